package dev.ampsieve.stage;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.AtomicFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Problem;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Writes stage files: a commented YAML text from a {@link Stage} or from answers keyed by
 * {@link StageKeys} paths, and saves it without ever destroying a user's file (written to a
 * temporary file in the same folder, then moved into place in one step; an existing file is
 * only replaced when the caller says so).
 */
public final class StageWriter {

    private StageWriter() {}

    /**
     * A commented stage file holding {@code answers} (key path to the text the user typed,
     * such as {@code "temperature.min" -> "-40 C"}). Keys without an answer appear as comments
     * with their example and default, ready to be uncommented.
     *
     * @throws IllegalArgumentException for a path that is not a stage key, or a limit given in two forms
     */
    public static String toYaml(Map<String, String> answers) {
        for (String path : answers.keySet()) {
            if (StageKeys.get(path) == null) {
                throw new IllegalArgumentException("not a stage key: " + path);
            }
        }
        boolean limitBlock = answers.keySet().stream().anyMatch(p -> p.startsWith("limit."));
        if (limitBlock && answers.containsKey("limit")) {
            throw new IllegalArgumentException("the limit is given both as 'limit' and as a 'limit.' block");
        }
        StringBuilder out = new StringBuilder();
        out.append("# ampsieve stage file: one amplifier stage and the error it may have.\n");
        out.append("# Every value carries its unit (10 kohm, 1 mV, 25 ppm/C, 10 y); '#' starts a comment.\n");
        out.append("# Keys left as comments take the default shown.\n");

        Topology topology = topologyOf(answers.get("topology"));
        Map<String, List<StageKeys.Key>> groups = new LinkedHashMap<>();
        for (StageKeys.Key key : StageKeys.ORDERED) {
            if (!StageKeys.appliesTo(key, topology)) {
                continue; // a key of another topology would only be refused on reading
            }
            String group = key.section().isEmpty() ? key.path() : key.section();
            groups.computeIfAbsent(group, g -> new ArrayList<>()).add(key);
        }
        for (Map.Entry<String, List<StageKeys.Key>> g : groups.entrySet()) {
            out.append('\n');
            String group = g.getKey();
            if (group.equals("limit")) {
                writeLimit(out, g.getValue(), answers, limitBlock);
            } else if (group.equals("gain")
                    && !answers.containsKey("gain")
                    && answers.containsKey("rf")
                    && answers.containsKey("rg")) {
                comment(out, "", g.getValue().get(0).why());
                out.append("# gain: set by rf and rg below\n");
            } else if (group.equals("source-resistance")
                    && answers.keySet().stream().anyMatch(k -> k.startsWith("source-resistance."))) {
                comment(out, "", g.getValue().get(0).why());
                out.append("source-resistance:\n");
                for (StageKeys.Key key : g.getValue().subList(1, g.getValue().size())) {
                    line(out, "  ", key.name(), key, answers.get(key.path()));
                }
            } else if (!StageKeys.SECTIONS.contains(group)) {
                StageKeys.Key key = g.getValue().get(0);
                line(out, "", key.path(), key, answers.get(key.path()));
            } else {
                block(out, group, g.getValue(), answers);
            }
        }
        return out.toString();
    }

    /** The topology an answer names; non-inverting (the default) when none or an unknown word. */
    private static Topology topologyOf(String answer) {
        for (Topology t : Topology.values()) {
            if (t.key().equals(answer)) {
                return t;
            }
        }
        return Topology.NON_INVERTING;
    }

    private static void block(
            StringBuilder out, String section, List<StageKeys.Key> keys, Map<String, String> answers) {
        boolean any = keys.stream().anyMatch(k -> answers.containsKey(k.path()));
        out.append(any ? "" : "# ").append(section).append(":\n");
        for (StageKeys.Key key : keys) {
            String answer = answers.get(key.path());
            line(out, any ? "  " : "#   ", key.name(), key, answer);
        }
    }

    private static void writeLimit(
            StringBuilder out, List<StageKeys.Key> keys, Map<String, String> answers, boolean asBlock) {
        StageKeys.Key scalar = keys.get(0);
        if (!asBlock) {
            line(out, "", "limit", scalar, answers.get("limit"));
            return;
        }
        comment(out, "", scalar.why());
        out.append("limit:\n");
        for (StageKeys.Key key : keys.subList(1, keys.size())) {
            String answer = answers.get(key.path());
            if (answer != null) {
                line(out, "  ", key.name(), key, answer);
            }
        }
    }

