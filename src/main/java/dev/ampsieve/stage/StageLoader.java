package dev.ampsieve.stage;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * Reads a stage file (keys in {@link StageKeys}) into a validated {@link Stage}. Every problem
 * in the file is collected and reported together as {@code file:line:col: field: problem; fix}.
 *
 * <p>Resistors: give {@code gain} (with {@code rf}, default 10 kohm, or with {@code rg}) or give
 * {@code rf} and {@code rg}. For a non-inverting stage {@code rg = rf/(gain - 1)}. For an
 * inverting stage {@code gain} is the resistor ratio {@code rf/rg} (a minus sign may be written
 * and is ignored); the signal gain is then {@code -rf/(rg + Rs)}, so a source resistance lowers it.
 * A follower has no {@code rg}; its {@code rf} (default 0) is an optional feedback resistor.
 */
public final class StageLoader {

    private StageLoader() {}

    // Values no circuit has. Each is refused with its reason (README, "The stage file"); they
    // also keep the budget's arithmetic finite.
    /** Largest gain (noise gain): the best op amps have about 1e8 open-loop gain, leaving under 40 dB of loop gain. */
    static final double MAX_GAIN = 1e6;
    /** Largest resistor: 1 Tohm, where board leakage decides the value. */
    static final double MAX_RESISTANCE = 1e12;
    /** Largest supply, and largest level measured against it: no op amp is built for more than about 1.2 kV. */
    static final double MAX_VOLTAGE = 2000;
    /** Largest error limit at the output. */
    static final double MAX_LIMIT = 1000;
    /** Smallest error limit at the output: 1 pV is far below a 1 ohm resistor's noise in 1 Hz (0.13 nV). */
    static final double MIN_LIMIT = 1e-12;
    /** Coldest and hottest ambient any circuit sees (liquid nitrogen is -196 °C; solder melts near 200 to 300 °C). */
    static final double MIN_AMBIENT = -200;

    static final double MAX_AMBIENT = 500;
    /** Longest service life: a century. */
    static final double MAX_LIFE = 100 * 365.25 * 86400;
    /** Highest band edge: 10 GHz, beyond the fastest op amp's gain-bandwidth. */
    static final double MAX_FREQUENCY = 10e9;
    /** Largest resistor-ratio tempco: 1 %/°C (10000 ppm/°C), ten times a carbon-composition resistor's. */
    static final double MAX_TEMPCO = 0.01;
    /** Largest price ceiling or trim cost: as the catalog's price limit. */
    static final double MAX_MONEY = 1e7;
    /**
     * Highest yield target, 99.9999 %: it prints as itself rather than as 100 %, and the largest
     * sample ({@link StageKeys#MAX_TRIALS}) can still show it when every unit passes.
     */
    static final double MAX_YIELD_TARGET = 0.999999;

    /** Reads and validates one stage file. */
    public static Stage load(Path file) throws InputException {
        return read(YamlFiles.read(file)).stage();
    }

    /** Validates stage text; {@code nameForMessages} only names it in messages (may be null). */
    public static Stage parse(String yaml, Path nameForMessages) throws InputException {
        return read(YamlFiles.parse(yaml, nameForMessages)).stage();
    }

    /**
     * A valid stage and the warnings about it: values that are allowed but probably not meant
     * (a gain above {@link #WARN_GAIN}, a limit no output error can reach, too few trials for the
     * yield target), each with its place, reason and fix.
     */
    public record Loaded(Stage stage, List<Problem> warnings) {
        public Loaded {
            warnings = List.copyOf(warnings);
        }
    }

    /** As {@link #load}, with the warnings. */
    public static Loaded loadWithWarnings(Path file) throws InputException {
        return read(YamlFiles.read(file));
    }

    /** As {@link #parse}, with the warnings. */
    public static Loaded parseWithWarnings(String yaml, Path nameForMessages) throws InputException {
        return read(YamlFiles.parse(yaml, nameForMessages));
    }

    /** Above this gain a warning (above {@link #MAX_GAIN} an error): loop gain runs short even with a good part. */
    static final double WARN_GAIN = 1e5;
    /** Most unpaired junctions a stage may name: beyond it the input path is a wiring harness, not a board. */
    static final int MAX_JUNCTIONS = 100;
    /** Largest thermoelectric coefficient: an oxidised copper contact reaches about 1 mV/°C (common practice). */
    static final double MAX_SEEBECK = 2e-3;
    /** Largest temperature difference across input junctions on one board. */
    static final double MAX_GRADIENT = 50.0;
    /** Largest shunt resistance of a transimpedance source: beyond it only the insulation decides. */
    static final double MAX_SHUNT = 1e15;
    /** Largest capacitance at a transimpedance input or in its feedback. */
    static final double MAX_CAPACITANCE = 1e-6;
    /** Below this load an op amp's output is shorted (common practice: precision outputs drive 1 to 10 kohm, power ones some ohms). */
    static final double MIN_LOAD = 1.0;

    /**
     * z of the two-sided 95 % interval the yield is reported with: the normal quantile at 0.975,
     * as {@code stats.Wilson.Z95} (the stage package may not depend on stats; a test keeps them equal).
     */
    static final double Z95 = 1.959963984540054;

    /**
     * The fewest trials whose sample can confirm a yield {@code target}: when all n units pass,
     * the Wilson (1927) score interval's lower end is n / (n + z²) (its centre
     * (1 + z²/2n)/(1 + z²/n) less its half-width (z²/2n)/(1 + z²/n)), which reaches the target
     * only for n ≥ target · z² / (1 − target).
     */
    static long trialsToConfirm(double target) {
        return (long) Math.ceil(target * Z95 * Z95 / (1 - target));
    }

    /** The example value of a stage key, for the fix of an error; null when the path is not a key. */
    private static String example(String path) {
        StageKeys.Key k = StageKeys.get(path);
        return k == null ? null : k.example();
    }

    /**
     * Checks one answer as the interactive shell collects it ({@code "temperature.min"},
     * {@code "-40 C"}): the problems with that key alone, without location. Checks between
     * keys (min above max, gain with rf and rg) happen when the whole stage is read.
     *
     * @throws IllegalArgumentException when {@code path} is not a stage key
     */
    public static List<Problem> checkAnswer(String path, String text) {
        if (StageKeys.get(path) == null) {
            throw new IllegalArgumentException("not a stage key: " + path);
        }
        // a neutral context in which the other required keys are present and valid
        java.util.Map<String, String> answers = new java.util.LinkedHashMap<>();
        answers.put(path, text);
        if (!List.of("gain", "rf", "rg", "topology").contains(path)) {
            answers.put("gain", "10");
        }
        if (!path.startsWith("limit")) {
            answers.put("limit", "1 V");
        }
        if (!path.equals("full-scale-output")) {
            answers.put("full-scale-output", "1 V");
        }
        try {
            parse(StageWriter.toYaml(answers), null);
            return List.of();
        } catch (InputException e) {
            List<Problem> mine = new ArrayList<>();
            for (Problem p : e.problems()) {
                if (p.field().equals(path) || p.field().startsWith(path + ".") || path.startsWith(p.field() + ".")) {
                    mine.add(p.at(null, 0, 0, path));
                }
            }
            return mine;
        }
    }

    private static Loaded read(Node root) throws InputException {
        if (root instanceof Node.Scalar s && s.text() == null) {
            throw new InputException(Problem.error(
                    root.at(), "", "the stage file is empty", "write at least 'gain: 100' and 'limit: 1 mV'"));
        }
        if (!(root instanceof Node.Mapping m)) {
            throw new InputException(Problem.error(
                    root.at(),
                    "",
                    "a stage file must be 'key: value' lines, found " + root.kind(),
                    "write at least 'gain: 100' and 'limit: 1 mV', one per line"));
        }
        Reader r = new Reader(new Fields(new ArrayList<>(), StageLoader::example));
        Stage stage = r.stage(m);
        List<Problem> problems = new ArrayList<>(r.f.problems());
        if (problems.stream().anyMatch(Problem::isError)) {
            problems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
            throw new InputException(problems);
        }
        problems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
        return new Loaded(stage, problems);
    }

    /** One pass over one file; holds the problem list. */
    private static final class Reader {
        private final Fields f;

        Reader(Fields f) {
            this.f = f;
        }

