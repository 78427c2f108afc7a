package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * The packages of the core in data-flow order (DEVELOPERS.md "Layout"): nothing in a package
 * imports a package later in the order. The root package orchestrates a run and may import all;
 * its {@code InputException} is the one class every package may use.
 */
class PackageOrderTest {

  private static final List<String> ORDER = List.of(
      "io", "survey", "line", "ground", "wire", "label", "sag", "clearance", "rules", "run",
      "assess", "report");
  private static final Pattern IMPORT =
      Pattern.compile("^import (?:static )?org\\.clearance\\.(?:([a-z]+)\\.)?([A-Z]\\w*)", Pattern.MULTILINE);

  @Test
  void noPackageImportsALaterOne() throws IOException {
    Path root = Path.of("src/main/java/org/clearance");
    List<String> wrong = new ArrayList<>();
    for (String pkg : ORDER) {
      int rank = ORDER.indexOf(pkg);
      try (Stream<Path> files = Files.walk(root.resolve(pkg))) {
        for (Path file : files.filter(f -> f.toString().endsWith(".java")).toList()) {
          Matcher m = IMPORT.matcher(Files.readString(file));
          while (m.find()) {
            String target = m.group(1);
            boolean allowed = target == null
                ? m.group(2).equals("InputException")
                : ORDER.contains(target) && ORDER.indexOf(target) <= rank;
            if (!allowed) {
              wrong.add(root.relativize(file) + " imports " + m.group(0).substring(7));
            }
          }
        }
      }
    }
    assertEquals(List.of(), wrong);
  }
}
