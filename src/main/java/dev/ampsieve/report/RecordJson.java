package dev.ampsieve.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.SerializableString;
import com.fasterxml.jackson.core.io.CharacterEscapes;
import com.fasterxml.jackson.core.io.SerializedString;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.record.Entry;
import dev.ampsieve.record.PartFacts;
import dev.ampsieve.record.RecordFacts;
import dev.ampsieve.text.Visible;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The machine-readable block of a decision record (README, "Decision records"): written into the
 * HTML record as {@code <script type="application/json" id="ampsieve-decision-record">} and into
 * the Markdown record as an HTML comment {@code <!-- ampsieve-decision-record ... -->}, and read
 * back by {@code recheck}.
 */
final class RecordJson {
    private RecordJson() {}

    static final String BLOCK_ID = "ampsieve-decision-record";
    static final String FORMAT_KEY = "recordFormat";
    static final int FORMAT = 1;

    private static final String HTML_START = "<script type=\"application/json\" id=\"" + BLOCK_ID + "\">";
    private static final String HTML_END = "</script>";
    private static final String MD_START = "<!-- " + BLOCK_ID;
    private static final String MD_END = "-->";

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    static {
        MAPPER.getFactory().setCharacterEscapes(new Embeddable());
    }

    /**
     * Escapes {@code < > &} (so {@code </script>} or {@code -->} inside a catalog string cannot end
     * the block), and DEL, C1 and the bidi controls beside JSON's own C0 escapes.
     */
    private static final class Embeddable extends CharacterEscapes {
        private static final long serialVersionUID = 1L;
        private final int[] ascii = standardAsciiEscapesForJSON();

        Embeddable() {
            ascii['<'] = ESCAPE_CUSTOM;
            ascii['>'] = ESCAPE_CUSTOM;
            ascii['&'] = ESCAPE_CUSTOM;
            ascii[0x7f] = ESCAPE_CUSTOM;
        }

        @Override
        public int[] getEscapeCodesForAscii() {
            return ascii;
        }

        @Override
        public SerializableString getEscapeSequence(int ch) {
            return ch == '<' || ch == '>' || ch == '&' || Visible.isControl(ch)
                    ? new SerializedString(String.format(java.util.Locale.ROOT, "\\u%04X", ch))
                    : null;
        }
    }

