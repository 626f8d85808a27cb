package dev.ampsieve.sheet;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The spreadsheet layout of a catalog: one column per catalog key path ({@code vos.max},
 * {@code noise.en}), in the template's order, each quantity with the unit its header carries
 * ({@code vos.max [uV]}). Columns come from {@link CatalogKeys}, so a new catalog key is a new
 * column; only its unit ({@link #UNITS}) has to be added here, and a test fails until it is.
 *
 * <p>Headers are matched loosely: case, spaces, dots, dashes and underscores do not count
 * ({@code VOS max over temp} is {@code vos.max-over-temp}), and a few common spellings are
 * accepted ({@link #ALIASES}).
 */
public final class Columns {
    private Columns() {}

    /** What a column holds, which decides how a cell becomes YAML. */
    public enum Kind {
        TEXT,
        WORD,
        BOOLEAN,
        INTEGER,
        NUMBER,
        LIST,
        QUANTITY,
        BREAKS
    }

    /**
     * One column.
     *
     * @param path      the catalog key path ({@code price.breaks} for the list of price breaks)
     * @param unit      the unit a bare number in the column is read in (quantities), else null
     * @param dimension for quantities, else null
     */
    public record Column(String path, Kind kind, String unit, Dimension dimension) {
        /** The header as export writes it: {@code vos.max [uV]}. */
        public String header() {
            return unit == null ? path : path + " [" + unit + "]";
        }
    }

    /** The column of the price-break list: cells like {@code 1: 2.10; 1000: 1.25}. */
    public static final String PRICE_BREAKS = "price.breaks";

    /** The unit each quantity's column is written in: the one datasheets use for it. */
    static final Map<String, String> UNITS;

    /** Common spellings of a few headers (in matching form, see {@link #key}) and the path they mean. */
    public static final Map<String, String> ALIASES;

    /** Every column, template order. */
    public static final List<Column> ALL;

    private static final Map<String, Column> BY_KEY = new LinkedHashMap<>();

    static {
        Map<String, String> u = new LinkedHashMap<>();
        u.put("supply.min", "V");
        u.put("supply.max", "V");
        u.put("temperature.min", "°C");
        u.put("temperature.max", "°C");
        for (String k : List.of("typ", "max", "max-over-temp")) {
            u.put("vos." + k, "uV");
            u.put("ib." + k, "nA");
            u.put("ios." + k, "nA");
        }
        u.put("vos-drift.typ", "uV/°C");
        u.put("vos-drift.max", "uV/°C");
        for (String s : List.of("cmrr", "psrr", "aol")) {
            u.put(s + ".min", "dB");
            u.put(s + ".typ", "dB");
        }
        u.put("gbw", "MHz");
        u.put("slew", "V/us");
        u.put("noise.en", "nV/rtHz");
        u.put("noise.en-corner", "Hz");
        u.put("noise.in", "pA/rtHz");
        u.put("noise.in-corner", "Hz");
        u.put("long-term-drift.value", "uV");
        u.put("long-term-drift.per", "h");
        for (String s : List.of("input-headroom", "output-headroom")) {
            u.put(s + ".low", "V");
            u.put(s + ".high", "V");
        }
        u.put("chopping-frequency", "kHz");
        u.put("quiescent-current", "mA");
        u.put("input-capacitance", "pF");
        u.put("test-conditions.supply", "V");
        u.put("test-conditions.common-mode", "V");
        u.put("input-crossover.from-positive-rail", "V");
        u.put("input-crossover.offset-step", "uV");
        u.put("theta-ja", "°C/W");
        u.put("chopping-ripple", "uV");
        UNITS = Collections.unmodifiableMap(u);

        List<Column> all = new ArrayList<>();
        for (String key : CatalogKeys.PART_KEYS) {
            List<String> sub = CatalogKeys.subKeys(key);
            if (sub.isEmpty()) {
                all.add(column(key));
            } else {
                for (String s : sub) {
                    all.add(column(CatalogKeys.path(key, s)));
                }
                if (key.equals(CatalogKeys.PRICE)) {
                    all.add(new Column(PRICE_BREAKS, Kind.BREAKS, null, null));
                }
            }
        }
        ALL = List.copyOf(all);
        for (Column c : ALL) {
            if (BY_KEY.put(key(c.path()), c) != null) {
                throw new IllegalStateException("two columns match as " + key(c.path()));
            }
        }

        Map<String, String> a = new LinkedHashMap<>();
        for (String s : List.of("part", "partid", "name")) {
            a.put(s, CatalogKeys.ID);
        }
        a.put("description", CatalogKeys.TITLE);
        a.put("package", CatalogKeys.PACKAGES);
        a.put("tag", CatalogKeys.TAGS);
        a.put("unitprice", "price.unit");
        a.put("price", "price.unit");
        a.put("currency", "price.currency");
        a.put("pricequantity", "price.quantity");
        a.put("breaks", PRICE_BREAKS);
        a.put("pricebreak", PRICE_BREAKS);
        a.put("vsmin", "supply.min");
        a.put("vsmax", "supply.max");
        a.put("tmin", "temperature.min");
        a.put("tmax", "temperature.max");
        a.put("en", "noise.en");
        a.put("encorner", "noise.en-corner");
        a.put("incorner", "noise.in-corner");
        a.put("iq", "quiescent-current");
        a.put("cin", "input-capacitance");
        a.put("slewrate", "slew");
        a.put("gainbandwidth", "gbw");
        ALIASES = Collections.unmodifiableMap(a);
    }

    private static Column column(String path) {
        Dimension d = CatalogKeys.dimension(path);
        Kind kind = switch (path) {
            case CatalogKeys.ID,
                    CatalogKeys.TITLE,
                    CatalogKeys.SOURCE,
                    CatalogKeys.NOTES,
                    "price.currency",
                    "measured.file" -> Kind.TEXT;
            case CatalogKeys.ARCHITECTURE, CatalogKeys.INPUT, CatalogKeys.FACTORY_TRIM -> Kind.WORD;
            case CatalogKeys.NULL_PINS -> Kind.BOOLEAN;
            case CatalogKeys.CHANNELS, "price.quantity" -> Kind.INTEGER;
            case CatalogKeys.PACKAGES, CatalogKeys.TAGS -> Kind.LIST;
            default -> d == Dimension.NUMBER ? Kind.NUMBER : d != null ? Kind.QUANTITY : null;
        };
        if (kind == null) {
            throw new IllegalStateException("no column kind for catalog key " + path + "; add it to sheet.Columns");
        }
        if (kind == Kind.QUANTITY && !UNITS.containsKey(path)) {
            throw new IllegalStateException(
                    "no column unit for catalog quantity " + path + "; add it to sheet.Columns.UNITS");
        }
        return new Column(path, kind, kind == Kind.QUANTITY ? UNITS.get(path) : null, kind == Kind.QUANTITY ? d : null);
    }

    /** A header in matching form: lower case, letters and digits only ({@code Vos_Max} and {@code vos.max} agree). */
    static String key(String header) {
        return header.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]", "");
    }

    /** The column a header names (its unit already cut off), or null. */
    static Column find(String name) {
        String k = key(name);
        Column c = BY_KEY.get(k);
        if (c == null && ALIASES.containsKey(k)) {
            c = BY_KEY.get(key(ALIASES.get(k)));
        }
        return c;
    }

    /** The column of {@code path}. */
    static Column of(String path) {
        return BY_KEY.get(key(path));
    }
}
