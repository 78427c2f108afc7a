package org.clearance.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.clearance.InputException;
import org.clearance.rules.RuleProfiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** run.json: SHA-256 of inputs, writing and reading back, nested source records. */
class RunRecordTest {

  @TempDir Path dir;

  @Test
  void sha256OfKnownTexts() throws IOException {
    // FIPS 180-2 appendix B.1 example "abc" (published); the empty input from the same family
    assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
        RunRecord.sha256(Files.write(dir.resolve("abc"),
            "abc".getBytes(StandardCharsets.US_ASCII))));
    assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855",
        RunRecord.sha256(Files.write(dir.resolve("empty"), new byte[0])));
  }

  @Test
  void roundTrip() throws IOException {
    Path input = Files.writeString(dir.resolve("structures.csv"), "id,x,y\nKV-10,0,0\n");
    RunRecord check = RunRecord.builder("check", "0.1.0").input("structures", input)
        .profile(RuleProfiles.builtin("example-utility")).parameter("keep_radius_m", "15")
        .parameter("threads", "2").timing("read", 1.5).timing("read", 0.25)
        .timing("measure", 3).output("model.json").output("model.json").build();
    RunRecord eval = RunRecord.builder("evaluate", "0.1.0").source(check).output("run.json")
        .build();
    RunRecordJson.write(dir, eval);
    RunRecord back = RunRecordJson.read(dir.resolve("run.json"));
    assertEquals(eval, back);
    RunRecord src = back.source().orElseThrow();
    assertEquals(List.of("keep_radius_m", "threads"), List.copyOf(src.parameters().keySet()));
    assertEquals(1.75, src.timingsS().get("read"), 1e-12);
    assertEquals(List.of("model.json"), src.outputs());
    assertEquals(17, src.inputs().get(0).bytes());
    assertEquals(RuleProfiles.builtin("example-utility").contentHash(),
        src.profile().orElseThrow().contentHash());
    assertTrue(!back.finished().isBefore(back.started()));
  }

  @Test
  void notARunRecordIsAnInputError() throws IOException {
    Path p = Files.writeString(dir.resolve("run.json"), "{\"format\": \"other/1\"}");
    InputException e = assertThrows(InputException.class, () -> RunRecordJson.read(p));
    assertTrue(e.getMessage().contains("format"), e.getMessage());
  }
}
