package dev.ampsieve.search;

import dev.ampsieve.units.Dimension;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/**
 * Every field name of the part index, in one place, with what each means to an engineer.
 * The query language accepts exactly these names (plus the aliases below); the document
 * mapper ({@link PartDocuments}) fills exactly these fields. Values are in SI units (V, A, Hz,
 * V/s, V/√Hz, A/√Hz, V/°C), temperatures in °C, rejection ratios and gain in dB, prices in
 * the catalog's currency.
 *
 * <p>To add a searchable number: add a {@link Numeric} to {@link #NUMERIC}, give it a value in
 * {@code PartDocuments.value}, bump {@link #VERSION} (old indexes then rebuild themselves).
 * Every catalog key ({@code CatalogKeys}) must be a query name, directly or through
 * {@link #ALIASES}; {@code SchemaTest} checks it.
 */
public final class Schema {
    private Schema() {}

    /**
     * Stored in each commit beside the catalog fingerprint; any change to the fields or to how
     * a value is derived must change it so that existing on-disk indexes rebuild.
     */
    public static final String VERSION = "6";

    // ------------------------------------------------------------ identity and words

    /** The part id, exact (keyword, stored, sorted doc values for a stable tie-break). */
    public static final String ID = "id";
    /** The part id lower-cased, for case-blind {@code id:} queries. */
    public static final String ID_LOWER = "id.lower";
    /** Every searchable word: id, title, tags, notes, packages, architecture, input type, synonyms. */
    public static final String TEXT = "text";
    /** Words of the title only; a free word found here counts double. */
    public static final String TITLE = "title";

    // ------------------------------------------------------------ keyword fields (field:word)

    /** Input stage: bipolar, jfet, cmos. */
    public static final String INPUT = "input";
    /** standard, chopper, auto-zero; self-correcting parts also carry zero-drift. */
    public static final String ARCHITECTURE = "architecture";
    /** Each package name as typed, lower-case. */
    public static final String PACKAGE = "package";
    /** Each tag as typed, lower-case. */
    public static final String TAG = "tag";
    /** Factory offset trim: none, laser, fuse, other. */
    public static final String TRIM = "trim";
    /** Rail-to-rail: input (no input headroom), output (no output headroom). */
    public static final String RAIL = "rail";

    /** Whether the maker's offset null pins are brought out: true, false. */
    public static final String NULL_PINS = "null-pins";
    /** The price's currency, lower-case. */
    public static final String CURRENCY = "currency";
    /** The measured lot file as the catalog names it, lower-case (issue 16). */
    public static final String MEASURED_FILE = "measured.file";

    /** A word field and the values it can hold (empty: free values). */
    public record Keyword(String name, List<String> values, String meaning) {
        public Keyword {
            values = List.copyOf(values);
        }
    }

    public static final List<Keyword> KEYWORDS = List.of(
            new Keyword(ID, List.of(), "the part id"),
            new Keyword(INPUT, List.of("bipolar", "jfet", "cmos"), "input stage technology"),
            new Keyword(
                    ARCHITECTURE,
                    List.of("standard", "chopper", "auto-zero", "zero-drift"),
                    "offset correction; zero-drift = chopper or auto-zero"),
            new Keyword(PACKAGE, List.of(), "package; package:sot-23 also finds sot-23-5"),
            new Keyword(TAG, List.of(), "a tag from the catalog"),
            new Keyword(TRIM, List.of("none", "laser", "fuse", "other"), "factory offset trim"),
            new Keyword(RAIL, List.of("input", "output"), "rail-to-rail input or output (headroom 0 or less)"),
            new Keyword(NULL_PINS, List.of("true", "false"), "offset null pins brought out"),
            new Keyword(CURRENCY, List.of(), "the currency of the price, as in the catalog"),
            new Keyword(MEASURED_FILE, List.of(), "the measured lot file, as the catalog names it"));

    // ------------------------------------------------------------ words of one text (field:word)

    /** Words of the notes only. */
    public static final String NOTES = "notes";
    /** Words of the source (datasheet name, revision) only. */
    public static final String SOURCE = "source";

    /** A free-text field searched by word ({@code notes:settling}), as the free words are. */
    public record Text(String name, String meaning) {}

    public static final List<Text> TEXTS = List.of(
            new Text(TITLE, "a word of the title"),
            new Text(NOTES, "a word of the notes"),
            new Text(SOURCE, "a word of the source (datasheet name, revision)"));

    // ------------------------------------------------------------ numbers (field<value ...)

    /** A number indexed as a point (search); the price also as doc values (the search order). */
    public record Numeric(String name, Dimension dimension, String meaning) {}

