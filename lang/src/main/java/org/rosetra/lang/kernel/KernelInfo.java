package org.rosetra.lang.kernel;

/**
 * The content of {@code kernel_info_reply} (Jupyter messaging protocol 5.3, "Kernel info").
 */
final class KernelInfo {
    static final String IMPLEMENTATION = "rosetra";
    static final String LANGUAGE = "rosetra";
    static final String MIMETYPE = "text/x-rosetra";
    static final String FILE_EXTENSION = ".strain";

    private KernelInfo() {}

    static JsonContent content(String implementationVersion, String languageVersion) {
        return json -> {
            json.writeStringField("status", "ok");
            json.writeStringField("protocol_version", WireFormat.PROTOCOL_VERSION);
            json.writeStringField("implementation", IMPLEMENTATION);
            json.writeStringField("implementation_version", implementationVersion);
            json.writeObjectFieldStart("language_info");
            json.writeStringField("name", LANGUAGE);
            json.writeStringField("version", languageVersion);
            json.writeStringField("mimetype", MIMETYPE);
            json.writeStringField("file_extension", FILE_EXTENSION);
            json.writeEndObject();
            json.writeStringField("banner", "Rosetra " + implementationVersion
                    + ": strain-gauge rosette reduction. Results support, and do not replace,"
                    + " the judgment of a qualified engineer.");
            json.writeArrayFieldStart("help_links");
            json.writeEndArray();
        };
    }

    /** The version of the running build, from the jar manifest; "dev" when run from classes. */
    static String implementationVersion() {
        String version = KernelInfo.class.getPackage().getImplementationVersion();
        return version == null ? "dev" : version;
    }
}
