package org.clearance.run;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import org.clearance.rules.RuleProfile;

/**
 * What a run did, for {@code run.json}: the command and tool version, when it ran, every input
 * file with its size and SHA-256, the rule profile (name and content hash), the parameters, the
 * time each step took, the files written, and for a re-evaluation the record of the run it
 * started from. Build one with {@link #builder}; write it with {@link RunRecordJson}.
 *
 * @param command the subcommand, e.g. {@code check} or {@code evaluate}
 * @param toolVersion Clearance version
 * @param started start time, UTC
 * @param finished end time, UTC
 * @param inputs input files
 * @param profile the rule profile, when one was applied
 * @param parameters parameters by name, in the order given (values as text)
 * @param timingsS seconds per step, in the order given
 * @param outputs names of the files written in the run folder
 * @param source the record of the run folder a re-evaluation started from, when it had one
 */
public record RunRecord(
    String command, String toolVersion, Instant started, Instant finished,
    List<InputFile> inputs, Optional<ProfileRef> profile, Map<String, String> parameters,
    Map<String, Double> timingsS, List<String> outputs, Optional<RunRecord> source) {

  /** File name inside a run folder. */
  public static final String FILE_NAME = "run.json";

  public RunRecord {
    Objects.requireNonNull(command, "command");
    Objects.requireNonNull(toolVersion, "toolVersion");
    Objects.requireNonNull(started, "started");
    Objects.requireNonNull(finished, "finished");
    inputs = List.copyOf(inputs);
    Objects.requireNonNull(profile, "profile");
    parameters = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(parameters));
    timingsS = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(timingsS));
    outputs = List.copyOf(outputs);
    Objects.requireNonNull(source, "source");
  }

  /**
   * An input file.
   *
   * @param role what the file is, e.g. {@code survey}, {@code structures}, {@code model}
   * @param path the path as given
   * @param bytes its size, bytes
   * @param sha256 SHA-256 of its content, lower-case hex
   */
  public record InputFile(String role, String path, long bytes, String sha256) {
    public InputFile {
      Objects.requireNonNull(role, "role");
      Objects.requireNonNull(path, "path");
      Objects.requireNonNull(sha256, "sha256");
    }
  }

  /**
   * The rule profile of a run.
   *
   * @param name profile name
   * @param title its title
   * @param location {@code builtin:<name>} or the file it was read from
   * @param contentHash SHA-256 of the texts of its inheritance chain
   */
  public record ProfileRef(String name, String title, String location, String contentHash) {
    /** The reference of a resolved profile. */
    public static ProfileRef of(RuleProfile p) {
      return new ProfileRef(p.name(), p.title(), p.origins().get(0).location(), p.contentHash());
    }
  }

  /** A builder; the start time is now. */
  public static Builder builder(String command, String toolVersion) {
    return new Builder(command, toolVersion);
  }

  /** SHA-256 of a file's content, lower-case hex (streams the file). */
  public static String sha256(Path file) throws IOException {
    MessageDigest md;
    try {
      md = MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform has SHA-256", e);
    }
    byte[] buf = new byte[1 << 16];
    try (InputStream in = Files.newInputStream(file)) {
      for (int n = in.read(buf); n >= 0; n = in.read(buf)) {
        md.update(buf, 0, n);
      }
    }
    return HexFormat.of().formatHex(md.digest());
  }

  /** Collects a run record step by step. Not thread-safe. */
  public static final class Builder {
    private final String command;
    private final String toolVersion;
    private final Instant started = now();
    private final List<InputFile> inputs = new ArrayList<>();
    private ProfileRef profile;
    private final Map<String, String> parameters = new LinkedHashMap<>();
    private final Map<String, Double> timings = new LinkedHashMap<>();
    private final List<String> outputs = new ArrayList<>();
    private RunRecord source;

    private Builder(String command, String toolVersion) {
      this.command = Objects.requireNonNull(command, "command");
      this.toolVersion = Objects.requireNonNull(toolVersion, "toolVersion");
    }

    /** Adds an input file, reading it for its size and SHA-256. */
    public Builder input(String role, Path file) throws IOException {
      inputs.add(new InputFile(role, file.toString(), Files.size(file), sha256(file)));
      return this;
    }

    /** Adds an input whose hash is already known. */
    public Builder input(InputFile file) {
      inputs.add(Objects.requireNonNull(file, "file"));
      return this;
    }

    /** The input files added so far. */
    public List<InputFile> inputs() {
      return List.copyOf(inputs);
    }

    /** When the run started, UTC. */
    public Instant started() {
      return started;
    }

    /** The rule profile applied. */
    public Builder profile(RuleProfile p) {
      this.profile = ProfileRef.of(p);
      return this;
    }

    /** A parameter (replaces one of the same name). */
    public Builder parameter(String name, String value) {
      parameters.put(Objects.requireNonNull(name, "name"), String.valueOf(value));
      return this;
    }

    /** Seconds a step took (added to any earlier time of the same step). */
    public Builder timing(String step, double seconds) {
      timings.merge(Objects.requireNonNull(step, "step"), seconds, Double::sum);
      return this;
    }

    /** A file written in the run folder. */
    public Builder output(String name) {
      if (!outputs.contains(name)) {
        outputs.add(name);
      }
      return this;
    }

    /** The record of the run folder this run started from. */
    public Builder source(RunRecord record) {
      this.source = record;
      return this;
    }

    /** The record, finished now. */
    public RunRecord build() {
      return new RunRecord(command, toolVersion, started, now(), inputs,
          Optional.ofNullable(profile), parameters, timings, outputs,
          Optional.ofNullable(source));
    }

    private static Instant now() {
      return Instant.now().truncatedTo(ChronoUnit.MILLIS);
    }
  }
}