    public static final String VOS = "vos";
    public static final String DRIFT = "drift";
    public static final String IB = "ib";
    public static final String IOS = "ios";
    public static final String CMRR = "cmrr";
    public static final String PSRR = "psrr";
    public static final String AOL = "aol";
    public static final String GBW = "gbw";
    public static final String SLEW = "slew";
    public static final String EN = "en";
    public static final String IN = "in";
    public static final String SUPPLY_MIN = "supply.min";
    public static final String SUPPLY_MAX = "supply.max";
    public static final String TEMPERATURE_MIN = "temperature.min";
    public static final String TEMPERATURE_MAX = "temperature.max";
    public static final String PRICE = "price";
    public static final String IQ = "iq";
    public static final String CIN = "cin";
    public static final String CHANNELS = "channels";
    public static final String FCHOP = "fchop";
    public static final String AGING = "aging";
    public static final String THETA_JA = "theta-ja";
    public static final String RIPPLE = "ripple";

    public static final List<Numeric> NUMERIC = List.of(
            new Numeric(VOS, Dimension.VOLTAGE, "offset voltage at 25 °C: the guaranteed maximum, else the typical"),
            new Numeric("vos.typ", Dimension.VOLTAGE, "typical offset voltage"),
            new Numeric("vos.max", Dimension.VOLTAGE, "maximum offset voltage at 25 °C"),
            new Numeric("vos.maxtemp", Dimension.VOLTAGE, "maximum offset voltage over the rated temperature range"),
            new Numeric(DRIFT, Dimension.VOLTAGE_DRIFT, "offset drift: the maximum, else the typical"),
            new Numeric("drift.typ", Dimension.VOLTAGE_DRIFT, "typical offset drift"),
            new Numeric("drift.max", Dimension.VOLTAGE_DRIFT, "maximum offset drift"),
            new Numeric(IB, Dimension.CURRENT, "input bias current at 25 °C: the maximum, else the typical"),
            new Numeric("ib.typ", Dimension.CURRENT, "typical input bias current"),
            new Numeric("ib.max", Dimension.CURRENT, "maximum input bias current at 25 °C"),
            new Numeric("ib.maxtemp", Dimension.CURRENT, "maximum input bias current over temperature"),
            new Numeric(IOS, Dimension.CURRENT, "input offset current at 25 °C: the maximum, else the typical"),
            new Numeric("ios.typ", Dimension.CURRENT, "typical input offset current"),
            new Numeric("ios.max", Dimension.CURRENT, "maximum input offset current at 25 °C"),
            new Numeric(CMRR, Dimension.DECIBEL, "common-mode rejection: the guaranteed minimum, else the typical"),
            new Numeric("cmrr.min", Dimension.DECIBEL, "minimum common-mode rejection"),
            new Numeric("cmrr.typ", Dimension.DECIBEL, "typical common-mode rejection"),
            new Numeric(PSRR, Dimension.DECIBEL, "supply rejection: the guaranteed minimum, else the typical"),
            new Numeric("psrr.min", Dimension.DECIBEL, "minimum supply rejection"),
            new Numeric("psrr.typ", Dimension.DECIBEL, "typical supply rejection"),
            new Numeric(AOL, Dimension.DECIBEL, "open-loop gain: the guaranteed minimum, else the typical"),
            new Numeric("aol.min", Dimension.DECIBEL, "minimum open-loop gain"),
            new Numeric("aol.typ", Dimension.DECIBEL, "typical open-loop gain"),
            new Numeric(GBW, Dimension.FREQUENCY, "gain-bandwidth product"),
            new Numeric(SLEW, Dimension.SLEW_RATE, "slew rate"),
            new Numeric(EN, Dimension.VOLTAGE_DENSITY, "white (broadband) input voltage noise density"),
            new Numeric("en.corner", Dimension.FREQUENCY, "1/f corner of the voltage noise"),
            new Numeric(IN, Dimension.CURRENT_DENSITY, "white input current noise density"),
            new Numeric("in.corner", Dimension.FREQUENCY, "1/f corner of the current noise"),
            new Numeric(SUPPLY_MIN, Dimension.VOLTAGE, "lowest total supply (V+ minus V-)"),
            new Numeric(SUPPLY_MAX, Dimension.VOLTAGE, "highest total supply (V+ minus V-)"),
            new Numeric(TEMPERATURE_MIN, Dimension.TEMPERATURE, "lower end of the rated ambient range"),
            new Numeric(TEMPERATURE_MAX, Dimension.TEMPERATURE, "upper end of the rated ambient range"),
            new Numeric(PRICE, Dimension.NUMBER, "unit price in the catalog's currency"),
            new Numeric(IQ, Dimension.CURRENT, "quiescent current per amplifier"),
            new Numeric(CIN, Dimension.CAPACITANCE, "input capacitance, common-mode plus differential"),
            new Numeric(CHANNELS, Dimension.NUMBER, "amplifiers per package"),
            new Numeric(FCHOP, Dimension.FREQUENCY, "chopping or auto-zero frequency"),
            new Numeric(
                    AGING,
                    Dimension.VOLTAGE,
                    "long-term offset change over 1000 h (scaled with the square root of time)"),
            new Numeric("ios.maxtemp", Dimension.CURRENT, "maximum input offset current over temperature"),
            new Numeric("long-term-drift.value", Dimension.VOLTAGE, "long-term offset change as the catalog gives it"),
            new Numeric("long-term-drift.per", Dimension.TIME, "the time the long-term offset change is given for"),
            new Numeric("input-headroom.low", Dimension.VOLTAGE, "how far above V- the inputs must stay"),
            new Numeric("input-headroom.high", Dimension.VOLTAGE, "how far below V+ the inputs must stay"),
            new Numeric("output-headroom.low", Dimension.VOLTAGE, "how close to V- the output swings"),
            new Numeric("output-headroom.high", Dimension.VOLTAGE, "how close to V+ the output swings"),
            new Numeric("price.quantity", Dimension.NUMBER, "the quantity the price is given for"),
            // operating point
            new Numeric("test-conditions.supply", Dimension.VOLTAGE, "total supply of the datasheet's 25 °C table"),
            new Numeric(
                    "test-conditions.common-mode",
                    Dimension.VOLTAGE,
                    "common mode of the datasheet's 25 °C table, above the negative rail"),
            new Numeric(
                    "input-crossover.from-positive-rail",
                    Dimension.VOLTAGE,
                    "where a rail-to-rail input hands over between its pairs, below the positive rail"),
            new Numeric("input-crossover.offset-step", Dimension.VOLTAGE, "the offset step at the input crossover"),
            new Numeric(THETA_JA, Dimension.THERMAL_RESISTANCE, "junction-to-ambient thermal resistance"),
            new Numeric(RIPPLE, Dimension.VOLTAGE, "input-referred chopping ripple at the chopping frequency"));

