package org.rosetra.lang.kernel;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;
import java.util.Map;

/** Writes the JSON object of one message part (a content, a header) to bytes. */
@FunctionalInterface
interface JsonContent {
    JsonFactory JSON = new JsonFactory();
    byte[] EMPTY_OBJECT = {'{', '}'};

    /** Writes the fields of the object; the braces are written around them. */
    void writeFields(JsonGenerator json) throws IOException;

    default byte[] toBytes() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream(256);
        try (JsonGenerator json = JSON.createGenerator(bytes)) {
            json.writeStartObject();
            writeFields(json);
            json.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("writing to memory cannot fail", e);
        }
        return bytes.toByteArray();
    }

    static void writeBundle(JsonGenerator json, String field, MimeBundle bundle) throws IOException {
        json.writeObjectFieldStart(field);
        for (Map.Entry<String, String> entry : bundle.data().entrySet()) {
            json.writeStringField(entry.getKey(), entry.getValue());
        }
        json.writeEndObject();
    }

    static void writeStrings(JsonGenerator json, String field, List<String> items) throws IOException {
        json.writeArrayFieldStart(field);
        for (String item : items) {
            json.writeString(item);
        }
        json.writeEndArray();
    }

    static void writeEmptyObject(JsonGenerator json, String field) throws IOException {
        json.writeObjectFieldStart(field);
        json.writeEndObject();
    }
}
