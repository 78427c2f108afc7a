package org.clearance.survey;

import java.util.Objects;
import java.util.Optional;

/**
 * How the user wants a survey's linear units decided.
 *
 * <p>Units the files state are used. A unit given here fills in where a file states none; where a
 * file states a different unit it is an error unless {@code overrideFile} is set. Where the files
 * state no vertical unit, z takes the horizontal unit only when {@code verticalFollowsHorizontal}
 * is set. Nothing is guessed: a unit neither stated nor given is an error naming the option to
 * give.
 *
 * @param horizontal unit of x and y given by the user
 * @param vertical unit of z given by the user
 * @param verticalFollowsHorizontal z takes the horizontal unit when no vertical unit is known
 * @param overrideFile the given units replace the units the files state
 */
public record UnitsChoice(
    Optional<LinearUnit> horizontal,
    Optional<LinearUnit> vertical,
    boolean verticalFollowsHorizontal,
    boolean overrideFile) {

  /** Command-line option setting both units (named in error messages). */
  public static final String UNITS_OPTION = "--survey-units";
  /** Command-line option setting the horizontal unit. */
  public static final String HORIZONTAL_OPTION = "--horizontal-units";
  /** Command-line option setting the vertical unit. */
  public static final String VERTICAL_OPTION = "--vertical-units";
  /** Command-line option letting z take the horizontal unit. */
  public static final String FOLLOW_OPTION = "--vertical-follows-horizontal";
  /** Command-line option letting given units replace the files' units. */
  public static final String OVERRIDE_OPTION = "--override-file-units";
  /** The unit values the options accept, for messages. */
  public static final String UNIT_VALUES = "m|ft|usft";

  public UnitsChoice {
    Objects.requireNonNull(horizontal, "horizontal");
    Objects.requireNonNull(vertical, "vertical");
  }

  /** Units only as the files state them. */
  public static UnitsChoice fromFile() {
    return new UnitsChoice(Optional.empty(), Optional.empty(), false, false);
  }

  /** The same unit for x, y and z where the files state none. */
  public static UnitsChoice of(LinearUnit both) {
    return of(both, both);
  }

  /** These units where the files state none. */
  public static UnitsChoice of(LinearUnit horizontal, LinearUnit vertical) {
    return new UnitsChoice(Optional.of(horizontal), Optional.of(vertical), false, false);
  }

  /** This choice with the given units replacing the files' units. */
  public UnitsChoice overridingFile() {
    return new UnitsChoice(horizontal, vertical, verticalFollowsHorizontal, true);
  }

  /** This choice with z taking the horizontal unit where no vertical unit is known. */
  public UnitsChoice withVerticalFollowingHorizontal() {
    return new UnitsChoice(horizontal, vertical, true, overrideFile);
  }

  /** True when the user gave no unit and no flag. */
  public boolean isFromFile() {
    return horizontal.isEmpty() && vertical.isEmpty() && !verticalFollowsHorizontal
        && !overrideFile;
  }
}
