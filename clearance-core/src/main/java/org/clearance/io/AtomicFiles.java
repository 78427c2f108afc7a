package org.clearance.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes output files so that a reader never sees half a file: the content goes to a temporary
 * file in the same folder, which is then moved over the target in one step.
 */
public final class AtomicFiles {

  private AtomicFiles() {}

  /** Writer of a file's content to a stream. */
  @FunctionalInterface
  public interface Content {
    /** Writes the whole content. */
    void writeTo(OutputStream out) throws IOException;
  }

  /** Writes text as UTF-8. */
  public static void writeString(Path target, String text) throws IOException {
    write(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
  }

  /**
   * A new empty temporary file in the target's folder (created if needed), readable by all like
   * an ordinary output file (rw-r--r-- where the file system has POSIX permissions; temporary
   * files are otherwise created owner-only).
   */
  public static Path tempFileBeside(Path target) throws IOException {
    Path dir = target.toAbsolutePath().getParent();
    Files.createDirectories(dir);
    Path temp = Files.createTempFile(dir, "." + target.getFileName().toString() + ".", ".part");
    if (Files.getFileStore(temp).supportsFileAttributeView(PosixFileAttributeView.class)) {
      Files.setPosixFilePermissions(temp, PosixFilePermissions.fromString("rw-r--r--"));
    }
    return temp;
  }

  /** Writes the content through a temporary file and moves it into place. */
  public static void write(Path target, Content content) throws IOException {
    Path temp = tempFileBeside(target);
    try {
      try (OutputStream out = Files.newOutputStream(temp)) {
        content.writeTo(out);
      }
      Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING,
          StandardCopyOption.ATOMIC_MOVE);
    } catch (FileSystemException | RuntimeException e) {
      Files.deleteIfExists(temp);
      throw e;
    } catch (IOException e) {
      Files.deleteIfExists(temp);
      // a full disk says only "No space left on device": name the file
      throw new IOException("cannot write " + target + ": " + e.getMessage(), e);
    }
  }
}