    // ------------------------------------------------------------ ranges (rated at a value)

    public static final String SUPPLY = "supply";
    public static final String TEMPERATURE = "temperature";

    /**
     * A rated interval, indexed as a {@code DoubleRange}. A query names the condition the stage
     * will see, and the part must be rated for it: {@code supply>=5V} and {@code supply=5V} both
     * mean "runs on 5 V" (min <= 5 V <= max); {@code >} and {@code <} also need the rating to
     * extend beyond the value on that side; {@code lo..hi} needs the whole interval.
     */
    public record Interval(String name, Dimension dimension, String min, String max, String meaning) {}

    public static final List<Interval> INTERVALS = List.of(
            new Interval(
                    SUPPLY,
                    Dimension.VOLTAGE,
                    SUPPLY_MIN,
                    SUPPLY_MAX,
                    "total supply the part is rated for: supply>=5V means it runs on 5 V"),
            new Interval(
                    TEMPERATURE,
                    Dimension.TEMPERATURE,
                    TEMPERATURE_MIN,
                    TEMPERATURE_MAX,
                    "rated ambient range: temperature>=125C means rated up to 125 °C or beyond"));

    /** Other spellings users reach for. */
    public static final Map<String, String> ALIASES = aliases();

    private static Map<String, String> aliases() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("temp", TEMPERATURE);
        m.put("offset", VOS);
        m.put("tc", DRIFT);
        m.put("quiescent", IQ);
        m.put("pkg", PACKAGE);
        m.put("arch", ARCHITECTURE);
        // the catalog's own key names, so a user can search by what they typed
        m.put("factory-trim", TRIM);
        m.put("packages", PACKAGE);
        m.put("tags", TAG);
        m.put("vos.max-over-temp", "vos.maxtemp");
        m.put("vos-drift", DRIFT);
        m.put("vos-drift.typ", "drift.typ");
        m.put("vos-drift.max", "drift.max");
        m.put("ib.max-over-temp", "ib.maxtemp");
        m.put("ios.max-over-temp", "ios.maxtemp");
        m.put("noise.en", EN);
        m.put("noise.en-corner", "en.corner");
        m.put("noise.in", IN);
        m.put("noise.in-corner", "in.corner");
        m.put("price.unit", PRICE);
        m.put("price.currency", CURRENCY);
        m.put("chopping-frequency", FCHOP);
        m.put("quiescent-current", IQ);
        m.put("input-capacitance", CIN);
        m.put("long-term-drift", AGING);
        m.put("chopping-ripple", RIPPLE);
        return m;
    }

    /** Every name a query may use (fields, then aliases), for suggestions and help. */
    public static List<String> queryNames() {
        return Stream.of(
                        KEYWORDS.stream().map(Keyword::name),
                        TEXTS.stream().map(Text::name),
                        NUMERIC.stream().map(Numeric::name),
                        INTERVALS.stream().map(Interval::name),
                        ALIASES.keySet().stream())
                .flatMap(s -> s)
                .toList();
    }
}
