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

  /**
   * Writes one file on its own (such as a {@code --json} file) the same safe way: by a temporary
   * name beside it and a rename, with the usual permissions of a new file. No manifest, nothing
   * else in its folder touched.
   */
  public static void writeOne(Path file, byte[] bytes) throws IOException {
    Path target = file.toAbsolutePath().normalize();
    Files.createDirectories(target.getParent());
    Path temp = createTemp(target);
    try {
      Files.write(temp, bytes);
      move(temp, target);
    } finally {
      Files.deleteIfExists(temp);
    }
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

  /**
   * Moves every staged file into place and removes the managed files the previous run wrote and
   * this one did not. When a move fails, the files already moved get their previous contents
   * back, so the folder is the old one or the new one, not a mix of both.
   */
  public void commit() throws IOException {
    requireOpen();
    writeManifest();
    Map<Path, Path> backups = new LinkedHashMap<>();
    List<Path> moved = new ArrayList<>();
    try {
      for (Path target : staged.keySet()) {
        if (Files.isDirectory(target)) {
          throw new IOException("cannot write " + root.relativize(target) + ": a folder of that name is in the way");
        }
      }
      for (Path target : staged.keySet()) {
        if (Files.isRegularFile(target)) {
          Path backup = createTemp(target);
          Files.copy(target, backup, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.COPY_ATTRIBUTES);
          backups.put(target, backup);
        }
      }
      for (Map.Entry<Path, Path> e : staged.entrySet()) {
        move(e.getValue(), e.getKey());
        moved.add(e.getKey());
      }
    } catch (IOException | RuntimeException failure) {
      restore(moved, backups, failure);
      finished = true;
      deleteTemps();
      deleteAll(backups.values());
      throw failure;
    }
    finished = true;
    deleteAll(backups.values());
    deleteTemps(); // none should be left
    removeStale();
  }

  /** Puts back what the moved files replaced, and removes the ones that were new. */
  private void restore(List<Path> moved, Map<Path, Path> backups, Exception failure) {
    for (Path target : moved) {
      try {
        Path backup = backups.get(target);
        if (backup != null) {
          move(backup, target);
        } else {
          Files.deleteIfExists(target);
        }
      } catch (IOException e) {
        failure.addSuppressed(e);
      }
    }
  }

  private static void deleteAll(java.util.Collection<Path> files) {
    for (Path p : files) {
      try {
        Files.deleteIfExists(p);
      } catch (IOException ignored) {
        // a leftover temporary file is removed by the next run's commit
      }
    }
  }

  /**
   * The list of files this run writes, kept in the folder: the next run removes from the
   * managed subfolders only files this list names, never a file someone else put there.
   */
  private void writeManifest() throws IOException {
    List<String> names = new ArrayList<>();
    for (Path target : staged.keySet()) {
      names.add(root.relativize(target).toString().replace('\\', '/'));
    }
    names.add(MANIFEST);
    java.util.Collections.sort(names);
    Path target = root.resolve(MANIFEST);
    Path temp = createTemp(target);
    Files.writeString(temp, String.join("\n", names) + "\n", java.nio.charset.StandardCharsets.UTF_8);
    previousManifest = readManifest(target);
    staged.put(target, temp);
  }

  private List<Path> readManifest(Path file) throws IOException {
    List<Path> files = new ArrayList<>();
    if (!Files.isRegularFile(file)) {
      return files;
    }
    for (String line : Files.readAllLines(file, java.nio.charset.StandardCharsets.UTF_8)) {
      if (!line.isBlank()) {
        Path p = root.resolve(line.strip()).normalize();
        if (p.startsWith(root)) {
          files.add(p);
        }
      }
    }
    return files;
  }

  /** The folder's list of files written by a run of the tool. */
  public static final String MANIFEST = ".rosetra.files";
  private List<Path> previousManifest = List.of();

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

  private static void move(Path temp, Path target) throws IOException {
    try {
      Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
    } catch (AtomicMoveNotSupportedException e) {
      Files.move(temp, target, StandardCopyOption.REPLACE_EXISTING);
    }
  }

  private void removeStale() throws IOException {
    Set<Path> written = staged.keySet();
    for (Path p : previousManifest) {
      boolean managed = MANAGED_FOLDERS.stream().anyMatch(name -> p.getParent() != null
          && p.getParent().equals(root.resolve(name)));
      if (managed && !written.contains(p) && Files.isRegularFile(p)) {
        Files.deleteIfExists(p);
      }
    }
    removeLeftoverTemps(root); // from a run that was killed before it could clean up
    for (String name : MANAGED_FOLDERS) {
      if (Files.isDirectory(root.resolve(name))) {
        removeLeftoverTemps(root.resolve(name));
      }
    }
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
