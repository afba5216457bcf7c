package org.rosetra.runtime.render.record;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RecordFolderTest {

  @TempDir Path dir;

  private Map<String, byte[]> files(Path root) throws IOException {
    Map<String, byte[]> out = new TreeMap<>();
    try (Stream<Path> walk = Files.walk(root)) {
      for (Path p : (Iterable<Path>) walk::iterator) {
        if (Files.isRegularFile(p)) {
          out.put(root.relativize(p).toString().replace('\\', '/'), Files.readAllBytes(p));
        }
      }
    }
    return out;
  }

  @Test
  void writesEveryOutputAndTwoRunsGiveIdenticalBytes() throws IOException {
    Map<String, byte[]> json = Map.of("results.json", "{}\n".getBytes(UTF_8));
    List<String> written = RecordFolder.write(dir.resolve("a"), RecordSamples.survey(true), json);
    RecordFolder.write(dir.resolve("b"), RecordSamples.survey(true), json);
    assertEquals(List.of("plots/directions-web_top-proof_60kN.png", "plots/directions-web_top-proof_60kN.svg",
            "plots/history-web_top-von_mises.png", "plots/history-web_top-von_mises.svg",
            "plots/mohr-web_top-proof_60kN.png", "plots/mohr-web_top-proof_60kN.svg",
            "record.html", "record.md", "results.json", "tables/web_top.csv"),
        written);
    Map<String, byte[]> a = files(dir.resolve("a"));
    Map<String, byte[]> b = files(dir.resolve("b"));
    assertEquals(a.keySet(), b.keySet());
    for (String k : a.keySet()) {
      assertArrayEquals(a.get(k), b.get(k), k + " differs between runs");
    }
    assertEquals("case,sigma_1 [MPa],von_mises [MPa]\r\nproof_60kN,84.51,168.2\r\nservice,50.70,\r\n",
        new String(a.get("tables/web_top.csv"), UTF_8));
  }

  @Test
  void aFigureDroppedFromTheScriptIsRemovedOnTheNextRun() throws IOException {
    RecordFolder.write(dir, RecordSamples.survey(true), Map.of());
    assertTrue(Files.exists(dir.resolve("plots/history-web_top-von_mises.svg")));
    RecordFolder.write(dir, RecordSamples.survey(false), Map.of());
    assertFalse(Files.exists(dir.resolve("plots/history-web_top-von_mises.svg")));
    assertFalse(Files.exists(dir.resolve("plots/history-web_top-von_mises.png")));
    assertTrue(Files.exists(dir.resolve("plots/mohr-web_top-proof_60kN.svg")));
  }

  @Test
  void aFailedRunLeavesThePreviousOutputsUntouched() throws IOException {
    RecordFolder.write(dir, RecordSamples.survey(true), Map.of());
    Map<String, byte[]> before = files(dir);
    Map<String, byte[]> bad = Map.of("../outside.txt", new byte[] {1});
    assertThrows(IllegalArgumentException.class, () -> RecordFolder.write(dir, RecordSamples.survey(false), bad));
    Map<String, byte[]> after = files(dir);
    assertEquals(before.keySet(), after.keySet());
    for (String k : before.keySet()) {
      assertArrayEquals(before.get(k), after.get(k), k);
    }
  }
}
