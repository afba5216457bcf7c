package org.rosetra.lang.kernel;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * One piece of output in several formats, keyed by MIME type ("text/plain", "text/html",
 * "text/markdown", "image/svg+xml", "image/png"). Binary formats such as PNG are held as
 * base64 text, which is how the Jupyter protocol carries them. Insertion order is kept so
 * the messages a kernel sends are reproducible.
 */
public final class MimeBundle {
    private static final MimeBundle EMPTY = new MimeBundle(Map.of());

    private final Map<String, String> data;

    private MimeBundle(Map<String, String> data) {
        this.data = data;
    }

    public static MimeBundle empty() {
        return EMPTY;
    }

    public static MimeBundle plain(String text) {
        return EMPTY.with("text/plain", text);
    }

    /** A copy of this bundle that also holds {@code value} as {@code mimeType}. */
    public MimeBundle with(String mimeType, String value) {
        Objects.requireNonNull(mimeType, "mimeType");
        Objects.requireNonNull(value, "value");
        Map<String, String> copy = new LinkedHashMap<>(data);
        copy.put(mimeType, value);
        return new MimeBundle(Collections.unmodifiableMap(copy));
    }

    /** The formats, in the order they were added. */
    public Map<String, String> data() {
        return data;
    }

    public boolean isEmpty() {
        return data.isEmpty();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof MimeBundle bundle && bundle.data.equals(data);
    }

    @Override
    public int hashCode() {
        return data.hashCode();
    }

    @Override
    public String toString() {
        return "MimeBundle" + data.keySet();
    }
}
