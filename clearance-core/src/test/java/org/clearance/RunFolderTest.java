package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Publishing a run folder by renames, and repairing each state a kill between two steps can
 * leave (issue 10, items 1 and 2).
 */
class RunFolderTest {

  @TempDir Path dir;

  /** A finished run folder holding {@code model.json} with {@code text} and its run.json. */
  private Path run(Path folder, String text) throws IOException {
    Files.createDirectories(folder);
    Files.writeString(folder.resolve("model.json"), text);
    RunRecordJson.write(folder, RunRecord.builder("check", "test").output("model.json")
        .output(RunRecord.FILE_NAME).build());
    return folder;
  }

  private List<String> names() throws IOException {
    try (Stream<Path> s = Files.list(dir)) {
      return s.map(p -> p.getFileName().toString()).sorted().toList();
    }
  }

  @Test
  void publishReplacesTheWholeFolderAndLeavesNoStagingBehind() throws IOException {
    Path out = run(dir.resolve("run"), "old");
    try (RunFolder f = RunFolder.replace(out, "--out")) {
      run(f.staging(), "new");
      f.publish();
    }
    assertEquals("new", Files.readString(out.resolve("model.json")));
    assertEquals(List.of(".run.lock", "run"), names());
  }

  @Test
  void aFailedRunLeavesThePreviousRunAndNoStaging() throws IOException {
    Path out = run(dir.resolve("run"), "old");
    try (RunFolder f = RunFolder.replace(out, "--out")) {
      Files.writeString(f.staging().resolve("model.json"), "half");
    }
    assertEquals("old", Files.readString(out.resolve("model.json")));
    assertEquals(List.of(".run.lock", "run"), names());
  }

  @Test
  void killedBetweenMovingTheOldAwayAndTheNewInIsCompletedByTheNextCommand()
      throws IOException {
    run(dir.resolve(".run.old-123"), "old");
    run(dir.resolve(".run.ready-123"), "new");
    Files.createDirectories(dir.resolve(".run.staging-456")); // a kill while writing
    try (RunFolder f = RunFolder.open(dir.resolve("run"), "RUN_DIR")) {
      assertEquals("new", Files.readString(f.target().resolve("model.json")));
    }
    assertEquals(List.of(".run.lock", "run"), names());
  }

  @Test
  void killedAfterMovingTheOldAwayWithoutAReadyRunPutsTheOldBack() throws IOException {
    run(dir.resolve(".run.old-9"), "old");
    try (RunFolder f = RunFolder.open(dir.resolve("run"), "RUN_DIR")) {
      assertEquals("old", Files.readString(f.target().resolve("model.json")));
    }
    assertEquals(List.of(".run.lock", "run"), names());
  }

  @Test
  void aReadyRunBesideACompleteFolderIsDropped() throws IOException {
    Path out = run(dir.resolve("run"), "old");
    run(dir.resolve(".run.ready-7"), "new");
    try (RunFolder f = RunFolder.open(out, "RUN_DIR")) {
      assertEquals("old", Files.readString(f.target().resolve("model.json")));
    }
    assertEquals(List.of(".run.lock", "run"), names());
  }

  @Test
  void otherFoldersLeftoversAreNotTouched() throws IOException {
    run(dir.resolve(".runs.staging-1"), "another folder's");
    try (RunFolder f = RunFolder.replace(dir.resolve("run"), "--out")) {
      run(f.staging(), "new");
      f.publish();
    }
    assertTrue(Files.isDirectory(dir.resolve(".runs.staging-1")));
  }

  @Test
  void aFolderWithOtherFilesOrNoRunRecordIsRefusedAndKept() throws IOException {
    Path out = run(dir.resolve("run"), "old");
    Files.writeString(out.resolve("survey.las"), "input");
    InputException e = assertThrows(InputException.class, () -> RunFolder.replace(out, "--out"));
    assertTrue(e.getMessage().contains("survey.las") && e.getMessage().contains("--out"),
        e.getMessage());
    assertTrue(Files.isRegularFile(out.resolve("survey.las")));
    Path plain = Files.createDirectories(dir.resolve("plain"));
    Files.writeString(plain.resolve("a.txt"), "a");
    e = assertThrows(InputException.class, () -> RunFolder.replace(plain, "--out"));
    assertTrue(e.getMessage().contains("not a Clearance run folder"), e.getMessage());
    Path damaged = run(dir.resolve("damaged"), "x");
    Files.writeString(damaged.resolve(RunRecord.FILE_NAME), "{\"format\":");
    e = assertThrows(InputException.class, () -> RunFolder.replace(damaged, "--out"));
    assertTrue(e.getMessage().contains("cannot be read"), e.getMessage());
    Path file = Files.writeString(dir.resolve("file"), "f");
    e = assertThrows(InputException.class, () -> RunFolder.replace(file, "--out"));
    assertTrue(e.getMessage().contains("is a file"), e.getMessage());
    assertFalse(names().stream().anyMatch(n -> n.contains(".staging-")), names().toString());
  }

  @Test
  void anEmptyFolderMayReceiveARun() throws IOException {
    Path out = Files.createDirectories(dir.resolve("empty"));
    try (RunFolder f = RunFolder.replace(out, "--out")) {
      run(f.staging(), "new");
      f.publish();
    }
    assertEquals("new", Files.readString(out.resolve("model.json")));
  }

  @Test
  void twoCommandsNeverWriteOneFolderAtOnce() throws IOException {
    Path out = dir.resolve("run");
    try (RunFolder f = RunFolder.replace(out, "--out")) {
      InputException e = assertThrows(InputException.class,
          () -> RunFolder.replace(out, "--out"));
      assertTrue(e.getMessage().contains("another clearance command"), e.getMessage());
      assertTrue(Files.isDirectory(f.staging()), "the first command's staging is kept");
    }
  }
}