    /** "# why" then "name: value", or the key commented out with its example and default. */
    private static void line(StringBuilder out, String indent, String name, StageKeys.Key key, String answer) {
        comment(out, indent, key.why());
        if (answer != null) {
            out.append(indent).append(name).append(": ").append(scalar(answer)).append('\n');
        } else {
            String lead = indent.startsWith("#") ? indent : indent + "# ";
            out.append(lead)
                    .append(name)
                    .append(": ")
                    .append(scalar(key.example()))
                    .append("    # default: ")
                    .append(key.defaultText())
                    .append('\n');
        }
    }

    private static void comment(StringBuilder out, String indent, String text) {
        String lead = indent.startsWith("#") ? indent : indent + "# ";
        out.append(lead).append(text).append('\n');
    }

    /** The trim circuit's keys, only when a circuit other than the stored correction is in play. */
    private static void trimCircuit(Map<String, String> a, Trim t) {
        TrimCircuit c = t.circuit();
        boolean other = c.kind() != TrimCircuit.Kind.STORED
                || t.circuits().stream().anyMatch(k -> k != TrimCircuit.Kind.STORED);
        if (!other) {
            return;
        }
        a.put("trim.circuit", c.kind().key());
        a.put(
                "trim.circuits",
                String.join(
                        ", ", t.circuits().stream().map(TrimCircuit.Kind::key).toList()));
        a.put("trim.margin", exact(c.margin(), Dimension.NUMBER));
        a.put("trim.node", c.node().key());
        a.put("trim.reference", exact(c.reference(), Dimension.VOLTAGE));
        a.put("trim.reference-tempco", exact(c.referenceTempco(), Dimension.RATIO_DRIFT));
        a.put("trim.resistor-tempco", exact(c.resistorTempco(), Dimension.RATIO_DRIFT));
        if (!Double.isNaN(c.tracking())) {
            a.put("trim.tracking", exact(c.tracking(), Dimension.RATIO_DRIFT));
        }
        a.put("trim.pot-settability", exact(c.potSettability(), Dimension.RATIO, "%"));
        a.put("trim.pot-tempco", exact(c.potTempco(), Dimension.RATIO_DRIFT));
        a.put("trim.pot-resistance", exact(c.potResistance(), Dimension.RESISTANCE));
        a.put("trim.dac-bits", String.valueOf(c.dacBits()));
        a.put("trim.dac-reference", exact(c.dacReference(), Dimension.VOLTAGE));
        a.put("trim.dac-offset-drift", exact(c.dacOffsetDrift(), Dimension.VOLTAGE_DRIFT));
        a.put("trim.dac-gain-drift", exact(c.dacGainDrift(), Dimension.RATIO_DRIFT));
        a.put("trim.pot-cost", exact(c.potCost(), Dimension.NUMBER));
        a.put("trim.reference-cost", exact(c.referenceCost(), Dimension.NUMBER));
        a.put("trim.resistor-cost", exact(c.resistorCost(), Dimension.NUMBER));
        a.put("trim.dac-cost", exact(c.dacCost(), Dimension.NUMBER));
        a.put("trim.adjust-cost", exact(c.adjustCost(), Dimension.NUMBER));
    }

    private static final Pattern PLAIN = Pattern.compile("[A-Za-z0-9+\\-.][A-Za-z0-9 +\\-._/%()°µΩ]*");

    /** The answer as a YAML scalar: plain when that reads back as the same text, else double-quoted. */
    static String scalar(String text) {
        String t = text.strip();
        if (!t.isEmpty() && PLAIN.matcher(t).matches() && !t.startsWith("- ") && !t.endsWith(" ")) {
            return t;
        }
        StringBuilder q = new StringBuilder("\"");
        for (char c : t.toCharArray()) {
            switch (c) {
                case '"' -> q.append("\\\"");
                case '\\' -> q.append("\\\\");
                case '\n' -> q.append("\\n");
                case '\t' -> q.append("\\t");
                default -> {
                    if (c < 0x20) {
                        q.append(String.format(Locale.ROOT, "\\x%02x", (int) c));
                    } else {
                        q.append(c);
                    }
                }
            }
        }
        return q.append('"').toString();
    }

    // ------------------------------------------------------------------ from a Stage

