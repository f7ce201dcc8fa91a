-- initialize: Neovim reaches initialized with the server's serverInfo, and positions stay in the UTF-16
-- Neovim 0.7.2 speaks (it offers no general.positionEncodings, so the server must not pick another).
-- Opens the sample and waits for its first, clean publish: later probes start from a warm server.
return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = s:open(ctx.sample)
  ctx.sample_buf = buf
  local p = s:wait_publish(buf, function(x) return x.errors == 0 end, 30000)
  if S.expect(r, p ~= nil, 'no clean publish for the opened sample at its version') then
    r.first_publish_ms = S.ms(p.at - s.started)
  end
  r.server_info = s.init_result and s.init_result.serverInfo
  S.expect(r, r.server_info ~= nil and r.server_info.name == 'jonquil', 'no serverInfo named jonquil')
  local general = s.capabilities.general or {}
  r.offered_position_encodings = general.positionEncodings or 'none (UTF-16 only)'
  local caps = (s.init_result and s.init_result.capabilities) or {}
  r.server_position_encoding = caps.positionEncoding or 'none (UTF-16)'
  r.client_offset_encoding = s.client.offset_encoding
  S.expect(r, caps.positionEncoding == nil or caps.positionEncoding == 'utf-16',
    'the server picked ' .. tostring(caps.positionEncoding) .. ' for a client that speaks UTF-16 only')
  S.expect(r, s.client.offset_encoding == 'utf-16', 'Neovim does not count in UTF-16')
  r.summary = ('%s %s, positions in %s'):format(r.server_info and r.server_info.name or '?',
    r.server_info and r.server_info.version or '?', s.client.offset_encoding)
  return r
end
