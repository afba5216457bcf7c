package org.rosetra.lang.kernel;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The top-level scalar fields of one JSON object (strings, numbers, booleans). Nested
 * objects and arrays are skipped: every request field the kernel acts on is a scalar, and
 * headers are echoed to clients as the bytes received, so no tree model is needed.
 */
final class JsonFields {
    private static final JsonFactory JSON = new JsonFactory();

    private final Map<String, Object> values;

    private JsonFields(Map<String, Object> values) {
        this.values = values;
    }

    /** Parses {@code json}; anything but one JSON object is an {@link IOException}. */
    static JsonFields parse(byte[] json) throws IOException {
        Map<String, Object> values = new HashMap<>();
        try (JsonParser parser = JSON.createParser(json)) {
            if (parser.nextToken() != JsonToken.START_OBJECT) {
                throw new IOException("expected a JSON object");
            }
            for (JsonToken token = parser.nextToken(); token != JsonToken.END_OBJECT;
                    token = parser.nextToken()) {
                if (token != JsonToken.FIELD_NAME) {
                    throw new IOException("malformed JSON object");
                }
                String name = parser.currentName();
                JsonToken value = parser.nextToken();
                switch (value) {
                    case VALUE_STRING -> values.put(name, parser.getText());
                    case VALUE_NUMBER_INT -> values.put(name, parser.getLongValue());
                    case VALUE_NUMBER_FLOAT -> values.put(name, parser.getDoubleValue());
                    case VALUE_TRUE -> values.put(name, Boolean.TRUE);
                    case VALUE_FALSE -> values.put(name, Boolean.FALSE);
                    case START_OBJECT, START_ARRAY -> parser.skipChildren();
                    default -> { } // null: treated as absent
                }
            }
            if (parser.nextToken() != null) {
                throw new IOException("trailing text after the JSON object");
            }
        }
        return new JsonFields(values);
    }

    Optional<String> text(String name) {
        return values.get(name) instanceof String s ? Optional.of(s) : Optional.empty();
    }

    String text(String name, String fallback) {
        return text(name).orElse(fallback);
    }

    boolean flag(String name, boolean fallback) {
        return values.get(name) instanceof Boolean b ? b : fallback;
    }

    /** A whole number, clamped into the int range (a cursor far past the end is just the end). */
    int whole(String name, int fallback) {
        if (values.get(name) instanceof Long n) {
            return (int) Math.max(Integer.MIN_VALUE, Math.min(Integer.MAX_VALUE, n));
        }
        return fallback;
    }
}
