package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.function.Supplier;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code rosetra kernel}: serves notebook front ends; {@code rosetra kernel install} registers it. */
@Command(name = "kernel",
        description = "Run Rosetra as a notebook kernel (Jupyter messaging protocol).",
        subcommands = KernelInstallCommand.class)
public final class KernelCommand implements Callable<Integer> {

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Option(names = "--connection-file", paramLabel = "FILE",
            description = "The connection file written by the notebook front end.")
    private Path connectionFile;

    @Option(names = "--no-warm-up",
            description = "Start serving at once; the first cells are then slower.")
    private boolean noWarmUp;

    private Supplier<? extends CellEngine> engines;

    /** For picocli's default factory; call {@link #useEngines} before running. */
    public KernelCommand() {
        this(null);
    }

    public KernelCommand(Supplier<? extends CellEngine> engines) {
        this.engines = engines;
    }

    /** Sets where each kernel gets its language session. */
    public KernelCommand useEngines(Supplier<? extends CellEngine> engines) {
        this.engines = Objects.requireNonNull(engines, "engines");
        return this;
    }

    @Override
    public Integer call() throws IOException, InterruptedException {
        if (connectionFile == null) {
            System.err.println("rosetra kernel: --connection-file FILE is required"
                    + " (front ends pass it; to register the kernel run: rosetra kernel install)");
            return 2;
        }
        if (engines == null) {
            System.err.println("rosetra kernel: no language session is wired in this build");
            return 1;
        }
        ConnectionInfo connection;
        try {
            connection = ConnectionInfo.read(connectionFile);
        } catch (IOException e) {
            System.err.println("rosetra kernel: cannot use connection file: " + e.getMessage());
            return 2;
        }
        Kernel kernel = new Kernel(connection, engines.get(), System.err).warmingUpWith(engines);
        (noWarmUp ? kernel.withoutWarmUp() : kernel).run();
        return 0;
    }
}