    /** A commented stage file that {@link StageLoader} reads back to a stage equal to {@code s} (apart from {@code where}). */
    public static String toYaml(Stage s) {
        return toYaml(answers(s));
    }

    /** The stage as answers: every value written out exactly, so reading it back gives the same doubles. */
    public static Map<String, String> answers(Stage s) {
        Map<String, String> a = new LinkedHashMap<>();
        Network n = s.network();
        a.put("topology", n.topology().key());
        switch (n.topology()) {
            case FOLLOWER -> {
                Follower x = (Follower) n;
                if (x.rf() != 0) {
                    a.put("rf", exact(x.rf(), Dimension.RESISTANCE));
                }
                a.put("source-resistance", exact(x.rs(), Dimension.RESISTANCE));
                a.put("balance-resistance", exact(x.rp(), Dimension.RESISTANCE));
            }
            case NON_INVERTING -> {
                NonInverting x = (NonInverting) n;
                gainOrRg(a, x.rf(), x.rg(), true);
                a.put("source-resistance", exact(x.rs(), Dimension.RESISTANCE));
                a.put("balance-resistance", exact(x.rp(), Dimension.RESISTANCE));
            }
            case INVERTING -> {
                Inverting x = (Inverting) n;
                gainOrRg(a, x.rf(), x.rg(), false);
                a.put("source-resistance", exact(x.rs(), Dimension.RESISTANCE));
                a.put("balance-resistance", exact(x.rp(), Dimension.RESISTANCE));
            }
            case DIFFERENCE -> {
                Difference x = (Difference) n;
                a.put("r1", exact(x.r1(), Dimension.RESISTANCE));
                a.put("r2", exact(x.r2(), Dimension.RESISTANCE));
                a.put("r3", exact(x.r3(), Dimension.RESISTANCE));
                a.put("r4", exact(x.r4(), Dimension.RESISTANCE));
                if (x.rsMinus() == x.rsPlus()) {
                    a.put("source-resistance", exact(x.rsMinus(), Dimension.RESISTANCE));
                } else {
                    a.put("source-resistance.minus", exact(x.rsMinus(), Dimension.RESISTANCE));
                    a.put("source-resistance.plus", exact(x.rsPlus(), Dimension.RESISTANCE));
                }
            }
            case TRANSIMPEDANCE -> {
                Transimpedance x = (Transimpedance) n;
                a.put("rf", exact(x.rf(), Dimension.RESISTANCE));
                a.put("cf", exact(x.cf(), Dimension.CAPACITANCE));
                a.put("source-resistance", exact(x.rsh(), Dimension.RESISTANCE));
                a.put("source-capacitance", exact(x.cs(), Dimension.CAPACITANCE));
                a.put("balance-resistance", exact(x.rp(), Dimension.RESISTANCE));
            }
        }
        a.put("temperature.min", exact(s.tMin(), Dimension.TEMPERATURE));
        a.put("temperature.max", exact(s.tMax(), Dimension.TEMPERATURE));
        if (s.supplyVoltage() != null) {
            a.put("supply.voltage", exact(s.supplyVoltage(), Dimension.VOLTAGE));
        }
        a.put("supply.variation", exact(s.supplyVariation(), Dimension.VOLTAGE));
        a.put("common-mode-swing", exact(s.commonModeSwing(), Dimension.VOLTAGE));
        if (s.commonModeRange() != null) {
            a.put("common-mode-range.min", exact(s.commonModeRange().min(), Dimension.VOLTAGE));
            a.put("common-mode-range.max", exact(s.commonModeRange().max(), Dimension.VOLTAGE));
        }
        if (s.outputRange() != null) {
            a.put("output-range.min", exact(s.outputRange().min(), Dimension.VOLTAGE));
            a.put("output-range.max", exact(s.outputRange().max(), Dimension.VOLTAGE));
        }
        a.put("band.low", exact(s.bandLow(), Dimension.FREQUENCY));
        a.put("band.high", exact(s.bandHigh(), Dimension.FREQUENCY));
        if (s.filterOrder() != null) {
            a.put("band.filter-order", s.filterOrder() == Stage.NO_FILTER ? "none" : String.valueOf(s.filterOrder()));
        }
        if (s.fullScaleOutput() != null) {
            a.put("full-scale-output", exact(s.fullScaleOutput(), Dimension.VOLTAGE));
        }
        a.put("resistor-ratio.tolerance", exact(s.ratioTolerance(), Dimension.RATIO));
        a.put("resistor-ratio.tempco", exact(s.ratioTempco(), Dimension.RATIO_DRIFT));
        a.put("service-life", exact(s.serviceLife(), Dimension.TIME));
        Limit l = s.limit();
        if (l != null) {
            switch (l.kind()) {
                case OUTPUT -> a.put("limit", exact(l.value(), Dimension.VOLTAGE));
                case INPUT -> a.put("limit.input", exact(l.value(), Dimension.VOLTAGE));
                case INPUT_CURRENT -> a.put("limit.input-current", exact(l.value(), Dimension.CURRENT));
                case PERCENT_OF_FULL_SCALE ->
                    a.put("limit.percent-of-full-scale", exact(l.value(), Dimension.RATIO, "%"));
                case LSB -> {
                    a.put("limit.lsb", exact(l.value(), Dimension.NUMBER));
                    a.put("limit.bits", String.valueOf(l.bits()));
                    a.put("limit.reference", exact(l.reference(), Dimension.VOLTAGE));
                }
            }
        }
        Criterion c = s.criterion();
        a.put(
                "criterion",
                switch (c.kind()) {
                    case WORST_CASE -> "worst-case";
                    case RSS -> "rss";
                    case YIELD -> "yield " + exact(c.yieldTarget(), Dimension.RATIO, "%");
                });
        a.put("max-to-sigma", exact(s.maxToSigma(), Dimension.NUMBER));
        a.put("trials", String.valueOf(s.trials()));
        a.put("max-trials", String.valueOf(s.maxTrials()));
        a.put("seed", String.valueOf(s.seed()));
        Trim t = s.trim();
        a.put("trim.allowed", String.valueOf(t.allowed()));
        a.put("trim.method", t.method().key());
        if (!Double.isNaN(t.cold())) {
            a.put("trim.cold", exact(t.cold(), Dimension.TEMPERATURE));
        }
        if (!Double.isNaN(t.hot())) {
            a.put("trim.hot", exact(t.hot(), Dimension.TEMPERATURE));
        }
        a.put("trim.resolution", exact(t.resolution(), Dimension.VOLTAGE));
        a.put("trim.cost", exact(t.cost(), Dimension.NUMBER));
        trimCircuit(a, t);
        a.put("quantity", String.valueOf(s.quantity()));
        if (s.maxPrice() != null) {
            a.put("max-price", exact(s.maxPrice(), Dimension.NUMBER));
        }
        a.put("ac-coupled", String.valueOf(s.acCoupled()));
        Board b = s.board();
        if (b.thermalEmf()) {
            a.put("thermal-emf.junctions", String.valueOf(b.junctions()));
            a.put("thermal-emf.seebeck", exact(b.seebeck(), Dimension.VOLTAGE_DRIFT));
            a.put("thermal-emf.gradient", exact(b.gradient(), Dimension.TEMPERATURE));
        }
        if (b.leakage()) {
            a.put("leakage.resistance", exact(b.leakageResistance(), Dimension.RESISTANCE));
            a.put("leakage.voltage", exact(b.leakageVoltage(), Dimension.VOLTAGE));
            a.put("leakage.input", b.leakageInput().key());
        }
        // operating point: written only when stated (absent: not counted)
        if (s.loadResistance() != null) {
            a.put("load-resistance", exact(s.loadResistance(), Dimension.RESISTANCE));
        }
        if (s.sampleRate() != null) {
            a.put("sample-rate", exact(s.sampleRate(), Dimension.FREQUENCY));
        }
        return a;
    }

