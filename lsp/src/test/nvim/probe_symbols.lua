-- Document symbols of the bench: a tree when Neovim advertises hierarchicalDocumentSymbolSupport (0.7.2 does),
-- flat SymbolInformation otherwise. Every declared name appears (and none of the unopened library's); in a
-- tree every node's selectionRange lies within its range, and every child within its parent.
local NAMES = { 'wren_laser', 'tern_optic', 'wren_spot', 'wren' }

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = ctx.bench_buf
  local err, result = s:request('textDocument/documentSymbol', { textDocument = { uri = vim.uri_from_bufnr(buf) } }, buf)
  if not (S.expect(r, err == nil, 'documentSymbol error: ' .. tostring(err and err.message))
      and S.expect(r, type(result) == 'table' and #result > 0, 'no document symbols')) then
    return r
  end
  local hierarchical = s.capabilities.textDocument.documentSymbol.hierarchicalDocumentSymbolSupport == true
  r.hierarchical_advertised = hierarchical
  local seen, nodes, max_depth = {}, 0, 0
  local function walk(list, parent, depth)
    for _, sym in ipairs(list) do
      nodes = nodes + 1
      max_depth = math.max(max_depth, depth)
      seen[sym.name] = true
      if hierarchical then
        S.expect(r, sym.range ~= nil and sym.selectionRange ~= nil and sym.location == nil,
          sym.name .. ' is not a DocumentSymbol')
        if sym.range and sym.selectionRange then
          S.expect(r, S.within(sym.selectionRange, sym.range), sym.name .. ': selectionRange outside its range')
          S.expect(r, parent == nil or S.within(sym.range, parent.range), sym.name .. ': outside its parent')
        end
        walk(sym.children or {}, sym, depth + 1)
      else
        S.expect(r, sym.location ~= nil and sym.selectionRange == nil, sym.name .. ' is not a SymbolInformation')
      end
    end
  end
  walk(result, nil, 1)
  r.form = result[1].location and 'SymbolInformation' or 'DocumentSymbol'
  r.nodes = nodes
  r.depth = max_depth
  r.top_level = {}
  for _, sym in ipairs(result) do table.insert(r.top_level, sym.name) end
  for _, name in ipairs(NAMES) do
    S.expect(r, seen[name], name .. ' is not among the symbols')
  end
  S.expect(r, not seen.glim_glass and not seen.glim_fold, 'the used library\'s declarations came as this file\'s')
  r.summary = ('%s, %d nodes, depth %d (hierarchical %s)'):format(r.form, nodes, max_depth, tostring(hierarchical))
  return r
end
