package dev.ampsieve.catalog;

import static dev.ampsieve.catalog.CatalogKeys.AOL;
import static dev.ampsieve.catalog.CatalogKeys.ARCHITECTURE;
import static dev.ampsieve.catalog.CatalogKeys.CHANNELS;
import static dev.ampsieve.catalog.CatalogKeys.CHOPPING_FREQUENCY;
import static dev.ampsieve.catalog.CatalogKeys.CHOPPING_RIPPLE;
import static dev.ampsieve.catalog.CatalogKeys.CMRR;
import static dev.ampsieve.catalog.CatalogKeys.COMMON_MODE;
import static dev.ampsieve.catalog.CatalogKeys.CURRENCY;
import static dev.ampsieve.catalog.CatalogKeys.EN;
import static dev.ampsieve.catalog.CatalogKeys.EN_CORNER;
import static dev.ampsieve.catalog.CatalogKeys.FACTORY_TRIM;
import static dev.ampsieve.catalog.CatalogKeys.FROM_POSITIVE_RAIL;
import static dev.ampsieve.catalog.CatalogKeys.GBW;
import static dev.ampsieve.catalog.CatalogKeys.HIGH;
import static dev.ampsieve.catalog.CatalogKeys.IB;
import static dev.ampsieve.catalog.CatalogKeys.ID;
import static dev.ampsieve.catalog.CatalogKeys.IN;
import static dev.ampsieve.catalog.CatalogKeys.INPUT;
import static dev.ampsieve.catalog.CatalogKeys.INPUT_CAPACITANCE;
import static dev.ampsieve.catalog.CatalogKeys.INPUT_CROSSOVER;
import static dev.ampsieve.catalog.CatalogKeys.INPUT_HEADROOM;
import static dev.ampsieve.catalog.CatalogKeys.IN_CORNER;
import static dev.ampsieve.catalog.CatalogKeys.IOS;
import static dev.ampsieve.catalog.CatalogKeys.LONG_TERM_DRIFT;
import static dev.ampsieve.catalog.CatalogKeys.LOW;
import static dev.ampsieve.catalog.CatalogKeys.MAX;
import static dev.ampsieve.catalog.CatalogKeys.MAX_OVER_TEMP;
import static dev.ampsieve.catalog.CatalogKeys.MIN;
import static dev.ampsieve.catalog.CatalogKeys.NOISE;
import static dev.ampsieve.catalog.CatalogKeys.NOTES;
import static dev.ampsieve.catalog.CatalogKeys.NULL_PINS;
import static dev.ampsieve.catalog.CatalogKeys.OFFSET_STEP;
import static dev.ampsieve.catalog.CatalogKeys.OUTPUT_HEADROOM;
import static dev.ampsieve.catalog.CatalogKeys.PACKAGES;
import static dev.ampsieve.catalog.CatalogKeys.PARTS;
import static dev.ampsieve.catalog.CatalogKeys.PER;
import static dev.ampsieve.catalog.CatalogKeys.PRICE;
import static dev.ampsieve.catalog.CatalogKeys.PSRR;
import static dev.ampsieve.catalog.CatalogKeys.QUANTITY;
import static dev.ampsieve.catalog.CatalogKeys.QUIESCENT_CURRENT;
import static dev.ampsieve.catalog.CatalogKeys.SLEW;
import static dev.ampsieve.catalog.CatalogKeys.SOURCE;
import static dev.ampsieve.catalog.CatalogKeys.SUPPLY;
import static dev.ampsieve.catalog.CatalogKeys.TAGS;
import static dev.ampsieve.catalog.CatalogKeys.TEMPERATURE;
import static dev.ampsieve.catalog.CatalogKeys.TEST_CONDITIONS;
import static dev.ampsieve.catalog.CatalogKeys.THETA_JA;
import static dev.ampsieve.catalog.CatalogKeys.TITLE;
import static dev.ampsieve.catalog.CatalogKeys.TYP;
import static dev.ampsieve.catalog.CatalogKeys.UNIT;
import static dev.ampsieve.catalog.CatalogKeys.VALUE;
import static dev.ampsieve.catalog.CatalogKeys.VOS;
import static dev.ampsieve.catalog.CatalogKeys.VOS_DRIFT;
import static dev.ampsieve.catalog.CatalogKeys.path;
import static dev.ampsieve.yaml.Fields.join;

import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Reads one part (a YAML mapping) into a {@link Part}, collecting every problem: unknown
 * keys, missing required fields, wrong units, impossible signs and orderings, implausible
 * magnitudes (warnings) and impossible ones (errors), and the few absences worth a warning.
 * Absent optional values stay null; the budget decides what to assume and says so.
 */
final class PartReader {

    /** What reading one part gave: its id and where it was written (for duplicate checks), the part or null. */
    record Result(String prefix, String id, Located idAt, Part part, List<Problem> problems) {}

    /** Lowercase words of letters and digits joined by single dashes; no leading dash (it would read as an option). */
    static final Pattern ID_FORMAT = Pattern.compile("[a-z0-9]+(?:-[a-z0-9]+)*");

