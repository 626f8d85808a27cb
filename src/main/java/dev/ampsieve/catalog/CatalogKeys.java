package dev.ampsieve.catalog;

import dev.ampsieve.units.Dimension;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.regex.Pattern;

/**
 * Every key a catalog file may hold, per section, with the dimension of each quantity.
 * The loader, the search index, the template and the docs all read key names from here,
 * so a field is renamed or added in one place.
 *
 * <p>Paths are dotted without the list prefix: {@code vos.max}, {@code noise.en}, {@code gbw}.
 */
public final class CatalogKeys {
    private CatalogKeys() {}

    /** The key of the list in a file holding several parts. */
    public static final String PARTS = "parts";

    /** The {@code parts[3].} in front of a key path read from a list of parts. */
    private static final Pattern LIST_ITEM = Pattern.compile("^" + PARTS + "\\[\\d+]\\.");

    // ---- top-level keys of one part, in the order the template lists them
    public static final String ID = "id";
    public static final String TITLE = "title";
    public static final String ARCHITECTURE = "architecture";
    public static final String INPUT = "input";
    public static final String FACTORY_TRIM = "factory-trim";
    public static final String NULL_PINS = "null-pins";
    public static final String CHANNELS = "channels";
    public static final String PACKAGES = "packages";
    public static final String TAGS = "tags";
    public static final String PRICE = "price";
    public static final String SUPPLY = "supply";
    public static final String TEMPERATURE = "temperature";
    public static final String VOS = "vos";
    public static final String VOS_DRIFT = "vos-drift";
    public static final String IB = "ib";
    public static final String IOS = "ios";
    public static final String CMRR = "cmrr";
    public static final String PSRR = "psrr";
    public static final String AOL = "aol";
    public static final String GBW = "gbw";
    public static final String SLEW = "slew";
    public static final String NOISE = "noise";
    public static final String LONG_TERM_DRIFT = "long-term-drift";
    public static final String INPUT_HEADROOM = "input-headroom";
    public static final String OUTPUT_HEADROOM = "output-headroom";
    public static final String CHOPPING_FREQUENCY = "chopping-frequency";
    public static final String QUIESCENT_CURRENT = "quiescent-current";
    public static final String INPUT_CAPACITANCE = "input-capacitance";
    // operating point (datasheet test conditions, input crossover, self-heating, chopping ripple)
    public static final String TEST_CONDITIONS = "test-conditions";
    public static final String INPUT_CROSSOVER = "input-crossover";
    public static final String THETA_JA = "theta-ja";
    public static final String CHOPPING_RIPPLE = "chopping-ripple";
    /** A lot of this part measured on the bench: {@code measured: {file: lot.csv}} (issue 16). */
    public static final String MEASURED = "measured";

    public static final String SOURCE = "source";
    public static final String NOTES = "notes";

    // ---- keys inside sections
    public static final String MIN = "min";
    public static final String MAX = "max";
    public static final String TYP = "typ";
    public static final String MAX_OVER_TEMP = "max-over-temp";
    public static final String UNIT = "unit";
    public static final String QUANTITY = "quantity";
    public static final String CURRENCY = "currency";
    public static final String EN = "en";
    public static final String EN_CORNER = "en-corner";
    public static final String IN = "in";
    public static final String IN_CORNER = "in-corner";
    public static final String VALUE = "value";
    public static final String PER = "per";
    public static final String LOW = "low";
    public static final String HIGH = "high";
    public static final String COMMON_MODE = "common-mode";
    public static final String FROM_POSITIVE_RAIL = "from-positive-rail";
    public static final String OFFSET_STEP = "offset-step";
    public static final String FILE = "file";

    /** Top-level keys of a part, template order. */
    public static final List<String> PART_KEYS = List.of(
            ID,
            TITLE,
            ARCHITECTURE,
            INPUT,
            FACTORY_TRIM,
            NULL_PINS,
            CHANNELS,
            PACKAGES,
            TAGS,
            PRICE,
            SUPPLY,
            TEMPERATURE,
            VOS,
            VOS_DRIFT,
            IB,
            IOS,
            CMRR,
            PSRR,
            AOL,
            GBW,
            SLEW,
            NOISE,
            LONG_TERM_DRIFT,
            INPUT_HEADROOM,
            OUTPUT_HEADROOM,
            CHOPPING_FREQUENCY,
            QUIESCENT_CURRENT,
            INPUT_CAPACITANCE,
            TEST_CONDITIONS,
            INPUT_CROSSOVER,
            THETA_JA,
            CHOPPING_RIPPLE,
            MEASURED,
            SOURCE,
            NOTES);

