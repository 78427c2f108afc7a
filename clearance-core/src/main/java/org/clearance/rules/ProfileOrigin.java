package org.clearance.rules;

import java.util.Objects;

/**
 * One file of a profile's inheritance chain, with the texts to print in reports.
 *
 * @param name profile name
 * @param title one-line title
 * @param source source and citation text
 * @param cautions cautions text (empty when none)
 * @param location where the profile came from: {@code builtin:<name>} or a file path
 */
public record ProfileOrigin(
    String name, String title, String source, String cautions, String location) {

  public ProfileOrigin {
    Objects.requireNonNull(name, "name");
    Objects.requireNonNull(title, "title");
    Objects.requireNonNull(source, "source");
    Objects.requireNonNull(cautions, "cautions");
    Objects.requireNonNull(location, "location");
  }

  /**
   * The location as a report shows it: {@code builtin:<name>}, or only the file's name (a report
   * names files, not folders of the machine it ran on; the file's content hash identifies it).
   */
  public String shownLocation() {
    if (location.startsWith("builtin:")) {
      return location;
    }
    int cut = Math.max(location.lastIndexOf('/'), location.lastIndexOf('\\'));
    return location.substring(cut + 1);
  }
}
