-- Completion from Neovim at four places of the bench: a train step (element names, one from the unopened
-- library), a name being typed on a new train line (read from the buffer before any check), the start of a
-- top-level line (kinds and keywords) and a parameter inside a block (parameter names).
-- Neovim 0.7.2 advertises completionItem.snippetSupport = false, so no item may be a snippet
-- (insertTextFormat 2); were it true, snippets would be allowed and only the labels are checked. It also
-- declares no completionItem.resolveSupport, so the server sends documentation at once; a completionItem/resolve
-- (which Neovim itself never sends, but completion plugins do) must answer with the item, documentation kept.
local function labels_of(result)
  local items = result and (result.items or result) or {}
  local labels = {}
  for _, it in ipairs(items) do labels[it.label] = it end
  return items, labels
end

return function(ctx)
  local S, s = ctx.S, ctx.s
  local r = S.result()
  local buf = ctx.bench_buf
  vim.api.nvim_set_current_buf(buf)
  local item_caps = s.capabilities.textDocument.completion.completionItem
  r.snippet_support_advertised = item_caps.snippetSupport == true
  r.resolve_support_advertised = item_caps.resolveSupport ~= nil
  r.places = {}

  local function complete(label, row, col, want)
    local err, result = s:request('textDocument/completion', S.position_at(row, col), buf)
    local items, labels = labels_of(result)
    local place = { at = label, utf16 = S.utf16(vim.api.nvim_buf_get_lines(buf, row, row + 1, false)[1], col),
      count = #items }
    table.insert(r.places, place)
    S.expect(r, err == nil, label .. ': completion error ' .. tostring(err and err.message))
    for _, w in ipairs(want) do
      S.expect(r, labels[w] ~= nil, label .. ': no item ' .. w)
    end
    for _, it in ipairs(items) do
      if not r.snippet_support_advertised then
        S.expect(r, it.insertTextFormat ~= 2, label .. ': ' .. it.label .. ' is a snippet')
      end
    end
    return labels
  end

  local row, col = S.find(buf, 'glim_fold ->')
  complete('train step', row, col, { 'wren_laser', 'glim_fold', 'tern_optic', 'wren_spot' })

  -- Typing a new train line: the request comes before the check of that version.
  local train_row = S.find(buf, '  wren_laser -> 100 mm')
  local typed = '  wren_laser -> 10 mm -> te'
  vim.api.nvim_buf_set_lines(buf, train_row + 1, train_row + 1, false, { typed })
  complete('typed "te"', train_row + 1, #typed, { 'tern_optic' })
  vim.api.nvim_buf_set_lines(buf, train_row + 1, train_row + 2, false, {})

  row = S.find(buf, 'probe wren_spot')
  complete('line start', row, 0, { 'source', 'lens', 'mirror', 'probe', 'use', 'train', 'require' })

  row, col = S.find(buf, '  focal 50 mm')
  local params = complete('lens block', row, col + 2, { 'focal', 'clear_aperture', 'material' })
  for _, name in ipairs({ 'focal', 'clear_aperture', 'material' }) do
    if params[name] and not r.resolve_support_advertised then
      S.expect(r, params[name].documentation ~= nil, name .. ' came without documentation')
    end
  end
  if params.focal then
    local err, resolved = s:request('completionItem/resolve', params.focal, buf)
    S.expect(r, err == nil and resolved ~= nil and resolved.label == 'focal' and resolved.documentation ~= nil,
      'completionItem/resolve lost the item or its documentation')
  end
  S.expect(r, s:wait_publish(buf, nil, 15000) ~= nil, 'no publish after the typed line was removed')
  local counts = {}
  for _, place in ipairs(r.places) do table.insert(counts, place.at .. ' ' .. place.count) end
  r.summary = ('items: %s; snippetSupport %s'):format(table.concat(counts, ', '), tostring(r.snippet_support_advertised))
  return r
end