        Stage stage(Node.Mapping m) {
            f.onlyKeys(m, "", StageKeys.topLevel());

            String topologyText = f.choice(m, "", "topology", StageKeys.TOPOLOGIES);
            boolean topologyKnown = topologyText != null || !m.entries().containsKey("topology");
            Topology topology = topologyText == null ? Topology.NON_INVERTING : Topology.of(topologyText);

            Network network = topologyKnown ? network(m, topology) : new Follower(StageKeys.DEFAULT_RF, 0, 0);
            if (!topologyKnown) {
                topology = Topology.FOLLOWER; // keeps the derived values finite; the file is rejected anyway
            }

            Node.Mapping temp = section(m, "temperature");
            double tMin = StageKeys.DEFAULT_T_MIN;
            double tMax = StageKeys.DEFAULT_T_MAX;
            if (temp != null) {
                tMin = ambient(temp, "min", temperature(temp, "min", tMin));
                tMax = ambient(temp, "max", temperature(temp, "max", tMax));
                if (tMin > tMax) {
                    f.error(
                            Fields.where(temp, "min"),
                            "temperature",
                            new StageFact.Order(
                                    StageFact.Ends.MIN_MAX,
                                    new Quantity(tMin, Dimension.TEMPERATURE),
                                    new Quantity(tMax, Dimension.TEMPERATURE)));
                }
            }

            Double supplyVoltage = null;
            double supplyVariation = 0.0;
            Node.Mapping supply = section(m, "supply");
            if (supply != null) {
                supplyVoltage = positive(supply, "supply", "voltage", Dimension.VOLTAGE);
                supplyVariation = nonNegative(supply, "supply", "variation", Dimension.VOLTAGE, 0.0);
                volts(supply, "supply", "voltage", supplyVoltage);
                if (supplyVoltage != null && supplyVariation >= supplyVoltage) {
                    f.error(
                            Fields.where(supply, "variation"),
                            "supply.variation",
                            new StageFact.SupplyVariation(supplyVariation, supplyVoltage, supplyVoltage * 0.05));
                }
            }

            Double fullScale = positive(m, "", "full-scale-output", Dimension.VOLTAGE);
            volts(m, "", "full-scale-output", fullScale);

            Double swing = nonNegativeOrNull(m, "", "common-mode-swing", Dimension.VOLTAGE);
            volts(m, "", "common-mode-swing", swing);
            double commonModeSwing = swing != null ? swing : defaultSwing(network, fullScale);

            Range cmRange = range(m, "common-mode-range", null);
            Range outRange = range(m, "output-range", supplyVoltage);

            double bandLow = StageKeys.DEFAULT_BAND_LOW;
            double bandHigh = StageKeys.DEFAULT_BAND_HIGH;
            Integer filterOrder = null;
            Node.Mapping band = section(m, "band");
            if (band != null) {
                filterOrder = filterOrder(band);
                Double lo = f.quantity(band, "band", "low", Dimension.FREQUENCY);
                Double hi = f.quantity(band, "band", "high", Dimension.FREQUENCY);
                for (String side : List.of("low", "high")) {
                    Double v = side.equals("low") ? lo : hi;
                    if (v != null && v > MAX_FREQUENCY) {
                        f.error(
                                Fields.where(band, side),
                                "band." + side,
                                beyond(StageFact.Bound.BAND_EDGE, v, MAX_FREQUENCY, Dimension.FREQUENCY, ""));
                    }
                }
                if (lo != null && lo <= 0) {
                    f.error(
                            Fields.where(band, "low"),
                            "band.low",
                            "the band must start above 0 Hz: 1/f noise grows without bound toward DC",
                            "write 'low: 0.1 Hz' (a common choice for DC stages: about a 10 s observation)");
                } else if (lo != null) {
                    bandLow = lo;
                }
                if (hi != null && hi <= 0) {
                    f.error(
                            Fields.where(band, "high"),
                            "band.high",
                            "must be more than 0 Hz",
                            "write 'high: 10 Hz' or the top signal frequency");
                } else if (hi != null) {
                    bandHigh = hi;
                }
                if (lo != null && hi != null && lo > 0 && hi > 0 && lo >= hi) {
                    f.error(
                            Fields.where(band, "low"),
                            "band",
                            new StageFact.Order(
                                    StageFact.Ends.LOW_HIGH,
                                    new Quantity(lo, Dimension.FREQUENCY),
                                    new Quantity(hi, Dimension.FREQUENCY)));
                }
            }

            double tolerance = 0.0;
            double tempco = 0.0;
            Node.Mapping ratio = section(m, "resistor-ratio");
            if (ratio != null) {
                tolerance = nonNegative(ratio, "resistor-ratio", "tolerance", Dimension.RATIO, 0.0);
                if (tolerance >= 1.0) {
                    f.error(
                            Fields.where(ratio, "tolerance"),
                            "resistor-ratio.tolerance",
                            new StageFact.RatioTolerance(tolerance));
                }
                tempco = nonNegative(ratio, "resistor-ratio", "tempco", Dimension.RATIO_DRIFT, 0.0);
                if (tempco > MAX_TEMPCO) {
                    f.error(
                            Fields.where(ratio, "tempco"),
                            "resistor-ratio.tempco",
                            beyond(StageFact.Bound.RATIO_TEMPCO, tempco, MAX_TEMPCO, Dimension.RATIO_DRIFT, ""));
                }
            }

            double life = nonNegative(m, "", "service-life", Dimension.TIME, 0.0);
            if (life > MAX_LIFE) {
                f.error(
                        Fields.where(m, "service-life"),
                        "service-life",
                        beyond(StageFact.Bound.SERVICE_LIFE, life, MAX_LIFE, Dimension.TIME, ""));
            }
            Limit limit = limit(m, fullScale, topology);
            Criterion criterion = criterion(m);

            double maxToSigma = StageKeys.DEFAULT_MAX_TO_SIGMA;
            Double k = f.number(m, "", "max-to-sigma");
            if (k != null && (k < 1 || k > 10)) {
                f.error(
                        Fields.where(m, "max-to-sigma"),
                        "max-to-sigma",
                        new StageFact.Outside(StageFact.Rule.MAX_TO_SIGMA, k, 1, 10));
            } else if (k != null) {
                maxToSigma = k;
            }
            Integer trials = f.integer(m, "", "trials", StageKeys.MIN_TRIALS, StageKeys.MAX_TRIALS);
            Integer maxTrials = f.integer(m, "", "max-trials", StageKeys.MIN_TRIALS, StageKeys.MAX_TRIALS);
            int n = trials != null ? trials : StageKeys.DEFAULT_TRIALS;
            int cap = maxTrials != null ? maxTrials : Math.max(n, StageKeys.DEFAULT_MAX_TRIALS);
            if (maxTrials != null && maxTrials < n) {
                // the cap on an undecided yield cannot stop the run before the units it always simulates
                f.error(
                        Fields.where(m, "max-trials"),
                        "max-trials",
                        new StageFact.Outside(StageFact.Rule.MAX_TRIALS, maxTrials, n, Double.NaN));
            }
            Long seed = f.longValue(m, "", "seed");
            Trim trim = trim(m, tMin, tMax);
            Integer quantity = f.integer(m, "", "quantity", 1, StageKeys.MAX_QUANTITY);
            Double maxPrice = positive(m, "", "max-price", Dimension.NUMBER);
            money(m, "", "max-price", maxPrice);
            Boolean ac = f.bool(m, "", "ac-coupled");
            Board board = board(m, network.topology());
            // operating point: the output's load (self-heating) and the converter sampling the output (aliases)
            Double loadResistance = positive(m, "", "load-resistance", Dimension.RESISTANCE);
            if (loadResistance != null && loadResistance < MIN_LOAD) {
                f.error(
                        Fields.where(m, "load-resistance"),
                        "load-resistance",
                        beyond(StageFact.Bound.LOAD_SHORT, loadResistance, MIN_LOAD, Dimension.RESISTANCE, ""));
                loadResistance = null;
            } else if (loadResistance != null && loadResistance > MAX_RESISTANCE) {
                f.error(
                        Fields.where(m, "load-resistance"),
                        "load-resistance",
                        beyond(StageFact.Bound.LOAD_OPEN, loadResistance, MAX_RESISTANCE, Dimension.RESISTANCE, ""));
                loadResistance = null;
            }
            Double sampleRate = positive(m, "", "sample-rate", Dimension.FREQUENCY);
            if (sampleRate != null && sampleRate > MAX_FREQUENCY) {
                f.error(
                        Fields.where(m, "sample-rate"),
                        "sample-rate",
                        beyond(StageFact.Bound.SAMPLE_RATE, sampleRate, MAX_FREQUENCY, Dimension.FREQUENCY, ""));
                sampleRate = null;
            }

            Stage stage = new Stage(
                    network,
                    tMin,
                    tMax,
                    supplyVoltage,
                    supplyVariation,
                    commonModeSwing,
                    cmRange,
                    outRange,
                    bandLow,
                    bandHigh,
                    filterOrder,
                    fullScale,
                    tolerance,
                    tempco,
                    life,
                    limit,
                    criterion,
                    maxToSigma,
                    n,
                    cap,
                    seed != null ? seed : StageKeys.DEFAULT_SEED,
                    trim,
                    quantity != null ? quantity : StageKeys.DEFAULT_QUANTITY,
                    maxPrice,
                    ac != null && ac,
                    loadResistance,
                    sampleRate,
                    board,
                    m.at());
            if (limit != null && !f.hasErrors()) {
                limitSize(m, stage);
            }
            if (!f.hasErrors()) {
                sanity(m, stage);
            }
            return stage;
        }

