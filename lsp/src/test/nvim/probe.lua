-- Headless Neovim probe of the Jonquil language server, for Neovim 0.7.2 (no vim.lsp.start, no nvim -l).
-- One session of `jonquil lsp --verbose` with Neovim's LSP log at debug level runs the probes below in order,
-- each in its own file (probe_*.lua) and each with its own ok flag in the report. The report goes to
-- $JONQUIL_PROBE_OUT as JSON; Neovim leaves with :cquit 0 when every probe passed, else 1.
local here = vim.fn.fnamemodify(debug.getinfo(1, 'S').source:sub(2), ':p:h')
local repo = assert(os.getenv('JONQUIL_REPO'), 'set JONQUIL_REPO')
local jar = os.getenv('JONQUIL_JAR') or (repo .. '/lsp/target/jonquil.jar')
local out = os.getenv('JONQUIL_PROBE_OUT') or (repo .. '/lsp/target/nvim-probe.json')

local PROBES = {
  'initialize', -- opens the sample; the rest start from a warm server
  'push_bound',
  'sample_edit',
  'emoji_hover', -- opens the bench that the next three use
  'completion',
  'definition',
  'symbols',
  'hover_latency',
  'shutdown',
  'log', -- reads the log the whole session wrote
}

local report = { probes = {} }

local function finish()
  local ok = #report.probes == #PROBES
  for _, p in ipairs(report.probes) do
    ok = ok and p.ok
  end
  report.ok = ok
  local f = assert(io.open(out, 'w'))
  f:write(vim.fn.json_encode(report))
  f:close()
  vim.cmd(ok and 'cquit 0' or 'cquit 1')
end

local started, err = pcall(function()
  -- Before any client starts: every message and the server's stderr go to the log.
  vim.lsp.set_log_level('debug')
  local ctx = {
    S = dofile(here .. '/session.lua'),
    repo = repo,
    sample = repo .. '/samples/optical_trap.jonq',
    log_path = vim.lsp.get_log_path(),
  }
  ctx.project = dofile(here .. '/project.lua').write(repo .. '/lsp/target/nvim-project')
  ctx.s = ctx.S.start(jar, ctx.project.dir, repo .. '/lsp/target/nvim-server-stdout.bin')
  if not ctx.s.id then
    error('start_client returned nil')
  end
  for _, name in ipairs(PROBES) do
    local ran, result = pcall(dofile(here .. '/probe_' .. name .. '.lua'), ctx)
    if not ran then
      result = { ok = false, failures = { 'probe error: ' .. tostring(result) } }
    end
    result.name = name
    table.insert(report.probes, result)
    if name == 'initialize' then
      report.server_info = result.server_info
      if not result.ok then break end -- nothing else can work
    end
  end
end)
if not started then
  report.error = tostring(err)
end
finish()
