package org.clearance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.function.Consumer;
import org.clearance.survey.PointChunk;
import org.junit.jupiter.api.Test;

class ProgressTest {

  private static String pass(long total, int chunks, int perChunk) {
    StringWriter text = new StringWriter();
    Progress p = new Progress(new PrintWriter(text), total);
    long[] consumed = {0};
    Consumer<PointChunk> c = p.wrap("test", () -> chunk -> consumed[0] += chunk.size()).get();
    PointChunk chunk = new PointChunk(perChunk);
    chunk.setSize(perChunk);
    for (int i = 0; i < chunks; i++) {
      c.accept(chunk);
    }
    assertEquals((long) chunks * perChunk, consumed[0], "every chunk reaches the consumer");
    return text.toString();
  }

  @Test
  void largeSurveyReportsEveryQuarter() {
    String out = pass(Progress.MIN_POINTS, 100, (int) (Progress.MIN_POINTS / 100));
    assertEquals(4, out.lines().count(), out);
    assertTrue(out.contains("test pass: 100 %"), out);
  }

  @Test
  void smallSurveyPassesQuietly() {
    assertEquals("", pass(Progress.MIN_POINTS - 1, 10, 1000));
  }
}
