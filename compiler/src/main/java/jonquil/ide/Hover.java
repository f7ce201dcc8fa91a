package jonquil.ide;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import jonquil.Result;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Param;
import jonquil.resolve.ResolvedModel;
import jonquil.resolve.Symbol;
import jonquil.source.SourceFile;
import jonquil.source.TextRange;
import jonquil.syntax.Declaration;
import jonquil.syntax.Property;
import jonquil.syntax.SpecFile;

/** Chooses what the cursor is on (a name, a quantity, a requirement line) and builds its hover. */
final class Hover {
  private Hover() {}

  static Optional<HoverInfo> at(Result r, Path file, int offset) {
    Optional<SymbolUses.Occurrence> name = SymbolUses.of(r).at(file, offset);
    if (name.isPresent()) {
      return Optional.of(symbol(r, file, name.get().symbol(), name.get().range()));
    }
    Optional<SpecFile> tree = OwningModels.tree(r, file);
    if (tree.isEmpty()) {
      return Optional.empty();
    }
    SpecFile f = tree.get();
    SourceFile text = r.files().get(file);
    var use = NodeAtCursor.use(f, offset);
    if (use.isPresent()) {
      Path target = UseTarget.of(file, use.get().target());
      return Optional.of(
          new HoverInfo(
              "**use** "
                  + MarkdownText.code(use.get().target())
                  + (r.files().containsKey(target)
                      ? ": a part library; its declarations are visible in this file"
                      : ": this file was not read"),
              use.get().targetRange()));
    }
    var quantity = NodeAtCursor.quantity(f, offset);
    if (quantity.isPresent()) {
      return Optional.of(QuantityText.hover(text.slice(quantity.get().range()), quantity.get()));
    }
    var requirement = NodeAtCursor.requirement(f, offset);
    if (requirement.isPresent()) {
      return Optional.of(RequirementText.hover(r, file, requirement.get()));
    }
    var port = NodeAtCursor.port(f, offset);
    if (port.isPresent()) {
      TextRange at = port.get().port().get().range();
      return SymbolUses.of(r)
          .at(file, port.get().name().range().start())
          .map(o -> port(r, file, o.symbol(), port.get().port().get().text(), at));
    }
    return NodeAtCursor.kindWord(f, offset)
        .flatMap(d -> SymbolUses.of(r).at(file, d.name().range().start()))
        .map(o -> symbol(r, file, o.symbol(), o.range()));
  }

  /** The hover of a declared or catalog name, by what it names. */
  static HoverInfo symbol(Result r, Path file, Symbol s, TextRange range) {
    List<ResolvedModel> models = OwningModels.reading(r, s.isCatalog() ? file : s.file());
    StringBuilder md = new StringBuilder();
    md.append("**")
        .append(
            s.isCatalog()
                ? "catalog material"
                : s.kind()
                    .map(ElementKind::word)
                    .orElse(s.category() == Category.TRAIN ? "train" : "name"))
        .append("** ")
        .append(MarkdownText.code(s.name()));
    if (!s.isCatalog() && !s.file().equals(file)) {
      md.append(" — declared in ").append(MarkdownText.code(s.file().getFileName().toString()));
    }
    s.declaration().ifPresent(d -> parameters(md, r.files().get(s.file()), d));
    if (s.category() == Category.MATERIAL) {
      MaterialText.append(md, models, s);
    } else if (s.category().placeable() && s.kind().isPresent()) {
      ResolvedModel model = lightModel(r, models, s.name());
      if (model == null) {
        md.append("\n\n").append(LightText.NO_ANALYSIS);
      } else {
        ElementKind kind = s.kind().get();
        var solution = OwningModels.solution(r, model);
        var lines = LineText.at(r, model, solution, s.name(), kind);
        if (kind == ElementKind.SOURCE) {
          model.element(s).ifPresent(e -> lines(md, e));
          coherence(md, model, s.name());
        }
        LightText.append(md, model, solution, s.name(), kind);
        OpticsText.append(md, model.ambient(), solution, s.name(), kind, !lines.isEmpty());
        if (kind == ElementKind.SOURCE) {
          SafetyText.append(md, model, solution, s.name(), !lines.isEmpty());
        }
        LineText.append(md, model, lines, s.name(), kind);
      }
    }
    return new HoverInfo(md.toString().stripTrailing(), range);
  }

