package org.clearance.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The span's survey temperature survives model.json; an unknown one stays unknown (NaN). */
class SurveyTemperatureRecordTest {

  @TempDir Path dir;

  @Test
  void theSpanAndSectionTemperaturesRoundTrip() throws IOException {
    RunModel m = RunFixture.metric().model();
    List<SpanRecord> spans = new ArrayList<>(m.spans());
    SpanRecord s = spans.get(0);
    SpanRecord.SurveyTemperature t = new SpanRecord.SurveyTemperature(31.25, 2.5, "computed",
        30.75, 2.25);
    spans.set(0, new SpanRecord(s.context(), s.lineName(), s.from(), s.to(), s.status(),
        s.reason(), s.conductors(), s.minima(), s.pointsMeasured(), s.pointsKept(), s.notes(),
        s.setAside(), t));
    RunModel with = new RunModel(m.toolVersion(), m.units(), m.conditions(), m.keepRadiusM(),
        m.vegetation(), m.groundSource(), spans, m.trees(), m.facts());
    Path file = dir.resolve(RunModel.FILE_NAME);
    RunModelJson.write(with, file);
    RunModel back = RunModelJson.read(file);
    assertEquals(t, back.spans().get(0).temperature());
    SpanRecord.SurveyTemperature none = back.spans().get(1).temperature();
    assertEquals("none", none.source());
    assertTrue(Double.isNaN(none.spanC()) && Double.isNaN(none.sectionSigmaC()));
  }
}
