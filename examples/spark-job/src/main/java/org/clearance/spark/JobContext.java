package org.clearance.spark;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.clearance.CheckOptions;
import org.clearance.clearance.ConditionModels;
import org.clearance.clearance.ConditionSet;
import org.clearance.line.ConductorLibrary;
import org.clearance.line.LineLayout;
import org.clearance.line.LineSpec;
import org.clearance.line.LineSpecReader;
import org.clearance.line.Span;
import org.clearance.line.SpanLayout;
import org.clearance.line.StructureReader;
import org.clearance.survey.Survey;

/**
 * The inputs of a run as every JVM of the job rebuilds them from a {@link JobSpec}: the survey's
 * files (headers only) and units, the line layout, one layout and condition set per line, and the
 * stage options. Built once per JVM and spec, with the same readers as the command line, so the
 * driver and every executor see the same spans in the same order.
 */
final class JobContext {
  private static final Map<JobSpec, JobContext> CACHE = new ConcurrentHashMap<>();

  final JobSpec spec;
  final Survey survey;
  final SpanLayout layout;
  /** Per line of {@link #layout}: a layout of that line alone (a run folder per line). */
  final List<SpanLayout> lineLayouts;
  /** Per line: its conditions (surveyed first), as a check of that line alone has them. */
  final List<ConditionSet> conditions;
  /** Every span of every line in layout order; a span's index here is its key in the job. */
  final List<SpanRef> spans;
  final CheckOptions options;
  /** Per span, its work area. */
  final List<WorkPlan.WorkBox> boxes;
  /**
   * Per span, the spans of its line whose tree regions may meet its own, itself included, in key
   * order: the spans its task measures with it, so that it sees the canopy and assigns trees as
   * a whole-survey run does ({@link SpanStages#measure}).
   */
  final List<List<Integer>> partners;
  /**
   * Per span, the spans whose tasks measure points its own task may set aside: its partners'
   * partners, in key order.
   */
  final List<List<Integer>> measuredNear;

  /**
   * A span of the job.
   *
   * @param line index of its line in {@link #layout}
   * @param span the span
   */
  record SpanRef(int line, Span span) {}

  private JobContext(JobSpec spec) {
    this.spec = spec;
    this.survey = Survey.open(spec.tiles().stream().map(Path::of).toList(), spec.units());
    ConductorLibrary library = ConductorLibrary.builtin();
    if (spec.conductors() != null) {
      library = library.withUserFile(Path.of(spec.conductors()));
    }
    List<LineSpec> specs = new ArrayList<>();
    for (String line : spec.lines()) {
      specs.add(LineSpecReader.read(Path.of(line), library));
    }
    this.layout = SpanLayout.build(StructureReader.read(Path.of(spec.structures()),
        survey.units()), specs);
    List<SpanLayout> perLine = new ArrayList<>();
    List<ConditionSet> sets = new ArrayList<>();
    List<SpanRef> all = new ArrayList<>();
    for (int l = 0; l < layout.lines().size(); l++) {
      LineLayout line = layout.lines().get(l);
      perLine.add(new SpanLayout(List.of(line)));
      sets.add(ConditionModels.conditionSet(List.of(line.spec())));
      for (Span s : line.spans()) {
        all.add(new SpanRef(l, s));
      }
    }
    this.lineLayouts = List.copyOf(perLine);
    this.conditions = List.copyOf(sets);
    this.spans = List.copyOf(all);
    CheckOptions defaults = CheckOptions.defaults(1);
    this.options = defaults.with(defaults.report(), spec.vegetationClasses() == null ? null
        : java.util.Set.copyOf(spec.vegetationClasses()));
    List<WorkPlan.WorkBox> areas = new ArrayList<>();
    for (int k = 0; k < spans.size(); k++) {
      SpanRef ref = spans.get(k);
      areas.add(WorkPlan.box(k, ref.span(), layout.lines().get(ref.line()).spec(),
          options.engine().treeReach(), options.ground()));
    }
    this.boxes = List.copyOf(areas);
    List<List<Integer>> near = new ArrayList<>();
    for (int k = 0; k < spans.size(); k++) {
      double[] a = boxes.get(k).regionBounds();
      List<Integer> list = new ArrayList<>();
      for (int j = 0; j < spans.size(); j++) {
        double[] b = boxes.get(j).regionBounds();
        if (spans.get(j).line() == spans.get(k).line() && a[0] <= b[2] && b[0] <= a[2]
            && a[1] <= b[3] && b[1] <= a[3]) {
          list.add(j);
        }
      }
      near.add(List.copyOf(list));
    }
    this.partners = List.copyOf(near);
    List<List<Integer>> twice = new ArrayList<>();
    for (int k = 0; k < spans.size(); k++) {
      java.util.TreeSet<Integer> set = new java.util.TreeSet<>();
      for (int j : partners.get(k)) {
        set.addAll(partners.get(j));
      }
      twice.add(List.copyOf(set));
    }
    this.measuredNear = List.copyOf(twice);
  }

  /**
   * The context of a spec, read on first use in this JVM.
   *
   * @throws org.clearance.InputException for a problem with the inputs
   */
  static JobContext of(JobSpec spec) {
    return CACHE.computeIfAbsent(spec, JobContext::new);
  }
}
