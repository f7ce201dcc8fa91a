-- The end of the session: publishes for each document never went back in version, and after Neovim's
-- shutdown and exit the server ends with status 0.
return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local last = {}
  for _, p in ipairs(s.publishes) do
    if p.version ~= nil then
      local before = last[p.uri]
      S.expect(r, before == nil or p.version >= before,
        ('%s went back from version %d to %d'):format(p.uri, before or -1, p.version))
      last[p.uri] = p.version
    end
  end
  r.publishes = #s.publishes
  s.client.stop()
  if S.expect(r, vim.wait(10000, function() return s.exit_code ~= nil end, 20), 'the server did not exit') then
    r.exit_code = s.exit_code
    S.expect(r, s.exit_code == 0, 'the server exited with ' .. tostring(s.exit_code) .. ' after shutdown and exit')
  end
  r.session_ms = S.ms(vim.loop.hrtime() - s.started)
  r.summary = ('exit %s after %d publishes, session %.1f s'):format(tostring(r.exit_code), r.publishes,
    r.session_ms / 1000)
  return r
end
