package org.rosetra.lang.kernel;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.security.CodeSource;

/**
 * Finds the project's {@code ./rosetra} script, which a kernelspec runs. The system
 * property {@code rosetra.launcher} wins; otherwise it is three levels above the running
 * code: {@code lang/target/rosetra.jar} (or {@code lang/target/classes}) → {@code ./rosetra}.
 */
final class Launcher {
    static final String PROPERTY = "rosetra.launcher";

    private Launcher() {}

    static Path locate() {
        String configured = System.getProperty(PROPERTY);
        if (configured != null && !configured.isBlank()) {
            return Path.of(configured).toAbsolutePath().normalize();
        }
        CodeSource source = Launcher.class.getProtectionDomain().getCodeSource();
        if (source == null) {
            throw new IllegalStateException("cannot tell where Rosetra runs from; set -D"
                    + PROPERTY + "=/path/to/rosetra");
        }
        try {
            Path code = Path.of(source.getLocation().toURI()).toAbsolutePath();
            return code.getParent().getParent().getParent().resolve("rosetra").normalize();
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("cannot tell where Rosetra runs from; set -D"
                    + PROPERTY + "=/path/to/rosetra", e);
        }
    }
}
