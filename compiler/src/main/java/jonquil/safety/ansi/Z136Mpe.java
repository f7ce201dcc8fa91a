package jonquil.safety.ansi;

import java.util.function.DoubleBinaryOperator;
import jonquil.safety.MpeCalculator;
import jonquil.safety.TableScope;
import jonquil.safety.TableScope.Tissue;

/**
 * What the ANSI Z136.1-2014 calculators share: the section 8.2.3 pulse rules, cited when a train is
 * refused, and the end of the MPE table refusing a longer pulse, alone or in a train.
 */
abstract class Z136Mpe extends MpeCalculator {
  private final String tableNumber;

  /**
   * @param tableNumber the MPE table as a refusal names it, e.g. "Table 7"
   */
  Z136Mpe(
      String table,
      String trainTable,
      Tissue tissue,
      DoubleBinaryOperator mpe,
      String tableNumber) {
    super(table, trainTable, tissue, AnsiPulseRules.NAMES, Z136.PULSE_RULES, mpe);
    this.tableNumber = tableNumber;
  }

  @Override
  protected final String longPulseRefusal(double tau, boolean single) {
    return tau > TableScope.T_MAX ? "pulse longer than 3e4 s, the end of " + tableNumber : null;
  }
}
