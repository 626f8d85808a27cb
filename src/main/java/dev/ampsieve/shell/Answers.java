package dev.ampsieve.shell;

import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.Fields;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns what the user typed for one question (or after {@code set KEY}) into stage-file answers:
 * key path to text, exactly as a stage file would hold them. Only the shorthands a person types
 * at a prompt are handled here (a temperature range in one answer, the forms of the limit,
 * yes/no, word prefixes); whether the values are valid is the stage loader's decision, see
 * {@link StageCheck}.
 */
final class Answers {
    private Answers() {}

    /** The combined question for temperature.min and temperature.max. */
    static final String TEMPERATURE = "temperature";
    /** The limit in any of its forms. */
    static final String LIMIT = "limit";
    /** The source resistance: one value, or one per leg of a difference stage. */
    static final String SOURCE = "source-resistance";
    /** The supply in one line: "5 V", "5 V ± 0.25 V" (also "+-"). */
    static final String SUPPLY = "supply";

    /**
     * A question or {@code set} id that stands for two keys given as one range, "low..high unit".
     *
     * @param id   the combined id
     * @param low  the key of the lower end
     * @param high the key of the upper end
     * @param unit the unit a bare number is read in
     */
    record RangeId(String id, String low, String high, Dimension dimension, String unit) {}

    /** Every combined range: one answer sets both ends. */
    static final List<RangeId> RANGES = List.of(
            new RangeId(TEMPERATURE, "temperature.min", "temperature.max", Dimension.TEMPERATURE, "C"),
            new RangeId("band", "band.low", "band.high", Dimension.FREQUENCY, "Hz"),
            new RangeId("common-mode-range", "common-mode-range.min", "common-mode-range.max", Dimension.VOLTAGE, "V"),
            new RangeId("output-range", "output-range.min", "output-range.max", Dimension.VOLTAGE, "V"));

    /** The combined range {@code id}, or null. */
    static RangeId range(String id) {
        return RANGES.stream().filter(r -> r.id().equals(id)).findFirst().orElse(null);
    }

    /**
     * What an answer changes.
     *
     * @param put    answers to add or replace
     * @param remove answers to drop (another form of the same value)
     * @param note   a line telling the user about a consequence, or null
     */
    record Change(Map<String, String> put, Set<String> remove, String note) {
        Change {
            put = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(put));
            remove = Set.copyOf(remove);
        }

        Map<String, String> applyTo(Map<String, String> answers) {
            Map<String, String> out = new LinkedHashMap<>(answers);
            remove.forEach(out::remove);
            out.putAll(put);
            return out;
        }

