package jonquil.analysis;

import java.util.Optional;
import jonquil.resolve.Symbol;

/** The material a beam runs in: a declared or catalog material, or the surrounding air. */
public record Medium(Optional<Symbol> material) {
  public static final Medium AMBIENT = new Medium(Optional.empty());

  public static Medium of(Symbol material) {
    return new Medium(Optional.of(material));
  }

  public String describe() {
    return material.map(Symbol::name).orElse("air");
  }
}
