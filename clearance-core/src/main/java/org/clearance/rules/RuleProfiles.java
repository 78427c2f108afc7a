package org.clearance.rules;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.clearance.InputException;

/**
 * The built-in rule profiles shipped in span-specs ({@code /span-specs/rules/} on the
 * classpath). {@code index.txt} there lists their names, one a line.
 */
public final class RuleProfiles {

  private static final String INDEX = RuleProfileReader.BUILTIN_FOLDER + "index.txt";

  private RuleProfiles() {}

  /** Names of the built-in profiles, in index order. */
  public static List<String> names() {
    try (InputStream in = RuleProfiles.class.getResourceAsStream(INDEX)) {
      if (in == null) {
        throw new IllegalStateException("span-specs is missing from the classpath: " + INDEX);
      }
      List<String> names = new ArrayList<>();
      BufferedReader reader =
          new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
      for (String line = reader.readLine(); line != null; line = reader.readLine()) {
        String name = line.strip();
        if (!name.isEmpty() && !name.startsWith("#")) {
          names.add(name);
        }
      }
      return List.copyOf(names);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * A built-in profile.
   *
   * @param name a name from {@link #names()}
   * @throws InputException when no built-in profile has that name
   */
  public static RuleProfile builtin(String name) {
    if (!names().contains(name)) {
      throw new InputException("--rules", null, null, "no built-in rule profile '" + name
          + "'; built-in profiles: " + String.join(", ", names()));
    }
    return RuleProfileReader.readBuiltin(name);
  }

  /**
   * A built-in profile by name, or else a profile file by path: what a {@code --profile} option
   * accepts.
   */
  public static RuleProfile byNameOrPath(String nameOrPath) {
    if (names().contains(nameOrPath)) {
      return RuleProfileReader.readBuiltin(nameOrPath);
    }
    Path path = Path.of(nameOrPath);
    if (!Files.isRegularFile(path)) {
      throw new InputException("--rules", null, null, "'" + nameOrPath + "' is neither a "
          + "built-in rule profile (" + String.join(", ", names()) + ") nor a file");
    }
    return RuleProfileReader.read(path);
  }
}