    /** Keys a part cannot do without. {@code vos} needs typ or max; range sections need both ends. */
    public static final List<String> REQUIRED = List.of(ID, ARCHITECTURE, INPUT, VOS, GBW, SUPPLY, TEMPERATURE, PRICE);

    private static final List<String> RANGE = List.of(MIN, MAX);
    private static final List<String> SPREAD = List.of(TYP, MAX, MAX_OVER_TEMP);
    private static final List<String> MIN_TYP = List.of(MIN, TYP);
    private static final List<String> HEADROOM = List.of(LOW, HIGH);

    /** Sections (top-level keys holding a mapping) and their keys, template order. */
    public static final Map<String, List<String>> SECTIONS;

    /** Every quantity (a number, with or without unit) by dotted path, with what it measures. */
    public static final Map<String, Dimension> QUANTITIES;

    private static final Map<String, Function<Part, Double>> GETTERS;

    /** No bound on this side. */
    private static final double NONE = Double.NaN;

    static {
        Map<String, List<String>> s = new LinkedHashMap<>();
        s.put(PRICE, List.of(UNIT, QUANTITY, CURRENCY));
        s.put(SUPPLY, RANGE);
        s.put(TEMPERATURE, RANGE);
        s.put(VOS, SPREAD);
        s.put(VOS_DRIFT, List.of(TYP, MAX));
        s.put(IB, SPREAD);
        s.put(IOS, SPREAD);
        s.put(CMRR, MIN_TYP);
        s.put(PSRR, MIN_TYP);
        s.put(AOL, MIN_TYP);
        s.put(NOISE, List.of(EN, EN_CORNER, IN, IN_CORNER));
        s.put(LONG_TERM_DRIFT, List.of(VALUE, PER));
        s.put(INPUT_HEADROOM, HEADROOM);
        s.put(OUTPUT_HEADROOM, HEADROOM);
        s.put(TEST_CONDITIONS, List.of(SUPPLY, COMMON_MODE));
        s.put(INPUT_CROSSOVER, List.of(FROM_POSITIVE_RAIL, OFFSET_STEP));
        s.put(MEASURED, List.of(FILE));
        SECTIONS = Collections.unmodifiableMap(s);

        Registry r = new Registry();
        r.put(path(PRICE, UNIT), Dimension.NUMBER, p -> p.price().unit());
        r.range(SUPPLY, Dimension.VOLTAGE, Part::supply);
        r.range(TEMPERATURE, Dimension.TEMPERATURE, Part::temperature);
        r.spread(VOS, Dimension.VOLTAGE, Part::vos);
        r.put(path(VOS_DRIFT, TYP), Dimension.VOLTAGE_DRIFT, p -> p.vosDrift().typ());
        r.put(path(VOS_DRIFT, MAX), Dimension.VOLTAGE_DRIFT, p -> p.vosDrift().max());
        r.spread(IB, Dimension.CURRENT, Part::ib);
        r.spread(IOS, Dimension.CURRENT, Part::ios);
        r.minTyp(CMRR, Part::cmrr);
        r.minTyp(PSRR, Part::psrr);
        r.minTyp(AOL, Part::aol);
        r.put(GBW, Dimension.FREQUENCY, Part::gbw);
        r.put(SLEW, Dimension.SLEW_RATE, Part::slew);
        r.put(path(NOISE, EN), Dimension.VOLTAGE_DENSITY, p -> p.noise().en());
        r.put(path(NOISE, EN_CORNER), Dimension.FREQUENCY, p -> p.noise().enCorner());
        r.put(path(NOISE, IN), Dimension.CURRENT_DENSITY, p -> p.noise().in());
        r.put(path(NOISE, IN_CORNER), Dimension.FREQUENCY, p -> p.noise().inCorner());
        r.put(
                path(LONG_TERM_DRIFT, VALUE),
                Dimension.VOLTAGE,
                p -> p.longTermDrift() == null ? null : p.longTermDrift().value());
        r.put(
                path(LONG_TERM_DRIFT, PER),
                Dimension.TIME,
                p -> p.longTermDrift() == null ? null : p.longTermDrift().per());
        r.headroom(INPUT_HEADROOM, Part::inputHeadroom);
        r.headroom(OUTPUT_HEADROOM, Part::outputHeadroom);
        r.put(CHOPPING_FREQUENCY, Dimension.FREQUENCY, Part::choppingFrequency);
        r.put(QUIESCENT_CURRENT, Dimension.CURRENT, Part::quiescentCurrent);
        r.put(INPUT_CAPACITANCE, Dimension.CAPACITANCE, Part::inputCapacitance);
        r.put(
                path(TEST_CONDITIONS, SUPPLY),
                Dimension.VOLTAGE,
                p -> p.testConditions() == null ? null : p.testConditions().supply());
        r.put(
                path(TEST_CONDITIONS, COMMON_MODE),
                Dimension.VOLTAGE,
                p -> p.testConditions() == null ? null : p.testConditions().commonMode());
        r.put(
                path(INPUT_CROSSOVER, FROM_POSITIVE_RAIL),
                Dimension.VOLTAGE,
                p -> p.inputCrossover() == null ? null : p.inputCrossover().fromPositiveRail());
        r.put(
                path(INPUT_CROSSOVER, OFFSET_STEP),
                Dimension.VOLTAGE,
                p -> p.inputCrossover() == null ? null : p.inputCrossover().offsetStep());
        r.put(THETA_JA, Dimension.THERMAL_RESISTANCE, Part::thetaJa);
        r.put(CHOPPING_RIPPLE, Dimension.VOLTAGE, Part::choppingRipple);
        QUANTITIES = Collections.unmodifiableMap(r.dimensions);
        GETTERS = Collections.unmodifiableMap(r.getters);

        Map<String, Bounds> b = new LinkedHashMap<>();
        b.put(
                path(PRICE, UNIT),
                new Bounds(NONE, 10_000, NONE, 1e7, false, "no single amplifier is sold for more than ten million"));
        Bounds supply = new Bounds(
                0.5,
                1000,
                0.1,
                2000,
                false,
                "transistors need a few kT/q (about 0.1 V) to amplify, and no op amp is built for more than about 1.2 kV");
        b.put(path(SUPPLY, MIN), supply);
        b.put(path(SUPPLY, MAX), supply);
        Bounds temp = new Bounds(
                -100,
                300,
                -273.15,
                1000,
                true,
                "nothing is colder than absolute zero, and no amplifier works near 1000 °C (silicon melts at 1414 °C)");
        b.put(path(TEMPERATURE, MIN), temp);
        b.put(path(TEMPERATURE, MAX), temp);
        Bounds vos = new Bounds(NONE, 100e-3, NONE, 1, false, "an offset of volts leaves no room for a signal");
        for (String k : SPREAD) {
            b.put(path(VOS, k), vos);
        }
        Bounds drift = new Bounds(
                NONE,
                100e-6,
                NONE,
                1e-3,
                false,
                "1 mV/°C is what a 1 V offset would drift (vos / T), and no amplifier has that offset");
        b.put(path(VOS_DRIFT, TYP), drift);
        b.put(path(VOS_DRIFT, MAX), drift);
        Bounds current = new Bounds(
                NONE,
                100e-6,
                NONE,
                100e-3,
                false,
                "input pins are commonly rated for at most 10 mA (absolute maximum), ten times less");
        for (String k : SPREAD) {
            b.put(path(IB, k), current);
            b.put(path(IOS, k), current);
        }
        Bounds rejection = new Bounds(
                NONE,
                180,
                NONE,
                200,
                false,
                "200 dB is a ratio of ten billion; the best amplifiers reach about 160 dB");
        for (String sec : List.of(CMRR, PSRR, AOL)) {
            b.put(path(sec, MIN), rejection);
            b.put(path(sec, TYP), rejection);
        }
        b.put(
                GBW,
                new Bounds(
                        100,
                        10e9,
                        1,
                        100e9,
                        false,
                        "the fastest amplifiers reach a few GHz, and none is slower than 1 Hz"));
        b.put(
                SLEW,
                new Bounds(
                        NONE,
                        1e11,
                        NONE,
                        1e12,
                        false,
                        "the fastest amplifiers slew a few thousand V/µs, far below 1 MV/µs"));
        b.put(
                path(NOISE, EN),
                new Bounds(
                        0.1e-9,
                        1e-6,
                        10e-12,
                        1e-3,
                        false,
                        "the quietest inputs reach a few tenths of a nV/√Hz; a mV/√Hz is no amplifier's noise"));
        Bounds corner = new Bounds(NONE, 1e6, NONE, 1e9, false, "a 1/f corner above 1 GHz is no amplifier's");
        b.put(path(NOISE, EN_CORNER), corner);
        b.put(
                path(NOISE, IN),
                new Bounds(
                        NONE,
                        1e-9,
                        NONE,
                        1e-6,
                        false,
                        "even 100 mA of bias current has only about 0.2 nA/√Hz of shot noise"));
        b.put(path(NOISE, IN_CORNER), corner);
        b.put(
                path(LONG_TERM_DRIFT, VALUE),
                new Bounds(NONE, 10e-3, NONE, 1, false, "an offset change of volts leaves no room for a signal"));
        double hour = 3600;
        double year = 365.25 * 86400;
        b.put(
                path(LONG_TERM_DRIFT, PER),
                new Bounds(
                        24 * hour,
                        10 * year,
                        hour,
                        100 * year,
                        false,
                        "aging is measured over hundreds of hours to years, never less than an hour nor over a century"));
        Bounds headroom =
                new Bounds(NONE, 10, NONE, 2000, false, "headroom is part of the supply, which is at most 2 kV");
        for (String sec : List.of(INPUT_HEADROOM, OUTPUT_HEADROOM)) {
            b.put(path(sec, LOW), headroom);
            b.put(path(sec, HIGH), headroom);
        }
        b.put(
                CHOPPING_FREQUENCY,
                new Bounds(
                        NONE,
                        100e6,
                        NONE,
                        100e9,
                        false,
                        "a chopping clock cannot be faster than the fastest amplifier's gain-bandwidth"));
        b.put(
                QUIESCENT_CURRENT,
                new Bounds(NONE, 1, NONE, 100, false, "even power amplifiers draw well under an ampere at rest"));
        b.put(
                INPUT_CAPACITANCE,
                new Bounds(
                        0.1e-12,
                        100e-12,
                        1e-15,
                        100e-9,
                        false,
                        "an amplifier's input pins are a few pF; 100 nF is a discrete capacitor, not a pin"));
        b.put(path(TEST_CONDITIONS, SUPPLY), supply);
        b.put(
                path(TEST_CONDITIONS, COMMON_MODE),
                new Bounds(
                        NONE,
                        1000,
                        NONE,
                        2000,
                        false,
                        "the common mode lies between the rails, and no op amp's supply exceeds 2 kV"));
        b.put(
                path(INPUT_CROSSOVER, FROM_POSITIVE_RAIL),
                new Bounds(
                        0.1,
                        5,
                        NONE,
                        2000,
                        false,
                        "the crossover lies between the rails, and no op amp's supply exceeds 2 kV"));
        b.put(
                path(INPUT_CROSSOVER, OFFSET_STEP),
                new Bounds(
                        NONE,
                        10e-3,
                        NONE,
                        1,
                        false,
                        "a step of volts between the two input pairs leaves no room for a signal"));
        b.put(
                THETA_JA,
                new Bounds(
                        5,
                        500,
                        0.5,
                        5000,
                        false,
                        "a bare die in still air is a few hundred °C/W and a package on a heat sink a few; beyond 5000 °C/W"
                                + " a milliwatt would melt silicon"));
        b.put(
                CHOPPING_RIPPLE,
                new Bounds(NONE, 10e-3, NONE, 1, false, "a ripple of volts at the input leaves no room for a signal"));
        BOUNDS = Collections.unmodifiableMap(b);
    }

