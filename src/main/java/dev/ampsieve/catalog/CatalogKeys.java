package dev.ampsieve.catalog;

import dev.ampsieve.units.Dimension;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Every key a catalog file may hold, per section, with the dimension of each quantity.
 * The loader, the search index, the template and the docs all read key names from here,
 * so a field is renamed or added in one place.
 *
 * <p>Paths are dotted without the list prefix: {@code vos.max}, {@code noise.en}, {@code gbw}.
 */
public final class CatalogKeys {
    private CatalogKeys() {
    }

    /** The key of the list in a file holding several parts. */
    public static final String PARTS = "parts";

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

    /** Top-level keys of a part, template order. */
    public static final List<String> PART_KEYS = List.of(ID, TITLE, ARCHITECTURE, INPUT, FACTORY_TRIM, NULL_PINS,
            CHANNELS, PACKAGES, TAGS, PRICE, SUPPLY, TEMPERATURE, VOS, VOS_DRIFT, IB, IOS, CMRR, PSRR, AOL, GBW, SLEW,
            NOISE, LONG_TERM_DRIFT, INPUT_HEADROOM, OUTPUT_HEADROOM, CHOPPING_FREQUENCY, QUIESCENT_CURRENT, SOURCE, NOTES);

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
        r.put(path(LONG_TERM_DRIFT, VALUE), Dimension.VOLTAGE,
                p -> p.longTermDrift() == null ? null : p.longTermDrift().value());
        r.put(path(LONG_TERM_DRIFT, PER), Dimension.TIME,
                p -> p.longTermDrift() == null ? null : p.longTermDrift().per());
        r.headroom(INPUT_HEADROOM, Part::inputHeadroom);
        r.headroom(OUTPUT_HEADROOM, Part::outputHeadroom);
        r.put(CHOPPING_FREQUENCY, Dimension.FREQUENCY, Part::choppingFrequency);
        r.put(QUIESCENT_CURRENT, Dimension.CURRENT, Part::quiescentCurrent);
        QUANTITIES = Collections.unmodifiableMap(r.dimensions);
        GETTERS = Collections.unmodifiableMap(r.getters);
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
            put(path(section, LOW), Dimension.VOLTAGE, p -> get.apply(p) == null ? null : get.apply(p).low());
            put(path(section, HIGH), Dimension.VOLTAGE, p -> get.apply(p) == null ? null : get.apply(p).high());
        }
    }
}
