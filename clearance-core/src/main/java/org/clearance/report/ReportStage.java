package org.clearance.report;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import org.clearance.assess.RunAssessment;
import org.clearance.assess.RunAssessor;
import org.clearance.clearance.NearPointFile;
import org.clearance.rules.RuleProfile;
import org.clearance.run.RunModel;
import org.clearance.run.RunRecord;

/**
 * The report stage of a run folder: evaluates the stored distances under a rule profile
 * ({@link RunAssessor}) and writes every output - {@code worklist.csv}, {@code spans.csv},
 * {@code sites.gpkg}, {@code sites.geojson} (when the CRS is known), {@code report.html} - each
 * through a temporary file, then prints a short summary. It reads {@code near-points.bin} of the
 * folder and the model given, never the survey; {@code clearance check} calls it after measuring,
 * {@code clearance evaluate} to apply another profile. It does not write {@code run.json}: the
 * calling command does ({@link RunRecord}).
 */
public final class ReportStage {

  private ReportStage() {}

  /**
   * What the stage did.
   *
   * @param assessment the evaluated run
   * @param written names of the files written into the run folder
   * @param notes remarks about the outputs (a file not written and why)
   * @param seconds time the stage took, s
   */
  public record Outcome(RunAssessment assessment, List<String> written, List<String> notes,
      double seconds) {
    public Outcome {
      Objects.requireNonNull(assessment, "assessment");
      written = List.copyOf(written);
      notes = List.copyOf(notes);
    }
  }

  /**
   * Evaluates and writes the outputs of a run folder.
   *
   * @param runDir the run folder (holds {@code near-points.bin}; outputs are written here)
   * @param model the run model
   * @param profile the rule profile to apply, or null for none (every span is then NOT
   *     ASSESSED and the work list is empty)
   * @param options report options
   * @param console where the summary goes, or null for none
   * @throws org.clearance.InputException when the near-points file does not match the model
   * @throws IOException when a file cannot be read or written
   */
  public static Outcome run(Path runDir, RunModel model, RuleProfile profile,
      ReportOptions options, PrintWriter console) throws IOException {
    long t0 = System.nanoTime();
    RunAssessment run = assess(runDir, model, profile, options);
    Outcome written = write(runDir, run, options, console);
    return new Outcome(run, written.written(), written.notes(), (System.nanoTime() - t0) / 1e9);
  }

  /**
   * The rules half of the stage: evaluates the profile on the stored distances.
   *
   * @throws org.clearance.InputException when the near-points file does not match the model
   * @throws IOException when the near-points file cannot be read
   */
  public static RunAssessment assess(Path runDir, RunModel model, RuleProfile profile,
      ReportOptions options) throws IOException {
    return RunAssessor.assess(model, runDir.resolve(NearPointFile.FILE_NAME), profile,
        options.assessOptions());
  }

  /**
   * The report half of the stage: writes every output of an evaluated run and the console
   * summary.
   *
   * @throws IOException when a file cannot be written
   */
  public static Outcome write(Path runDir, RunAssessment run, ReportOptions options,
      PrintWriter console) throws IOException {
    long t0 = System.nanoTime();
    List<String> written = new ArrayList<>();
    List<String> notes = new ArrayList<>();
    // The GeoPackage (most of the stage's time, in SQLite) is written on a second thread while
    // the text outputs are written here; each writer reads the assessment only and writes its
    // own file through a temporary file, so the files are the same as one after the other.
    FutureTask<Void> geoPackage = new FutureTask<>(() -> {
      GeoPackageWriter.write(runDir, run, options);
      return null;
    });
    Thread writer = new Thread(geoPackage, "clearance-geopackage");
    writer.setDaemon(true);
    writer.start();
    boolean geoJson;
    try {
      CsvOutputs.write(runDir, run, options);
      geoJson = GeoJsonSites.write(runDir, run, options);
      HtmlReport.write(runDir, run, options);
    } catch (IOException | RuntimeException | Error e) {
      try {
        await(geoPackage);
      } catch (IOException | RuntimeException | Error also) {
        e.addSuppressed(also);
      }
      throw e;
    }
    await(geoPackage);
    written.add(CsvOutputs.WORKLIST);
    written.add(CsvOutputs.SITES);
    written.add(CsvOutputs.SPANS);
    written.add(GeoPackageWriter.FILE_NAME);
    if (geoJson) {
      written.add(GeoJsonSites.FILE_NAME);
    } else {
      notes.add(GeoJsonSites.FILE_NAME + " not written: RFC 7946 asks for longitude and "
          + "latitude, and " + run.lonLatNote());
    }
    written.add(HtmlReport.FILE_NAME);
    if (console != null) {
      console.print(ConsoleSummary.text(run, options, written, notes));
      console.flush();
    }
    return new Outcome(run, written, notes, (System.nanoTime() - t0) / 1e9);
  }

  /** Waits for a writer and rethrows its failure as it was thrown. */
  private static void await(FutureTask<Void> task) throws IOException {
    boolean interrupted = false;
    try {
      while (true) {
        try {
          task.get();
          return;
        } catch (InterruptedException e) {
          interrupted = true; // the writer must finish before its file may be touched
        }
      }
    } catch (ExecutionException e) {
      Throwable cause = e.getCause();
      if (cause instanceof IOException io) {
        throw io;
      }
      if (cause instanceof RuntimeException r) {
        throw r;
      }
      if (cause instanceof Error err) {
        throw err;
      }
      throw new IllegalStateException(cause);
    } finally {
      if (interrupted) {
        Thread.currentThread().interrupt();
      }
    }
  }
}