    static final int MAX_ID_LENGTH = 64;
    static final int MAX_CHANNELS = 64;

    /** An example value for each required key, for the "add ..." half of a message. */
    private static final Map<String, String> REQUIRED_EXAMPLE = Map.of(
            ID, "my-part-01",
            ARCHITECTURE, "standard",
            INPUT, "bipolar",
            VOS, "{typ: 0.5 mV, max: 2 mV}",
            GBW, "1 MHz",
            SUPPLY, "{min: 4.5 V, max: 36 V}",
            TEMPERATURE, "{min: -40 C, max: 85 C}",
            PRICE, "{unit: 1.20, quantity: 1000}");

    private final String prefix;
    private final Node.Mapping part;
    private final List<Problem> problems = new ArrayList<>();
    private final Fields f = new Fields(problems);
    /** Quantities read so far, by key path (vos.max), and where each was written. */
    private final Map<String, Double> values = new HashMap<>();

    private final Map<String, Located> at = new HashMap<>();
    /** Key paths written in the file, valid or not: an absence warning is only for keys really absent. */
    private final Set<String> written = new HashSet<>();

    private PartReader(String prefix, Node.Mapping part) {
        this.prefix = prefix;
        this.part = part;
    }

    /**
     * @param prefix field-path prefix for messages: "" in a single-part file, {@code parts[3]} in a list
     * @param topLevel true when the part is the whole file (a misspelt {@code parts:} then gets suggested)
     */
    static Result read(Node node, String prefix, boolean topLevel) {
        if (!(node instanceof Node.Mapping m)) {
            List<Problem> p = List.of(Problem.error(
                    node.at(),
                    prefix,
                    "expected a part (id: ..., architecture: ..., ...), found " + node.kind(),
                    "write each part as 'key: value' lines; see catalog-template/part.yaml"));
            return new Result(prefix, null, node.at(), null, p);
        }
        return new PartReader(prefix, m).read(topLevel);
    }

    /**
     * The part keys as a set for the look-up of every key of every part, iterated in the catalog's
     * order for messages; a search of the list was a tenth of reading a part.
     */
    private static final Set<String> PART_KEY_SET =
            Collections.unmodifiableSet(new LinkedHashSet<>(CatalogKeys.PART_KEYS));

    /** Suggestions for an unknown key at the top of a file: the part keys and {@code parts}. */
    private static final List<String> TOP_LEVEL_SUGGEST =
            Stream.concat(CatalogKeys.PART_KEYS.stream(), Stream.of(PARTS)).toList();

    private Result read(boolean topLevel) {
        f.onlyKeys(part, prefix, PART_KEY_SET, topLevel ? TOP_LEVEL_SUGGEST : CatalogKeys.PART_KEYS);
        for (String key : CatalogKeys.REQUIRED) {
            f.require(part, prefix, key, REQUIRED_EXAMPLE.get(key));
        }

        String id = readId();
        Located idAt = Fields.where(part, ID);
        String title = f.text(part, prefix, TITLE);
        String arch = f.choice(part, prefix, ARCHITECTURE, ARCHITECTURES);
        String input = f.choice(part, prefix, INPUT, INPUTS);
        String trim = f.choice(part, prefix, FACTORY_TRIM, TRIMS);
        Boolean nullPins = f.bool(part, prefix, NULL_PINS);
        Integer channels = f.integer(part, prefix, CHANNELS, 1, MAX_CHANNELS);
        List<String> packages = f.strings(part, prefix, PACKAGES);
        List<String> tags = f.strings(part, prefix, TAGS);

        Price price = readPrice();
        Range supply = readRange(SUPPLY);
        Range temperature = readRange(TEMPERATURE);
        Spread vos = readSpread(VOS, true);
        Node.Mapping drift = section(VOS_DRIFT);
        Spread vosDrift = drift == null
                ? null
                : new Spread(quantity(drift, VOS_DRIFT, TYP), quantity(drift, VOS_DRIFT, MAX), null);
        Spread ib = readSpread(IB, false);
        Spread ios = readSpread(IOS, false);
        MinTyp cmrr = readMinTyp(CMRR);
        MinTyp psrr = readMinTyp(PSRR);
        MinTyp aol = readMinTyp(AOL);
        Double gbw = quantity(part, null, GBW);
        Double slew = quantity(part, null, SLEW);
        Noise noise = readNoise();
        LongTermDrift ltd = readLongTermDrift();
        Headroom inHead = readHeadroom(INPUT_HEADROOM);
        Headroom outHead = readHeadroom(OUTPUT_HEADROOM);
        Double chop = quantity(part, null, CHOPPING_FREQUENCY);
        Double iq = quantity(part, null, QUIESCENT_CURRENT);
        Double cin = quantity(part, null, INPUT_CAPACITANCE);
        TestConditions tests = readTestConditions();
        InputCrossover crossover = readCrossover();
        Double thetaJa = quantity(part, null, THETA_JA);
        Double ripple = quantity(part, null, CHOPPING_RIPPLE);
        Measured measured = readMeasured();
        String source = f.text(part, prefix, SOURCE);
        String notes = f.text(part, prefix, NOTES);

        checkSigns();
        checkOrder();
        checkBounds();
        if (!f.hasErrors()) {
            warnAbsences(arch, input); // secondary: not worth a line while the part cannot load anyway
        }

        if (f.hasErrors()) {
            return new Result(prefix, id, idAt, null, problems);
        }
        Part p = new Part(
                id,
                title,
                Architecture.of(arch),
                InputType.of(input),
                trim == null ? FactoryTrim.NONE : FactoryTrim.of(trim),
                nullPins != null && nullPins,
                channels == null ? 1 : channels,
                packages,
                tags,
                price,
                supply,
                temperature,
                vos,
                vosDrift,
                ib,
                ios,
                cmrr,
                psrr,
                aol,
                gbw,
                slew,
                noise,
                ltd,
                inHead,
                outHead,
                chop,
                iq,
                cin,
                tests,
                crossover,
                thetaJa,
                ripple,
                measured,
                source,
                notes,
                part.at());
        return new Result(prefix, id, idAt, p, problems);
    }

