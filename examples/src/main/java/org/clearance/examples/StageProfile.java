package org.clearance.examples;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import jdk.jfr.Recording;
import jdk.jfr.consumer.RecordedEvent;
import jdk.jfr.consumer.RecordedFrame;
import jdk.jfr.consumer.RecordingFile;

/**
 * The benchmark's profile: JDK Flight Recorder method samples (every {@link #SAMPLE_MS} ms of
 * each running Java thread, and of threads in native code such as file writes) taken while the
 * benchmark runs, attributed to the stage whose time
 * window holds them, and summed by the innermost frame. Shows which methods each stage's time
 * goes to, without any tool beyond the JDK.
 */
final class StageProfile implements AutoCloseable {

  /** Sampling period of running Java threads, ms: the JDK's own "profile" setting. */
  static final long SAMPLE_MS = 10;
  /** Innermost frames listed per stage. */
  static final int TOP = 6;

  /** Package prefix of the project's own frames. */
  private static final String PROJECT = "org.clearance.";

  /** A stage's time window. */
  private record Window(String stage, Instant start, Instant end) {}

  private final Recording recording = new Recording();
  private final List<Window> windows = new ArrayList<>();
  private final Path file;
  private Instant last;

  /** Starts recording; the file goes into {@code dir}. */
  StageProfile(Path dir) {
    this.file = dir.resolve("bench-profile.jfr");
    recording.enable("jdk.ExecutionSample").withPeriod(Duration.ofMillis(SAMPLE_MS));
    recording.enable("jdk.NativeMethodSample").withPeriod(Duration.ofMillis(SAMPLE_MS));
    recording.start();
    last = Instant.now();
  }

  /** Marks the start of the next window now (time before it belongs to no stage). */
  void mark() {
    last = Instant.now();
  }

  /** Ends the current window: the samples since the last mark or end belong to {@code stage}. */
  void ended(String stage) {
    Instant now = Instant.now();
    windows.add(new Window(stage, last, now));
    last = now;
  }

  /**
   * Prints the top innermost frames of each stage ended since the last print, with their sample
   * share (printed per mode, so that a later failure does not lose them); recording goes on.
   */
  void print(PrintWriter out) throws IOException {
    recording.dump(file);
    Map<String, Map<String, Integer>> byStage = new LinkedHashMap<>();
    Map<String, Integer> totals = new HashMap<>();
    for (Window w : windows) {
      byStage.putIfAbsent(w.stage(), new HashMap<>());
    }
    for (RecordedEvent e : RecordingFile.readAllEvents(file)) {
      if (e.getStackTrace() == null || e.getStackTrace().getFrames().isEmpty()) {
        continue;
      }
      Instant t = e.getStartTime();
      for (Window w : windows) {
        if (!t.isBefore(w.start()) && t.isBefore(w.end())) {
          String name = frameName(e);
          byStage.get(w.stage()).merge(name, 1, Integer::sum);
          totals.merge(w.stage(), 1, Integer::sum);
          break;
        }
      }
    }
    out.printf(Locale.ROOT, "%nprofile (JFR method and native samples every %d ms; innermost "
        + "frame, and the project frame that called it; share of the stage's samples):%n", SAMPLE_MS);
    byStage.forEach((stage, counts) -> {
      int total = totals.getOrDefault(stage, 0);
      out.printf(Locale.ROOT, "  %s: %d samples%n", stage, total);
      counts.entrySet().stream()
          .sorted((a, b) -> a.getValue().equals(b.getValue()) ? a.getKey().compareTo(b.getKey())
              : b.getValue() - a.getValue())
          .limit(TOP)
          .forEach(en -> out.printf(Locale.ROOT, "    %5.1f %%  %s%n",
              100.0 * en.getValue() / total, en.getKey()));
    });
    out.flush();
    windows.clear();
  }

  /**
   * The innermost frame; for a frame outside the project, also the innermost project frame that
   * called it (a sort, a hash lookup: whose?); "(native)" for a sample in native code.
   */
  private static String frameName(RecordedEvent e) {
    List<RecordedFrame> frames = e.getStackTrace().getFrames();
    String name = name(frames.get(0));
    if (!name.startsWith(PROJECT)) {
      for (RecordedFrame f : frames) {
        if (name(f).startsWith(PROJECT)) {
          name += " < " + name(f);
          break;
        }
      }
    }
    return e.getEventType().getName().equals("jdk.NativeMethodSample") ? name + " (native)"
        : name;
  }

  private static String name(RecordedFrame f) {
    return f.getMethod().getType().getName() + "." + f.getMethod().getName();
  }

  @Override
  public void close() throws IOException {
    recording.stop();
    recording.close();
    Files.deleteIfExists(file);
  }
}
