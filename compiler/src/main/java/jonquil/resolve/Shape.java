package jonquil.resolve;

import java.util.List;
import jonquil.units.Dimension;

/**
 * The expected form of a parameter's arguments, written as data so that each element kind's table
 * reads like documentation. Matching is structural (is there a quantity here?); units, dimensions
 * and ranges are then checked on the match, which gives messages about the value ("'45 mm' is a
 * length") rather than about the grammar.
 */
public sealed interface Shape {
  /**
   * A number with a unit of one of the given dimensions (a plain number if DIMENSIONLESS is
   * listed).
   */
  record Quantity(String slot, List<Dimension> dimensions, Bounds bounds, String example)
      implements Shape {}

  /** A fraction written as '95 %', '200 ppm' or a plain number from 0 to 1. */
  record Ratio(String slot, Bounds bounds) implements Shape {}

  /** A power ratio written as a plain number (1000:1) or in dB ('30 dB'). */
  record PowerRatio(String slot, Bounds bounds) implements Shape {}

  /** An optical density, written 'OD 3' or as a plain number. */
  record Density(String slot) implements Shape {}

  /** Two quantities joined by '..': '400 nm .. 700 nm'. */
  record Span(Quantity low, Quantity high) implements Shape {}

  /** A plain number without a unit. */
  record Count(String slot, Bounds bounds, boolean integer) implements Shape {}

  /** One word from a fixed list. */
  record Word(String slot, List<String> choices) implements Shape {}

  /** A fixed word that introduces what follows ('at', 'for'). */
  record Literal(String word) implements Shape {}

  /**
   * A name that must resolve to a declaration of one of the given categories (or a catalog entry).
   */
  record Reference(String slot, List<Category> categories) implements Shape {}

  /** A quoted string. */
  record Text(String slot) implements Shape {}

  /** A comma. */
  record Comma() implements Shape {}

  /** All of the parts, in order. */
  record Seq(List<Shape> parts) implements Shape {}

  /** The part, or nothing. */
  record Opt(Shape part) implements Shape {}

  /** The first alternative that fits. */
  record OneOf(List<Shape> alternatives, String description) implements Shape {}

  /** Clauses led by a keyword, separated by commas, each at most once: 'waist 1 mm, m2 1.1'. */
  record Keyed(List<Seq> clauses) implements Shape {}

  /** One or more items separated by commas. */
  record ListOf(Shape item) implements Shape {}

  /** The leaves of a shape in writing order; alternatives are laid end to end. */
  static List<Shape> leaves(Shape shape) {
    List<Shape> out = new java.util.ArrayList<>();
    addLeaves(shape, out);
    return out;
  }

  private static void addLeaves(Shape shape, List<Shape> out) {
    if (shape instanceof Seq s) {
      s.parts().forEach(p -> addLeaves(p, out));
    } else if (shape instanceof Opt o) {
      addLeaves(o.part(), out);
    } else if (shape instanceof OneOf o) {
      o.alternatives().forEach(a -> addLeaves(a, out));
    } else if (shape instanceof Keyed k) {
      k.clauses().forEach(c -> addLeaves(c, out));
    } else if (shape instanceof ListOf l) {
      addLeaves(l.item(), out);
    } else {
      out.add(shape);
    }
  }

  // Small factories keep the schema tables short and readable.
  static Quantity q(String slot, Dimension dim, Bounds bounds, String example) {
    return new Quantity(slot, List.of(dim), bounds, example);
  }

  static Quantity q(String slot, List<Dimension> dims, Bounds bounds, String example) {
    return new Quantity(slot, dims, bounds, example);
  }

  static Ratio ratio(String slot) {
    return new Ratio(slot, Bounds.closed(0, 1));
  }

  static Word word(String slot, String... choices) {
    return new Word(slot, List.of(choices));
  }

  static Literal lit(String word) {
    return new Literal(word);
  }

  static Reference ref(String slot, Category... categories) {
    return new Reference(slot, List.of(categories));
  }

  static Seq seq(Shape... parts) {
    return new Seq(List.of(parts));
  }

  static Opt opt(Shape... parts) {
    return new Opt(parts.length == 1 ? parts[0] : seq(parts));
  }

  static OneOf oneOf(String description, Shape... alternatives) {
    return new OneOf(List.of(alternatives), description);
  }

  static Keyed keyed(Seq... clauses) {
    return new Keyed(List.of(clauses));
  }

  static Seq empty() {
    return new Seq(List.of());
  }
}