    // ------------------------------------------------------------------ reading

    private String readId() {
        String id = f.text(part, prefix, ID);
        if (id == null) {
            return null;
        }
        Problem bad = idProblem(id, Fields.where(part, ID), join(prefix, ID));
        if (bad != null) {
            problems.add(bad);
            return null;
        }
        return id;
    }

    /** The catalog's id rule: null when {@code id} is valid, else the error, at {@code at}. */
    static Problem idProblem(String id, Located at, String field) {
        if (id.length() > MAX_ID_LENGTH || !ID_FORMAT.matcher(id).matches()) {
            return Problem.error(
                    at,
                    field,
                    "'" + id + "' is not a valid id (lowercase letters, digits and single dashes," + " at most "
                            + MAX_ID_LENGTH + " characters)",
                    "write for example '" + suggestId(id) + "'");
        }
        return null;
    }

    /** The nearest valid id: lowercase, runs of other characters turned into one dash. */
    static String suggestId(String id) {
        String s = id.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        if (s.length() > MAX_ID_LENGTH) {
            s = s.substring(0, MAX_ID_LENGTH).replaceAll("-+$", "");
        }
        return s.isEmpty() ? "my-part-01" : s;
    }

    private static final List<String> ARCHITECTURES =
            Arrays.stream(Architecture.values()).map(Architecture::key).toList();
    private static final List<String> INPUTS =
            Arrays.stream(InputType.values()).map(InputType::key).toList();
    private static final List<String> TRIMS =
            Arrays.stream(FactoryTrim.values()).map(FactoryTrim::key).toList();

    /**
     * {@code measured: {file: lot.csv}}: only where the file is (relative to this catalog file's folder);
     * its units are read when a budget needs them ({@link LotReader}), so the parse stays cheap.
     */
    private Measured readMeasured() {
        Node.Mapping m = section(CatalogKeys.MEASURED);
        if (m == null) {
            return null;
        }
        String field = join(prefix, CatalogKeys.MEASURED);
        String file = f.text(m, field, CatalogKeys.FILE);
        Located at = Fields.where(m, CatalogKeys.FILE);
        if (file == null || file.isBlank()) {
            if (file != null || !m.entries().containsKey(CatalogKeys.FILE)) {
                f.error(
                        at,
                        join(field, CatalogKeys.FILE),
                        "no lot file named",
                        "write 'measured: {file: lot.csv}' (a path relative to this catalog file)");
            }
            return null;
        }
        Path catalogFile = part.at().file();
        Path dir = catalogFile == null || catalogFile.getParent() == null ? Path.of("") : catalogFile.getParent();
        Path resolved;
        try {
            resolved = dir.resolve(file).normalize();
        } catch (InvalidPathException e) {
            f.error(
                    at,
                    join(field, CatalogKeys.FILE),
                    "'" + file + "' is not a valid path",
                    "write a file name such as lot.csv");
            return null;
        }
        return new Measured(file, resolved, at, null);
    }

    /** The mapping at {@code key}, its keys checked; null when absent or not a mapping (with a problem). */
    private Node.Mapping section(String key) {
        Node v = part.entries().get(key);
        if (v == null || v instanceof Node.Scalar s && s.text() == null) {
            return null;
        }
        List<String> sub = CatalogKeys.subKeys(key);
        if (v instanceof Node.Mapping m) {
            f.onlyKeys(m, join(prefix, key), sub);
            return m;
        }
        String first = sub.contains(MAX) ? MAX : sub.get(0);
        Dimension d = CatalogKeys.dimension(path(key, first));
        // "vos: 2 mV" most likely meant the maximum: show the user's own value in place
        String example = v instanceof Node.Scalar s ? s.text() : d == null ? "..." : d.example();
        f.error(
                v.at(),
                join(prefix, key),
                "expected its keys (" + String.join(", ", sub) + ") below it, found " + v.kind(),
                "write '" + key + ": {" + first + ": " + example + "}'");
        return null;
    }

