package org.clearance.cli;

import java.util.Optional;
import org.clearance.InputException;
import org.clearance.survey.LinearUnit;
import org.clearance.survey.UnitsChoice;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;
import picocli.CommandLine.TypeConversionException;

/**
 * The units options shared by every command that reads a survey (a picocli mixin). They map to
 * a {@link UnitsChoice}: units the files state are used; these options fill in where the files
 * are silent and may replace the files' units only with {@code --override-file-units}.
 */
public final class UnitsOptions {
  @Option(names = UnitsChoice.UNITS_OPTION, paramLabel = "m|ft|usft",
      converter = UnitConverter.class,
      description = "Unit of x, y and z where the files do not state one.")
  LinearUnit units;

  @Option(names = UnitsChoice.HORIZONTAL_OPTION, paramLabel = "m|ft|usft",
      converter = UnitConverter.class,
      description = "Unit of x and y where the files do not state one.")
  LinearUnit horizontal;

  @Option(names = UnitsChoice.VERTICAL_OPTION, paramLabel = "m|ft|usft",
      converter = UnitConverter.class,
      description = "Unit of z where the files do not state one.")
  LinearUnit vertical;

  @Option(names = UnitsChoice.FOLLOW_OPTION,
      description = "Where the files state no vertical unit, z takes the horizontal unit.")
  boolean verticalFollowsHorizontal;

  @Option(names = UnitsChoice.OVERRIDE_OPTION,
      description = "The units given replace the units the files state.")
  boolean overrideFile;

  /**
   * The user's choice.
   *
   * @throws InputException when the options contradict each other
   */
  public UnitsChoice choice() {
    if (units != null && (horizontal != null || vertical != null)) {
      throw new InputException(UnitsChoice.UNITS_OPTION, null, null, "give either "
          + UnitsChoice.UNITS_OPTION + " or " + UnitsChoice.HORIZONTAL_OPTION + " / "
          + UnitsChoice.VERTICAL_OPTION + ", not both");
    }
    Optional<LinearUnit> h = Optional.ofNullable(units != null ? units : horizontal);
    Optional<LinearUnit> v = Optional.ofNullable(units != null ? units : vertical);
    if (overrideFile && h.isEmpty() && v.isEmpty()) {
      throw new InputException(UnitsChoice.OVERRIDE_OPTION, null, null, "needs "
          + UnitsChoice.UNITS_OPTION + ", " + UnitsChoice.HORIZONTAL_OPTION + " or "
          + UnitsChoice.VERTICAL_OPTION);
    }
    return new UnitsChoice(h, v, verticalFollowsHorizontal, overrideFile);
  }

  /** Reads {@code m}, {@code ft}, {@code usft} and the other spellings of {@link LinearUnit}. */
  static final class UnitConverter implements ITypeConverter<LinearUnit> {
    @Override
    public LinearUnit convert(String value) {
      return LinearUnit.parse(value).orElseThrow(() -> new TypeConversionException(
          "'" + value + "' is not a unit; use m, ft (international foot) or usft (US survey"
              + " foot)"));
    }
  }
}
