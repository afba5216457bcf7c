package org.rosetra.lang.kernel;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;

/**
 * The kernelspec that tells notebook front ends how to start Rosetra: a folder named
 * {@code rosetra} holding {@code kernel.json} (Jupyter client documentation, "Kernel
 * specs"). {@code interrupt_mode} is "message" so an interrupt arrives as an
 * {@code interrupt_request} on the control channel instead of a signal that would end the JVM.
 */
public record KernelSpec(Path launcher) {
    public static final String NAME = "rosetra";
    public static final String DISPLAY_NAME = "Rosetra";

    /** The command a front end runs, with its placeholder for the connection file. */
    public List<String> argv() {
        return List.of(launcher.toString(), "kernel", "--connection-file", "{connection_file}");
    }

    public byte[] kernelJson() {
        JsonContent spec = json -> {
            JsonContent.writeStrings(json, "argv", argv());
            json.writeStringField("display_name", DISPLAY_NAME);
            json.writeStringField("language", KernelInfo.LANGUAGE);
            json.writeStringField("interrupt_mode", "message");
            json.writeObjectFieldStart("metadata");
            json.writeBooleanField("debugger", false);
            json.writeEndObject();
        };
        return spec.toBytes();
    }

    /**
     * Writes {@code <kernelsFolder>/rosetra/kernel.json}, replacing an older one; written to
     * a temporary name first so a front end never reads half a file.
     */
    public Path installInto(Path kernelsFolder) throws IOException {
        Path folder = kernelsFolder.resolve(NAME);
        Files.createDirectories(folder);
        Path target = folder.resolve("kernel.json");
        Path partial = Files.createTempFile(folder, "kernel.json.", ".partial");
        try {
            Files.write(partial, kernelJson());
            Files.move(partial, target, StandardCopyOption.REPLACE_EXISTING,
                    StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(partial);
        }
        return target;
    }
}
