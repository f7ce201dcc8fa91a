-- The probe's throw-away project, written under lsp/target/: a bench that `use`s a part library which no
-- probe ever opens, a spec with a mistake, and a generated spec of more than 5000 lines. Every name is invented.
local M = {}

local LIBRARY = [[
// Parts for the editor probe's bench (invented).
material glim_glass {
  cauchy 1.51, 0.004 um2
}

mirror glim_fold {
  metal silver
  aoi 45 deg
}
]]

-- The emoji line: a comment holding a surrogate pair (two UTF-16 units, one code point, four UTF-8 bytes)
-- and an é (one unit, two bytes) before the declared name, so the three encodings disagree on its column.
local BENCH = [[
// Bench for the editor probe (invented parts).
use "parts/glim_parts.jonq"

source wren_laser {
  wavelength 1064 nm
  power 1 W
  polarization linear 0 deg
}

/* 😀😀 é */ lens tern_optic {
  focal 50 mm
  clear_aperture 10 mm
  material glim_glass
}

probe wren_spot

train wren {
  wren_laser -> 100 mm -> glim_fold -> 50 mm -> tern_optic -> 50 mm -> wren_spot
}
]]

-- A focal length without its unit.
local BROKEN = [[
// A relay lens whose focal length lost its unit (invented part).
lens tern_relay {
  focal 80
}
]]

-- Trains of windows, as the server's latency benchmark builds them, at 20 trains of 34 windows (over 5000 lines).
local function large(trains, windows)
  local out = { '// Generated for the editor probe: many trains of windows (invented parts).', '',
    'material pane_glass = index 1.5', '' }
  for t = 0, trains - 1 do
    table.insert(out, ('source heron_%d {'):format(t))
    table.insert(out, '  wavelength 1064 nm')
    table.insert(out, '  power 1 W')
    table.insert(out, '  polarization linear 0 deg')
    table.insert(out, '  beam waist 1.0 mm, m2 1.1')
    table.insert(out, '}')
    table.insert(out, '')
    for w = 0, windows - 1 do
      table.insert(out, ('window pane_%d_%d {'):format(t, w))
      table.insert(out, '  material pane_glass')
      table.insert(out, '  thickness 1 mm')
      table.insert(out, '  coating ar 0.2 %')
      table.insert(out, '}')
      table.insert(out, '')
    end
    table.insert(out, ('probe heron_spot_%d'):format(t))
    table.insert(out, '')
  end
  for t = 0, trains - 1 do
    table.insert(out, ('train heron_train_%d {'):format(t))
    table.insert(out, ('  heron_%d'):format(t))
    for w = 0, windows - 1 do
      table.insert(out, ('    -> 10 mm -> pane_%d_%d'):format(t, w))
    end
    table.insert(out, ('    -> 10 mm -> heron_spot_%d'):format(t))
    table.insert(out, '}')
    table.insert(out, '')
  end
  table.insert(out, 'require {')
  for t = 0, trains - 1 do
    table.insert(out, ('  power at heron_spot_%d > 1 mW'):format(t))
  end
  table.insert(out, '}')
  return table.concat(out, '\n') .. '\n'
end

local function write(path, text)
  vim.fn.mkdir(vim.fn.fnamemodify(path, ':h'), 'p')
  local f = assert(io.open(path, 'w'))
  f:write(text)
  f:close()
end

-- Writes the project into dir (emptied first) and returns its paths.
function M.write(dir)
  vim.fn.delete(dir, 'rf')
  local p = {
    dir = dir,
    library = dir .. '/parts/glim_parts.jonq',
    bench = dir .. '/bench.jonq',
    broken = dir .. '/broken.jonq',
    large = dir .. '/large.jonq',
  }
  -- Marks the project root, as a checkout without version control would.
  write(dir .. '/.jonquil-root', '')
  write(p.library, LIBRARY)
  write(p.bench, BENCH)
  write(p.broken, BROKEN)
  write(p.large, large(20, 34))
  return p
end

return M