    /** A quantity of the dimension {@link CatalogKeys} gives its path; remembered for the checks. */
    private Double quantity(Node.Mapping m, String section, String key) {
        String keyPath = section == null ? key : path(section, key);
        Dimension d = CatalogKeys.dimension(keyPath);
        if (m.entries().containsKey(key)) {
            written.add(keyPath);
        }
        Double v =
                f.quantity(m, section == null ? prefix : join(prefix, section), key, d, CatalogKeys.example(keyPath));
        if (v != null) {
            values.put(keyPath, v);
            at.put(keyPath, Fields.where(m, key));
        }
        return v;
    }

    /** Examples for the fix when a key inside a section is missing, where the dimension's own would mislead. */
    private static final Map<String, String> SECTION_EXAMPLE = Map.of(
            path(PRICE, UNIT), "1.20",
            path(SUPPLY, MIN), "4.5 V",
            path(SUPPLY, MAX), "36 V",
            path(TEMPERATURE, MIN), "-40 C",
            path(TEMPERATURE, MAX), "85 C",
            path(LONG_TERM_DRIFT, VALUE), "0.5 uV",
            path(INPUT_HEADROOM, LOW), "1 V",
            path(INPUT_HEADROOM, HIGH), "1 V",
            path(OUTPUT_HEADROOM, LOW), "0.2 V",
            path(OUTPUT_HEADROOM, HIGH), "0.2 V");

    /** Errors when {@code key} is missing inside a present section. */
    private void requireIn(Node.Mapping m, String section, String key) {
        String example = SECTION_EXAMPLE.get(path(section, key));
        String fallback = CatalogKeys.example(path(section, key));
        f.require(m, join(prefix, section), key, example != null ? example : fallback != null ? fallback : "...");
    }

    /** At most this many price breaks; distributors list a handful. */
    static final int MAX_PRICE_BREAKS = 100;

    private Price readPrice() {
        if (part.entries().get(PRICE) instanceof Node.Seq seq) {
            return readPriceBreaks(seq);
        }
        Node.Mapping m = section(PRICE);
        if (m == null) {
            return null;
        }
        requireIn(m, PRICE, UNIT);
        Double unit = quantity(m, PRICE, UNIT);
        Integer qty = f.integer(m, join(prefix, PRICE), QUANTITY, 1, 1_000_000_000);
        String currency = f.text(m, join(prefix, PRICE), CURRENCY);
        return unit == null ? null : new Price(unit, qty == null ? 1 : qty, currency);
    }

    /**
     * The list form: {@code price: [{quantity: 1, unit: 2.10, currency: USD}, {quantity: 1000, unit: 1.25}]}.
     * Each break needs both keys; quantities are distinct; a currency may be written on any break
     * and all that are written must agree. A larger order priced higher than a smaller one is
     * warned about (usually swapped columns).
     */
    private Price readPriceBreaks(Node.Seq seq) {
        String field = join(prefix, PRICE);
        if (seq.items().isEmpty()) {
            f.error(
                    seq.at(),
                    field,
                    "the list of price breaks is empty",
                    "write '- {quantity: 1, unit: 2.10}' items, or 'price: {unit: 1.20, quantity: 1000}'");
            return null;
        }
        if (seq.items().size() > MAX_PRICE_BREAKS) {
            f.error(
                    seq.at(),
                    field,
                    seq.items().size() + " price breaks, more than " + MAX_PRICE_BREAKS,
                    "keep the breaks your orders can reach");
            return null;
        }
        List<Price.Break> breaks = new ArrayList<>();
        Map<Integer, String> seen = new HashMap<>();
        String currency = null;
        String currencyField = null;
        boolean ok = true;
        for (int i = 0; i < seq.items().size(); i++) {
            String itemField = field + "[" + i + "]";
            Node item = seq.items().get(i);
            if (!(item instanceof Node.Mapping m)) {
                f.error(
                        item.at(),
                        itemField,
                        "expected a price break {quantity, unit}, found " + item.kind(),
                        "write '- {quantity: 1000, unit: 1.25}'");
                ok = false;
                continue;
            }
            f.onlyKeys(m, itemField, CatalogKeys.subKeys(PRICE));
            f.require(m, itemField, QUANTITY, "1000");
            f.require(m, itemField, UNIT, "1.25");
            Integer qty = f.integer(m, itemField, QUANTITY, 1, 1_000_000_000);
            Double unit = f.quantity(m, itemField, UNIT, CatalogKeys.dimension(path(PRICE, UNIT)));
            String cur = f.text(m, itemField, CURRENCY);
            if (cur != null) {
                if (currency != null && !currency.equals(cur)) {
                    f.error(
                            Fields.where(m, CURRENCY),
                            join(itemField, CURRENCY),
                            "'" + cur + "' differs from '" + currency + "' at " + currencyField,
                            "give every break in one currency");
                    ok = false;
                } else if (currency == null) {
                    currency = cur;
                    currencyField = join(itemField, CURRENCY);
                }
            }
            if (unit != null) {
                Located unitAt = Fields.where(m, UNIT);
                if (unit < 0) {
                    f.error(
                            unitAt,
                            join(itemField, UNIT),
                            new CatalogFact.Sign(
                                    new Quantity(unit, Dimension.NUMBER),
                                    true,
                                    "write the unit price as a positive number"));
                } else {
                    checkBound(path(PRICE, UNIT), join(itemField, UNIT), unit, unitAt);
                }
            }
            if (qty != null && seen.containsKey(qty)) {
                f.error(
                        Fields.where(m, QUANTITY),
                        join(itemField, QUANTITY),
                        "quantity " + qty + " is already a break at " + seen.get(qty),
                        "give each break its own quantity");
                ok = false;
            } else if (qty != null) {
                seen.put(qty, itemField);
            }
            if (qty == null || unit == null) {
                ok = false;
            } else {
                breaks.add(new Price.Break(qty, unit));
            }
        }
        if (!ok || f.hasErrors()) {
            return null;
        }
        Price price = new Price(breaks, currency);
        for (int i = 1; i < price.breaks().size(); i++) {
            Price.Break lower = price.breaks().get(i - 1);
            Price.Break higher = price.breaks().get(i);
            if (higher.unit() > lower.unit()) {
                f.warning(
                        seq.at(),
                        field,
                        new CatalogFact.PriceRises(higher.quantity(), higher.unit(), lower.quantity(), lower.unit()));
            }
        }
        return price;
    }

