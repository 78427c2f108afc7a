package org.clearance.report;

import java.util.List;

/**
 * The cautions every report carries (HTML report and console), in this project's own words.
 */
public final class ReportCautions {

  private ReportCautions() {}

  /** The general cautions, one sentence or two each. */
  public static final List<String> GENERAL = List.of(
      "This is a screening aid computed from a lidar survey and models of the line; it is not a "
          + "field inspection, an engineering assessment or a regulatory finding.",
      "The utility's own vegetation-management rules, the local regulator and qualified "
          + "line-clearance personnel govern every decision on what to cut, where and how; "
          + "check every site in the field before work is planned.",
      "Workers keep the minimum approach distances that apply to them at all times; the "
          + "clearances here are for vegetation, not for people, tools or equipment.",
      "A span marked NOT ASSESSED or INCOMPLETE has not been shown to be clear.",
      "Distances depend on the survey's accuracy and date, the conductor fits and the modelled "
          + "line conditions; vegetation keeps growing after the survey.");
}
