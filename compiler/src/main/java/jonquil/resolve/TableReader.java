package jonquil.resolve;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import jonquil.diag.Diagnostic;
import jonquil.diag.DiagnosticCode;
import jonquil.source.LineIndex;
import jonquil.source.TextRange;
import jonquil.units.Dimension;
import jonquil.units.Unit;
import jonquil.units.UnitParse;
import jonquil.units.UnitParser;

/**
 * Reads an n,k table file: one row per line, {@code <wavelength> <unit> <n> [<k>]}, e.g. {@code 532
 * nm 1.5195 0}; '#' or '//' starts a comment. Rows must rise in wavelength. Every bad row is a
 * diagnostic at its line in the table file.
 */
public final class TableReader {
  private TableReader() {}

  /** The rows (wavelength in metres, n, k), or empty when the table has errors. */
  public static Optional<List<double[]>> read(Path file, String text, List<Diagnostic> out) {
    LineIndex lines = new LineIndex(text);
    List<double[]> rows = new ArrayList<>();
    int errors = 0;
    for (int line = 0; line < lines.lineCount(); line++) {
      int start = lines.lineStart(line);
      int end = lines.lineContentEnd(line);
      String content = text.substring(start, end);
      int comment = indexOfComment(content);
      String data = (comment >= 0 ? content.substring(0, comment) : content).strip();
      if (data.isEmpty()) {
        continue;
      }
      TextRange range =
          new TextRange(
              start + content.indexOf(data.charAt(0)),
              start + content.indexOf(data.charAt(0)) + data.length());
      String problem = null;
      double[] row = null;
      String[] f = data.split("[\\s,;]+");
      if (f.length < 3 || f.length > 4) {
        problem = "expected '<wavelength> <unit> <n> [<k>]', e.g. '532 nm 1.5195 0'";
      } else {
        try {
          UnitParse unit = UnitParser.parse(f[1]);
          if (unit instanceof UnitParse.Failure failure) {
            problem = failure.message();
          } else {
            Unit u = ((UnitParse.Ok) unit).unit();
            if (!u.dimension().equals(Dimension.LENGTH)) {
              problem =
                  "the wavelength needs a length unit such as 'nm'; '" + f[1] + "' is not one";
            } else {
              double wl = u.toSi(Double.parseDouble(f[0]));
              double n = Double.parseDouble(f[2]);
              double k = f.length == 4 ? Double.parseDouble(f[3]) : 0;
              if (!plain(f[0]) || !plain(f[2]) || (f.length == 4 && !plain(f[3]))) {
                // Java would read 'NaN', 'Infinity', '0x1p3' or '2d'; a data file means none.
                problem = "numbers must be plain decimals such as '1.5195' or '1.2e-3'";
              } else if (!Double.isFinite(wl) || !Double.isFinite(n) || !Double.isFinite(k)) {
                problem = "n and k must be finite numbers";
              } else if (!(wl > 0) || !(n > 0) || !(k >= 0)) {
                problem = "the wavelength and n must be positive and k zero or more";
              } else if (!KindTables.WAVELENGTH.contains(wl)) {
                problem =
                    "'"
                        + f[0]
                        + " "
                        + f[1]
                        + "' is outside the wavelengths Jonquil models (150 nm to 20 µm)";
              } else if (!rows.isEmpty() && wl <= rows.get(rows.size() - 1)[0]) {
                problem = "rows must rise in wavelength; this one does not";
              } else {
                row = new double[] {wl, n, k};
              }
            }
          }
        } catch (NumberFormatException e) {
          problem = "not a number in this row: expected '<wavelength> <unit> <n> [<k>]'";
        }
      }
      if (problem != null) {
        errors++;
        if (errors <= 20) {
          out.add(Diagnostic.of(DiagnosticCode.BAD_TABLE_ROW, file, range, problem));
        }
      } else {
        rows.add(row);
      }
    }
    if (errors == 0 && rows.size() < 2) {
      out.add(
          Diagnostic.of(
              DiagnosticCode.BAD_TABLE_ROW,
              file,
              TextRange.EMPTY,
              "an n,k table needs at least two rows to interpolate between"));
      errors++;
    }
    return errors == 0 ? Optional.of(rows) : Optional.empty();
  }

  private static int indexOfComment(String line) {
    int hash = line.indexOf('#');
    int slashes = line.indexOf("//");
    if (hash < 0) {
      return slashes;
    }
    return slashes < 0 ? hash : Math.min(hash, slashes);
  }

  private static final java.util.regex.Pattern PLAIN_DECIMAL =
      java.util.regex.Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

  private static boolean plain(String number) {
    return PLAIN_DECIMAL.matcher(number).matches();
  }
}
