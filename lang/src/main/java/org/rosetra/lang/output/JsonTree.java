package org.rosetra.lang.output;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads JSON into plain maps (in document order), lists, strings, doubles, booleans and nulls. */
public final class JsonTree {
    private static final JsonFactory FACTORY = new JsonFactory();

    private JsonTree() {}

    /** Parses a whole document; an {@link IOException} says where the text is not JSON. */
    public static Object parse(byte[] text) throws IOException {
        try (JsonParser parser = FACTORY.createParser(text)) {
            JsonToken first = parser.nextToken();
            if (first == null) {
                throw new IOException("the file is empty");
            }
            return read(parser, first);
        }
    }

    private static Object read(JsonParser parser, JsonToken token) throws IOException {
        switch (token) {
            case START_OBJECT: {
                Map<String, Object> map = new LinkedHashMap<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_OBJECT; t = parser.nextToken()) {
                    String name = parser.currentName();
                    map.put(name, read(parser, parser.nextToken()));
                }
                return map;
            }
            case START_ARRAY: {
                List<Object> list = new ArrayList<>();
                for (JsonToken t = parser.nextToken(); t != JsonToken.END_ARRAY; t = parser.nextToken()) {
                    list.add(read(parser, t));
                }
                return list;
            }
            case VALUE_STRING:
                return parser.getText();
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return parser.getDoubleValue();
            case VALUE_TRUE:
                return Boolean.TRUE;
            case VALUE_FALSE:
                return Boolean.FALSE;
            case VALUE_NULL:
                return null;
            default:
                throw new IOException("unexpected JSON token " + token);
        }
    }
}