    private Range readRange(String key) {
        Node.Mapping m = section(key);
        if (m == null) {
            return null;
        }
        requireIn(m, key, MIN);
        requireIn(m, key, MAX);
        Double min = quantity(m, key, MIN);
        Double max = quantity(m, key, MAX);
        return min == null || max == null ? null : new Range(min, max);
    }

    private Spread readSpread(String key, boolean typOrMaxRequired) {
        Node.Mapping m = section(key);
        if (m == null) {
            return null;
        }
        Spread s = new Spread(quantity(m, key, TYP), quantity(m, key, MAX), quantity(m, key, MAX_OVER_TEMP));
        // a value, not only a key: 'max:' left empty gives no figure either
        if (typOrMaxRequired && !written(m, TYP) && !written(m, MAX)) {
            f.error(
                    m.at(),
                    join(prefix, key),
                    "neither typ nor max is given",
                    "add 'max: " + CatalogKeys.dimension(path(key, MAX)).example()
                            + "' from the datasheet's 25 °C column (typ when it gives no max)");
        }
        return s.isEmpty() ? null : s;
    }

    /** The key holds something (possibly wrong) rather than nothing. */
    private static boolean written(Node.Mapping m, String key) {
        Node v = m.entries().get(key);
        return v != null && !(v instanceof Node.Scalar s && s.text() == null);
    }

    private MinTyp readMinTyp(String key) {
        Node.Mapping m = section(key);
        return m == null ? null : new MinTyp(quantity(m, key, MIN), quantity(m, key, TYP));
    }

    private Noise readNoise() {
        Node.Mapping m = section(NOISE);
        if (m == null) {
            return null;
        }
        return new Noise(
                quantity(m, NOISE, EN),
                quantity(m, NOISE, EN_CORNER),
                quantity(m, NOISE, IN),
                quantity(m, NOISE, IN_CORNER));
    }

    private LongTermDrift readLongTermDrift() {
        Node.Mapping m = section(LONG_TERM_DRIFT);
        if (m == null) {
            return null;
        }
        requireIn(m, LONG_TERM_DRIFT, VALUE);
        requireIn(m, LONG_TERM_DRIFT, PER);
        Double value = quantity(m, LONG_TERM_DRIFT, VALUE);
        Double per = quantity(m, LONG_TERM_DRIFT, PER);
        return value == null || per == null ? null : new LongTermDrift(value, per);
    }

    private Headroom readHeadroom(String key) {
        Node.Mapping m = section(key);
        if (m == null) {
            return null;
        }
        requireIn(m, key, LOW);
        requireIn(m, key, HIGH);
        Double low = quantity(m, key, LOW);
        Double high = quantity(m, key, HIGH);
        return low == null || high == null ? null : new Headroom(low, high);
    }

    /** {@code test-conditions: {supply, common-mode}}: either may be left out. */
    private TestConditions readTestConditions() {
        Node.Mapping m = section(TEST_CONDITIONS);
        if (m == null) {
            return null;
        }
        Double vs = quantity(m, TEST_CONDITIONS, SUPPLY);
        Double cm = quantity(m, TEST_CONDITIONS, COMMON_MODE);
        return vs == null && cm == null ? null : new TestConditions(vs, cm);
    }

