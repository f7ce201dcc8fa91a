package jonquil.resolve;

import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The laser-safety standard whose limits gate a bench's safety requirements; the others are
 * reported beside it for comparison. Chosen by a spec's {@code standard} line or by {@code check
 * --standard}; IEC 60825-1:2014 when neither says.
 */
public enum SafetyStandard {
  /** IEC 60825-1:2014 (Ed. 3), Annex A: the default. */
  IEC_60825_1("iec", "IEC 60825-1:2014 (Ed. 3)"),
  /** Directive 2006/25/EC (artificial optical radiation), Annex II exposure limit values. */
  DIRECTIVE_2006_25("directive", "Directive 2006/25/EC, Annex II"),
  /** ANSI Z136.1-2014 ocular MPE. */
  ANSI_Z136_1("ansi", "ANSI Z136.1-2014");

  /** What a spec or the command line calls the standard when none is chosen. */
  public static final SafetyStandard DEFAULT = IEC_60825_1;

  private final String word;
  private final String title;

  SafetyStandard(String word, String title) {
    this.word = word;
    this.title = title;
  }

  /** The name a spec's {@code standard} line and {@code --standard} take. */
  public String word() {
    return word;
  }

  /** The standard and edition, as findings name it. */
  public String title() {
    return title;
  }

  /** The standard a name stands for. */
  public static Optional<SafetyStandard> byWord(String word) {
    return Arrays.stream(values()).filter(s -> s.word.equals(word)).findFirst();
  }

  /** Every name, in declaration order. */
  public static List<String> words() {
    return Arrays.stream(values()).map(SafetyStandard::word).toList();
  }

  /** Why a name is not a standard: the names there are, and the closest. */
  public static String unknown(String word) {
    return "unknown safety standard '"
        + word
        + "'"
        + Suggest.hint(word, words())
        + "; the standards are "
        + String.join(", ", words());
  }
}
