package org.rosetra.runtime.render.output;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 digests (FIPS 180-4) as lower-case hex, for the record's list of inputs. */
public final class Sha256 {

  private Sha256() {}

  public static String of(byte[] bytes) {
    return HexFormat.of().formatHex(digest().digest(bytes));
  }

  /** Streams the file, so a large measured series is never held in memory. */
  public static String ofFile(Path file) throws IOException {
    MessageDigest md = digest();
    byte[] buffer = new byte[1 << 16];
    try (InputStream in = Files.newInputStream(file)) {
      for (int n; (n = in.read(buffer)) > 0; ) {
        md.update(buffer, 0, n);
      }
    }
    return HexFormat.of().formatHex(md.digest());
  }

  private static MessageDigest digest() {
    try {
      return MessageDigest.getInstance("SHA-256");
    } catch (NoSuchAlgorithmException e) {
      throw new IllegalStateException("every Java platform must provide SHA-256", e);
    }
  }
}
