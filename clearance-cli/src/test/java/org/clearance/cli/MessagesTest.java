package org.clearance.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The messages of issue 10 item 12: one line, naming the file, no Java names, no raw controls. */
class MessagesTest {

  @TempDir Path dir;

  /** Bug: an unknown option printed the whole usage text. */
  @Test
  void optionErrorIsOneLineAndAHint() {
    CliRun r = CliRun.of("survey", "--no-such-option", "x.las");
    assertEquals(2, r.exit());
    String[] lines = r.err().strip().split("\n");
    assertEquals(2, lines.length, r.err());
    assertTrue(lines[0].startsWith("clearance survey: ")
        && lines[0].contains("unknown option --no-such-option"), r.err());
    assertEquals("See: clearance survey --help", lines[1]);
    assertFalse(r.err().contains("Usage:"), r.err());
  }

  /** Bug: a profile that is not UTF-8 printed a Java exception name. */
  @Test
  void nonUtf8ProfileNamesFileAndLine() throws IOException {
    Path p = dir.resolve("p.yaml");
    Files.write(p, "name: t\ntitle: caf\u00e9\n".getBytes(java.nio.charset.StandardCharsets
        .ISO_8859_1));
    CliRun r = CliRun.of("rules", "validate", p.toString());
    assertEquals(2, r.exit(), r.err());
    assertTrue(r.err().contains(p + ", line 2: not UTF-8 text"), r.err());
    assertFalse(r.err().contains("Exception"), r.err());
  }

  /** Control characters from an input reach the console escaped, never raw. */
  @Test
  void controlCharactersAreEscaped() throws IOException {
    Path p = dir.resolve("p.yaml");
    Files.writeString(p, "name: t\ntitle: T\nsource: S\n\"col\\e[31mour\": red\nzones: []\n");
    CliRun r = CliRun.of("rules", "validate", p.toString());
    assertEquals(2, r.exit(), r.err());
    assertFalse(r.err().contains("\u001b"), r.err());
    assertTrue(r.err().contains("col\\u001B[31mour"), r.err());
  }

  /** Bug: file system errors (a full disk, /proc) did not name the file. */
  @Test
  void fileSystemErrorsNameTheFile() {
    assertEquals("/proc/x/run.json: Read-only file system", ClearanceCommand.describe(
        new FileSystemException("/proc/x/run.json", null, "Read-only file system")));
    assertEquals("/out/a -> /out/b: permission denied", ClearanceCommand.describe(
        new java.nio.file.AccessDeniedException("/out/a", "/out/b", null)));
  }
}