    /**
     * How large (or small) a quantity may be. Beyond a warning bound a value is unusual but
     * possible, so the part still loads; beyond an error bound no op amp has it, the value is
     * certainly a slip (a wrong prefix, a misread column), and the part is refused. Errors also
     * keep the budget's arithmetic finite: no product of allowed values overflows.
     * Magnitudes are compared (a signed ib.typ or headroom by its size), except where
     * {@code signed} (temperatures). Bounds below apply to non-zero values only (zero has
     * its own sign checks). NaN: no bound on that side. SI units, °C, dB.
     *
     * @param why for the error: the physical reason no op amp goes beyond {@code errorAbove}
     */
    public record Bounds(
            double warnBelow, double warnAbove, double errorBelow, double errorAbove, boolean signed, String why) {}

    /**
     * The bounds of every quantity in {@link #QUANTITIES}. Warning bounds are common practice,
     * an order of magnitude or more beyond the parts a precision designer meets; error bounds
     * are generous physical limits, each with its reason (documented in catalog-template/GUIDE.md).
     */
    public static final Map<String, Bounds> BOUNDS;

    /**
     * Example values for the quantities whose dimension's example would mislead in an error's fix
     * (a supply is volts, not the microvolts of an offset); the rest use {@link Dimension#example}.
     */
    private static final Map<String, String> EXAMPLES = Map.ofEntries(
            Map.entry(path(PRICE, UNIT), "1.25"),
            Map.entry(path(SUPPLY, MIN), "2.7 V"),
            Map.entry(path(SUPPLY, MAX), "36 V"),
            Map.entry(path(TEMPERATURE, MIN), "-40 C"),
            Map.entry(path(TEMPERATURE, MAX), "125 C"),
            Map.entry(path(NOISE, EN_CORNER), "10 Hz"),
            Map.entry(path(NOISE, IN_CORNER), "100 Hz"),
            Map.entry(path(LONG_TERM_DRIFT, VALUE), "5 uV"),
            Map.entry(path(LONG_TERM_DRIFT, PER), "1000 h"),
            Map.entry(path(INPUT_HEADROOM, LOW), "0.1 V"),
            Map.entry(path(INPUT_HEADROOM, HIGH), "1.5 V"),
            Map.entry(path(OUTPUT_HEADROOM, LOW), "50 mV"),
            Map.entry(path(OUTPUT_HEADROOM, HIGH), "50 mV"),
            Map.entry(CHOPPING_FREQUENCY, "100 kHz"),
            Map.entry(QUIESCENT_CURRENT, "1 mA"),
            Map.entry(INPUT_CAPACITANCE, "7 pF"),
            Map.entry(path(TEST_CONDITIONS, SUPPLY), "30 V"),
            Map.entry(path(TEST_CONDITIONS, COMMON_MODE), "15 V"),
            Map.entry(path(INPUT_CROSSOVER, FROM_POSITIVE_RAIL), "1.2 V"),
            Map.entry(path(INPUT_CROSSOVER, OFFSET_STEP), "50 uV"),
            Map.entry(THETA_JA, "150 C/W"),
            Map.entry(CHOPPING_RIPPLE, "5 uV"));