        /** Warnings about a valid stage whose values are allowed but probably not what was meant. */
        private void sanity(Node.Mapping m, Stage stage) {
            // the loop gain left is what a large gain costs: the noise gain (inverting: the ratio rf/rg is what the
            // file says)
            double ratio = stage.topology() == Topology.INVERTING ? stage.noiseGain() - 1.0 : stage.noiseGain();
            if (ratio > WARN_GAIN) {
                String where = present(m, "gain") ? "gain" : "rf";
                f.warning(
                        Fields.where(m, where),
                        where.equals("gain") ? "gain" : "rf",
                        new StageFact.HighGain(ratio, WARN_GAIN, stage.noiseGain()));
            }
            double limit = stage.limitVolts();
            Located limitAt = Fields.where(m, "limit");
            if (stage.supplyVoltage() != null && limit >= stage.supplyVoltage()) {
                f.warning(
                        limitAt,
                        "limit",
                        beyond(StageFact.Bound.LIMIT_OVER_SUPPLY, limit, stage.supplyVoltage(), Dimension.VOLTAGE, ""));
            } else if (stage.fullScaleOutput() != null && limit >= stage.fullScaleOutput()) {
                f.warning(
                        limitAt,
                        "limit",
                        beyond(
                                StageFact.Bound.LIMIT_OVER_FULL_SCALE,
                                limit,
                                stage.fullScaleOutput(),
                                Dimension.VOLTAGE,
                                ""));
            }
            Criterion c = stage.criterion();
            if (c != null && c.kind() == Criterion.Kind.YIELD) {
                long needed = trialsToConfirm(c.yieldTarget());
                if (stage.trials() < needed && needed <= StageKeys.MAX_TRIALS) {
                    Located at = present(m, "trials") ? Fields.where(m, "trials") : Fields.where(m, "criterion");
                    f.warning(
                            at,
                            present(m, "trials") ? "trials" : "criterion",
                            new StageFact.TooFewTrials(
                                    stage.trials(),
                                    c.yieldTarget(),
                                    stage.trials() / (stage.trials() + Z95 * Z95),
                                    needed,
                                    StageKeys.MAX_TRIALS));
                }
            }
        }

        /**
         * The limit at the output, whatever its form, between {@link #MIN_LIMIT} and {@link #MAX_LIMIT}
         * (checked once the gain and full scale it depends on are known to be valid).
         */
        private void limitSize(Node.Mapping m, Stage stage) {
            double out = stage.limitVolts();
            Node v = m.entries().get("limit");
            Located at = v == null ? m.at() : v.at();
            Dimension written = switch (stage.limit().kind()) {
                case LSB, PERCENT_OF_FULL_SCALE -> Dimension.NUMBER;
                case INPUT_CURRENT -> Dimension.CURRENT;
                case OUTPUT, INPUT -> Dimension.VOLTAGE;
            };
            if (out > MAX_LIMIT) {
                f.error(
                        at,
                        "limit",
                        new StageFact.LimitTooLarge(
                                new Quantity(stage.limit().value(), written),
                                stage.limit().kind() == Limit.Kind.OUTPUT,
                                out,
                                MAX_LIMIT));
            } else if (out < MIN_LIMIT) {
                f.error(at, "limit", beyond(StageFact.Bound.LIMIT_TINY, out, MIN_LIMIT, Dimension.VOLTAGE, ""));
            }
        }

        /** Error when {@code ohms} is above {@link #MAX_RESISTANCE}; returns it. */
        private double resistance(Node.Mapping m, String key, double ohms) {
            if (ohms > MAX_RESISTANCE) {
                f.error(
                        Fields.where(m, key),
                        key,
                        beyond(
                                StageFact.Bound.RESISTOR,
                                ohms,
                                MAX_RESISTANCE,
                                Dimension.RESISTANCE,
                                exampleFor("", key, Dimension.RESISTANCE)));
            }
            return ohms;
        }

        /** Error when {@code v} is above {@link #MAX_VOLTAGE}. */
        private void volts(Node.Mapping m, String path, String key, Double v) {
            if (v != null && v > MAX_VOLTAGE) {
                f.error(
                        Fields.where(m, key),
                        Fields.join(path, key),
                        beyond(
                                StageFact.Bound.VOLTAGE,
                                v,
                                MAX_VOLTAGE,
                                Dimension.VOLTAGE,
                                exampleFor(path, key, Dimension.VOLTAGE)));
            }
        }

        /** Error when {@code v} is above {@link #MAX_MONEY}. */
        private void money(Node.Mapping m, String path, String key, Double v) {
            if (v != null && v > MAX_MONEY) {
                f.error(
                        Fields.where(m, key),
                        Fields.join(path, key),
                        beyond(
                                StageFact.Bound.MONEY,
                                v,
                                MAX_MONEY,
                                Dimension.NUMBER,
                                exampleFor(path, key, Dimension.NUMBER)));
            }
        }

        /** {@code t}, with an error when it is outside {@link #MIN_AMBIENT}..{@link #MAX_AMBIENT}. */
        private double ambient(Node.Mapping temp, String key, double t) {
            if (t < MIN_AMBIENT || t > MAX_AMBIENT) {
                f.error(
                        Fields.where(temp, key),
                        "temperature." + key,
                        new StageFact.Ambient(
                                t,
                                MIN_AMBIENT,
                                MAX_AMBIENT,
                                false,
                                exampleFor("temperature", key, Dimension.TEMPERATURE)));
            }
            return t;
        }

        // ------------------------------------------------------------ resistors and gain

        /** The keys that belong to one topology only, with the topology they belong to. */
        private static final Map<String, Topology> OWN_KEYS = ownKeys();

        private static Map<String, Topology> ownKeys() {
            Map<String, Topology> k = new java.util.LinkedHashMap<>();
            for (String key : List.of("r1", "r2", "r3", "r4")) {
                k.put(key, Topology.DIFFERENCE);
            }
            k.put("cf", Topology.TRANSIMPEDANCE);
            k.put("source-capacitance", Topology.TRANSIMPEDANCE);
            return k;
        }

        /** The network of {@code topology} from the file's resistor keys. */
        private Network network(Node.Mapping m, Topology topology) {
            for (Map.Entry<String, Topology> e : OWN_KEYS.entrySet()) {
                if (e.getValue() != topology && present(m, e.getKey())) {
                    f.error(
                            Fields.where(m, e.getKey()),
                            e.getKey(),
                            "'" + e.getKey() + "' belongs to a " + e.getValue().key() + " stage, and this one is "
                                    + topology.key(),
                            "remove it, or write 'topology: " + e.getValue().key() + "'");
                }
            }
            if (topology != Topology.DIFFERENCE && m.entries().get("source-resistance") instanceof Node.Mapping) {
                f.error(
                        Fields.where(m, "source-resistance"),
                        "source-resistance",
                        "a source resistance per leg ({minus, plus})" + " belongs to a difference stage",
                        "write one value, such as 'source-resistance: 350 ohm'");
                return new Follower(StageKeys.DEFAULT_RF, 0, 0);
            }
            return switch (topology) {
                case NON_INVERTING, INVERTING, FOLLOWER -> {
                    double rs = resistance(
                            m, "source-resistance", nonNegative(m, "", "source-resistance", Dimension.RESISTANCE, 0.0));
                    double rp = resistance(
                            m,
                            "balance-resistance",
                            nonNegative(m, "", "balance-resistance", Dimension.RESISTANCE, 0.0));
                    double[] rfRg = resistors(m, topology);
                    yield switch (topology) {
                        case NON_INVERTING -> new NonInverting(rfRg[0], rfRg[1], rs, rp);
                        case INVERTING -> new Inverting(rfRg[0], rfRg[1], rs, rp);
                        default -> new Follower(rfRg[0], rs, rp);
                    };
                }
                case DIFFERENCE -> difference(m);
                case TRANSIMPEDANCE -> transimpedance(m);
            };
        }

