/**
 * The canonical layout of a spec, for {@code jonquil fmt} and the editor's format request.
 *
 * <p>Rules, chosen so that a diff shows one changed fact per changed line:
 *
 * <ul>
 *   <li>One statement per line. A block puts each parameter (or path, or requirement) on a line of
 *       its own, indented one level; its '}' closes on a line of its own, and an empty block closes
 *       at once ({@code probe p {}}). {@code material x = ...} stays on one line.
 *   <li>';' is a line break written inline; it becomes a real one and is not written. Nothing else
 *       the writer typed is dropped, added or reordered: every other token and every comment stays
 *       between the same two tokens.
 *   <li>One space between tokens, except: none before ',', none around '.' in {@code element.port},
 *       none after a sign ({@code -5 mm}), none inside a compound unit ({@code 5 kW/cm2}, {@code 2
 *       J/cm^2}); a unit that starts with '/' keeps its space after the number ({@code 0.2 /cm}).
 *       Before '%' and '°' the writer's choice is kept ({@code 95 %} or {@code 95%}, {@code 45°}).
 *       Tolerances keep their spelling, '±' or '+-', with one space on each side.
 *   <li>A beam path stays on one line unless it is longer than 100 columns; then it breaks before
 *       an arrow, and each continuation line starts with '->' aligned under the path's first arrow.
 *       Line breaks inside a path are otherwise not kept.
 *   <li>A comment after code stays at the end of that line; a comment on its own line stays on its
 *       own line, indented like the code around it. Inside a path, a line comment or a comment on
 *       its own line ends the line there. Block comments keep their text exactly, including the
 *       lines inside them; line comments lose trailing blanks.
 *   <li>Blank lines the writer left are kept, at most one in a row, never just inside a block's
 *       braces, never at the start or end of the file.
 *   <li>No trailing blanks; the file ends with exactly one line break, written in the file's own
 *       style (the first line ending found: LF, CRLF or CR); a byte-order mark stays. A file with
 *       nothing but blanks becomes empty.
 * </ul>
 *
 * <p>A file with syntax errors is never formatted. As a last guard, output whose tokens differ from
 * the input's, or that no longer parses, is discarded for the original text.
 */
package jonquil.format;
