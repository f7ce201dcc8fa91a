-- Push diagnostics: opening a broken file publishes at least one diagnostic, with the document's version,
-- within 1 s.
-- What is measured: from just before buf_attach_client sends didOpen to the moment Neovim runs the
-- publishDiagnostics handler for that URI with the buffer's version and at least one diagnostic. That spans
-- both pipes, the server's 150 ms debounce and the check. It is not JVM start-up: the server warms up at start
-- and the sample's first publish has already arrived, so this is what a user opening a file sees.
local BOUND_MS = 1000

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  vim.cmd('edit ' .. vim.fn.fnameescape(ctx.project.broken))
  local buf = vim.api.nvim_get_current_buf()
  local sent = vim.loop.hrtime()
  vim.lsp.buf_attach_client(buf, s.id)
  r.version = vim.lsp.util.buf_versions[buf]
  r.bound_ms = BOUND_MS
  local p = s:wait_publish(buf, function(x) return x.count >= 1 end, 10000)
  if not S.expect(r, p ~= nil, 'no diagnostic published for the broken file at its version') then
    return r
  end
  r.elapsed_ms = S.ms(p.at - sent)
  r.codes = p.codes
  S.expect(r, p.errors >= 1, 'the unitless focal length is not reported as an error')
  S.expect(r, r.elapsed_ms < BOUND_MS, ('the first diagnostics took %.1f ms'):format(r.elapsed_ms))
  r.summary = ('%s for version %d, %.0f ms after didOpen (bound %d ms)'):format(table.concat(p.codes, ' '),
    p.version, r.elapsed_ms, BOUND_MS)
  return r
end
