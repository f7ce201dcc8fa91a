-- Editing the sample in the buffer (never saved): a power written in millimetres is reported for that
-- version, a hover on the source answers meanwhile, and the repair clears the error for the newest version.
return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = ctx.sample_buf
  vim.api.nvim_set_current_buf(buf)
  local row, _, original = S.find(buf, 'power 1.2 W')
  if not S.expect(r, row ~= nil, 'the sample no longer has the line "power 1.2 W"') then
    return r
  end
  vim.api.nvim_buf_set_lines(buf, row, row + 1, false, { (original:gsub('1%.2 W', '1.2 mm')) })
  r.broken_version = vim.lsp.util.buf_versions[buf]
  local broken = s:wait_publish(buf, function(p) return p.errors > 0 end, 15000)
  if S.expect(r, broken ~= nil, 'no error published for the broken line at the buffer version') then
    r.broken_codes = broken.codes
  end

  local source_row, source_col = S.find(buf, 'trap_laser {')
  local err, result = s:request('textDocument/hover', S.position_at(source_row, source_col), buf)
  r.hover_answered = result ~= nil or err ~= nil
  S.expect(r, r.hover_answered, 'no hover answer')
  S.expect(r, err == nil, 'hover answered with an error: ' .. tostring(err and err.message))
  S.expect(r, result ~= nil and result.contents.value:find('trap_laser', 1, true) ~= nil,
    'the hover does not name the source trap_laser')

  vim.api.nvim_buf_set_lines(buf, row, row + 1, false, { original })
  r.fixed_version = vim.lsp.util.buf_versions[buf]
  S.expect(r, s:wait_publish(buf, function(p) return p.errors == 0 end, 15000) ~= nil,
    'the error was not cleared after the repair')
  r.summary = ('%s at version %d, cleared at version %d'):format(table.concat(r.broken_codes or {}, ' '),
    r.broken_version, r.fixed_version)
  return r
end