    /**
     * The gain as the shortest number from which the loader derives exactly the stage's rg
     * (rg = rf/(gain - 1), inverting rf/gain), or null when none does; then rf and rg are written.
     */
    private static void gainOrRg(Map<String, String> a, double rf, double rg, boolean nonInverting) {
        String gain = gainText(rf, rg, nonInverting);
        if (gain != null) {
            a.put("gain", gain);
        } else {
            a.put("rg", exact(rg, Dimension.RESISTANCE));
        }
        a.put("rf", exact(rf, Dimension.RESISTANCE));
    }

    private static String gainText(double rf, double rg, boolean nonInverting) {
        double ratio = rf / rg;
        double gain = nonInverting ? 1.0 + ratio : ratio;
        BigDecimal exactGain = new BigDecimal(gain);
        for (int digits = 1; digits <= 17; digits++) {
            BigDecimal g = exactGain.round(new MathContext(digits));
            double back = g.doubleValue();
            double rgBack = nonInverting ? rf / (back - 1.0) : rf / back;
            if (Double.compare(rgBack, rg) == 0) {
                return digits <= 6
                        ? g.stripTrailingZeros().toPlainString()
                        : null; // a long gain reads worse than rf and rg
            }
        }
        return null;
    }

    private static final String[] PREFIX = {"f", "p", "n", "u", "m", "", "k", "M", "G", "T"};