        /** An optional resistor key: null when absent, an error (and null) when 0 or negative or absurd. */
        private Double resistor(Node.Mapping m, String key) {
            if (!present(m, key)) {
                return null;
            }
            Double v = positive(m, "", key, Dimension.RESISTANCE);
            return v == null ? null : resistance(m, key, v);
        }

        /**
         * r1..r4 from 'gain' with r2 (or r1), or from r1 and r2; r3 and r4 default to r1 and r2 (a
         * matched design); the source resistance as one value for both legs or {minus, plus}.
         */
        private Network difference(Node.Mapping m) {
            Network bad = new Difference(1e3, 1e3, 1e3, 1e3, 0, 0);
            for (String key : List.of("rf", "rg", "balance-resistance")) {
                if (present(m, key)) {
                    f.error(
                            Fields.where(m, key),
                            key,
                            "a difference stage has r1, r2 (inverting side) and r3, r4 (non-inverting" + " side), not '"
                                    + key + "'",
                            key.equals("rf")
                                    ? "write 'r2' for the feedback resistor"
                                    : key.equals("rg")
                                            ? "write 'r1' for the input resistor"
                                            : "remove it: r4 returns the + input to the reference");
                }
            }
            Double gain = present(m, "gain") ? gain(m) : null;
            Double r1 = resistor(m, "r1");
            Double r2 = resistor(m, "r2");
            Double r3 = resistor(m, "r3");
            Double r4 = resistor(m, "r4");
            double[] legs = legs(m);
            if (f.hasErrors()) {
                return bad;
            }
            double g;
            if (gain != null) {
                g = Math.abs(gain);
                if (r1 != null && r2 != null) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            "'gain', 'r1' and 'r2' are all given and may disagree",
                            "give 'gain' with 'r2' (or with 'r1'), or 'r1' and 'r2' without 'gain'");
                    return bad;
                }
                if (!(g > 0) || g > MAX_GAIN) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            new StageFact.Outside(StageFact.Rule.DIFFERENCE_GAIN, g, 0, MAX_GAIN));
                    return bad;
                }
                if (r2 == null) {
                    r2 = r1 != null ? r1 * g : StageKeys.DEFAULT_RF;
                }
                if (r1 == null) {
                    r1 = r2 / g;
                }
            } else if (r1 == null || r2 == null) {
                Located at = r1 != null ? Fields.where(m, "r1") : r2 != null ? Fields.where(m, "r2") : m.at();
                f.error(
                        at,
                        "gain",
                        "the gain is not given",
                        "add 'gain: 10' (with 'r2', default 10 kohm), or both 'r1' and 'r2'");
                return bad;
            } else if (!(r2 / r1 <= MAX_GAIN)) {
                f.error(
                        Fields.where(m, "r1"),
                        "r1",
                        beyond(StageFact.Bound.R2_R1_GAIN, r2 / r1, MAX_GAIN, Dimension.NUMBER, ""));
                return bad;
            }
            if ((r3 == null) != (r4 == null)) {
                String given = r3 != null ? "r3" : "r4";
                f.error(
                        Fields.where(m, given),
                        given,
                        "only one of r3 and r4 is given",
                        "give both, or neither (then r3 = r1 and r4 = r2, the matched design)");
                return bad;
            }
            if (r3 == null) {
                r3 = r1;
                r4 = r2;
            }
            return new Difference(r1, r2, r3, r4, legs[0], legs[1]);
        }

        /** {Rs-, Rs+}: 'source-resistance' as one value (both legs) or as {minus, plus}; 0 when absent. */
        private double[] legs(Node.Mapping m) {
            Node v = m.entries().get("source-resistance");
            if (!(v instanceof Node.Mapping sm)) {
                double rs = resistance(
                        m, "source-resistance", nonNegative(m, "", "source-resistance", Dimension.RESISTANCE, 0.0));
                return new double[] {rs, rs};
            }
            f.onlyKeys(sm, "source-resistance", StageKeys.inside("source-resistance"));
            double[] out = new double[2];
            int i = 0;
            for (String leg : List.of("minus", "plus")) {
                if (!present(sm, leg)) {
                    f.error(
                            sm.at(),
                            "source-resistance." + leg,
                            "missing: per-leg source resistances need both legs",
                            "add '" + leg + ": 350 ohm' (the resistance of the leg driving "
                                    + (leg.equals("minus") ? "r1" : "r3") + ")");
                }
                double r = nonNegative(sm, "source-resistance", leg, Dimension.RESISTANCE, 0.0);
                if (r > MAX_RESISTANCE) {
                    f.error(
                            Fields.where(sm, leg),
                            "source-resistance." + leg,
                            beyond(StageFact.Bound.LEG_RESISTOR, r, MAX_RESISTANCE, Dimension.RESISTANCE, ""));
                }
                out[i++] = r;
            }
            return out;
        }

        /** rf, cf, the source's shunt resistance and capacitance (both required: neither has a default that would not flatter). */
        private Network transimpedance(Node.Mapping m) {
            Network bad = new Transimpedance(1e6, 0, 1e9, 0, 0);
            for (String key : List.of("gain", "rg")) {
                if (present(m, key)) {
                    f.error(
                            Fields.where(m, key),
                            key,
                            "a transimpedance stage's gain is rf itself, in volts per ampere",
                            "remove '" + key + "'; write 'rf: 1 Mohm'");
                }
            }
            Double rf = resistor(m, "rf");
            if (rf == null && !present(m, "rf")) {
                f.error(
                        m.at(),
                        "rf",
                        "required for a transimpedance stage: the output is the source current times rf",
                        "add 'rf: 1 Mohm'");
            }
            double cf = nonNegative(m, "", "cf", Dimension.CAPACITANCE, 0.0);
            Double rsh =
                    present(m, "source-resistance") ? positive(m, "", "source-resistance", Dimension.RESISTANCE) : null;
            if (!present(m, "source-resistance")) {
                f.error(
                        m.at(),
                        "source-resistance",
                        "required for a transimpedance stage: the source's shunt resistance sets the"
                                + " DC noise gain 1 + rf/source-resistance",
                        "add 'source-resistance: 1 Gohm' (a photodiode's shunt"
                                + " resistance at the hottest temperature; a current source: a large value such as 100 Gohm)");
            }
            Double cs = present(m, "source-capacitance")
                    ? nonNegativeOrNull(m, "", "source-capacitance", Dimension.CAPACITANCE)
                    : null;
            if (!present(m, "source-capacitance")) {
                f.error(
                        m.at(),
                        "source-capacitance",
                        "required for a transimpedance stage: the source's capacitance raises the"
                                + " noise gain above its zero and decides stability",
                        "add 'source-capacitance: 50 pF' (the photodiode's"
                                + " junction capacitance at its bias, plus the wiring)");
            }
            double rp = resistance(
                    m, "balance-resistance", nonNegative(m, "", "balance-resistance", Dimension.RESISTANCE, 0.0));
            if (rf == null || rsh == null || cs == null) {
                return bad;
            }
            if (rsh > MAX_SHUNT) {
                f.error(
                        Fields.where(m, "source-resistance"),
                        "source-resistance",
                        beyond(StageFact.Bound.SHUNT, rsh, MAX_SHUNT, Dimension.RESISTANCE, ""));
                return bad;
            }
            if (cs > MAX_CAPACITANCE || cf > MAX_CAPACITANCE) {
                String key = cs > MAX_CAPACITANCE ? "source-capacitance" : "cf";
                f.error(
                        Fields.where(m, key),
                        key,
                        beyond(
                                StageFact.Bound.CAPACITANCE,
                                Math.max(cs, cf),
                                MAX_CAPACITANCE,
                                Dimension.CAPACITANCE,
                                ""));
                return bad;
            }
            return new Transimpedance(rf, cf, rsh, cs, rp);
        }

        /** {rf, rg} from gain / rf / rg, by topology; follower rg is infinite. */
        private double[] resistors(Node.Mapping m, Topology topology) {
            boolean hasGain = present(m, "gain");
            boolean hasRf = present(m, "rf");
            boolean hasRg = present(m, "rg");
            Double gain = hasGain ? gain(m) : null;
            Double rf = hasRf ? nonNegativeOrNull(m, "", "rf", Dimension.RESISTANCE) : null;
            Double rg = hasRg ? nonNegativeOrNull(m, "", "rg", Dimension.RESISTANCE) : null;
            double bad = StageKeys.DEFAULT_RF; // placeholder for values the file gets wrong; never returned on success
            if (rf != null) {
                resistance(m, "rf", rf);
            }
            if (rg != null) {
                resistance(m, "rg", rg);
            }
            if (gain != null && !(Math.abs(gain) <= MAX_GAIN)) {
                f.error(
                        Fields.where(m, "gain"),
                        "gain",
                        beyond(StageFact.Bound.GAIN, Math.abs(gain), MAX_GAIN, Dimension.NUMBER, ""));
                return new double[] {bad, bad};
            }

            if (topology == Topology.FOLLOWER) {
                if (hasRg) {
                    f.error(
                            Fields.where(m, "rg"),
                            "rg",
                            "a follower has no gain resistor",
                            "remove 'rg', or write 'topology: non-inverting'");
                }
                if (gain != null && gain != 1.0) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            new StageFact.Outside(StageFact.Rule.FOLLOWER_GAIN, gain, 1, 1));
                }
                return new double[] {rf != null ? rf : 0.0, Double.POSITIVE_INFINITY};
            }

            if (hasGain && hasRf && hasRg) {
                f.error(
                        Fields.where(m, "gain"),
                        "gain",
                        "'gain', 'rf' and 'rg' are all given and may disagree",
                        "give 'gain' with 'rf' (or with 'rg'), or give 'rf' and 'rg' without 'gain'");
                return new double[] {bad, bad};
            }
            if (rf != null && rf == 0) {
                f.error(
                        Fields.where(m, "rf"),
                        "rf",
                        "0 ohm feedback leaves no gain",
                        topology == Topology.NON_INVERTING
                                ? "write the feedback resistor, or 'topology: follower' for unity gain"
                                : "write the feedback resistor, such as '10 kohm'");
            }
            if (rg != null && rg == 0) {
                f.error(
                        Fields.where(m, "rg"),
                        "rg",
                        "0 ohm gives an infinite gain",
                        "write the gain resistor, such as '1 kohm'");
            }
            if (!hasGain) {
                if (hasRf && hasRg) {
                    if (rf == null || rg == null || rf == 0 || rg == 0) {
                        return new double[] {bad, bad};
                    }
                    if (!(rf / rg <= MAX_GAIN)) {
                        f.error(
                                Fields.where(m, "rg"),
                                "rg",
                                beyond(StageFact.Bound.RF_RG_GAIN, rf / rg, MAX_GAIN, Dimension.NUMBER, ""));
                        return new double[] {bad, bad};
                    }
                    return new double[] {rf, rg};
                }
                Located at = hasRf ? Fields.where(m, "rf") : hasRg ? Fields.where(m, "rg") : m.at();
                f.error(
                        at,
                        "gain",
                        "the gain is not given",
                        hasRf || hasRg
                                ? "add 'gain: 100', or give both 'rf' and 'rg'"
                                : "add 'gain: 100' (with 'rf', default 10 kohm), or 'rf' and 'rg'");
                return new double[] {bad, bad};
            }
            if (gain == null) {
                return new double[] {bad, bad};
            }
            // ratio = rf/rg that gives the asked gain
            double ratio;
            if (topology == Topology.NON_INVERTING) {
                if (gain < 1.0) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            new StageFact.Outside(StageFact.Rule.NON_INVERTING_GAIN, gain, 1, Double.NaN));
                    return new double[] {bad, bad};
                }
                if (gain == 1.0) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            "gain 1 needs no gain resistor (rg would be infinite)",
                            "write 'topology: follower'");
                    return new double[] {bad, bad};
                }
                ratio = gain - 1.0;
            } else {
                ratio = Math.abs(gain);
                if (ratio == 0.0) {
                    f.error(
                            Fields.where(m, "gain"),
                            "gain",
                            "gain 0 is no amplifier",
                            "write the resistor ratio rf/rg, such as 10");
                    return new double[] {bad, bad};
                }
            }
            if (hasRg) {
                return rg == null || rg == 0 ? new double[] {bad, bad} : new double[] {rg * ratio, rg};
            }
            double rfValue = hasRf ? (rf == null || rf == 0 ? bad : rf) : StageKeys.DEFAULT_RF;
            return new double[] {rfValue, rfValue / ratio};
        }

        private static final Pattern DECIBELS = Pattern.compile("(?i).*\\d\\s*db$");

        /** A plain number, "100 V/V", or decibels ("40 dB" = 100). */
        private Double gain(Node.Mapping m) {
            String text = f.text(m, "", "gain");
            if (text == null) {
                return null;
            }
            String t = text.strip();
            try {
                if (DECIBELS.matcher(t).matches()) {
                    double db = Units.parse(t.substring(0, t.length() - 2) + "dB", Dimension.DECIBEL);
                    return Math.pow(10.0, db / 20.0); // voltage gain from decibels: 20 log10
                }
                if (t.endsWith("V/V")) {
                    t = t.substring(0, t.length() - 3);
                }
                return Units.parse(t, Dimension.NUMBER);
            } catch (UnitException e) {
                f.error(
                        Fields.where(m, "gain"),
                        "gain",
                        "'" + text + "' is not a gain",
                        "write a plain number such as '100', or decibels such as '40 dB'");
                return null;
            }
        }

        /** band.filter-order: "none" is {@link Stage#NO_FILTER}, else a whole number 1..{@link Stage#MAX_FILTER_ORDER}; null when absent. */
        private Integer filterOrder(Node.Mapping band) {
            String text = f.text(band, "band", "filter-order");
            if (text == null) {
                return null;
            }
            String t = text.strip().toLowerCase(Locale.ROOT);
            if (t.equals("none")) {
                return Stage.NO_FILTER;
            }
            try {
                int n = Integer.parseInt(t);
                if (n >= 1 && n <= Stage.MAX_FILTER_ORDER) {
                    return n;
                }
            } catch (NumberFormatException e) {
                // reported below
            }
            f.error(
                    Fields.where(band, "filter-order"),
                    "band.filter-order",
                    "'" + text + "' is not a filter order",
                    "write 'none' when no filter after the amplifier limits the band, or the filter's order, 1 to "
                            + Stage.MAX_FILTER_ORDER + " (an RC is 1)");
            return null;
        }

        /** non-inverting: the full-scale input; follower: the full-scale output; inverting: 0 (virtual ground). */
        /**
         * The common-mode change when the stage names none: what the signal itself moves. A follower's
         * input is the signal; a non-inverting input moves by the output over the gain; an inverting
         * or transimpedance input sits at the reference. A difference amplifier's common mode is at the
         * source: half the differential full scale, as when one leg is held (a bridge moves both legs
         * and less, so this does not flatter it).
         */
        private static double defaultSwing(Network network, Double fullScale) {
            if (fullScale == null) {
                return 0.0;
            }
            return switch (network.topology()) {
                case FOLLOWER -> fullScale;
                case NON_INVERTING -> fullScale / network.noiseGain();
                case INVERTING, TRANSIMPEDANCE -> 0.0;
                case DIFFERENCE -> fullScale / (2.0 * network.signalGain());
            };
        }

        // ------------------------------------------------------------ limit and criterion

        private Limit limit(Node.Mapping m, Double fullScale, Topology topology) {
            Node v = m.entries().get("limit");
            if (v == null || v instanceof Node.Scalar s && s.text() == null) {
                f.error(
                        v != null ? v.at() : m.at(),
                        "limit",
                        "required field is missing: the error limit decides which parts fit",
                        "add 'limit: 1 mV' (at the output), or 'limit: {input: 10 uV}', '{percent-of-full-scale: 0.1 %}', "
                                + "'{lsb: 0.5, bits: 16, reference: 2.5 V}'");
                return null;
            }
            if (v instanceof Node.Scalar) {
                Double volts = positive(m, "", "limit", Dimension.VOLTAGE);
                return volts == null ? null : Limit.output(volts);
            }
            Node.Mapping lm = f.mapping(v, "limit");
            if (lm == null) {
                return null;
            }
            f.onlyKeys(lm, "limit", StageKeys.inside("limit"));
            List<String> forms = new ArrayList<>();
            if (present(lm, "input")) {
                forms.add("input");
            }
            if (present(lm, "input-current")) {
                forms.add("input-current");
            }
            if (present(lm, "percent-of-full-scale")) {
                forms.add("percent-of-full-scale");
            }
            if (present(lm, "lsb") || present(lm, "bits") || present(lm, "reference")) {
                forms.add("lsb");
            }
            if (forms.isEmpty()) {
                f.error(
                        lm.at(),
                        "limit",
                        "no limit given in this block",
                        "write 'input: 10 uV', 'percent-of-full-scale: 0.1 %', or 'lsb: 0.5', 'bits: 16', 'reference: 2.5 V'");
                return null;
            }
            if (forms.size() > 1) {
                f.error(
                        lm.at(),
                        "limit",
                        "more than one form of limit given (" + String.join(", ", forms) + ")",
                        "keep one of them");
                return null;
            }
            boolean currentIn = topology == Topology.TRANSIMPEDANCE;
            if (forms.get(0).equals("input") && currentIn) {
                f.error(
                        Fields.where(lm, "input"),
                        "limit.input",
                        "a transimpedance stage's input is a current",
                        "write 'input-current: 1 nA' (multiplied by rf), or the limit at the output");
                return null;
            }
            if (forms.get(0).equals("input-current") && !currentIn) {
                f.error(
                        Fields.where(lm, "input-current"),
                        "limit.input-current",
                        "only a transimpedance stage has a current input",
                        "write 'input: 10 uV' (at the signal source), or 'topology: transimpedance'");
                return null;
            }
            switch (forms.get(0)) {
                case "input-current": {
                    Double amps = positive(lm, "limit", "input-current", Dimension.CURRENT);
                    return amps == null ? null : new Limit(Limit.Kind.INPUT_CURRENT, amps, 0, 0);
                }
                case "input": {
                    Double volts = positive(lm, "limit", "input", Dimension.VOLTAGE);
                    return volts == null ? null : new Limit(Limit.Kind.INPUT, volts, 0, 0);
                }
                case "percent-of-full-scale": {
                    Double share = percent(lm);
                    if (share != null && fullScale == null) {
                        f.error(
                                Fields.where(lm, "percent-of-full-scale"),
                                "limit.percent-of-full-scale",
                                "a share of full scale needs the full-scale output",
                                "add 'full-scale-output: 2.5 V', or give the limit in volts");
                        return null;
                    }
                    return share == null ? null : new Limit(Limit.Kind.PERCENT_OF_FULL_SCALE, share, 0, 0);
                }
                default: {
                    boolean ok = true;
                    for (String key : List.of("lsb", "bits", "reference")) {
                        if (!present(lm, key)) {
                            f.error(
                                    lm.at(),
                                    "limit." + key,
                                    "missing: an LSB limit needs lsb, bits and reference",
                                    "add '" + key + ": "
                                            + StageKeys.get("limit." + key).example() + "'");
                            ok = false;
                        }
                    }
                    Double lsb = positive(lm, "limit", "lsb", Dimension.NUMBER);
                    Integer bits = f.integer(lm, "limit", "bits", 1, 32);
                    Double ref = positive(lm, "limit", "reference", Dimension.VOLTAGE);
                    if (!ok || lsb == null || bits == null || ref == null) {
                        return null;
                    }
                    return new Limit(Limit.Kind.LSB, lsb, bits, ref);
                }
            }
        }

        private static final Pattern BARE_NUMBER =
                Pattern.compile("\\s*[-+]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][-+]?\\d+)?\\s*");

        /** The key says percent, so a bare number is read as percent ("0.1" = 0.1 %). */
        private Double percent(Node.Mapping lm) {
            String text = f.text(lm, "limit", "percent-of-full-scale");
            if (text == null) {
                return null;
            }
            String t = BARE_NUMBER.matcher(text).matches() ? text.strip() + " %" : text;
            double share;
            try {
                share = Units.parse(t, Dimension.RATIO);
            } catch (UnitException e) {
                f.error(
                        Fields.where(lm, "percent-of-full-scale"),
                        "limit.percent-of-full-scale",
                        e.problem(),
                        "write a percentage such as '0.1 %'");
                return null;
            }
            if (share <= 0 || share > 1) {
                f.error(
                        Fields.where(lm, "percent-of-full-scale"),
                        "limit.percent-of-full-scale",
                        new StageFact.FullScaleShare(share));
                return null;
            }
            return share;
        }

        private Criterion criterion(Node.Mapping m) {
            String text = f.text(m, "", "criterion");
            if (text == null) {
                return Criterion.WORST_CASE;
            }
            Located at = Fields.where(m, "criterion");
            String t = text.strip().toLowerCase(Locale.ROOT);
            if (t.equals("worst-case")) {
                return Criterion.WORST_CASE;
            }
            if (t.equals("rss")) {
                return Criterion.RSS;
            }
            if (t.startsWith("yield")) {
                String rest = t.substring("yield".length()).strip();
                if (rest.startsWith(":")) {
                    rest = rest.substring(1).strip();
                }
                if (rest.isEmpty()) {
                    f.error(at, "criterion", "a yield criterion needs a target", "write 'yield 99.9 %'");
                    return Criterion.WORST_CASE;
                }
                double target;
                try {
                    target = Units.parse(rest, Dimension.RATIO);
                } catch (UnitException e) {
                    f.error(at, "criterion", "yield target: " + e.problem(), "write 'yield 99.9 %'");
                    return Criterion.WORST_CASE;
                }
                if (!(target > 0 && target < 1)) {
                    // 100 % cannot be shown by sampling; 0 % asks nothing
                    f.error(
                            at,
                            "criterion",
                            "yield target " + rest + " is outside (0, 100) %",
                            "write a target above 0 % and below 100 %, such as 'yield 99.9 %'");
                    return Criterion.WORST_CASE;
                }
                if (target > MAX_YIELD_TARGET) {
                    // 99.99999999 % would print as 100 % and no sample within the trial cap could show it
                    f.error(
                            at,
                            "criterion",
                            "yield target " + rest + " is above 99.9999 %, closer to 100 % than " + StageKeys.MAX_TRIALS
                                    + " simulated units (the most allowed) can show",
                            "write at most 'yield 99.9999 %'; for an error no unit may exceed, write 'worst-case'");
                    return Criterion.WORST_CASE;
                }
                return Criterion.yield(target);
            }
            String near = Fields.closest(t, List.of("worst-case", "rss", "yield"));
            f.error(
                    at,
                    "criterion",
                    "'" + text + "' is not one of worst-case | rss | yield P %",
                    near != null
                            ? "did you mean '" + (near.equals("yield") ? "yield 99.9 %" : near) + "'?"
                            : "write 'worst-case', 'rss' or 'yield 99.9 %'");
            return Criterion.WORST_CASE;
        }

        /** thermal-emf and leakage: each off unless its block is written, and then complete. */
        private Board board(Node.Mapping m, Topology topology) {
            int junctions = 0;
            double seebeck = 0;
            double gradient = 0;
            Node.Mapping emf = section(m, "thermal-emf");
            if (emf != null) {
                Integer n = f.integer(emf, "thermal-emf", "junctions", 0, MAX_JUNCTIONS);
                Double s = nonNegativeOrNull(emf, "thermal-emf", "seebeck", Dimension.VOLTAGE_DRIFT);
                Double g = nonNegativeOrNull(emf, "thermal-emf", "gradient", Dimension.TEMPERATURE);
                for (String key : List.of("junctions", "seebeck", "gradient")) {
                    if (!present(emf, key)) {
                        f.error(
                                emf.at(),
                                "thermal-emf." + key,
                                "missing: thermal EMF needs junctions, seebeck and gradient",
                                "add '" + key + ": "
                                        + StageKeys.get("thermal-emf." + key).example() + "' ("
                                        + StageKeys.get("thermal-emf." + key).why() + ")");
                    }
                }
                if (s != null && s > MAX_SEEBECK) {
                    f.error(
                            Fields.where(emf, "seebeck"),
                            "thermal-emf.seebeck",
                            beyond(StageFact.Bound.SEEBECK, s, MAX_SEEBECK, Dimension.VOLTAGE_DRIFT, ""));
                }
                if (g != null && g > MAX_GRADIENT) {
                    f.error(
                            Fields.where(emf, "gradient"),
                            "thermal-emf.gradient",
                            beyond(StageFact.Bound.GRADIENT, g, MAX_GRADIENT, Dimension.TEMPERATURE, ""));
                }
                junctions = n == null ? 0 : n;
                seebeck = s == null ? 0 : s;
                gradient = g == null ? 0 : g;
            }
            double rLeak = Double.POSITIVE_INFINITY;
            double vLeak = 0;
            Board.Input input = Board.defaultInput(topology);
            Node.Mapping leak = section(m, "leakage");
            if (leak != null) {
                Double r = positive(leak, "leakage", "resistance", Dimension.RESISTANCE);
                Double v = f.quantity(leak, "leakage", "voltage", Dimension.VOLTAGE);
                for (String key : List.of("resistance", "voltage")) {
                    if (!present(leak, key)) {
                        f.error(
                                leak.at(),
                                "leakage." + key,
                                "missing: leakage needs the resistance and the voltage across it",
                                "add '" + key + ": "
                                        + StageKeys.get("leakage." + key).example() + "'");
                    }
                }
                if (v != null && Math.abs(v) > MAX_VOLTAGE) {
                    f.error(
                            Fields.where(leak, "voltage"),
                            "leakage.voltage",
                            beyond(StageFact.Bound.LEAKAGE_VOLTAGE, v, MAX_VOLTAGE, Dimension.VOLTAGE, ""));
                }
                String which = f.choice(leak, "leakage", "input", List.of("plus", "minus"));
                if (which != null) {
                    input = which.equals("plus") ? Board.Input.PLUS : Board.Input.MINUS;
                }
                rLeak = r == null ? Double.POSITIVE_INFINITY : r;
                vLeak = v == null ? 0 : v;
            }
            return new Board(junctions, seebeck, gradient, rLeak, vLeak, input);
        }

        private Trim trim(Node.Mapping m, double tMin, double tMax) {
            Node v = m.entries().get("trim");
            if (v == null || v instanceof Node.Scalar s && s.text() == null) {
                return Trim.NONE;
            }
            if (v instanceof Node.Scalar) {
                // shorthand 'trim: true' / 'trim: false'
                Boolean allowed = f.bool(m, "", "trim");
                return allowed == null ? Trim.NONE : new Trim(allowed, Trim.Method.ONE_POINT, 0, 0);
            }
            Node.Mapping t = section(m, "trim");
            if (t == null) {
                return Trim.NONE;
            }
            Boolean allowed = f.bool(t, "trim", "allowed");
            String method = f.choice(t, "trim", "method", StageKeys.TRIM_METHODS);
            double resolution = nonNegative(t, "trim", "resolution", Dimension.VOLTAGE, 0.0);
            volts(t, "trim", "resolution", resolution);
            double cost = nonNegative(t, "trim", "cost", Dimension.NUMBER, 0.0);
            money(t, "trim", "cost", cost);
            Trim.Method how = Trim.Method.ONE_POINT;
            for (Trim.Method each : Trim.Method.values()) {
                if (each.key().equals(method)) {
                    how = each;
                }
            }
            double[] at = calibrationTemperatures(t, how, tMin, tMax);
            TrimCircuit circuit = trimCircuit(t, how);
            List<TrimCircuit.Kind> circuits = trimCircuits(t, circuit.kind());
            return new Trim(allowed == null || allowed, how, resolution, cost, at[0], at[1], circuit, circuits);
        }

        /** Largest trim range margin: a range 100 times the offset is no longer a trim. */
        static final double MAX_TRIM_MARGIN = 100;
        /** Most DAC bits: beyond 24 the steps are below any amplifier's noise. */
        static final int MAX_DAC_BITS = 24;

        /** trim.circuit and its keys (defaults in {@link TrimCircuit}, each common practice). */
        private TrimCircuit trimCircuit(Node.Mapping t, Trim.Method how) {
            TrimCircuit d = TrimCircuit.STORED;
            String word = f.choice(t, "trim", "circuit", StageKeys.TRIM_CIRCUITS);
            TrimCircuit.Kind kind = word == null ? TrimCircuit.Kind.STORED : TrimCircuit.Kind.of(word);
            if (kind == null) {
                kind = TrimCircuit.Kind.STORED; // f.choice has reported the word
            }
            if (how == Trim.Method.TWO_TEMPERATURE
                    && (kind == TrimCircuit.Kind.NULL_PINS || kind == TrimCircuit.Kind.INJECTION)) {
                f.error(
                        Fields.where(t, "circuit"),
                        "trim.circuit",
                        "a trimmer is set once, at one temperature; method two-temperature needs a correction that "
                                + "follows the temperature",
                        "write 'circuit: stored' or 'circuit: dac', or 'method: one-point'");
            }
            double margin = nonNegative(t, "trim", "margin", Dimension.NUMBER, d.margin());
            if (present(t, "margin") && (margin < 1 || margin > MAX_TRIM_MARGIN)) {
                f.error(
                        Fields.where(t, "margin"),
                        "trim.margin",
                        new StageFact.Outside(StageFact.Rule.TRIM_MARGIN, margin, 1, MAX_TRIM_MARGIN));
            }
            String nodeWord = f.choice(t, "trim", "node", StageKeys.TRIM_NODES);
            TrimCircuit.Node node = "plus".equals(nodeWord) ? TrimCircuit.Node.PLUS : TrimCircuit.Node.MINUS;
            double reference = positiveOr(t, "reference", Dimension.VOLTAGE, d.reference());
            volts(t, "trim", "reference", reference);
            double refTc = tempco(t, "reference-tempco", d.referenceTempco());
            double resTc = tempco(t, "resistor-tempco", d.resistorTempco());
            double tracking = tempco(t, "tracking", Double.NaN);
            double settability = positiveOr(t, "pot-settability", Dimension.RATIO, d.potSettability());
            if (settability > 1) {
                f.error(
                        Fields.where(t, "pot-settability"),
                        "trim.pot-settability",
                        "a share of the trimmer's travel is at most 100 %",
                        "write the smallest settable step as a share, such as '0.1 %'");
            }
            double potTc = tempco(t, "pot-tempco", d.potTempco());
            double potR = positiveOr(t, "pot-resistance", Dimension.RESISTANCE, d.potResistance());
            if (potR > MAX_RESISTANCE) {
                f.error(
                        Fields.where(t, "pot-resistance"),
                        "trim.pot-resistance",
                        "above 1 Tohm, more than any trimmer",
                        "check the prefix; write for example '10 kohm'");
            }
            Integer bits = f.integer(t, "trim", "dac-bits", 1, MAX_DAC_BITS);
            double dacRef = positiveOr(t, "dac-reference", Dimension.VOLTAGE, d.dacReference());
            volts(t, "trim", "dac-reference", dacRef);
            double dacOffset = nonNegative(t, "trim", "dac-offset-drift", Dimension.VOLTAGE_DRIFT, d.dacOffsetDrift());
            if (dacOffset > MAX_SEEBECK) {
                f.error(
                        Fields.where(t, "dac-offset-drift"),
                        "trim.dac-offset-drift",
                        "above 2 mV/°C, more than any DAC drifts",
                        "check the prefix; write for example '10 uV/C'");
            }
            double dacGain = tempco(t, "dac-gain-drift", d.dacGainDrift());
            double[] costs = new double[5];
            String[] costKeys = {"pot-cost", "reference-cost", "resistor-cost", "dac-cost", "adjust-cost"};
            double[] costDefaults = {d.potCost(), d.referenceCost(), d.resistorCost(), d.dacCost(), d.adjustCost()};
            for (int i = 0; i < costs.length; i++) {
                costs[i] = nonNegative(t, "trim", costKeys[i], Dimension.NUMBER, costDefaults[i]);
                money(t, "trim", costKeys[i], costs[i]);
            }
            return new TrimCircuit(
                    kind,
                    margin,
                    node,
                    reference,
                    refTc,
                    resTc,
                    tracking,
                    settability,
                    potTc,
                    potR,
                    bits == null ? d.dacBits() : bits,
                    dacRef,
                    dacOffset,
                    dacGain,
                    costs[0],
                    costs[1],
                    costs[2],
                    costs[3],
                    costs[4]);
        }

        /** trim.circuits: a list (or comma-separated words) of circuit kinds; the stage's circuit alone by default. */
        private List<TrimCircuit.Kind> trimCircuits(Node.Mapping t, TrimCircuit.Kind own) {
            List<TrimCircuit.Kind> out = new ArrayList<>();
            for (String item : f.strings(t, "trim", "circuits")) {
                for (String w : item.split("[,\\s]+")) {
                    if (w.isEmpty()) {
                        continue;
                    }
                    TrimCircuit.Kind k = TrimCircuit.Kind.of(w);
                    if (k == null) {
                        String near = Fields.closest(w, StageKeys.TRIM_CIRCUITS);
                        f.error(
                                Fields.where(t, "circuits"),
                                "trim.circuits",
                                "'" + w + "' is not a trim circuit"
                                        + (near == null ? "" : " (did you mean " + near + "?)"),
                                "write some of " + String.join(", ", StageKeys.TRIM_CIRCUITS));
                    } else if (!out.contains(k)) {
                        out.add(k);
                    }
                }
            }
            if (out.isEmpty()) {
                return List.of(own);
            }
            return out;
        }

        /** A positive quantity of the trim block, or {@code fallback} when absent (or refused). */
        private double positiveOr(Node.Mapping t, String key, Dimension d, double fallback) {
            Double v = positive(t, "trim", key, d);
            return v == null ? fallback : v;
        }

        /** A temperature coefficient of the trim block, 0 to {@link #MAX_TEMPCO}; {@code fallback} when absent. */
        private double tempco(Node.Mapping t, String key, double fallback) {
            Double v = nonNegativeOrNull(t, "trim", key, Dimension.RATIO_DRIFT);
            if (v != null && v > MAX_TEMPCO) {
                f.error(
                        Fields.where(t, key),
                        "trim." + key,
                        "above 1 %/°C, more than any component drifts",
                        "check the prefix; write for example '"
                                + StageKeys.get("trim." + key).example() + "'");
                return fallback;
            }
            return v == null ? fallback : v;
        }

        /**
         * trim.cold and trim.hot: only with method two-temperature, each an ambient a circuit can see,
         * cold below hot; an absent one is NaN (the range end). Returns {cold, hot}.
         */
        private double[] calibrationTemperatures(Node.Mapping t, Trim.Method how, double tMin, double tMax) {
            Double cold = f.quantity(t, "trim", "cold", Dimension.TEMPERATURE);
            Double hot = f.quantity(t, "trim", "hot", Dimension.TEMPERATURE);
            if (how != Trim.Method.TWO_TEMPERATURE) {
                for (String key : List.of("cold", "hot")) {
                    if (present(t, key)) {
                        f.error(
                                Fields.where(t, key),
                                "trim." + key,
                                "a calibration temperature belongs to method " + "two-temperature, but the method is "
                                        + how.key(),
                                "write 'method: two-temperature', or remove 'trim." + key + "'");
                    }
                }
                return new double[] {Double.NaN, Double.NaN};
            }
            for (String key : List.of("cold", "hot")) {
                Double v = key.equals("cold") ? cold : hot;
                if (v != null && (v < MIN_AMBIENT || v > MAX_AMBIENT)) {
                    f.error(
                            Fields.where(t, key),
                            "trim." + key,
                            new StageFact.Ambient(
                                    v,
                                    MIN_AMBIENT,
                                    MAX_AMBIENT,
                                    true,
                                    StageKeys.get("trim." + key).example()));
                    return new double[] {Double.NaN, Double.NaN};
                }
            }
            double c = cold != null ? cold : tMin;
            double h = hot != null ? hot : tMax;
            if (!(c < h)) {
                // a line needs two distinct points; name the key the user wrote (or the range when both defaulted)
                String key = hot != null ? "hot" : cold != null ? "cold" : null;
                f.error(
                        key == null ? Fields.where(t, "method") : Fields.where(t, key),
                        key == null ? "trim.method" : "trim." + key,
                        new StageFact.CalibrationOrder(c, cold == null, h, hot == null));
            }
            return new double[] {cold != null ? cold : Double.NaN, hot != null ? hot : Double.NaN};
        }

        // ------------------------------------------------------------ helpers

        private static boolean present(Node.Mapping m, String key) {
            Node v = m.entries().get(key);
            return v != null && !(v instanceof Node.Scalar s && s.text() == null);
        }

        /** A block such as 'temperature:', checked for unknown keys; null when absent or not a block. */
        private Node.Mapping section(Node.Mapping m, String key) {
            Node v = m.entries().get(key);
            if (v == null || v instanceof Node.Scalar s && s.text() == null) {
                return null;
            }
            if (!(v instanceof Node.Mapping block)) {
                List<String> inside = StageKeys.inside(key);
                StringBuilder example = new StringBuilder("write '" + key + ":' with ");
                for (int i = 0; i < inside.size(); i++) {
                    example.append(i == 0 ? "" : ", ")
                            .append('\'')
                            .append(inside.get(i))
                            .append(": ")
                            .append(StageKeys.get(key + "." + inside.get(i)).example())
                            .append('\'');
                }
                f.error(
                        v.at(),
                        key,
                        "expected a block of 'key: value' lines, found " + v.kind(),
                        example + " indented below it");
                return null;
            }
            f.onlyKeys(block, key, StageKeys.inside(key));
            return block;
        }

        private double temperature(Node.Mapping t, String key, double fallback) {
            Double v = f.quantity(t, "temperature", key, Dimension.TEMPERATURE); // Units refuses below absolute zero
            return v == null ? fallback : v;
        }

        /** min and max both required in the block; min <= max; within 0..supply when {@code rail} is known. */
        private Range range(Node.Mapping m, String key, Double rail) {
            Node.Mapping r = section(m, key);
            if (r == null) {
                return null;
            }
            Double lo = f.quantity(r, key, "min", Dimension.VOLTAGE);
            Double hi = f.quantity(r, key, "max", Dimension.VOLTAGE);
            volts(r, key, "min", lo == null ? null : Math.abs(lo));
            volts(r, key, "max", hi == null ? null : Math.abs(hi));
            for (String side : List.of("min", "max")) {
                if (!present(r, side)) {
                    f.error(
                            r.at(),
                            key + "." + side,
                            "required in this block (both ends of the range)",
                            "add '" + side + ": "
                                    + StageKeys.get(key + "." + side).example() + "' (volts above the negative rail)");
                }
            }
            if (lo == null || hi == null) {
                return null;
            }
            if (lo > hi) {
                f.error(
                        Fields.where(r, "min"),
                        key,
                        new StageFact.Order(
                                StageFact.Ends.MIN_MAX,
                                new Quantity(lo, Dimension.VOLTAGE),
                                new Quantity(hi, Dimension.VOLTAGE)));
                return null;
            }
            if (rail != null && (lo < 0 || hi > rail)) {
                f.error(Fields.where(r, lo < 0 ? "min" : "max"), key, new StageFact.OutsideRails(rail));
                return null;
            }
            return new Range(lo, hi);
        }

        private Double nonNegativeOrNull(Node.Mapping m, String path, String key, Dimension d) {
            Double v = f.quantity(m, path, key, d);
            if (v != null && v < 0) {
                f.error(
                        Fields.where(m, key),
                        Fields.join(path, key),
                        "must not be negative",
                        "write " + d.noun() + " of 0 or more, such as '" + exampleFor(path, key, d) + "'");
                return null;
            }
            return v;
        }

        private double nonNegative(Node.Mapping m, String path, String key, Dimension d, double fallback) {
            Double v = nonNegativeOrNull(m, path, key, d);
            return v == null ? fallback : v;
        }

        private Double positive(Node.Mapping m, String path, String key, Dimension d) {
            Double v = f.quantity(m, path, key, d);
            if (v != null && v <= 0) {
                f.error(
                        Fields.where(m, key),
                        Fields.join(path, key),
                        "must be more than 0",
                        "write " + d.noun() + " such as '" + exampleFor(path, key, d) + "'");
                return null;
            }
            return v;
        }

        /** {@code value} past {@code limit}, both of dimension {@code d}, as a fact. */
        private static StageFact.Beyond beyond(
                StageFact.Bound bound, double value, double limit, Dimension d, String example) {
            return new StageFact.Beyond(bound, new Quantity(value, d), new Quantity(limit, d), example);
        }

        private static String exampleFor(String path, String key, Dimension d) {
            StageKeys.Key k = StageKeys.get(Fields.join(path, key));
            return k != null ? k.example() : d.example();
        }
    }
}
