package dev.ampsieve.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.SerializableString;
import com.fasterxml.jackson.core.io.CharacterEscapes;
import com.fasterxml.jackson.core.io.SerializedString;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.text.Visible;

/** Shared JSON conventions: SI numbers, NaN (not applicable) as null, indented, a caution field. */
final class JsonSupport {
    private JsonSupport() {}

    static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    static {
        MAPPER.getFactory().setCharacterEscapes(new TerminalSafe());
    }

    /**
     * JSON escapes C0 controls (ESC as &#92;u001B) by itself (RFC 8259, section 7); this adds DEL,
     * C1 and the bidi controls of {@link Visible}, so JSON printed to a terminal cannot drive it
     * either, while a JSON reader still gets the catalog text exactly.
     */
    private static final class TerminalSafe extends CharacterEscapes {
        private static final long serialVersionUID = 1L;
        private final int[] ascii = standardAsciiEscapesForJSON();

        TerminalSafe() {
            ascii[0x7f] = ESCAPE_STANDARD;
        }

        @Override
        public int[] getEscapeCodesForAscii() {
            return ascii;
        }

        @Override
        public SerializableString getEscapeSequence(int ch) {
            return Visible.isControl(ch)
                    ? new SerializedString(String.format(java.util.Locale.ROOT, "\\u%04X", ch))
                    : null;
        }
    }

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
