package org.clearance.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.clearance.InputException;
import org.junit.jupiter.api.function.Executable;

/** Test helpers: small input files and checks that an error names its file, line and field. */
final class InputErrors {

  private InputErrors() {}

  /** Writes text (UTF-8) to dir/name and returns the path. */
  static Path write(Path dir, String name, String text) {
    try {
      return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }

  /**
   * Asserts that the call throws an InputException naming the file, the 1-based line (0: no line)
   * and the field (null: none), with a problem text containing {@code problemPart}.
   */
  static InputException check(Path file, int line, String field, String problemPart,
      Executable call) {
    InputException e = assertThrows(InputException.class, call);
    String msg = e.getMessage();
    assertEquals(file.toString(), e.file(), msg);
    assertEquals(line == 0 ? null : "line " + line, e.location(), msg);
    assertEquals(field, e.field(), msg);
    assertTrue(e.problem().contains(problemPart), () -> "'" + problemPart + "' not in: " + msg);
    assertTrue(msg.startsWith(file.toString()), msg);
    if (line != 0) {
      assertTrue(msg.contains("line " + line), msg);
    }
    if (field != null) {
      assertTrue(msg.contains("'" + field + "'"), msg);
    }
    return e;
  }
}