    /**
     * A well-formed value for the quantity at {@code path} (a list prefix such as {@code parts[2].}
     * is ignored), for the fix of an error; null when the path is not a quantity.
     */
    public static String example(String path) {
        // called for every quantity read: the pattern is compiled once (String.replaceFirst compiles per call)
        String p = path.startsWith(PARTS + "[") ? LIST_ITEM.matcher(path).replaceFirst("") : path;
        Dimension d = QUANTITIES.get(p);
        return d == null ? null : EXAMPLES.getOrDefault(p, d.example());
    }

    /** {@code section.key}. */
    public static String path(String section, String key) {
        return section + "." + key;
    }

    /** The keys allowed inside {@code section}, or an empty list for a plain key. */
    public static List<String> subKeys(String section) {
        return SECTIONS.getOrDefault(section, List.of());
    }

    /** What the quantity at {@code path} measures, or null when the path is not a quantity. */
    public static Dimension dimension(String path) {
        return QUANTITIES.get(path);
    }

    /**
     * The value of the quantity at {@code path} for {@code p} in SI units (temperatures in °C,
     * levels in dB), or null when the part does not give it. For indexing and queries.
     *
     * @throws IllegalArgumentException for a path not in {@link #QUANTITIES}
     */
    public static Double value(Part p, String path) {
        Function<Part, Double> g = GETTERS.get(path);
        if (g == null) {
            throw new IllegalArgumentException("not a catalog quantity: " + path);
        }
        return g.apply(p);
    }