    /** {@code input-crossover: {from-positive-rail, offset-step}}: both are needed. */
    private InputCrossover readCrossover() {
        Node.Mapping m = section(INPUT_CROSSOVER);
        if (m == null) {
            return null;
        }
        requireIn(m, INPUT_CROSSOVER, FROM_POSITIVE_RAIL);
        requireIn(m, INPUT_CROSSOVER, OFFSET_STEP);
        Double from = quantity(m, INPUT_CROSSOVER, FROM_POSITIVE_RAIL);
        Double step = quantity(m, INPUT_CROSSOVER, OFFSET_STEP);
        return from == null || step == null ? null : new InputCrossover(from, step);
    }

    // ------------------------------------------------------------------ checks

    private static final String MAGNITUDE_FIX = "write the magnitude without a sign: the value is read as a ± limit";

    private void checkSigns() {
        for (String s : List.of(VOS, IOS)) {
            for (String k : List.of(TYP, MAX, MAX_OVER_TEMP)) {
                nonNegative(path(s, k), MAGNITUDE_FIX);
            }
        }
        nonNegative(path(VOS_DRIFT, TYP), MAGNITUDE_FIX);
        nonNegative(path(VOS_DRIFT, MAX), MAGNITUDE_FIX);
        // bias-cancelled and PNP-input parts have a negative typical bias current; the limits are magnitudes
        String ibFix = "write the limit as a magnitude; only ib.typ may carry a sign (current out of the pin)";
        nonNegative(path(IB, MAX), ibFix);
        nonNegative(path(IB, MAX_OVER_TEMP), ibFix);
        for (String s : List.of(CMRR, PSRR, AOL)) {
            for (String k : List.of(MIN, TYP)) {
                nonNegative(
                        path(s, k),
                        "write the level as a positive number of dB (some datasheets print -100 dB for 100 dB)");
            }
        }
        positive(path(SUPPLY, MIN), "write the total supply (V+ minus V-), for example '2.7 V'");
        positive(path(SUPPLY, MAX), "write the total supply (V+ minus V-), for example '36 V'");
        positive(GBW, "write the gain-bandwidth product from the datasheet, for example '1.5 MHz'");
        positive(
                SLEW,
                "write the slew rate as a positive value, for example '0.5 V/us'; leave the key out when unknown");
        positive(path(NOISE, EN), "write the white-noise density, for example '12 nV/rtHz'; leave it out when unknown");
        positive(path(NOISE, IN), "write the white-noise density, for example '3 fA/rtHz'; leave it out when unknown");
        nonNegative(path(NOISE, EN_CORNER), "write 0 Hz when there is no 1/f region, else the corner frequency");
        nonNegative(path(NOISE, IN_CORNER), "write 0 Hz when there is no 1/f region, else the corner frequency");
        nonNegative(path(PRICE, UNIT), "write the unit price as a positive number");
        nonNegative(path(LONG_TERM_DRIFT, VALUE), MAGNITUDE_FIX);
        positive(path(LONG_TERM_DRIFT, PER), "write the time the drift figure is given for, for example '1000 h'");
        positive(CHOPPING_FREQUENCY, "write the chopping or auto-zero clock, for example '100 kHz'");
        positive(QUIESCENT_CURRENT, "write the supply current, for example '1.5 mA'");
        positive(
                INPUT_CAPACITANCE,
                "write the common-mode plus differential input capacitance, for example '7 pF';"
                        + " leave the key out when unknown");
        positive(
                path(TEST_CONDITIONS, SUPPLY),
                "write the total supply of the datasheet's table (V+ minus V-), for example '30 V'");
        nonNegative(
                path(TEST_CONDITIONS, COMMON_MODE),
                "write the common mode in volts above the negative rail" + " (mid-supply of a 30 V table is '15 V')");
        nonNegative(
                path(INPUT_CROSSOVER, FROM_POSITIVE_RAIL),
                "write the distance below the positive rail as a" + " positive value, for example '1.2 V'");
        nonNegative(path(INPUT_CROSSOVER, OFFSET_STEP), MAGNITUDE_FIX);
        positive(
                THETA_JA,
                "write the package's junction-to-ambient thermal resistance, for example '150 C/W';"
                        + " leave the key out when unknown");
        nonNegative(CHOPPING_RIPPLE, MAGNITUDE_FIX);
    }

