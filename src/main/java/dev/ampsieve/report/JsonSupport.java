package dev.ampsieve.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** Shared JSON conventions: SI numbers, NaN (not applicable) as null, indented, a caution field. */
final class JsonSupport {
    private JsonSupport() {
    }

    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    static ObjectNode object() {
        return MAPPER.createObjectNode();
    }

    static void put(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    static void put(ObjectNode o, String key, String v) {
        if (v == null) {
            o.putNull(key);
        } else {
            o.put(key, v);
        }
    }

    /** Adds the caution and prints. */
    static String render(ObjectNode o) {
        o.put("caution", Caution.TEXT);
        try {
            return MAPPER.writeValueAsString(o) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }
}
