package org.rosetra.runtime.render.output;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.OutputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Writes one run's output folder so that a reader never sees a half-written or stale file.
 *
 * <p>Each {@link #write} stages the bytes in a temporary file beside its final place (same folder,
 * so the rename is on one file system). {@link #commit} renames every staged file into place, then
 * deletes the files in the managed subfolders ({@code plots/}, {@code tables/}) that this run did
 * not write: a figure removed from the script must not linger looking current. {@link #abort}, or
 * any failure before commit, deletes the temporary files and leaves the folder as it was. Files
 * outside the managed subfolders that this run did not write are left alone.
 */
public final class OutputTransaction implements AutoCloseable {

  /** Subfolders whose whole content belongs to the run. */
  public static final List<String> MANAGED_FOLDERS = List.of("plots", "tables");

  private static final String TEMP_PREFIX = ".rosetra-";
  private static final String TEMP_SUFFIX = ".part";

  private final Path root;
  private final Map<Path, Path> staged = new LinkedHashMap<>(); // final path -> temporary file
  private final List<Path> createdFolders = new ArrayList<>();
  private boolean finished;

  private OutputTransaction(Path root) {
    this.root = root;
  }

  /** Starts a transaction on {@code dir}, creating it (and its parents) when missing. */
  public static OutputTransaction begin(Path dir) throws IOException {
    Path root = dir.toAbsolutePath().normalize();
    OutputTransaction tx = new OutputTransaction(root);
    tx.createFolders(root);
    return tx;
  }

  public Path root() {
    return root;
  }

  /**
   * Stages {@code bytes} for {@code relativePath} (forward slashes, inside the folder). Writing the
   * same path twice keeps the last bytes.
   */
  public void write(String relativePath, byte[] bytes) throws IOException {
    requireOpen();
    Path target = resolveInside(relativePath);
    createFolders(target.getParent());
    Path temp = createTemp(target);
    Path previous = staged.put(target, temp);
    try (OutputStream out = Files.newOutputStream(temp, StandardOpenOption.WRITE)) {
      out.write(bytes);
    } finally {
      if (previous != null) {
        Files.deleteIfExists(previous);
      }
    }
  }

  /** Moves every staged file into place and removes the managed files this run did not write. */
  public void commit() throws IOException {
    requireOpen();
    try {
      for (Map.Entry<Path, Path> e : staged.entrySet()) {
        move(e.getValue(), e.getKey());
      }
      removeStale();
    } finally {
      finished = true;
      deleteTemps(); // only those a failed move left behind
    }
  }

  /** Drops every staged file; the folder is left as it was before {@link #begin}. */
  public void abort() {
    if (finished) {
      return;
    }
    finished = true;
    deleteTemps();
    for (int i = createdFolders.size() - 1; i >= 0; i--) {
      try {
        Files.deleteIfExists(createdFolders.get(i)); // fails, harmlessly, if not empty
      } catch (IOException ignored) {
        // a folder someone else filled meanwhile stays
      }
    }
  }

  /** Aborts unless committed, so try-with-resources cleans up after a failure. */
  @Override
  public void close() {
    abort();
  }

  /**
   * A new empty file beside the target. Not Files.createTempFile: that one is private to the
   * owner (0600), and the rename would carry that onto the output; this one gets the usual
   * permissions of a new file (the process's umask decides).
   */
  private static Path createTemp(Path target) throws IOException {
    String base = TEMP_PREFIX + target.getFileName() + ".";
    for (int attempt = 0; ; attempt++) {
      Path temp = target.resolveSibling(base + attempt + TEMP_SUFFIX);
      try {
        return Files.createFile(temp);
      } catch (FileAlreadyExistsException taken) {
        if (attempt > 10_000) {
          throw taken;
        }
      }
    }
  }

  private void move(Path temp, Path target) throws IOException {
    try {
      Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (AtomicMoveNotSupportedException e) {
      Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  private void removeStale() throws IOException {
    Set<Path> written = staged.keySet();
    for (String name : MANAGED_FOLDERS) {
      Path folder = root.resolve(name);
      if (!Files.isDirectory(folder)) {
        continue;
      }
      List<Path> stale = new ArrayList<>();
      try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
        for (Path p : entries) {
          if (Files.isRegularFile(p) && !written.contains(p)) {
            stale.add(p);
          }
        }
      }
      for (Path p : stale) {
        Files.deleteIfExists(p);
      }
    }
    removeLeftoverTemps(root); // from a run that was killed before it could clean up
  }

  private void removeLeftoverTemps(Path folder) throws IOException {
    try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder, TEMP_PREFIX + "*" + TEMP_SUFFIX)) {
      for (Path p : entries) {
        if (Files.isRegularFile(p) && !staged.containsValue(p)) {
          Files.deleteIfExists(p);
        }
      }
    }
  }

  private void deleteTemps() {
    for (Path temp : staged.values()) {
      try {
        Files.deleteIfExists(temp);
      } catch (IOException e) {
        throw new UncheckedIOException("cannot remove temporary file " + temp, e);
      }
    }
  }

  private Path resolveInside(String relativePath) {
    if (relativePath.isEmpty() || relativePath.startsWith("/") || relativePath.contains("\\")) {
      throw new IllegalArgumentException(
          "output path must be relative with forward slashes: '" + relativePath + "'");
    }
    Path target = root.resolve(relativePath).normalize();
    if (!target.startsWith(root) || target.equals(root)) {
      throw new IllegalArgumentException("output path leaves the output folder: '" + relativePath + "'");
    }
    if (target.getFileName().toString().startsWith(TEMP_PREFIX)) {
      throw new IllegalArgumentException("output name is reserved for temporary files: '" + relativePath + "'");
    }
    return target;
  }

  private void createFolders(Path folder) throws IOException {
    List<Path> missing = new ArrayList<>();
    for (Path p = folder; p != null && !Files.isDirectory(p); p = p.getParent()) {
      missing.add(0, p);
    }
    for (Path p : missing) {
      Files.createDirectory(p);
      createdFolders.add(p);
    }
  }

  private void requireOpen() {
    if (finished) {
      throw new IllegalStateException("the output transaction is already committed or aborted");
    }
  }
}
