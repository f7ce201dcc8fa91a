package jonquil.diag;

/**
 * Every diagnostic the checker can emit, with its stable id, default severity and a one-line
 * summary (used as the SARIF rule description and in DEVELOPERS.md). Ids never change meaning once
 * released; retired ids are not reused.
 */
public enum DiagnosticCode {
  // Syntax: J1xx
  SYNTAX_UNEXPECTED(
      "J101", Severity.ERROR, "Unexpected text where the grammar expects something else"),
  SYNTAX_MISSING("J102", Severity.ERROR, "Something the grammar requires is missing"),
  UNCLOSED_BRACE("J103", Severity.ERROR, "A '{' is never closed"),
  UNMATCHED_CLOSE("J104", Severity.ERROR, "A '}' or ')' has no opening partner"),
  UNTERMINATED_STRING("J105", Severity.ERROR, "A quoted string is not closed on its line"),
  UNTERMINATED_COMMENT("J106", Severity.ERROR, "A block comment is never closed"),
  BAD_CHARACTER("J107", Severity.ERROR, "A character that has no meaning in the language"),
  TOO_MANY_ERRORS("J108", Severity.NOTE, "Checking of a file stopped after too many errors"),
  FILE_TOO_LARGE("J109", Severity.ERROR, "The file exceeds the size limit for specs"),
  BAD_NUMBER("J110", Severity.ERROR, "A number literal that cannot be read"),

  // Names and files: J2xx
  DUPLICATE_NAME("J201", Severity.ERROR, "A name is declared twice"),
  UNDEFINED_NAME("J202", Severity.ERROR, "A name is used but never declared"),
  USE_NOT_FOUND("J203", Severity.ERROR, "A used file does not exist"),
  USE_CYCLE("J204", Severity.ERROR, "Files use each other in a cycle"),
  USE_ESCAPES_ROOT("J205", Severity.ERROR, "A used path leaves the project root"),
  USE_TOO_DEEP("J206", Severity.ERROR, "Files use each other too deeply"),
  USED_FILE_HAS_TRAIN(
      "J207", Severity.ERROR, "A used part library contains a train or requirements"),
  WRONG_KIND("J208", Severity.ERROR, "A name refers to the wrong kind of thing"),
  UNKNOWN_KIND("J209", Severity.ERROR, "A declaration of an unknown kind"),
  DUPLICATE_USE("J210", Severity.WARNING, "The same file is used twice"),
  USE_UNREADABLE("J211", Severity.ERROR, "A used file cannot be read"),
  UNKNOWN_CATALOG_MATERIAL("J212", Severity.ERROR, "A material name that is not in the catalog"),
  DATA_FILE_NOT_FOUND(
      "J213", Severity.ERROR, "A data file named by a spec does not exist or leaves the project"),
  BAD_TABLE_ROW("J214", Severity.ERROR, "A row of an n,k table file that cannot be read"),

  // Units and quantities: J3xx
  UNKNOWN_UNIT("J301", Severity.ERROR, "A unit that Jonquil does not know"),
  WRONG_DIMENSION("J302", Severity.ERROR, "A quantity of the wrong dimension for its place"),
  MISSING_UNIT("J303", Severity.ERROR, "A bare number where a unit is required"),
  UNEXPECTED_UNIT("J304", Severity.ERROR, "A unit on a number that must be a plain ratio or count"),
  TOLERANCE_MISMATCH("J305", Severity.ERROR, "A tolerance whose unit does not fit its value"),

  // Parameters of declarations: J4xx
  UNKNOWN_PARAMETER("J401", Severity.ERROR, "A parameter that this kind of element does not have"),
  MISSING_PARAMETER("J402", Severity.ERROR, "A required parameter is missing"),
  DUPLICATE_PARAMETER("J403", Severity.ERROR, "A parameter is given twice"),
  BAD_ARGUMENT("J404", Severity.ERROR, "A parameter's value is not of the expected form"),
  OUT_OF_RANGE("J405", Severity.ERROR, "A value outside its physical range"),
  CONFLICTING_PARAMETERS("J406", Severity.ERROR, "Parameters that exclude each other"),
  MISSING_ARGUMENT("J407", Severity.ERROR, "A parameter is missing part of its value"),
  UNSUPPORTED_WAVELENGTH("J408", Severity.ERROR, "A wavelength outside the range Jonquil supports"),
  MATERIAL_OUT_OF_RANGE(
      "J409", Severity.WARNING, "A material used outside the wavelength range of its data"),
  PARAMETER_NOT_MODELLED(
      "J410", Severity.ERROR, "A parameter whose effect Jonquil does not model, refused"),
  AMBIENT_OUT_OF_RANGE(
      "J411",
      Severity.ERROR,
      "An ambient air condition outside the validity of Ciddor's equations"),
  UNKNOWN_STANDARD("J417", Severity.ERROR, "A laser-safety standard that Jonquil does not know"),
  VIEWING_NOT_APPLICABLE(
      "J420",
      Severity.ERROR,
      "A viewing condition or exposure duration on a requirement whose measure does not use it"),
  // Numbered with the analysis codes it guards, but found from the parameters alone.
  ENERGY_NOT_CONSERVED_BY_PARAMETERS(
      "J618",
      Severity.ERROR,
      "Parameters that together send out more light than comes in (R + T above 100 %)"),

