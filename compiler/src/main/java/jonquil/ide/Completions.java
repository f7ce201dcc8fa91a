package jonquil.ide;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import jonquil.Result;
import jonquil.resolve.Category;
import jonquil.resolve.ElementKind;
import jonquil.resolve.Measure;
import jonquil.resolve.ParamSpec;
import jonquil.resolve.SafetyStandard;
import jonquil.resolve.ViewingTerms;
import jonquil.safety.Viewing;
import jonquil.source.SourceFile;
import jonquil.syntax.Token;
import jonquil.syntax.TokenKind;

/**
 * Chooses what may be written at the cursor from the text before it and the names of the last
 * check.
 */
final class Completions {
  /** Words after which a material name comes. */
  static final Set<String> MATERIAL_WORDS = Set.of("material", "metal", "from", "to", "then", "in");

  private static final List<String> STATES =
      List.of("linear", "circular", "elliptical", "unpolarized", "partial");

  private Completions() {}

  static List<CompletionItemInfo> at(Result r, Path file, int offset) {
    try {
      SourceFile source = r.files().get(file);
      String text = source == null ? "" : source.text();
      CursorContext c = CursorContext.read(text, Math.max(0, Math.min(offset, text.length())));
      if (c.inert()) {
        return List.of();
      }
      Vocabulary v = Vocabulary.of(r, file);
      List<CompletionItemInfo> out =
          c.dotted().isPresent()
              ? c.block() == CursorContext.Block.TRAIN
                  ? faces(v, c.dotted().get())
                  : ports(v, c.dotted().get())
              : choose(c, v);
      return unique(out);
    } catch (RuntimeException e) {
      return List
          .of(); // completion must never break typing; a wrong guess costs less than an error
    }
  }

  private static List<CompletionItemInfo> choose(CursorContext c, Vocabulary v) {
    switch (c.block()) {
      case DECLARATION:
        return inDeclaration(c, v);
      case TRAIN:
        return inTrain(c, v);
      case REQUIRE:
        return inRequire(c, v);
      case TOP:
        return topLevel(c, v);
    }
    throw new IllegalStateException("unknown block " + c.block());
  }

  private static List<CompletionItemInfo> topLevel(CursorContext c, Vocabulary v) {
    if (c.statement().isEmpty()) {
      List<CompletionItemInfo> out = new ArrayList<>();
      for (ElementKind k : ElementKind.values()) {
        out.add(new CompletionItemInfo(k.word(), CompletionItemInfo.Kind.KIND, kindDetail(k), ""));
      }
      out.add(keyword("use", "bring in the declarations of a part library: use \"parts.jonq\""));
      out.add(keyword("train", "the beam paths of the bench: train main { ... }"));
      out.add(keyword("require", "the requirements the train must meet: require { ... }"));
      out.add(
          keyword(
              "standard",
              "the laser-safety standard that gates the safety requirements: standard "
                  + String.join(" | ", SafetyStandard.words())));
      return out;
    }
    if (c.statement().get(0).is("standard") && c.statement().size() == 1) {
      return java.util.Arrays.stream(SafetyStandard.values())
          .map(st -> keyword(st.word(), st.title()))
          .toList();
    }
    String kind = c.statement().get(0).text();
    boolean shorthand = c.statement().stream().anyMatch(l -> l.is("="));
    if (shorthand && c.after("=")) {
      List<CompletionItemInfo> out = new ArrayList<>(v.materials(false));
      ElementKind.byWord(kind).ifPresent(k -> out.addAll(parameters(k, Set.of())));
      return out;
    }
    if (shorthand) {
      return ElementKind.byWord(kind)
          .map(
              k ->
                  inParameter(
                      c,
                      v,
                      k,
                      c.statement()
                          .subList(Math.min(3, c.statement().size()), c.statement().size())))
          .orElse(List.of());
    }
    return List.of();
  }

  private static List<CompletionItemInfo> inDeclaration(CursorContext c, Vocabulary v) {
    Optional<ElementKind> kind = ElementKind.byWord(c.header());
    if (kind.isEmpty()) {
      return List.of();
    }
    if (c.statement().isEmpty()) {
      return parameters(kind.get(), Set.of());
    }
    return inParameter(c, v, kind.get(), c.statement());
  }

