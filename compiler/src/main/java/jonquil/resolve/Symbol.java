package jonquil.resolve;

import java.nio.file.Path;
import java.util.Optional;
import jonquil.syntax.Declaration;
import jonquil.syntax.Name;

/**
 * Something a name can refer to: a declaration in some file, a train, or an entry of the built-in
 * material catalog (which has no declaration and no file).
 */
public record Symbol(
    String name,
    Category category,
    Optional<ElementKind> kind,
    Path file,
    Optional<Name> nameNode,
    Optional<Declaration> declaration) {

  public static Symbol catalog(String name) {
    return new Symbol(
        name,
        Category.MATERIAL,
        Optional.of(ElementKind.MATERIAL),
        null,
        Optional.empty(),
        Optional.empty());
  }

  /**
   * Symbols are map keys throughout resolution and analysis; the record's own hash would walk the
   * whole declaration subtree each time (a tenth of a large spec's check). These components already
   * tell symbols apart, and equal records still hash alike.
   */
  @Override
  public int hashCode() {
    return java.util.Objects.hash(name, category, file, nameNode);
  }

  @Override
  public boolean equals(Object other) {
    return this == other
        || other instanceof Symbol s
            && name.equals(s.name)
            && category == s.category
            && java.util.Objects.equals(file, s.file)
            && nameNode.equals(s.nameNode)
            && kind.equals(s.kind)
            && declaration.equals(s.declaration);
  }

  public boolean isCatalog() {
    return file == null;
  }

  /** What the symbol is, with an article: "a mirror", "a catalog material", "a train". */
  public String kindPhrase() {
    if (isCatalog()) {
      return "a catalog material";
    }
    return kind.map(k -> (k.word().matches("^[aeiou].*") ? "an " : "a ") + k.word())
        .orElse(category.phrase());
  }

  /** How the symbol is named in messages: "mirror 'm1'", "catalog material 'water'". */
  public String describe() {
    if (isCatalog()) {
      return "catalog material '" + name + "'";
    }
    return kind.map(k -> k.word() + " '" + name + "'")
        .orElse(category.phrase() + " '" + name + "'");
  }
}