    /** The shortest text with a unit that {@link Units#parse} reads back to exactly {@code v}. */
    static String exact(double v, Dimension d) {
        return switch (d) {
            case VOLTAGE -> engineering(v, d, "V");
            case CURRENT -> engineering(v, d, "A");
            case RESISTANCE -> engineering(v, d, "ohm");
            case CAPACITANCE -> engineering(v, d, "F");
            case VOLTAGE_DRIFT -> engineering(v, d, "V/C");
            case FREQUENCY -> engineering(v, d, "Hz");
            case TEMPERATURE -> plain(v) + " C";
            case RATIO -> exact(v, d, "%");
            case RATIO_DRIFT ->
                firstExact(v, d, List.of("ppm/C", "%/C"), plain(v) + " /C"); // a bare ratio per degree is exact
            case TIME -> firstExact(v, d, List.of("y", "h"), plain(v) + " s");
            default -> plain(v);
        };
    }

    /** A ratio in {@code unit} when that reads back exactly, else a bare ratio (always exact). */
    private static String exact(double v, Dimension d, String unit) {
        return firstExact(v, d, List.of(unit), plain(v));
    }

    private static String engineering(double v, Dimension d, String symbol) {
        if (v != 0) {
            int exp3 = (int) Math.floor(Math.log10(Math.abs(v)) / 3.0);
            exp3 = Math.max(-5, Math.min(4, exp3));
            // the prefixed form or the bare unit, whichever is shorter: "250 mV", but "0.1 Hz" rather than "100 mHz"
            String found = firstExact(v, d, List.of(PREFIX[exp3 + 5] + symbol, symbol), null);
            if (found != null) {
                return found;
            }
        }
        return plain(v) + " " + symbol; // factor 1: the shortest decimal of v reads back as v
    }

    /** Of the texts in {@code units} that read back exactly, the shortest; else {@code fallback}. */
    private static String firstExact(double v, Dimension d, List<String> units, String fallback) {
        String best = null;
        for (String unit : units) {
            double factor;
            try {
                factor = Units.parse("1 " + unit, d);
            } catch (UnitException e) {
                throw new IllegalStateException(unit, e);
            }
            BigDecimal scaled = new BigDecimal(v / factor);
            for (int digits = 1; digits <= 17; digits++) {
                String text = scaled.round(new MathContext(digits))
                                .stripTrailingZeros()
                                .toPlainString() + " " + unit;
                try {
                    if (Double.compare(Units.parse(text, d), v) == 0) {
                        if (best == null || text.length() < best.length()) {
                            best = text;
                        }
                        break;
                    }
                } catch (UnitException e) {
                    throw new IllegalStateException(text, e);
                }
            }
        }
        return best != null ? best : fallback;
    }

    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    // ------------------------------------------------------------------ saving

    /** Saves {@code s} as a commented stage file; see {@link #save(String, Path, boolean)}. */
    public static void save(Stage s, Path file, boolean overwrite) throws InputException {
        save(toYaml(s), file, overwrite);
    }

    /**
     * Saves stage text after checking that it loads. The text goes to a temporary file in the
     * same folder, which then takes the file's name in one step, so a crash never leaves half a
     * file. Without {@code overwrite} an existing file is left untouched and the call fails.
     *
     * @throws InputException when the text is not a valid stage, the file exists (and
     *                        {@code overwrite} is false), or it cannot be written
     */
    public static void save(String yaml, Path file, boolean overwrite) throws InputException {
        StageLoader.parse(yaml, file);
        if (Files.isDirectory(file.toAbsolutePath())) {
            throw new InputException(
                    Problem.error(Located.nowhere(file), "", "is a folder", "give a file name such as 'stage.yaml'"));
        }
        AtomicFiles.write(file, yaml, overwrite, "choose another file name, or ask explicitly to overwrite it");
    }
}
