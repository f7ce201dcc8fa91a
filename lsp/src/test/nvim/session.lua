-- One Jonquil client in headless Neovim 0.7.2 (no vim.lsp.start), what it received, and blocking helpers
-- for the probes: each helper pumps Neovim's loop with vim.wait, so handlers run while a probe waits.
local M = {}
M.__index = M

local function ms(nanos)
  return math.floor(nanos / 1e4 + 0.5) / 100
end
M.ms = ms

-- Starts `jonquil lsp --verbose` with Neovim's own default capabilities, kept so probes can read what was offered.
-- The server's stdout passes through tee into stdout_copy: Neovim 0.7.2 silently skips stray text before a
-- header, so only a byte-exact copy shows whether stdout held anything but protocol. pipefail keeps the
-- server's own exit status as the command's.
function M.start(jar, root_dir, stdout_copy)
  local s = setmetatable({ publishes = {}, client_errors = {}, started = vim.loop.hrtime() }, M)
  s.capabilities = vim.lsp.protocol.make_client_capabilities()
  s.stdout_copy = stdout_copy
  s.id = vim.lsp.start_client({
    name = 'jonquil',
    cmd = { 'bash', '-c', 'set -o pipefail; java -jar "$0" lsp --verbose | tee "$1"', jar, stdout_copy },
    root_dir = root_dir,
    capabilities = s.capabilities,
    handlers = {
      ['textDocument/publishDiagnostics'] = function(_, result, _, _)
        local errors, codes = 0, {}
        for _, d in ipairs(result.diagnostics) do
          if d.severity == 1 then errors = errors + 1 end
          table.insert(codes, d.code)
        end
        table.insert(s.publishes, {
          uri = result.uri, version = result.version, count = #result.diagnostics, errors = errors, codes = codes,
          at = vim.loop.hrtime(),
        })
      end,
    },
    on_init = function(_, result)
      s.init_result = result
    end,
    -- Neovim calls this for framing, JSON and handler errors on the stream (INVALID_SERVER_MESSAGE and the like).
    on_error = function(code, err)
      table.insert(s.client_errors, { code = vim.lsp.rpc.client_errors[code] or code, err = tostring(err) })
    end,
    on_exit = function(code, signal)
      s.exit_code = code
      s.exit_signal = signal
    end,
  })
  if s.id then
    s.client = vim.lsp.get_client_by_id(s.id)
  end
  return s
end

-- Opens a file in a new buffer and attaches the client (Neovim sends didOpen with version 0).
function M:open(path)
  vim.cmd('edit ' .. vim.fn.fnameescape(path))
  local buf = vim.api.nvim_get_current_buf()
  vim.lsp.buf_attach_client(buf, self.id)
  return buf, vim.uri_from_bufnr(buf)
end

function M:latest(uri)
  for i = #self.publishes, 1, -1 do
    if self.publishes[i].uri == uri then return self.publishes[i] end
  end
end

-- Waits for a publish for the buffer at its current version that satisfies pred; returns it or nil.
function M:wait_publish(buf, pred, timeout_ms)
  local uri = vim.uri_from_bufnr(buf)
  local found
  vim.wait(timeout_ms, function()
    local p = self:latest(uri)
    if p ~= nil and p.version == vim.lsp.util.buf_versions[buf] and (pred == nil or pred(p)) then
      found = p
      return true
    end
    return false
  end, 5)
  return found
end

-- Sends a request and waits for its answer: returns err, result and the round trip in ms (nil, nil, nil on timeout).
function M:request(method, params, buf, timeout_ms)
  local done, err, result, took = false, nil, nil, nil
  local sent = vim.loop.hrtime()
  self.client.request(method, params, function(e, r)
    took = ms(vim.loop.hrtime() - sent)
    err, result, done = e, r, true
  end, buf)
  if not vim.wait(timeout_ms or 10000, function() return done end, 1) then
    return nil, nil, nil
  end
  return err, result, took
end

-- Puts the cursor on a byte column of a line of the current window's buffer and returns the position
-- parameters Neovim itself would send from there (its own UTF-16 conversion, as for K or gd).
function M.position_at(row, byte_col)
  vim.api.nvim_win_set_cursor(0, { row + 1, byte_col })
  return vim.lsp.util.make_position_params()
end

-- The 0-based row and byte column of the first plain-text match of needle in a buffer, or nil.
function M.find(buf, needle)
  for i, line in ipairs(vim.api.nvim_buf_get_lines(buf, 0, -1, false)) do
    local at = line:find(needle, 1, true)
    if at then return i - 1, at - 1, line end
  end
end

-- The UTF-16 column of a byte column of a line, as the protocol counts it.
function M.utf16(line, byte_col)
  local _, units = vim.str_utfindex(line, byte_col)
  return units
end

-- A probe's result: its own ok flag and the failures that cleared it.
function M.result()
  return { ok = true, failures = {} }
end

-- Records a failure in r unless cond holds; returns cond.
function M.expect(r, cond, what)
  if not cond then
    r.ok = false
    table.insert(r.failures, what)
  end
  return cond
end

function M.before_or_at(a, b)
  return a.line < b.line or (a.line == b.line and a.character <= b.character)
end

function M.within(inner, outer)
  return M.before_or_at(outer.start, inner.start) and M.before_or_at(inner['end'], outer['end'])
end

function M.same_range(a, b)
  return a ~= nil and b ~= nil and a.start.line == b.start.line and a.start.character == b.start.character
    and a['end'].line == b['end'].line and a['end'].character == b['end'].character
end

return M