  /**
   * The light leaving one port of an element, in total and, where several lines leave by it, each
   * line's own; a port no light leaves by (a face light enters by) shows the element instead.
   */
  private static HoverInfo port(Result r, Path file, Symbol s, String port, TextRange range) {
    if (s.kind().isEmpty() || !s.category().placeable()) {
      return symbol(r, file, s, range);
    }
    ResolvedModel model = lightModel(r, OwningModels.reading(r, s.file()), s.name());
    var solution =
        model == null
            ? Optional.<jonquil.analysis.TrainSolution>empty()
            : OwningModels.solution(r, model);
    String key = s.name() + "." + port;
    if (solution.isEmpty() || solution.get().port(key).isEmpty()) {
      return symbol(r, file, s, range);
    }
    StringBuilder md =
        new StringBuilder("**port** ")
            .append(MarkdownText.code(key))
            .append(" of ")
            .append(s.kind().get().word())
            .append(' ')
            .append(MarkdownText.code(s.name()));
    LightText.port(
        md,
        solution.get(),
        key,
        "**Light** leaving it (in the table frame, summed over the lines)");
    LineText.port(md, r, model, key);
    return new HoverInfo(md.toString().stripTrailing(), range);
  }

  /** The model whose solution carries light at the element, else the first that reads it. */
  private static ResolvedModel lightModel(Result r, List<ResolvedModel> models, String name) {
    for (ResolvedModel m : models) {
      var s = OwningModels.solution(r, m);
      if (s.isPresent()
          && (s.get().incidentAt(name).isPresent() || s.get().port(name).isPresent())) {
        return m;
      }
    }
    return models.isEmpty() ? null : models.get(0);
  }

  /** A source's coherence length, when it states one or a linewidth. */
  private static void coherence(StringBuilder md, ResolvedModel model, String source) {
    jonquil.analysis.PortInterference.coherenceOf(model, source)
        .coherenceLength()
        .ifPresent(
            lc ->
                MarkdownText.para(md)
                    .append("**Coherence length**: ")
                    .append(MarkdownText.q(lc, jonquil.units.Dimension.LENGTH))
                    .append(
                        " per line (Lorentzian line: |γ| = exp(−ΔL/Lc), Lc = c/(πΔν)); beams of one"
                            + " line that meet again interfere by it"));
  }

  /** A source's emission lines: one wavelength and power each. */
  private static void lines(StringBuilder md, jonquil.resolve.ResolvedElement source) {
    List<String> lines = new java.util.ArrayList<>();
    source
        .number(Param.WAVELENGTH, "wavelength")
        .ifPresent(
            wl ->
                lines.add(
                    MarkdownText.q(wl, jonquil.units.Dimension.LENGTH)
                        + source.number(Param.POWER, "power").stream()
                            .mapToObj(
                                p -> " at " + MarkdownText.q(p, jonquil.units.Dimension.POWER))
                            .findFirst()
                            .orElse("")));
    source
        .all(Param.LINE)
        .forEach(
            g ->
                lines.add(
                    g.number("wavelength").stream()
                            .mapToObj(wl -> MarkdownText.q(wl, jonquil.units.Dimension.LENGTH))
                            .findFirst()
                            .orElse("?")
                        + " at "
                        + g.number("power").stream()
                            .mapToObj(p -> MarkdownText.q(p, jonquil.units.Dimension.POWER))
                            .findFirst()
                            .orElse("?")));
    if (!lines.isEmpty()) {
      MarkdownText.para(md).append("**Lines**: ").append(String.join("; ", lines));
    }
  }

  private static void parameters(StringBuilder md, SourceFile text, Declaration d) {
    if (text == null) {
      return;
    }
    StringBuilder lines = new StringBuilder();
    d.shorthand()
        .filter(args -> !args.isEmpty())
        .ifPresent(
            args ->
                lines
                    .append(
                        MarkdownText.oneLine(
                            text.slice(
                                TextRange.span(
                                    args.get(0).range(), args.get(args.size() - 1).range()))))
                    .append('\n'));
    for (Property p : d.properties()) {
      lines.append(MarkdownText.oneLine(text.slice(p.range()))).append('\n');
    }
    if (lines.length() > 0) {
      md.append("\n\n```jonquil\n").append(lines).append("```");
    }
  }
}
