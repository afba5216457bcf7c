package org.rosetra.runtime.render.output;

import static java.nio.charset.StandardCharsets.UTF_8;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputTransactionTest {

  @TempDir Path dir;

  /** Every file under the folder with its content: the folder's whole observable state. */
  private Map<String, String> snapshot() throws IOException {
    Map<String, String> files = new TreeMap<>();
    try (Stream<Path> walk = Files.walk(dir)) {
      for (Path p : (Iterable<Path>) walk::iterator) {
        String key = dir.relativize(p).toString().replace('\\', '/');
        if (key.equals(OutputTransaction.MANIFEST)) {
          continue; // the list of written files; its own test below
        }
        files.put(key, Files.isDirectory(p) ? "<dir>" : Files.readString(p, UTF_8));
      }
    }
    return files;
  }

  private void previousRun() throws IOException {
    Files.createDirectories(dir.resolve("plots"));
    Files.createDirectories(dir.resolve("tables"));
    Files.writeString(dir.resolve("record.md"), "old record");
    Files.writeString(dir.resolve("plots/mohr-a.svg"), "old a");
    Files.writeString(dir.resolve("plots/mohr-gone.svg"), "old gone");
    Files.writeString(dir.resolve("tables/results.csv"), "old table");
    Files.writeString(dir.resolve("notes.txt"), "the user's own file");
    Files.writeString(dir.resolve(OutputTransaction.MANIFEST),
        "plots/mohr-a.svg\nplots/mohr-gone.svg\nrecord.md\ntables/results.csv\n");
  }

  @Test
  void onlyFilesAnEarlierRunWroteAreRemoved() throws IOException {
    previousRun();
    Files.writeString(dir.resolve("plots/sketch-by-hand.svg"), "a reviewer's own file");
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      tx.write("plots/mohr-a.svg", "new a".getBytes(UTF_8));
      tx.commit();
    }
    Map<String, String> after = snapshot();
    assertFalse(after.containsKey("plots/mohr-gone.svg"), "written by the earlier run, not by this one");
    assertEquals("a reviewer's own file", after.get("plots/sketch-by-hand.svg"), "never written by a run");
    assertEquals(OutputTransaction.MANIFEST + "\nplots/mohr-a.svg\n",
        Files.readString(dir.resolve(OutputTransaction.MANIFEST), UTF_8), "the list names what this run wrote");
  }

  @Test
  void commitPutsFilesInPlaceAndRemovesStalePlots() throws IOException {
    previousRun();
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      tx.write("record.md", "new record".getBytes(UTF_8));
      tx.write("plots/mohr-a.svg", "new a".getBytes(UTF_8));
      tx.write("tables/results.csv", "new table".getBytes(UTF_8));
      tx.commit();
    }
    Map<String, String> after = snapshot();
    assertEquals("new record", after.get("record.md"));
    assertEquals("new a", after.get("plots/mohr-a.svg"));
    assertEquals("new table", after.get("tables/results.csv"));
    assertFalse(after.containsKey("plots/mohr-gone.svg"), "a plot removed from the script must go");
    assertEquals("the user's own file", after.get("notes.txt"), "unmanaged files stay");
    assertTrue(after.keySet().stream().noneMatch(k -> k.contains(".rosetra-")), "no temp files");
  }

  @Test
  void failureBeforeCommitLeavesTheFolderExactlyAsItWas() throws IOException {
    previousRun();
    Map<String, String> before = snapshot();
    RuntimeException failure =
        assertThrows(
            RuntimeException.class,
            () -> {
              try (OutputTransaction tx = OutputTransaction.begin(dir)) {
                tx.write("record.md", "half".getBytes(UTF_8));
                tx.write("plots/new-figure/deep.svg", "x".getBytes(UTF_8));
                throw new RuntimeException("the run failed while rendering");
              }
            });
    assertEquals("the run failed while rendering", failure.getMessage());
    assertEquals(before, snapshot());
  }

  @Test
  void abortOnAFreshFolderRemovesWhatBeginCreated() throws IOException {
    Path out = dir.resolve("survey.out");
    OutputTransaction tx = OutputTransaction.begin(out);
    tx.write("plots/a.svg", new byte[] {1, 2, 3});
    tx.abort();
    assertFalse(Files.exists(out));
    assertThrows(IllegalStateException.class, () -> tx.write("b", new byte[0]));
  }

  @Test
  void writingTheSamePathTwiceKeepsTheLastAndLeavesNoTemp() throws IOException {
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      tx.write("record.md", "first".getBytes(UTF_8));
      tx.write("record.md", "second".getBytes(UTF_8));
      tx.commit();
    }
    assertEquals(Map.of("", "<dir>", "record.md", "second"), snapshot());
  }

  @Test
  void outputsAreNotMadePrivateByTheTemporaryFile() throws IOException {
    org.junit.jupiter.api.Assumptions.assumeTrue(
        dir.getFileSystem().supportedFileAttributeViews().contains("posix"));
    Path plain = Files.writeString(dir.resolve("plain.txt"), "x"); // what the umask gives
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      tx.write("record.md", "r".getBytes(UTF_8));
      tx.commit();
    }
    assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(dir.resolve("record.md")));
  }

  @Test
  void leftoversOfAKilledRunAreRemovedOnCommit() throws IOException {
    Files.writeString(dir.resolve(".rosetra-record.md.0.part"), "half");
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      tx.write("record.md", "r".getBytes(UTF_8));
      tx.commit();
    }
    assertEquals(Map.of("", "<dir>", "record.md", "r"), snapshot());
  }

  @Test
  void pathsMayNotLeaveTheFolder() throws IOException {
    try (OutputTransaction tx = OutputTransaction.begin(dir)) {
      assertThrows(IllegalArgumentException.class, () -> tx.write("../escape.txt", new byte[0]));
      assertThrows(IllegalArgumentException.class, () -> tx.write("/abs.txt", new byte[0]));
      assertThrows(IllegalArgumentException.class, () -> tx.write("plots/..", new byte[0]));
    }
  }

  @Test
  void sha256OfKnownMessages() throws IOException {
    // FIPS 180-4 examples (NIST CSRC): "abc" and the empty message.
    assertEquals(
        "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad",
        Sha256.of("abc".getBytes(UTF_8)));
    Path empty = Files.createFile(dir.resolve("empty.csv"));
    assertEquals(
        "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", Sha256.ofFile(empty));
  }
}
