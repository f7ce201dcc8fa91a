-- Definition into another file that was never opened: from 'glim_glass' in the bench to its declaration in
-- the part library the bench `use`s. Neovim 0.7.2 advertises definition.linkSupport, so the answer must be
-- LocationLinks (a client without it must get Locations; the branch follows what was advertised).
local NAME = 'glim_glass'

local function realpath(uri)
  local path = vim.uri_to_fname(uri)
  return vim.loop.fs_realpath(path) or path
end

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = ctx.bench_buf
  vim.api.nvim_set_current_buf(buf)
  local library = ctx.project.library
  S.expect(r, vim.fn.bufnr(library) == -1, 'the library was opened in a buffer before the request')

  local row, col, line = S.find(buf, 'material ' .. NAME)
  col = col + #'material '
  local err, result = s:request('textDocument/definition', S.position_at(row, col + 2), buf)
  if not (S.expect(r, err == nil, 'definition error: ' .. tostring(err and err.message))
      and S.expect(r, type(result) == 'table' and #result == 1, 'not exactly one definition')) then
    r.result = result
    return r
  end
  local links = s.capabilities.textDocument.definition.linkSupport == true
  r.link_support_advertised = links
  local d = result[1]
  r.answer = d
  local uri, range, selection
  if links then
    r.form = d.targetUri and 'LocationLink' or 'Location'
    S.expect(r, d.targetUri ~= nil and d.uri == nil, 'a Location came although linkSupport was advertised')
    uri, range, selection = d.targetUri, d.targetRange, d.targetSelectionRange
    S.expect(r, S.same_range(d.originSelectionRange, {
      start = { line = row, character = S.utf16(line, col) },
      ['end'] = { line = row, character = S.utf16(line, col + #NAME) },
    }), 'originSelectionRange is not the name under the cursor')
    S.expect(r, range ~= nil and selection ~= nil and S.within(selection, range),
      'targetSelectionRange is not within targetRange')
  else
    r.form = d.uri and 'Location' or 'LocationLink'
    S.expect(r, d.uri ~= nil and d.targetUri == nil, 'a LocationLink came although linkSupport was not advertised')
    uri, selection = d.uri, d.range
  end
  if not S.expect(r, uri ~= nil and selection ~= nil, 'the answer has no target') then
    return r
  end
  S.expect(r, realpath(uri) == vim.loop.fs_realpath(library), 'the definition is not in the part library: ' .. uri)

  -- Where the declaration's name is in the library's text on disk.
  local lines = vim.fn.readfile(library)
  local want
  for i, l in ipairs(lines) do
    local at = l:find('material ' .. NAME, 1, true)
    if at then
      local start = at - 1 + #'material '
      want = { start = { line = i - 1, character = S.utf16(l, start) },
        ['end'] = { line = i - 1, character = S.utf16(l, start + #NAME) } }
    end
  end
  S.expect(r, S.same_range(selection, want), 'the target is not the declaration of ' .. NAME)
  S.expect(r, vim.fn.bufnr(library) == -1, 'the library was opened')
  r.summary = ('%s in %s line %d (linkSupport %s)'):format(r.form, vim.fn.fnamemodify(library, ':t'),
    selection.start.line + 1, tostring(links))
  return r
end
