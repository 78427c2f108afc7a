package org.clearance;

import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.clearance.run.RunRecord;
import org.clearance.run.RunRecordJson;

/**
 * A run folder being written: the new run goes into a staging folder beside it and is published
 * by renames only when complete, so the folder always holds one whole run (the previous or the
 * new one), never half of one or a mix.
 *
 * <p>Names beside a run folder {@code NAME}, all hidden and owned by Clearance:
 * {@code .NAME.lock} (held while a command writes, so two commands never write one folder at
 * once), {@code .NAME.staging-*} (a run being written; removed by the next command when left by
 * a kill), {@code .NAME.ready-*} (a complete run about to be published) and {@code .NAME.old-*}
 * (the replaced run, deleted once the new one is in place). Publishing is: staging renamed to
 * ready; the old folder renamed away; ready renamed to {@code NAME}; the old one deleted. A kill
 * between two of these steps is repaired by the next command on that folder
 * ({@link #recover}): a ready run takes the empty place, else the old run goes back.
 *
 * <p>An existing folder is replaced only when it is empty or a recognised run folder (its
 * {@code run.json} reads as a run record) holding nothing but the files that record lists as
 * written: input files or anyone else's files in it are never deleted; such a folder is refused.
 */
public final class RunFolder implements Closeable {

  private static final String STAGING = ".staging-";
  private static final String READY = ".ready-";
  private static final String OLD = ".old-";

  private final Path target;
  private final FileChannel lockChannel;
  private final FileLock lock;
  private Path staging;

  private RunFolder(Path target, FileChannel lockChannel, FileLock lock) {
    this.target = target;
    this.lockChannel = lockChannel;
    this.lock = lock;
  }

  /**
   * Locks a run folder that will be read (and perhaps replaced) and repairs an interrupted
   * publication of it.
   *
   * @param dir the run folder
   * @param option option or argument that named it, for messages
   * @throws InputException when another command is writing it, or when it cannot be written
   *     ({@link OutFolder#check})
   */
  public static RunFolder open(Path dir, String option) throws IOException {
    OutFolder.check(dir, option);
    Path abs = resolve(dir);
    Path parent = abs.getParent();
    if (parent == null) {
      throw new InputException(dir.toString(), null, option, "a run folder cannot be the root");
    }
    Files.createDirectories(parent);
    Path lockFile = parent.resolve("." + abs.getFileName() + ".lock");
    FileChannel ch = FileChannel.open(lockFile, StandardOpenOption.CREATE,
        StandardOpenOption.WRITE);
    FileLock lock;
    try {
      lock = ch.tryLock();
    } catch (OverlappingFileLockException e) {
      lock = null;
    } catch (IOException | RuntimeException e) {
      ch.close();
      throw e;
    }
    if (lock == null) {
      ch.close();
      throw new InputException(dir.toString(), null, option,
          "another clearance command is writing this run folder; wait for it to finish");
    }
    RunFolder f = new RunFolder(abs, ch, lock);
    try {
      f.recover();
    } catch (IOException | RuntimeException e) {
      f.close();
      throw e;
    }
    return f;
  }

  /**
   * Locks {@code out}, checks that it may be replaced (absent, empty, or a run folder holding
   * only its own files) and creates the staging folder beside it.
   *
   * @param out the run folder to write
   * @param option option or argument that named it, for messages
   * @throws InputException when {@code out} is a file or a folder that may not be replaced
   */
  public static RunFolder replace(Path out, String option) throws IOException {
    RunFolder f = open(out, option);
    try {
      f.checkReplaceable(out, option);
      f.createStaging();
    } catch (IOException | RuntimeException e) {
      f.close();
      throw e;
    }
    return f;
  }

  /** The run folder (absolute, symbolic links resolved). */
  public Path target() {
    return target;
  }

  /**
   * The staging folder to write the new run into; created by {@link #replace} or
   * {@link #beginReplacing}.
   */
  public Path staging() {
    if (staging == null) {
      throw new IllegalStateException("no staging folder: not opened for replacing");
    }
    return staging;
  }

  /**
   * After {@link #open}, checks that the folder may be replaced and creates the staging folder.
   *
   * @param option option or argument that named the folder, for messages
   */
  public Path beginReplacing(String option) throws IOException {
    checkReplaceable(target, option);
    createStaging();
    return staging;
  }