    private void checkOrder() {
        String spreadFix =
                "typ is the usual value and max the guaranteed limit; check which datasheet column each came from";
        String tempFix = "max-over-temp covers the whole rated range, which includes 25 °C, so it is at least max;"
                + " check the columns";
        for (String s : List.of(VOS, IB, IOS)) {
            notAbove(path(s, TYP), path(s, MAX), s.equals(IB), spreadFix);
            if (values.get(path(s, MAX)) == null) {
                notAbove(path(s, TYP), path(s, MAX_OVER_TEMP), s.equals(IB), spreadFix);
            }
            notAbove(path(s, MAX), path(s, MAX_OVER_TEMP), false, tempFix);
        }
        notAbove(path(VOS_DRIFT, TYP), path(VOS_DRIFT, MAX), false, spreadFix);
        for (String s : List.of(VOS, VOS_DRIFT, IB, IOS)) {
            farAbove(path(s, TYP), path(s, MAX));
        }
        for (String s : List.of(CMRR, PSRR, AOL)) {
            notAbove(
                    path(s, MIN),
                    path(s, TYP),
                    false,
                    "min is the guaranteed floor and typ the usual value; check which datasheet column each came from");
        }
        notAbove(path(SUPPLY, MIN), path(SUPPLY, MAX), false, "swap them: min is the lowest total supply");
        notAbove(path(TEMPERATURE, MIN), path(TEMPERATURE, MAX), false, "swap them: min is the coldest rated ambient");
        notAbove(
                path(TEST_CONDITIONS, COMMON_MODE),
                path(TEST_CONDITIONS, SUPPLY),
                false,
                "the common mode is measured above the negative rail, so it lies inside the supply; check the datasheet's conditions");
        notAbove(
                path(INPUT_CROSSOVER, FROM_POSITIVE_RAIL),
                path(SUPPLY, MAX),
                false,
                "the crossover lies between the rails; write its distance below the positive rail");
    }

    /**
     * Sizes against {@link CatalogKeys#BOUNDS}: beyond an error bound the part is refused (no op
     * amp has such a value, and the budget's arithmetic must stay finite); beyond a warning
     * bound it loads with a warning.
     */
    private void checkBounds() {
        for (Map.Entry<String, CatalogKeys.Bounds> e : CatalogKeys.BOUNDS.entrySet()) {
            String keyPath = e.getKey();
            Double v = values.get(keyPath);
            if (v == null) {
                continue;
            }
            checkBound(keyPath, join(prefix, keyPath), v, at.get(keyPath));
        }
    }

    /** One value against the bounds of {@code keyPath}; problems go to {@code field} at {@code where}. */
    private void checkBound(String keyPath, String field, double v, Located where) {
        CatalogKeys.Bounds b = CatalogKeys.BOUNDS.get(keyPath);
        Dimension d = CatalogKeys.dimension(keyPath);
        double x = b.signed() ? v : Math.abs(v);
        boolean sized = b.signed() || x > 0; // zero is for the sign checks
        Quantity q = new Quantity(v, d);
        if (x > b.errorAbove()) {
            f.error(where, field, new CatalogFact.OutOfBounds(q, b.errorAbove(), true, true, b.signed(), b.why()));
        } else if (sized && x < b.errorBelow()) {
            f.error(where, field, new CatalogFact.OutOfBounds(q, b.errorBelow(), false, true, b.signed(), b.why()));
        } else if (x > b.warnAbove()) {
            f.warning(where, field, new CatalogFact.OutOfBounds(q, b.warnAbove(), true, false, b.signed(), b.why()));
        } else if (sized && x < b.warnBelow()) {
            f.warning(where, field, new CatalogFact.OutOfBounds(q, b.warnBelow(), false, false, b.signed(), b.why()));
        }
    }

