-- Stdout hygiene with debug logging on both sides: Neovim's LSP log at level debug (all but the timed hovers of
-- hover_latency), the server started with --verbose (all along). The whole session above went through, and
-- afterwards the log must show
--   * Neovim logging at debug level (rpc.receive lines), and the server's verbose lines (they reach the log as
--     its stderr), so both kinds of logging really were on;
--   * no framing or decoding trouble: no Content-Length or header complaint, no client_error, and no ERROR or
--     WARN line other than the server's own stderr;
--   * no on_error call from Neovim's RPC layer during the session;
--   * and, since Neovim 0.7.2 silently skips stray text before a header, the byte-exact copy of the server's
--     stdout splits into Content-Length frames whose bodies all decode as JSON, with not one byte left over.
local PROTOCOL_TROUBLE = { 'content%-length', 'invalid header', 'client_error', 'invalid_server',
  'expected more data', 'decode', 'parse error' }

-- Splits the server's stdout into frames; returns the frame count and the first bytes that are not a frame.
local function unframe(bytes)
  local at, frames = 1, 0
  while at <= #bytes do
    local header_end = bytes:find('\r\n\r\n', at, true)
    local header = header_end and bytes:sub(at, header_end - 1)
    local length = header and header:match('^Content%-Length: (%d+)$')
    if not length then
      return frames, bytes:sub(at, at + 199)
    end
    local body = bytes:sub(header_end + 4, header_end + 3 + tonumber(length))
    if #body < tonumber(length) or not pcall(vim.fn.json_decode, body) then
      return frames, bytes:sub(at, at + 199)
    end
    frames = frames + 1
    at = header_end + 4 + tonumber(length)
  end
  return frames, nil
end

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  r.log = ctx.log_path
  S.expect(r, vim.startswith(ctx.log_path, ctx.repo .. '/lsp/target/'), 'the log is not this run\'s own, under lsp/target/')
  r.client_errors = s.client_errors
  S.expect(r, #s.client_errors == 0, 'Neovim reported RPC errors')
  local lines = vim.fn.readfile(ctx.log_path)
  local receive, stderr, check_lines, request_lines, bad = 0, 0, 0, 0, {}
  for _, line in ipairs(lines) do
    local is_stderr = line:find('"stderr"', 1, true) ~= nil
    if line:find('"rpc.receive"', 1, true) then receive = receive + 1 end
    if is_stderr then
      stderr = stderr + 1
      local _, checks = line:gsub('jonquil lsp: debug: check: ', '')
      local _, requests = line:gsub('jonquil lsp: debug: request textDocument/', '')
      check_lines = check_lines + checks
      request_lines = request_lines + requests
    else
      local lower = line:lower()
      local trouble = line:match('^%[ERROR%]') or line:match('^%[WARN%]')
      for _, pattern in ipairs(PROTOCOL_TROUBLE) do
        -- Payload lines (rpc.send/rpc.receive) carry spec text and messages, not protocol complaints.
        if not line:find('"rpc.send"', 1, true) and not line:find('"rpc.receive"', 1, true) and lower:find(pattern) then
          trouble = true
        end
      end
      if trouble and #bad < 10 then table.insert(bad, line:sub(1, 300)) end
    end
  end
  r.lines = #lines
  r.debug_receive_lines = receive
  r.stderr_chunks = stderr
  r.verbose_check_lines = check_lines
  r.verbose_request_lines = request_lines
  r.trouble = bad
  S.expect(r, receive > 0, 'Neovim did not log at debug level (no rpc.receive lines)')
  S.expect(r, check_lines > 0 and request_lines > 0, 'the server\'s --verbose lines did not reach the log')
  S.expect(r, #bad == 0, 'the log has protocol trouble or error lines')

  local f = io.open(s.stdout_copy, 'rb')
  if S.expect(r, f ~= nil, 'no copy of the server\'s stdout') then
    local bytes = f:read('*a')
    f:close()
    r.stdout_bytes = #bytes
    r.stdout_frames, r.stdout_unframed = unframe(bytes)
    S.expect(r, r.stdout_frames > 0 and r.stdout_unframed == nil, 'the server\'s stdout holds more than frames')
  end
  r.summary = ('%d debug receive lines, %d check and %d request lines from --verbose, %d stdout frames, %d bad lines')
    :format(receive, check_lines, request_lines, r.stdout_frames or 0, #bad)
  return r
end