    static String write(RecordFacts f) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put(FORMAT_KEY, FORMAT);
        o.put("kind", f.kind().key());
        o.put("written", f.date());
        o.put("toolVersion", f.toolVersion());
        o.put("stageFile", f.stagePath());
        o.put("catalogFolder", f.catalogPath());
        o.put("candidates", f.candidates());
        o.put("rejected", f.rejected());
        if (f.cheapestFit() == null) {
            o.putNull("cheapestFitting");
        } else {
            o.set("cheapestFitting", part(f.cheapestFit()));
        }
        var parts = o.putArray("parts");
        for (PartFacts p : f.parts()) {
            parts.add(part(p));
        }
        o.put("stageValues", f.stageYaml());
        try {
            return MAPPER.writeValueAsString(o);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a tree of plain values always serialises", e);
        }
    }

    private static ObjectNode part(PartFacts p) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("id", p.id());
        n.put("file", p.file());
        n.put("entrySha256", p.entry().sha256());
        n.put("verdict", p.verdict());
        n.put("constraintsMet", p.constraintsMet());
        JsonSupport.put(n, "limitingTerm", p.limitingTerm());
        n.put("trimmed", p.trimmed());
        JsonSupport.put(n, "judgedErrorV", p.errorV());
        JsonSupport.put(n, "worstCaseV", p.worstCaseV());
        JsonSupport.put(n, "rssV", p.rssV());
        JsonSupport.put(n, "limitV", p.limitV());
        JsonSupport.put(n, "effectiveCost", p.effectiveCost());
        n.put("currency", p.currency());
        ObjectNode e = n.putObject("entry");
        p.entry().fields().forEach(e::put);
        return n;
    }

    /** True when {@code text} holds a record block (HTML or Markdown) of ours. */
    static boolean isRecord(String text) {
        return text.contains(HTML_START) || text.contains(MD_START + "\n");
    }

    /**
     * The facts of the record in {@code text}.
     *
     * @throws InputException naming {@code file}: no record block, or a damaged one
     */
    static RecordFacts read(String text, Path file) throws InputException {
        String json = block(text, HTML_START, HTML_END);
        if (json == null) {
            json = block(text, MD_START + "\n", MD_END);
        }
        if (json == null) {
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    "",
                    "is not an ampsieve decision record (it holds" + " no " + BLOCK_ID + " block)",
                    "give an .html or .md file written by 'ampsieve record', or write one"
                            + " with 'ampsieve record --stage FILE --html OUT'"));
        }
        try {
            JsonNode o = MAPPER.readTree(json);
            if (o == null || !o.isObject() || o.path(FORMAT_KEY).asInt(0) != FORMAT) {
                throw new IllegalArgumentException(FORMAT_KEY + " is not " + FORMAT);
            }
            RecordFacts.Kind kind = RecordFacts.Kind.of(text(o, "kind"));
            if (kind == null) {
                throw new IllegalArgumentException("kind is neither shortlist nor change");
            }
            List<PartFacts> parts = new ArrayList<>();
            for (JsonNode p : o.path("parts")) {
                parts.add(part(p));
            }
            JsonNode cheapest = o.path("cheapestFitting");
            return new RecordFacts(
                    kind,
                    text(o, "stageFile"),
                    text(o, "stageValues"),
                    text(o, "catalogFolder"),
                    text(o, "written"),
                    text(o, "toolVersion"),
                    parts,
                    cheapest.isObject() ? part(cheapest) : null,
                    o.path("candidates").asInt(),
                    o.path("rejected").asInt());
        } catch (JsonProcessingException | IllegalArgumentException e) {
            String why = e instanceof JsonProcessingException j ? j.getOriginalMessage() : e.getMessage();
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    BLOCK_ID,
                    "the record's block is damaged (" + why + ")",
                    "write the record again with 'ampsieve record', or restore the file from version control"));
        }
    }

    private static PartFacts part(JsonNode p) {
        Map<String, String> fields = new LinkedHashMap<>();
        JsonNode e = p.path("entry");
        if (!e.isObject()) {
            throw new IllegalArgumentException("a part has no entry");
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = e.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> f = it.next();
            fields.put(f.getKey(), f.getValue().asText());
        }
        String hash = text(p, "entrySha256");
        Entry entry = new Entry(fields, hash);
        return new PartFacts(
                text(p, "id"),
                p.path("file").asText(""),
                entry,
                text(p, "verdict"),
                p.path("limitingTerm").isTextual() ? p.path("limitingTerm").asText() : null,
                p.path("trimmed").asBoolean(),
                num(p, "judgedErrorV"),
                num(p, "worstCaseV"),
                num(p, "rssV"),
                num(p, "limitV"),
                num(p, "effectiveCost"),
                p.path("currency").asText(""),
                p.path("constraintsMet").asBoolean(true));
    }

    private static String text(JsonNode o, String key) {
        JsonNode v = o.get(key);
        if (v == null || !v.isTextual()) {
            throw new IllegalArgumentException(key + " is missing or not text");
        }
        return v.asText();
    }

    private static double num(JsonNode o, String key) {
        JsonNode v = o.get(key);
        return v != null && v.isNumber() ? v.asDouble() : Double.NaN;
    }

    /** The text between the first {@code start} and the next {@code end}, or null. */
    private static String block(String text, String start, String end) {
        int i = text.indexOf(start);
        if (i < 0) {
            return null;
        }
        int j = text.indexOf(end, i + start.length());
        return j < 0 ? null : text.substring(i + start.length(), j);
    }
}
