package jonquil.ide;

import jonquil.syntax.Arg;
import jonquil.units.Dimension;
import jonquil.units.QuantityFormat;
import jonquil.units.Unit;
import jonquil.units.UnitParse;
import jonquil.units.UnitParser;

/** A quantity literal in SI and in the other units people use for it. */
final class QuantityText {
  private QuantityText() {}

  static HoverInfo hover(String written, Arg.QuantityArg q) {
    StringBuilder md =
        new StringBuilder("**quantity** ").append(MarkdownText.code(MarkdownText.oneLine(written)));
    String unitText = q.unit().map(Arg.UnitLit::text).orElse("");
    UnitParse parsed =
        unitText.isEmpty() ? new UnitParse.Ok(Unit.dimensionless()) : UnitParser.parse(unitText);
    if (parsed instanceof UnitParse.Failure f) {
      md.append("\n\n_Unit not understood: ").append(f.message()).append("_");
      return new HoverInfo(md.toString(), q.range());
    }
    Unit unit = ((UnitParse.Ok) parsed).unit();
    double si = unit.toSi(q.number().value());
    Dimension dim = unit.dimension();
    md.append("\n\n")
        .append(dim.isDimensionless() ? "a plain number" : dim.describe())
        .append(": ")
        .append(QuantityFormat.format(si, dim))
        .append("\n\nIn SI: ")
        .append(MarkdownText.num(si))
        .append(MarkdownText.siUnit(dim).isEmpty() ? "" : " " + MarkdownText.siUnit(dim));
    var alternatives = QuantityFormat.alternatives(si, dim);
    alternatives =
        alternatives.stream()
            .filter(a -> !a.equals(MarkdownText.num(si) + " " + MarkdownText.siUnit(dim)))
            .toList();
    if (!alternatives.isEmpty()) {
      md.append("\n\nAlso: ").append(String.join(", ", alternatives));
    }
    q.tolerance()
        .ifPresent(
            t -> {
              String tolUnit = t.unit().map(Arg.UnitLit::text).orElse(unitText);
              UnitParse tp =
                  tolUnit.isEmpty()
                      ? new UnitParse.Ok(Unit.dimensionless())
                      : UnitParser.parse(tolUnit);
              if (tp instanceof UnitParse.Ok ok
                  && ok.unit().dimension().isDimensionless()
                  && !dim.isDimensionless()) {
                double half = Math.abs(si) * ok.unit().toSi(t.number().value());
                md.append("\n\nTolerance: ± ")
                    .append(QuantityFormat.format(half, dim))
                    .append(" (relative)");
              } else if (tp instanceof UnitParse.Ok ok) {
                md.append("\n\nTolerance: ± ")
                    .append(
                        QuantityFormat.format(
                            Math.abs(t.number().value() * ok.unit().factor()), dim));
              }
            });
    return new HoverInfo(md.toString(), q.range());
  }
}