  /** Publishes the complete staging folder as the run folder, replacing the previous run. */
  public void publish() throws IOException {
    Path ready = sibling(READY + suffix(staging, STAGING));
    Files.move(staging, ready, StandardCopyOption.ATOMIC_MOVE);
    staging = null;
    if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
      Path old = sibling(OLD + suffix(ready, READY));
      Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
      Files.move(ready, target, StandardCopyOption.ATOMIC_MOVE);
      deleteTree(old);
    } else {
      Files.move(ready, target, StandardCopyOption.ATOMIC_MOVE);
    }
  }

  /** Removes an unpublished staging folder and releases the lock. */
  @Override
  public void close() throws IOException {
    try {
      if (staging != null) {
        deleteTree(staging);
        staging = null;
      }
    } finally {
      try {
        lock.release();
      } finally {
        lockChannel.close();
      }
    }
  }

  /**
   * Repairs what a kill during a publication left: when the run folder is missing, a complete
   * ready run takes its place (else the old run goes back); then every leftover staging, ready
   * and old folder of this run folder is removed.
   */
  void recover() throws IOException {
    List<Path> ready = leftovers(READY);
    List<Path> old = leftovers(OLD);
    if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
      if (!ready.isEmpty()) {
        Path newest = ready.get(ready.size() - 1);
        Files.move(newest, target, StandardCopyOption.ATOMIC_MOVE);
      } else if (!old.isEmpty()) {
        Path newest = old.get(old.size() - 1);
        Files.move(newest, target, StandardCopyOption.ATOMIC_MOVE);
      }
    }
    for (String kind : List.of(STAGING, READY, OLD)) {
      for (Path p : leftovers(kind)) {
        deleteTree(p);
      }
    }
  }

  /** Leftover siblings of one kind, oldest first (by modification time, then name). */
  private List<Path> leftovers(String kind) throws IOException {
    String prefix = "." + target.getFileName() + kind;
    List<Path> out = new ArrayList<>();
    try (DirectoryStream<Path> s = Files.newDirectoryStream(target.getParent(),
        p -> p.getFileName().toString().startsWith(prefix))) {
      for (Path p : s) {
        if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
          out.add(p);
        }
      }
    }
    out.sort(Comparator.comparing((Path p) -> {
      try {
        return Files.getLastModifiedTime(p, LinkOption.NOFOLLOW_LINKS).toMillis();
      } catch (IOException e) {
        return 0L;
      }
    }).thenComparing(Path::toString));
    return out;
  }

  private void checkReplaceable(Path shown, String option) throws IOException {
    if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
      return;
    }
    if (!Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS)) {
      throw new InputException(shown.toString(), null, option, "is a file, not a folder");
    }
    List<String> names = new ArrayList<>();
    try (DirectoryStream<Path> s = Files.newDirectoryStream(target)) {
      s.forEach(p -> names.add(p.getFileName().toString()));
    }
    if (names.isEmpty()) {
      return;
    }
    Path recordFile = target.resolve(RunRecord.FILE_NAME);
    if (!Files.isRegularFile(recordFile, LinkOption.NOFOLLOW_LINKS)) {
      throw new InputException(shown.toString(), null, option, "exists, is not empty and is "
          + "not a Clearance run folder (no " + RunRecord.FILE_NAME + "); nothing in it is "
          + "replaced; choose a new folder");
    }
    RunRecord record;
    try {
      record = RunRecordJson.read(recordFile);
    } catch (InputException e) {
      throw new InputException(shown.toString(), null, option, "its " + RunRecord.FILE_NAME
          + " cannot be read (" + e.getMessage() + "), so it is not replaced; choose a new "
          + "folder");
    }
    Set<String> own = new HashSet<>(record.outputs());
    own.add(RunRecord.FILE_NAME);
    List<String> foreign = new ArrayList<>();
    for (String n : names) {
      Path p = target.resolve(n);
      boolean ownFile = own.contains(n) && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS);
      boolean partFile = n.startsWith(".") && n.endsWith(".part")
          && Files.isRegularFile(p, LinkOption.NOFOLLOW_LINKS);
      if (!ownFile && !partFile) {
        foreign.add(n);
      }
    }
    if (!foreign.isEmpty()) {
      foreign.sort(null);
      String shownNames = String.join(", ", foreign.subList(0, Math.min(5, foreign.size())))
          + (foreign.size() > 5 ? " and " + (foreign.size() - 5) + " more" : "");
      throw new InputException(shown.toString(), null, option, "is a run folder that also "
          + "holds files Clearance did not write (" + shownNames + ": not among the outputs "
          + "its run record " + recordFile + " lists); they are never deleted, so the folder "
          + "is not replaced: move them out or choose a new folder");
    }
  }

  private void createStaging() throws IOException {
    staging = Files.createTempDirectory(target.getParent(), "." + target.getFileName()
        + STAGING);
    if (Files.getFileStore(staging).supportsFileAttributeView(PosixFileAttributeView.class)) {
      Files.setPosixFilePermissions(staging, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
  }

  private Path sibling(String kindAndSuffix) {
    return target.getParent().resolve("." + target.getFileName() + kindAndSuffix);
  }

  private String suffix(Path p, String kind) {
    String n = p.getFileName().toString();
    return n.substring(("." + target.getFileName() + kind).length());
  }

  private static Path resolve(Path dir) throws IOException {
    Path abs = dir.toAbsolutePath().normalize();
    if (Files.exists(abs)) {
      return abs.toRealPath();
    }
    return abs;
  }

  /** Removes a folder and what is in it, without following symbolic links. */
  static void deleteTree(Path dir) throws IOException {
    if (!Files.exists(dir, LinkOption.NOFOLLOW_LINKS)) {
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
    } catch (UncheckedIOException e) {
      throw e.getCause();
    }
  }
}