    /** Absences the user should hear about now, because the budget will assume something. */
    private void warnAbsences(String arch, String input) {
        if (arch == null || input == null) {
            if (!written.contains(path(NOISE, EN))) {
                problems.add(Problem.warning(
                        part.at(),
                        join(prefix, path(NOISE, EN)),
                        "not given: it will be estimated (common practice, conservative) and marked estimated",
                        "add 'noise: {en: 12 nV/rtHz}' with the datasheet's white-noise density"));
            }
            return;
        }
        // every figure the budget estimates when absent (budget.Assumed): said here, at check time
        boolean selfCorrecting = !arch.equals(Architecture.STANDARD.key());
        boolean plainBipolar = !selfCorrecting && input.equals(InputType.BIPOLAR.key());
        String kind = selfCorrecting ? arch + " (" + input + ")" : input;
        String estimated =
                " will be estimated for a " + kind + " input (common practice, conservative) and marked estimated";
        List<String> noise = new ArrayList<>();
        noise.add(EN);
        if (!selfCorrecting) {
            noise.add(EN_CORNER);
        }
        noise.add(IN);
        if (plainBipolar) {
            noise.add(IN_CORNER);
        }
        List<String> absent =
                noise.stream().filter(k -> !written.contains(path(NOISE, k))).toList();
        boolean noNoise = noise.stream().noneMatch(k -> written.contains(path(NOISE, k)))
                && !written.contains(path(NOISE, EN_CORNER))
                && !written.contains(path(NOISE, IN_CORNER));
        if (noNoise) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, NOISE),
                    "not given: " + String.join(", ", absent) + estimated,
                    "add 'noise: {en: 12 nV/rtHz, in: 0.1 pA/rtHz}' with the datasheet's white-noise densities"
                            + (selfCorrecting ? "" : " and their 1/f corners")));
        } else {
            for (String k : absent) {
                problems.add(Problem.warning(
                        part.at(),
                        join(prefix, path(NOISE, k)),
                        "not given: it" + estimated,
                        "add noise." + k + " from the datasheet"));
            }
        }
        boolean noIb = !written.contains(path(IB, TYP))
                && !written.contains(path(IB, MAX))
                && !written.contains(path(IB, MAX_OVER_TEMP));
        if (noIb) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, IB),
                    "not given: bias current" + estimated,
                    "add 'ib: {typ: ..., max: ..., max-over-temp: ...}' from the datasheet"));
        }
        boolean noIos = !written.contains(path(IOS, TYP))
                && !written.contains(path(IOS, MAX))
                && !written.contains(path(IOS, MAX_OVER_TEMP));
        if (noIos) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, IOS),
                    "not given: offset current will be taken equal to ib (conservative) and marked estimated",
                    "add 'ios: {typ: ..., max: ..., max-over-temp: ...}' from the datasheet"));
        }
        for (String[] r : new String[][] {{CMRR, "60 dB"}, {PSRR, "60 dB"}, {AOL, "80 dB"}}) {
            if (!written.contains(path(r[0], MIN)) && !written.contains(path(r[0], TYP))) {
                problems.add(Problem.warning(
                        part.at(),
                        join(prefix, r[0]),
                        "not given: a pessimistic " + r[1] + " will be assumed and marked estimated",
                        "add '" + r[0] + ": {min: ..., typ: ...}' from the datasheet"));
            }
        }
        if (!written.contains(path(LONG_TERM_DRIFT, VALUE))) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, LONG_TERM_DRIFT),
                    "not given: aging over a stage's service life" + estimated,
                    "add 'long-term-drift: {value: ..., per: 1000 h}' from the datasheet"));
        }
        boolean noDrift = !written.contains(path(VOS_DRIFT, TYP)) && !written.contains(path(VOS_DRIFT, MAX));
        boolean standardBipolar = arch.equals(Architecture.STANDARD.key()) && input.equals(InputType.BIPOLAR.key());
        if (noDrift && standardBipolar) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, VOS_DRIFT),
                    "not given: drift will be estimated from vos (VOS/T rule, about 3.3 µV/°C per mV) and marked as estimated",
                    "add 'vos-drift: {typ: ..., max: ...}' when the datasheet gives it"));
        } else if (noDrift && !written.contains(path(VOS, MAX_OVER_TEMP))) {
            problems.add(Problem.warning(
                    part.at(),
                    join(prefix, VOS_DRIFT),
                    "not given, nor vos.max-over-temp: drift over temperature will be an assumed default,"
                            + " not a datasheet figure (the VOS/T estimate holds for standard bipolar inputs only)",
                    "add vos-drift or vos.max-over-temp from the datasheet"));
        }
    }

    private void nonNegative(String keyPath, String fix) {
        Double v = values.get(keyPath);
        if (v != null && v < 0) {
            err(keyPath, new CatalogFact.Sign(new Quantity(v, CatalogKeys.dimension(keyPath)), true, fix));
        }
    }

    private void positive(String keyPath, String fix) {
        Double v = values.get(keyPath);
        if (v != null && v <= 0) {
            err(keyPath, new CatalogFact.Sign(new Quantity(v, CatalogKeys.dimension(keyPath)), false, fix));
        }
    }

    /** Error at {@code low} when it exceeds {@code high}; {@code magnitude} compares |low| (signed ib.typ). */
    private void notAbove(String low, String high, boolean magnitude, String fix) {
        Double a = values.get(low);
        Double b = values.get(high);
        if (a == null || b == null || (magnitude ? Math.abs(a) : a) <= b) {
            return;
        }
        Dimension d = CatalogKeys.dimension(low);
        err(low, new CatalogFact.Order(last(low), new Quantity(a, d), last(high), new Quantity(b, d), fix));
    }

    /**
     * A maximum hundreds of times the typical value is almost always a prefix slip (uV typed as
     * mV); datasheets rarely put max more than 5 to 20 times typ (common practice). A warning,
     * since some specifications do spread that far.
     */
    private void farAbove(String typ, String max) {
        Double a = values.get(typ);
        Double b = values.get(max);
        if (a == null || b == null || a == 0 || Math.abs(b) < FAR_ABOVE * Math.abs(a)) {
            return;
        }
        Dimension d = CatalogKeys.dimension(typ);
        warn(
                max,
                new CatalogFact.Spread(
                        last(max), new Quantity(b, d), last(typ), new Quantity(a, d), Math.round(Math.abs(b / a))));
    }

    /** Ratio of max to typ beyond which a prefix slip is suspected. */
    static final double FAR_ABOVE = 100.0;

    private static String last(String keyPath) {
        return keyPath.substring(keyPath.lastIndexOf('.') + 1);
    }

    private void err(String keyPath, CatalogFact fact) {
        problems.add(Problem.error(at.get(keyPath), join(prefix, keyPath), fact));
    }

    private void warn(String keyPath, CatalogFact fact) {
        problems.add(Problem.warning(at.get(keyPath), join(prefix, keyPath), fact));
    }
}
