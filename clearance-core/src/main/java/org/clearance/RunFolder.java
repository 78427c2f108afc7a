package org.clearance;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Comparator;
import java.util.stream.Stream;
import org.clearance.run.RunRecord;

/**
 * A run folder is written in a staging folder beside it and published only when complete: a
 * failed run leaves the previous contents (or nothing) in place, never half a run.
 */
public final class RunFolder {

  private RunFolder() {}

  /**
   * Checks that {@code out} may receive a run and creates the staging folder beside it.
   *
   * @throws InputException when {@code out} is a file, or a non-empty folder that is not a
   *     Clearance run folder (its files are never overwritten)
   */
  public static Path staging(Path out) throws IOException {
    Path abs = out.toAbsolutePath().normalize();
    if (Files.exists(abs) && !Files.isDirectory(abs)) {
      throw new InputException(out, null, "--out", "is a file, not a folder");
    }
    if (Files.isDirectory(abs) && !isEmpty(abs)
        && !Files.isRegularFile(abs.resolve(RunRecord.FILE_NAME))) {
      throw new InputException(out, null, "--out",
          "exists, is not empty and is not a Clearance run folder; choose a new folder");
    }
    Path parent = abs.getParent();
    Files.createDirectories(parent);
    Path staging = Files.createTempDirectory(parent, "." + abs.getFileName() + ".staging-");
    if (Files.getFileStore(staging).supportsFileAttributeView(PosixFileAttributeView.class)) {
      Files.setPosixFilePermissions(staging, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
    return staging;
  }

  /** Moves every file of the staging folder into the run folder, replacing a previous run. */
  public static void publish(Path staging, Path out) throws IOException {
    Path abs = out.toAbsolutePath().normalize();
    if (!Files.exists(abs)) {
      Files.move(staging, abs, StandardCopyOption.ATOMIC_MOVE);
      return;
    }
    try (DirectoryStream<Path> old = Files.newDirectoryStream(abs)) {
      for (Path p : old) {
        if (Files.isRegularFile(p)) {
          Files.delete(p);
        }
      }
    }
    try (DirectoryStream<Path> fresh = Files.newDirectoryStream(staging)) {
      for (Path p : fresh) {
        Files.move(p, abs.resolve(p.getFileName()), StandardCopyOption.REPLACE_EXISTING,
            StandardCopyOption.ATOMIC_MOVE);
      }
    }
  }

  /** Removes a staging folder and what is left in it; errors are ignored. */
  public static void deleteQuietly(Path dir) {
    if (!Files.exists(dir)) {
      return;
    }
    try (Stream<Path> walk = Files.walk(dir)) {
      walk.sorted(Comparator.reverseOrder()).forEach(p -> {
        try {
          Files.deleteIfExists(p);
        } catch (IOException e) {
          throw new UncheckedIOException(e);
        }
      });
    } catch (IOException | UncheckedIOException e) {
      // a leftover hidden staging folder is harmless and named as such
    }
  }

  private static boolean isEmpty(Path dir) throws IOException {
    try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
      return !s.iterator().hasNext();
    }
  }
}
