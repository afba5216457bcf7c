package org.rosetra.lang.kernel;

/**
 * Publishes what a running cell shows as {@code display_data} and {@code stream} messages
 * (Jupyter messaging protocol 5.3, "Display Data", "Streams"), or drops it for a silent
 * request.
 */
final class CellOutputSink implements OutputSink {
    private final MessageOut out;
    private final Request cause;
    private final boolean silent;

    CellOutputSink(MessageOut out, Request cause, boolean silent) {
        this.out = out;
        this.cause = cause;
        this.silent = silent;
    }

    @Override
    public void display(MimeBundle bundle) {
        if (silent || bundle.isEmpty()) {
            return;
        }
        out.publish(cause, "display_data", json -> {
            JsonContent.writeBundle(json, "data", bundle);
            JsonContent.writeEmptyObject(json, "metadata");
            JsonContent.writeEmptyObject(json, "transient");
        });
    }

    @Override
    public void printOut(String text) {
        stream("stdout", text);
    }

    @Override
    public void printErr(String text) {
        stream("stderr", text);
    }

    private void stream(String name, String text) {
        if (silent || text.isEmpty()) {
            return;
        }
        out.publish(cause, "stream", json -> {
            json.writeStringField("name", name);
            json.writeStringField("text", text);
        });
    }
}