  /**
   * Inside one parameter line: units after a number, names after the words that take them, else the
   * shape's words.
   */
  private static List<CompletionItemInfo> inParameter(
      CursorContext c, Vocabulary v, ElementKind kind, List<Token> line) {
    if (line.isEmpty()) {
      return parameters(kind, Set.of());
    }
    Optional<ParamSpec> spec = kind.param(line.get(0).text());
    if (c.afterNumber()) {
      return units(
          spec.map(s -> ShapeSlots.unitsAfter(s.shape(), line)).orElse(UnitChoices.COMMON));
    }
    String prev = c.previous().map(Token::text).orElse("");
    if (MATERIAL_WORDS.contains(prev)) {
      return v.materials(prev.equals("metal"));
    }
    if (spec.isEmpty()) {
      return List.of();
    }
    List<CompletionItemInfo> out = new ArrayList<>();
    ShapeSlots.words(spec.get().shape()).forEach(w -> out.add(keyword(w, "")));
    for (Category category : ShapeSlots.references(spec.get().shape())) {
      if (category == Category.MATERIAL) {
        out.addAll(v.materials(false));
      } else {
        v.of(category)
            .forEach(
                n ->
                    out.add(
                        new CompletionItemInfo(
                            n.name(),
                            CompletionItemInfo.Kind.ELEMENT,
                            n.kind().map(ElementKind::word).orElse(category.phrase()),
                            "")));
      }
    }
    return out;
  }

  private static List<CompletionItemInfo> inTrain(CursorContext c, Vocabulary v) {
    if (c.afterNumber()) {
      return units(UnitChoices.forDimensions(List.of(jonquil.units.Dimension.LENGTH)));
    }
    if (c.after("in")) {
      return v.materials(false);
    }
    if (c.statement().isEmpty() || c.after("->")) {
      return elements(v);
    }
    if (c.beforePrevious().map(l -> l.kind() == TokenKind.NUMBER).orElse(false)) {
      return List.of(keyword("in", "the medium of this distance: 2.8 mm in water"));
    }
    return List.of();
  }

