-- Hover after an emoji, in the position encoding Neovim 0.7.2 uses (UTF-16): the cursor is put on the name
-- and Neovim converts its byte column itself (make_position_params, as for K). The answer must be about that
-- name, with the name's UTF-16 range. Both ends of the name are hovered: a server reading the column as code
-- points would land past the last character, one reading UTF-8 bytes before the first (on 'lens').
local NAME = 'tern_optic'

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = s:open(ctx.project.bench)
  ctx.bench_buf = buf
  if not S.expect(r, s:wait_publish(buf, nil, 15000) ~= nil, 'no publish for the bench at its version') then
    return r
  end
  local row, col, line = S.find(buf, NAME .. ' {')
  r.line = line
  local code_points, units = vim.str_utfindex(line, col)
  r.name_starts_at = { utf8_byte = col, code_point = code_points, utf16 = units }
  S.expect(r, col > units and units > code_points, 'the line before the name must hold an emoji and an é')
  local want = {
    start = { line = row, character = units },
    ['end'] = { line = row, character = S.utf16(line, col + #NAME) },
  }
  local hover_format = s.capabilities.textDocument.hover.contentFormat
  r.offered_content_format = hover_format
  r.hovers = {}
  for _, byte_col in ipairs({ col, col + #NAME - 1 }) do
    local params = S.position_at(row, byte_col)
    local h = { utf16 = params.position.character }
    table.insert(r.hovers, h)
    local err, result = s:request('textDocument/hover', params, buf)
    local at = ' at UTF-16 ' .. h.utf16
    if S.expect(r, err == nil, 'hover error' .. at .. ': ' .. tostring(err and err.message))
        and S.expect(r, result ~= nil, 'no hover' .. at) then
      h.kind = result.contents.kind
      h.range = result.range
      S.expect(r, result.contents.value:find(NAME, 1, true) ~= nil, 'the hover' .. at .. ' does not name ' .. NAME)
      S.expect(r, S.same_range(result.range, want), 'the hover range' .. at .. ' is not the UTF-16 range of ' .. NAME)
      -- Neovim lists markdown first: the server must answer in it.
      S.expect(r, h.kind == hover_format[1], 'hover in ' .. tostring(h.kind) .. ', not ' .. hover_format[1])
    end
  end
  r.summary = ('%s at UTF-16 %d-%d (bytes %d, code points %d), %s'):format(NAME, want.start.character,
    want['end'].character, col, code_points, r.hovers[1].kind or '?')
  return r
end