  // Beam trains: J5xx
  PATH_START_NOT_SOURCE(
      "J501", Severity.ERROR, "A beam path starts neither at a source nor at a port"),
  ELEMENT_TWICE_IN_PATH("J502", Severity.ERROR, "An element appears twice in one beam path"),
  UNKNOWN_PORT("J503", Severity.ERROR, "A port that the element does not have"),
  PORT_USED_TWICE("J504", Severity.ERROR, "Two branches leave the same port"),
  PATH_ENDS_WITH_DISTANCE("J505", Severity.ERROR, "A beam path ends in empty space"),
  UNTERMINATED_BRANCH(
      "J506", Severity.WARNING, "A branch ends at an element that does not stop the beam"),
  SOURCE_INSIDE_PATH("J507", Severity.ERROR, "A source appears after the start of a path"),
  TERMINAL_INSIDE_PATH("J508", Severity.ERROR, "A beam continues past a dump or detector"),
  NOT_PLACEABLE(
      "J509", Severity.ERROR, "Something that is not an optical element is placed in a path"),
  PORT_NOT_FOLLOWED("J510", Severity.WARNING, "Light leaves a port that no branch follows"),
  BRANCH_FROM_UNPLACED("J511", Severity.ERROR, "A branch starts at an element that no path places"),
  ELEMENT_PLACED_TWICE("J512", Severity.ERROR, "An element is placed in two paths"),
  EMPTY_TRAIN("J513", Severity.WARNING, "A train without beam paths"),
  PORT_ON_ELEMENT_WITHOUT_PORTS(
      "J514", Severity.ERROR, "A port named on an element with a single output"),
  MISSING_DISTANCE(
      "J515", Severity.ERROR, "Two elements follow each other with no distance between them"),
  ELEMENT_NEVER_PLACED("J517", Severity.WARNING, "An element is declared but no path places it"),
  ENTRY_INTO_UNPLACED(
      "J518", Severity.ERROR, "Light enters a face of an element that no path places"),
  LOOP_DOES_NOT_SETTLE(
      "J519",
      Severity.ERROR,
      "A closed loop of light whose round trips do not die out (round-trip gain of 1 or more)"),

  // Requirements: J6xx
  UNKNOWN_MEASURE("J601", Severity.ERROR, "A requirement on a quantity Jonquil does not know"),
  MISSING_PLACE("J602", Severity.ERROR, "A requirement that needs a place has none"),
  MISSING_CONDITION("J603", Severity.ERROR, "A requirement without a bound"),
  UNKNOWN_HAZARD_CLASS("J604", Severity.ERROR, "A laser hazard class that does not exist"),
  BAD_POLARIZATION_STATE("J605", Severity.ERROR, "A polarization state that cannot be read"),
  INVERTED_RANGE("J606", Severity.ERROR, "A range whose low end is above its high end"),
  TARGET_NOT_PLACED(
      "J607", Severity.WARNING, "A requirement names an element that no beam reaches"),
  UNEXPECTED_PLACE("J608", Severity.ERROR, "A place given to a requirement that takes none"),
  REQUIREMENT_FAILED("J609", Severity.ERROR, "A requirement is not met"),
  REQUIREMENT_MET(
      "J611", Severity.NOTE, "A requirement is met, with its computed value and margin"),
  APERTURE_CLIPS("J612", Severity.WARNING, "An aperture cuts off a significant part of the beam"),
  STRAY_BEAM(
      "J610", Severity.NOTE, "Light leaves the train without reaching a probe, detector or dump"),
  REQUIREMENT_NOT_EVALUATED(
      "J613", Severity.ERROR, "A requirement cannot be evaluated, so it is not met (fail closed)"),
  RATING_EXCEEDED(
      "J616", Severity.ERROR, "A dump or detector takes more than its stated rating or threshold"),
  CONSERVATION_BROKEN(
      "J617",
      Severity.ERROR,
      "The power budget does not close: the model created or lost light (a checker fault)"),
  UNKNOWN_LINE("J619", Severity.ERROR, "A requirement names a laser line the source does not have"),
  COHERENCE_UNUSED(
      "J626",
      Severity.WARNING,
      "A source states a linewidth or coherence length, but no two beams of one of its lines meet"),

  // Limits and internals: J9xx
  INTERNAL_ERROR("J901", Severity.ERROR, "The checker failed internally; please report it"),
  UNREADABLE_FILE("J902", Severity.ERROR, "A file given to the checker cannot be read");

  private final String id;
  private final Severity severity;
  private final String summary;

  DiagnosticCode(String id, Severity severity, String summary) {
    this.id = id;
    this.severity = severity;
    this.summary = summary;
  }

  public String id() {
    return id;
  }

  public Severity severity() {
    return severity;
  }

  public String summary() {
    return summary;
  }

  /** A stable kebab-case name for the rule, e.g. "unknown-unit", used in SARIF and docs. */
  public String ruleName() {
    return name().toLowerCase(java.util.Locale.ROOT).replace('_', '-');
  }
}