    /** Fills the two path tables together so they cannot disagree. */
    private static final class Registry {
        final Map<String, Dimension> dimensions = new LinkedHashMap<>();
        final Map<String, Function<Part, Double>> getters = new LinkedHashMap<>();

        void put(String path, Dimension d, Function<Part, Double> get) {
            dimensions.put(path, d);
            getters.put(path, get);
        }

        void range(String section, Dimension d, Function<Part, Range> get) {
            put(path(section, MIN), d, p -> get.apply(p).min());
            put(path(section, MAX), d, p -> get.apply(p).max());
        }

        void spread(String section, Dimension d, Function<Part, Spread> get) {
            put(path(section, TYP), d, p -> get.apply(p).typ());
            put(path(section, MAX), d, p -> get.apply(p).max());
            put(path(section, MAX_OVER_TEMP), d, p -> get.apply(p).maxOverTemp());
        }

        void minTyp(String section, Function<Part, MinTyp> get) {
            put(path(section, MIN), Dimension.DECIBEL, p -> get.apply(p).min());
            put(path(section, TYP), Dimension.DECIBEL, p -> get.apply(p).typ());
        }

        void headroom(String section, Function<Part, Headroom> get) {
            put(
                    path(section, LOW),
                    Dimension.VOLTAGE,
                    p -> get.apply(p) == null ? null : get.apply(p).low());
            put(
                    path(section, HIGH),
                    Dimension.VOLTAGE,
                    p -> get.apply(p) == null ? null : get.apply(p).high());
        }
    }
}