        /** Every path this change touches. */
        Set<String> paths() {
            Set<String> s = new LinkedHashSet<>(put.keySet());
            s.addAll(remove);
            return s;
        }
    }

    /** Ids a user may answer or set: every stage key, the combined ranges and the supply in one line. */
    static List<String> ids() {
        List<String> ids = new ArrayList<>();
        for (String p : StageKeys.paths()) {
            for (RangeId r : RANGES) {
                if (p.equals(r.low())) {
                    ids.add(r.id());
                }
            }
            if (p.equals("supply.voltage")) {
                ids.add(SUPPLY);
            }
            ids.add(p);
        }
        return ids;
    }

    /** The id as typed, checked; a near miss gets a suggestion. */
    static String id(String typed) throws AnswerException {
        String t = typed.strip().toLowerCase(Locale.ROOT).replace('_', '-');
        if (ids().contains(t)) {
            return t;
        }
        String near = Fields.closest(t, ids());
        throw new AnswerException(
                "'" + typed + "' is not a stage key",
                near != null
                        ? "did you mean '" + near + "'? (`show --all` lists them)"
                        : "`show --all` lists the keys");
    }

    /** The dimension of the value under {@code id}, or null when it is not a quantity. */
    static Dimension dimension(String id) {
        if (range(id) != null) {
            return range(id).dimension();
        }
        if (id.equals(SUPPLY)) {
            return Dimension.VOLTAGE;
        }
        StageKeys.Key k = StageKeys.get(id);
        return k == null ? null : k.dimension();
    }

    /**
     * @param id      a stage key path or {@link #TEMPERATURE}
     * @param text    the answer, not empty
     * @param current the answers so far (some shorthands depend on them)
     */
    static Change interpret(String id, String text, Map<String, String> current) throws AnswerException {
        String t = text.strip();
        if (range(id) != null) {
            return range(range(id), t);
        }
        if (id.equals(SUPPLY)
                || id.equals("supply.voltage") && PLUS_MINUS.matcher(t).find()) {
            return supply(t);
        }
        if (id.equals(LIMIT)) {
            return limit(t, Questions.topology(current) == Topology.TRANSIMPEDANCE);
        }
        if (id.startsWith("limit.")) {
            // one form of the limit replaces the others; lsb, bits and reference form one together
            Set<String> drop = new LinkedHashSet<>(limitPaths());
            if (Set.of("limit.lsb", "limit.bits", "limit.reference").contains(id)) {
                drop.removeAll(Set.of("limit.lsb", "limit.bits", "limit.reference"));
            }
            drop.remove(id);
            return new Change(Map.of(id, t), drop, null);
        }
        StageKeys.Key key = StageKeys.get(id);
        if (key == null) {
            throw new AnswerException("'" + id + "' is not a stage key", "`show --all` lists them");
        }
        if (id.equals("topology")) {
            return topology(choice(t, key.choices()), current);
        }
        if (id.equals(SOURCE)) {
            return new Change(
                    Map.of(id, t), Set.of(SOURCE + ".minus", SOURCE + ".plus"), null); // one value for both legs
        }
        if (id.startsWith(SOURCE + ".")) {
            // one leg given where both had one value (or the default): the other leg keeps that value
            String other = id.endsWith(".minus") ? SOURCE + ".plus" : SOURCE + ".minus";
            if (current.containsKey(other)) {
                return new Change(Map.of(id, t), Set.of(SOURCE), null);
            }
            String both = current.getOrDefault(SOURCE, "0 ohm");
            Map<String, String> put = new LinkedHashMap<>();
            put.put(id, t);
            put.put(other, both);
            return new Change(put, Set.of(SOURCE), other + " keeps " + both);
        }
        return switch (key.kind()) {
            case BOOLEAN -> new Change(Map.of(id, yesNo(t)), Set.of(), null);
            case CHOICE -> new Change(Map.of(id, choice(t, key.choices())), Set.of(), null);
            case GAIN -> gain(t, current);
            default -> new Change(Map.of(id, t), Set.of(), null);
        };
    }

    private static List<String> limitPaths() {
        return StageKeys.paths().stream()
                .filter(p -> p.equals(LIMIT) || p.startsWith("limit."))
                .toList();
    }

    /** Splits "-40..85 C", "-40 C to 85 C", "-40 to 85" (degrees Celsius unless a unit says otherwise). */
    private static final Pattern RANGE = Pattern.compile("^(.+?)\\s*(?:\\.\\.|…|\\bto\\b)\\s*(.+)$");

    private static final Pattern BARE = Pattern.compile("^[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?$");

    /** "low..high unit": a bare end takes the other end's unit, or the range's own. */
    private static Change range(RangeId r, String t) throws AnswerException {
        String example = Questions.example(r.id());
        Matcher m = RANGE.matcher(t);
        if (!m.matches()) {
            throw new AnswerException(
                    "'" + t + "' is not a range", "write the lower and upper end, such as '" + example + "'");
        }
        String lo = m.group(1).strip();
        String hi = m.group(2).strip();
        hi = withUnit(hi, r);
        String unit = unitOf(hi) != null && parses("1 " + unitOf(hi), r.dimension()) ? unitOf(hi) : r.unit();
        lo = BARE.matcher(lo).matches() ? lo + " " + unit : withUnit(lo, r);
        for (String side : List.of(lo, hi)) {
            try {
                Units.parse(side, r.dimension());
            } catch (UnitException e) {
                throw new AnswerException(e.problem(), "write the range such as '" + example + "'");
            }
        }
        Map<String, String> put = new LinkedHashMap<>();
        put.put(r.low(), lo);
        put.put(r.high(), hi);
        return new Change(put, Set.of(), null);
    }

    /** One end as typed, or with the range's unit after it: "10" and "1k" are read as "10 Hz" and "1kHz" for a band. */
    private static String withUnit(String side, RangeId r) {
        if (BARE.matcher(side).matches()) {
            return side + " " + r.unit();
        }
        if (!parses(side, r.dimension()) && parses(side + r.unit(), r.dimension())) {
            return side + r.unit(); // a prefix alone: "1k"
        }
        return side;
    }

    private static boolean parses(String text, Dimension d) {
        try {
            Units.parse(text, d);
            return true;
        } catch (UnitException e) {
            return false;
        }
    }

    private static final Pattern PLUS_MINUS = Pattern.compile("±|\\+-|\\+/-");

    /** "5 V", "5 V ± 0.25 V", "5 V +- 0.25 V", "5 ± 0.25 V": the total supply and its peak change. */
    private static Change supply(String t) throws AnswerException {
        String[] sides = PLUS_MINUS.split(t, -1);
        if (sides.length > 2 || sides[0].isBlank() || sides.length == 2 && sides[1].isBlank()) {
            throw new AnswerException(
                    "'" + t + "' is not a supply",
                    "write the total supply and its peak change, such as '5 V ± 0.25 V'");
        }
        String v = sides[0].strip();
        String dv = sides.length == 2 ? sides[1].strip() : null;
        String unit = dv != null && unitOf(dv) != null ? unitOf(dv) : unitOf(v) != null ? unitOf(v) : "V";
        v = BARE.matcher(v).matches() ? v + " " + unit : v;
        Map<String, String> put = new LinkedHashMap<>();
        put.put("supply.voltage", v);
        if (dv != null) {
            put.put("supply.variation", BARE.matcher(dv).matches() ? dv + " " + unit : dv);
        }
        for (String side : put.values()) {
            try {
                Units.parse(side, Dimension.VOLTAGE);
            } catch (UnitException e) {
                throw new AnswerException(e.problem(), "write the supply such as '5 V ± 0.25 V'");
            }
        }
        return new Change(put, Set.of(), null);
    }

    private static final Pattern UNIT_AFTER_NUMBER =
            Pattern.compile("^[-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?\\s*([^\\d\\s.].*)$");

    /** The unit written after a number, or null for a bare number. */
    private static String unitOf(String s) {
        Matcher m = UNIT_AFTER_NUMBER.matcher(s.strip());
        return m.matches() ? m.group(1) : null;
    }

    private static final Pattern INPUT =
            Pattern.compile("(?i)^(?:input|in|rti)[:\\s]+(.+)$|^(.+?)\\s+(?:input|in|rti|input-referred)$");
    private static final Pattern OUTPUT =
            Pattern.compile("(?i)^(?:output|out)[:\\s]+(.+)$|^(.+?)\\s+(?:output|out|at the output)$");
    private static final Pattern PERCENT = Pattern.compile("(?i)^(.+?%)\\s*(?:of\\s+)?(?:full[- ]scale|fs)?$");
    private static final Pattern LSB = Pattern.compile(
            "(?i)^([-+]?[\\d.]+(?:[eE][-+]?\\d+)?)\\s*lsb[,\\s]+(?:of\\s+|at\\s+)?(\\d+)[\\s-]*bits?[,\\s]+(?:at\\s+|ref(?:erence)?\\s+)?(.+)$");

    /**
     * "1 mV" at the output; "10 uV input"; "0.1 %" of full scale; "0.5 lsb 16 bits 2.5 V".
     * Each form replaces the others.
     */
    private static Change limit(String t, boolean currentIn) throws AnswerException {
        Map<String, String> put = new LinkedHashMap<>();
        Matcher m;
        if ((m = LSB.matcher(t)).matches()) {
            put.put("limit.lsb", m.group(1));
            put.put("limit.bits", m.group(2));
            put.put("limit.reference", m.group(3).strip());
        } else if ((m = INPUT.matcher(t)).matches()) {
            put.put(
                    currentIn ? "limit.input-current" : "limit.input",
                    (m.group(1) != null ? m.group(1) : m.group(2)).strip());
        } else if ((m = PERCENT.matcher(t)).matches()) {
            put.put("limit.percent-of-full-scale", m.group(1).strip());
        } else if (t.toLowerCase(Locale.ROOT).contains("lsb")) {
            throw new AnswerException(
                    "an LSB limit needs the count, the bits and the reference",
                    "write it such as '0.5 lsb 16 bits 2.5 V'");
        } else {
            m = OUTPUT.matcher(t);
            put.put(LIMIT, m.matches() ? (m.group(1) != null ? m.group(1) : m.group(2)).strip() : t);
        }
        Set<String> drop = new LinkedHashSet<>(limitPaths());
        drop.removeAll(put.keySet());
        return new Change(put, drop, null);
    }

    /**
     * A new topology drops the answers that mean nothing in it (another network's resistors, the
     * gain of a transimpedance stage, an input limit of the other kind), and says which.
     */
    private static Change topology(String word, Map<String, String> current) {
        Topology t = Topology.of(word);
        Set<String> drop = new LinkedHashSet<>();
        for (String path : StageKeys.paths()) { // in the key table's order, so the note reads the same each time
            StageKeys.Key k = StageKeys.get(path);
            if (current.containsKey(path) && !StageKeys.appliesTo(k, t)) {
                drop.add(path);
            }
        }
        String note =
                drop.isEmpty() ? null : String.join(", ", drop) + " dropped: not part of the " + word + " topology";
        return new Change(Map.of("topology", word), drop, note);
    }

    /** Gain 1 in a non-inverting stage is a follower: say so rather than refuse the answer. */
    private static Change gain(String t, Map<String, String> current) {
        String topology = current.getOrDefault("topology", "non-inverting");
        double g;
        try {
            g = Units.parse(t, Dimension.NUMBER);
        } catch (UnitException e) {
            return new Change(Map.of("gain", t), Set.of(), null); // "40 dB" and errors: the loader decides
        }
        if (g == 1.0 && topology.equals("non-inverting")) {
            Map<String, String> put = new LinkedHashMap<>();
            put.put("gain", t);
            put.put("topology", "follower");
            return new Change(put, Set.of("rg"), "gain 1: taken as a follower (topology follower)");
        }
        return new Change(Map.of("gain", t), Set.of(), null);
    }

    private static String yesNo(String t) throws AnswerException {
        return switch (t.toLowerCase(Locale.ROOT)) {
            case "y", "yes", "true", "on", "1" -> "true";
            case "n", "no", "false", "off", "0" -> "false";
            default -> throw new AnswerException("'" + t + "' is not yes or no", "answer yes or no");
        };
    }

    /** The choice, or the one choice the word starts (so "inv" is inverting). */
    private static String choice(String t, List<String> choices) throws AnswerException {
        String w = t.toLowerCase(Locale.ROOT);
        if (choices.contains(w)) {
            return w;
        }
        List<String> starts = choices.stream().filter(c -> c.startsWith(w)).toList();
        if (starts.size() == 1) {
            return starts.get(0);
        }
        throw new AnswerException("'" + t + "' is not one of " + String.join(", ", choices), "write one of them");
    }
}