  private static List<CompletionItemInfo> inRequire(CursorContext c, Vocabulary v) {
    if (c.statement().isEmpty()) {
      List<CompletionItemInfo> out = new ArrayList<>();
      for (String s : Measure.spellings()) {
        Measure m = Measure.bySpelling(s).orElseThrow();
        out.add(
            new CompletionItemInfo(
                s,
                CompletionItemInfo.Kind.MEASURE,
                "requirement on " + m.word(),
                "bound written as "
                    + m.bound().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')
                    + "; place: "
                    + m.where().name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ')));
      }
      out.add(keyword("yield", "the fraction of toleranced builds that must pass"));
      return out;
    }
    if (c.after("at") || c.after("from") || c.after("to")) {
      return elements(v);
    }
    if (c.after("is")) {
      return STATES.stream().map(s -> keyword(s, "polarization state")).toList();
    }
    if (c.after("over")) {
      return List.of(
          keyword("wavelength", "a wavelength band: over wavelength 1060 nm .. 1070 nm"));
    }
    if (c.after("for")) {
      return ViewingTerms.WORDS.stream().map(w -> keyword(w, ViewingTerms.example(w))).toList();
    }
    if (c.after("viewing")) {
      return java.util.Arrays.stream(Viewing.values())
          .map(w -> keyword(w.word(), w.description()))
          .toList();
    }
    if (c.afterNumber()) {
      boolean band = c.statement().stream().anyMatch(l -> l.is("over"));
      return units(
          band
              ? UnitChoices.forDimensions(List.of(jonquil.units.Dimension.LENGTH))
              : ShapeSlots.unitsFor(measure(c).map(Measure::bound).orElse(null)));
    }
    if (measure(c).isPresent()) {
      List<CompletionItemInfo> out = new ArrayList<>();
      for (String k : List.of("at", "everywhere", "from", "to", "in", "is", "over")) {
        out.add(keyword(k, ""));
      }
      if (measure(c).get().viewed()) {
        out.add(
            keyword(
                "for",
                "how the light meets the eye: for " + String.join(" | ", ViewingTerms.WORDS)));
      }
      return out;
    }
    return List.of();
  }

  /** The measure the requirement line starts with, in its longest spelling. */
  private static Optional<Measure> measure(CursorContext c) {
    List<Token> s = c.statement();
    int start = !s.isEmpty() && s.get(0).is("yield") ? -1 : 0;
    if (start < 0) {
      return Optional.empty();
    }
    String two = s.size() >= 2 ? s.get(0).text() + " " + s.get(1).text() : "";
    Optional<Measure> m = Measure.bySpelling(two);
    return m.isPresent() ? m : s.isEmpty() ? Optional.empty() : Measure.bySpelling(s.get(0).text());
  }

  private static List<CompletionItemInfo> elements(Vocabulary v) {
    List<CompletionItemInfo> out = new ArrayList<>();
    for (Vocabulary.Named n : v.placeable()) {
      ElementKind k = n.kind().get();
      out.add(new CompletionItemInfo(n.name(), CompletionItemInfo.Kind.ELEMENT, k.word(), ""));
      if (k.ports().size() > 1) {
        for (String p : k.ports()) {
          out.add(
              new CompletionItemInfo(
                  n.name() + "." + p, CompletionItemInfo.Kind.PORT, k.word() + " port", ""));
        }
      }
    }
    return out;
  }

  private static List<CompletionItemInfo> ports(Vocabulary v, String element) {
    return v.named(element)
        .flatMap(Vocabulary.Named::kind)
        .map(
            k ->
                k.ports().stream()
                    .map(
                        p ->
                            new CompletionItemInfo(
                                p,
                                CompletionItemInfo.Kind.PORT,
                                "port of " + k.word() + " '" + element + "'",
                                ""))
                    .toList())
        .orElse(List.of());
  }

  /**
   * In a path, what may follow {@code element.}: the ports that choose how the beam leaves it (on
   * an element with more than one), the faces light enters it by again, and the ports a path may
   * start at, each word once with what it means there.
   */
  private static List<CompletionItemInfo> faces(Vocabulary v, String element) {
    Optional<ElementKind> kind = v.named(element).flatMap(Vocabulary.Named::kind);
    if (kind.isEmpty()) {
      return List.of();
    }
    ElementKind k = kind.get();
    List<String> words = new ArrayList<>();
    if (k.ports().size() > 1) {
      words.addAll(k.ports());
    }
    words.addAll(k.entryFaces());
    words.addAll(k.exits().stream().filter(x -> !k.ports().contains(x)).toList());
    return words.stream()
        .distinct()
        .map(w -> new CompletionItemInfo(w, CompletionItemInfo.Kind.PORT, faceDetail(k, w), ""))
        .toList();
  }

  /** What one word after an element's name means in a path, in a few words. */
  private static String faceDetail(ElementKind k, String word) {
    String straight = k.ports().size() > 1 ? k.ports().get(0) : "out";
    return switch (word) {
      case "front" -> "face: again the way the first pass came in; port: light heading back out";
      case "back" -> "face: a return pass, against the light that left by '" + straight + "'";
      case "side" ->
          "face: the fourth face, a second input joining '" + straight + "'; port: its exit";
      case "reflected" -> "port: the reflected light; face: against it";
      default -> "port: the light leaving by '" + word + "'";
    };
  }

  static List<CompletionItemInfo> parameters(ElementKind kind, Set<String> skip) {
    List<CompletionItemInfo> out = new ArrayList<>();
    for (ParamSpec p : kind.takenParams()) {
      if (!skip.contains(p.name())) {
        String how = p.required() ? "required" : p.repeatable() ? "repeatable" : "optional";
        out.add(
            new CompletionItemInfo(
                p.name(),
                CompletionItemInfo.Kind.PARAMETER,
                how + " parameter of " + kind.word(),
                p.doc()));
      }
    }
    return out;
  }

  private static List<CompletionItemInfo> units(List<String> units) {
    return units.stream()
        .map(
            u ->
                new CompletionItemInfo(
                    u, CompletionItemInfo.Kind.UNIT, UnitChoices.describe(u), ""))
        .toList();
  }

  private static CompletionItemInfo keyword(String word, String doc) {
    return new CompletionItemInfo(word, CompletionItemInfo.Kind.KEYWORD, "keyword", doc);
  }

  private static String kindDetail(ElementKind k) {
    return k.category().phrase().replaceFirst("^(a|an) ", "")
        + (k.ports().isEmpty() ? "" : "; ports " + String.join(", ", k.ports()));
  }

  private static List<CompletionItemInfo> unique(List<CompletionItemInfo> items) {
    Map<String, CompletionItemInfo> out = new LinkedHashMap<>();
    items.forEach(i -> out.putIfAbsent(i.label(), i));
    return List.copyOf(out.values());
  }
}
