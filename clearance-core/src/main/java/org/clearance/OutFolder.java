package org.clearance;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;

/**
 * Checks, before any computation, that an output folder can be written, so that a mistyped or
 * impossible {@code --out} is refused at once with a message naming it rather than after the
 * whole survey was read.
 */
public final class OutFolder {

  private OutFolder() {}

  /**
   * Refuses an output folder that cannot be written: a symbolic link to nothing, a file, or a
   * folder whose nearest existing ancestor is not a folder this process can create files in (a
   * file is created there and removed again to find out, since permission bits do not tell for
   * the root user or for special file systems such as {@code /proc}).
   *
   * @param out the output folder as given
   * @param option the option that named it, for messages
   * @throws InputException naming {@code out} when it cannot be written
   */
  public static void check(Path out, String option) {
    if (Files.isSymbolicLink(out) && !Files.exists(out)) {
      String to;
      try {
        to = Files.readSymbolicLink(out).toString();
      } catch (IOException e) {
        to = "a target that cannot be read";
      }
      throw new InputException(out.toString(), null, option, "is a symbolic link to " + to
          + ", which does not exist; give an existing folder or a new name");
    }
    if (Files.exists(out) && !Files.isDirectory(out)) {
      throw new InputException(out.toString(), null, option, "is a file, not a folder");
    }
    Path at = out.toAbsolutePath().normalize();
    Path probeIn = Files.isDirectory(at) ? at : null;
    for (Path p = at.getParent(); probeIn == null && p != null; p = p.getParent()) {
      if (Files.exists(p)) {
        if (!Files.isDirectory(p)) {
          throw new InputException(out.toString(), null, option, "cannot be created: " + p
              + " is a file, not a folder");
        }
        probeIn = p;
      }
    }
    if (probeIn == null) {
      throw new InputException(out.toString(), null, option, "cannot be created: no folder of "
          + "its path exists");
    }
    // the run folder's lock and staging folder go beside it: its parent must take new files too
    Path parent = at.getParent();
    Path probeParent = parent != null && Files.isDirectory(parent, LinkOption.NOFOLLOW_LINKS)
        ? parent : probeIn;
    probe(out, option, probeIn);
    if (!probeParent.equals(probeIn)) {
      probe(out, option, probeParent);
    }
  }

  private static void probe(Path out, String option, Path dir) {
    try {
      Path p = Files.createTempFile(dir, ".clearance-write-check", ".tmp");
      Files.delete(p);
    } catch (IOException | UnsupportedOperationException | SecurityException e) {
      throw new InputException(out.toString(), null, option, "cannot be written: no file can "
          + "be created in " + dir + " (" + reason(e) + ")");
    }
  }

  private static String reason(Exception e) {
    if (e instanceof java.nio.file.AccessDeniedException) {
      return "permission denied";
    }
    if (e instanceof java.nio.file.NoSuchFileException) {
      return "the file system does not take new files there";
    }
    if (e instanceof java.nio.file.FileSystemException f && f.getReason() != null) {
      return f.getReason();
    }
    return "not writable";
  }
}
