-- Reads the probe's JSON report ($JONQUIL_PROBE_OUT), prints one line per probe, and leaves with :cquit 0 only
-- when every expected probe is present and ok (run.sh's verdict; Neovim is the one JSON reader it can count on).
local EXPECTED = { 'initialize', 'push_bound', 'sample_edit', 'emoji_hover', 'completion', 'definition', 'symbols',
  'hover_latency', 'shutdown', 'log' }

local path = assert(os.getenv('JONQUIL_PROBE_OUT'), 'set JONQUIL_PROBE_OUT')
local ok, report = pcall(function() return vim.fn.json_decode(table.concat(vim.fn.readfile(path), '\n')) end)
local lines, pass = {}, ok
if not ok then
  table.insert(lines, 'run.sh: the report does not parse: ' .. tostring(report))
else
  if report.error then
    table.insert(lines, 'run.sh: the probe stopped: ' .. report.error)
    pass = false
  end
  local by_name = {}
  for _, p in ipairs(report.probes or {}) do by_name[p.name] = p end
  for _, name in ipairs(EXPECTED) do
    local p = by_name[name]
    if p == nil then
      table.insert(lines, ('run.sh: %-14s MISSING'):format(name))
      pass = false
    elseif p.ok == true then
      table.insert(lines, ('run.sh: %-14s ok: %s'):format(name, p.summary or ''))
    else
      table.insert(lines, ('run.sh: %-14s FAILED: %s'):format(name, table.concat(p.failures or {}, '; ')))
      pass = false
    end
  end
  if report.ok ~= pass then
    table.insert(lines, 'run.sh: the report\'s own verdict disagrees')
    pass = false
  end
end
io.stdout:write(table.concat(lines, '\n') .. '\n')
vim.cmd(pass and 'cquit 0' or 'cquit 1')
