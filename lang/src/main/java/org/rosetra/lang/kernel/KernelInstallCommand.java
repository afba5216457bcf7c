package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code rosetra kernel install}: writes the {@code rosetra} kernelspec where front ends look. */
@Command(name = "install",
        description = "Register Rosetra with notebook front ends (writes the kernelspec).")
public final class KernelInstallCommand implements Callable<Integer> {

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @ArgGroup(exclusive = true)
    private Destination destination = new Destination();

    static final class Destination {
        @Option(names = "--user", description = "For this user (the default): "
                + "$JUPYTER_DATA_DIR/kernels, else ~/.local/share/jupyter/kernels.")
        boolean user;

        @Option(names = "--sys-prefix", description = "For the Python environment of python3.")
        boolean sysPrefix;

        @Option(names = "--prefix", paramLabel = "DIR", description = "Under DIR/share/jupyter/kernels.")
        Path prefix;
    }

    @Override
    public Integer call() throws IOException {
        Path folder;
        if (destination.prefix != null) {
            folder = KernelsFolder.underPrefix(destination.prefix);
        } else if (destination.sysPrefix) {
            folder = KernelsFolder.forPythonEnvironment("python3");
        } else {
            folder = KernelsFolder.forUser(System.getenv(), Path.of(System.getProperty("user.home")));
        }
        Path written = new KernelSpec(Launcher.locate()).installInto(folder);
        System.out.println("Installed kernelspec " + KernelSpec.NAME + " in " + written.getParent());
        return 0;
    }
}
