package jonquil.ide;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import jonquil.resolve.Category;
import jonquil.resolve.Measure;
import jonquil.resolve.Shape;
import jonquil.syntax.Token;
import jonquil.syntax.TokenKind;

/**
 * Reads a parameter's {@link Shape} as a flat sequence of words and value slots, which is enough to
 * tell which words may come next and which unit follows a given number.
 */
final class ShapeSlots {
  private ShapeSlots() {}

  /** The shape flattened in writing order; alternatives end to end, a span as its two ends. */
  static List<Shape> flatten(Shape shape) {
    List<Shape> out = new ArrayList<>();
    for (Shape leaf : Shape.leaves(shape)) {
      if (leaf instanceof Shape.Span s) {
        out.add(s.low());
        out.add(s.high());
      } else {
        out.add(leaf);
      }
    }
    return out;
  }

  /** Fixed words the shape accepts anywhere ('ar', 'linear', 'at', 'waist'). */
  static List<String> words(Shape shape) {
    Set<String> out = new LinkedHashSet<>();
    for (Shape s : flatten(shape)) {
      if (s instanceof Shape.Word w) {
        out.addAll(w.choices());
      } else if (s instanceof Shape.Literal l) {
        out.add(l.word());
      }
    }
    return List.copyOf(out);
  }

  static List<Category> references(Shape shape) {
    Set<Category> out = new LinkedHashSet<>();
    for (Shape s : flatten(shape)) {
      if (s instanceof Shape.Reference r) {
        out.addAll(r.categories());
      }
    }
    return List.copyOf(out);
  }

  private static boolean numeric(Shape s) {
    return s instanceof Shape.Quantity
        || s instanceof Shape.Ratio
        || s instanceof Shape.PowerRatio
        || s instanceof Shape.Density
        || s instanceof Shape.Count;
  }

  /**
   * Units for the number that ends {@code line} (key first): the value slot after the word before
   * the number when the shape has that word ('at 1064', 'waist 1'), else the slot counted by
   * position, else every common unit.
   */
  static List<String> unitsAfter(Shape shape, List<Token> line) {
    List<Shape> flat = flatten(shape);
    int numberAt = line.size() - 1;
    String wordBefore = numberAt >= 1 ? line.get(numberAt - 1).text() : "";
    for (int i = 0; i < flat.size(); i++) {
      if (introduces(flat.get(i), wordBefore)) {
        for (int j = i + 1; j < flat.size(); j++) {
          if (numeric(flat.get(j))) {
            return UnitChoices.forShape(flat.get(j));
          }
        }
      }
    }
    List<Shape> slots = flat.stream().filter(ShapeSlots::numeric).toList();
    int index = (int) line.stream().filter(l -> l.kind() == TokenKind.NUMBER).count() - 1;
    return index >= 0 && index < slots.size()
        ? UnitChoices.forShape(slots.get(index))
        : UnitChoices.COMMON;
  }

  private static boolean introduces(Shape s, String word) {
    return (s instanceof Shape.Literal l && l.word().equals(word))
        || (s instanceof Shape.Word w && w.choices().contains(word));
  }

  /** Units for a requirement's bound: those of its dimension, else the words its form takes. */
  static List<String> unitsFor(Measure.Bound bound) {
    if (bound == null) {
      return UnitChoices.COMMON;
    }
    return bound.dimension().map(d -> UnitChoices.forDimensions(List.of(d))).orElse(bound.units());
  }
}
