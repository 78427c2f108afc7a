package org.clearance.survey;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;

/** Finds the shared open LAS files (shared/data/open) from the module or repository folder. */
public final class SurveyTestFiles {
  private SurveyTestFiles() {}

  /** The folder holding the open LAS files; fails the test when it cannot be found. */
  public static Path openDataDir() {
    Path dir = Paths.get("").toAbsolutePath();
    for (Path p = dir; p != null; p = p.getParent()) {
      Path candidate = p.resolve("shared").resolve("data").resolve("open");
      if (Files.isDirectory(candidate)) {
        return candidate;
      }
    }
    throw new AssertionError("shared/data/open not found above " + dir);
  }

  /** One open LAS file by name, e.g. {@code "mvk-thin.las"}. */
  public static Path open(String name) {
    return openDataDir().resolve(name);
  }
}
