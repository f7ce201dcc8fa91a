-- Headless Neovim probe of the Jonquil language server, for Neovim 0.7.2 (no vim.lsp.start).
-- Opens samples/optical_trap.jonq, breaks one value in the buffer (never saved), waits for
-- versioned diagnostics, asks for hover, repairs the value, then shuts the server down.
-- Writes what it received as JSON to $JONQUIL_PROBE_OUT and leaves with :cquit 0 (pass) or 1.
local repo = assert(os.getenv('JONQUIL_REPO'), 'set JONQUIL_REPO')
local jar = os.getenv('JONQUIL_JAR') or (repo .. '/lsp/target/jonquil.jar')
local out = os.getenv('JONQUIL_PROBE_OUT') or (repo .. '/lsp/target/nvim-probe.json')
local sample = repo .. '/samples/optical_trap.jonq'

local report = { publishes = {}, failures = {} }

local function fail(what)
  table.insert(report.failures, what)
end

local function finish()
  report.ok = #report.failures == 0
  local f = io.open(out, 'w')
  f:write(vim.fn.json_encode(report))
  f:close()
  vim.cmd(report.ok and 'cquit 0' or 'cquit 1')
end

local ok, err = pcall(function()
  vim.cmd('edit ' .. vim.fn.fnameescape(sample))
  local buf = vim.api.nvim_get_current_buf()
  local uri = vim.uri_from_bufnr(buf)
  report.uri = uri

  local id = vim.lsp.start_client({
    name = 'jonquil',
    cmd = { 'java', '-jar', jar, 'lsp' },
    root_dir = repo,
    handlers = {
      ['textDocument/publishDiagnostics'] = function(_, result, _, _)
        local errors = 0
        local codes = {}
        for _, d in ipairs(result.diagnostics) do
          if d.severity == 1 then errors = errors + 1 end
          table.insert(codes, d.code)
        end
        table.insert(report.publishes, {
          uri = result.uri, version = result.version, count = #result.diagnostics, errors = errors, codes = codes,
        })
      end,
    },
    on_init = function(_, result)
      report.server_info = result.serverInfo
      report.position_encoding = result.capabilities.positionEncoding
    end,
    on_exit = function(code, signal)
      report.exit_code = code
      report.exit_signal = signal
    end,
  })
  if not id then
    fail('start_client returned nil')
    return
  end
  vim.lsp.buf_attach_client(buf, id)
  local client = vim.lsp.get_client_by_id(id)

  -- The latest publish for the buffer, and whether it is for the buffer's current version.
  local function latest()
    for i = #report.publishes, 1, -1 do
      if report.publishes[i].uri == uri then return report.publishes[i] end
    end
  end
  local function current(pred)
    local p = latest()
    return p ~= nil and p.version == vim.lsp.util.buf_versions[buf] and pred(p)
  end

  if not vim.wait(30000, function() return current(function(p) return p.errors == 0 end) end, 50) then
    fail('no clean publish for the opened sample at its version')
    return
  end
  report.initialized = report.server_info ~= nil

  -- A deliberate mistake: a power in millimetres.
  local lines = vim.api.nvim_buf_get_lines(buf, 0, -1, false)
  local row
  for i, line in ipairs(lines) do
    if line:match('^%s*power%s+1%.2 W%s*$') then row = i - 1 break end
  end
  if not row then
    fail('sample no longer has the line "power 1.2 W"')
    return
  end
  local original = lines[row + 1]
  vim.api.nvim_buf_set_lines(buf, row, row + 1, false, { (original:gsub('1%.2 W', '1.2 mm')) })
  report.broken_version = vim.lsp.util.buf_versions[buf]
  if not vim.wait(15000, function() return current(function(p) return p.errors > 0 end) end, 50) then
    fail('no error published for the broken line at the buffer version')
  end

  -- Hover on the source's name (the server may have no answer yet, but must not fail).
  local hover_done = false
  client.request('textDocument/hover', {
    textDocument = { uri = uri },
    position = { line = row - 2, character = 8 },
  }, function(e, result)
    report.hover = { error = e and (e.message or tostring(e)) or vim.NIL, result = result or vim.NIL, answered = true }
    hover_done = true
  end, buf)
  if not vim.wait(10000, function() return hover_done end, 20) then
    fail('no hover response')
  elseif report.hover.error ~= vim.NIL then
    fail('hover answered with an error')
  end

  -- Repair the line: the error must be cleared for the newest version.
  vim.api.nvim_buf_set_lines(buf, row, row + 1, false, { original })
  report.fixed_version = vim.lsp.util.buf_versions[buf]
  if not vim.wait(15000, function() return current(function(p) return p.errors == 0 end) end, 50) then
    fail('the error was not cleared after the repair')
  end

  -- Versions published for the buffer never go back.
  local last = -1
  for _, p in ipairs(report.publishes) do
    if p.uri == uri and p.version ~= nil then
      if p.version < last then fail('a publish went back from version ' .. last .. ' to ' .. p.version) end
      last = p.version
    end
  end

  client.stop()
  if not vim.wait(10000, function() return report.exit_code ~= nil end, 50) then
    fail('the server did not exit after shutdown')
  elseif report.exit_code ~= 0 then
    fail('the server exited with ' .. tostring(report.exit_code) .. ' after shutdown and exit')
  end
end)
if not ok then
  fail('probe error: ' .. tostring(err))
end
finish()
