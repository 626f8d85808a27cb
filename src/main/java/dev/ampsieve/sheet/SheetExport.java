package dev.ampsieve.sheet;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.dataformat.csv.CsvMapper;
import com.fasterxml.jackson.dataformat.csv.CsvSchema;
import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import dev.ampsieve.text.FormulaCells;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.UnitException;
import dev.ampsieve.units.Units;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;

/**
 * The catalog as one CSV sheet in the layout {@link SheetImport} reads: a header of key paths
 * with units in brackets ({@link Columns}), one row per part. Every number is written so that it
 * reads back as the same value (import of an export gives equal parts). A text cell a spreadsheet
 * could run as a formula gets a leading {@code '} ({@link FormulaCells}); import takes it off.
 * Text is written exactly as the catalog holds it (this is data for a file, not for a terminal).
 */
public final class SheetExport {
    private SheetExport() {}

    /** For a file: RFC 4180 lines end in CR LF. */
    public static String csv(List<Part> parts) {
        return csv(parts, "\r\n");
    }

    /** @param lineEnd "\r\n" for a file, "\n" for a terminal (which would show a CR as an escape) */
    public static String csv(List<Part> parts, String lineEnd) {
        List<List<String>> rows = new ArrayList<>();
        rows.add(Columns.ALL.stream().map(Columns.Column::header).toList());
        for (Part p : parts) {
            List<String> row = new ArrayList<>();
            for (Columns.Column c : Columns.ALL) {
                row.add(FormulaCells.defuse(cell(p, c)));
            }
            rows.add(row);
        }
        try {
            return new CsvMapper()
                    .writer(CsvSchema.emptySchema().withLineSeparator(lineEnd))
                    .writeValueAsString(rows);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("writing CSV text in memory", e);
        }
    }

    private static String cell(Part p, Columns.Column c) {
        Price price = p.price();
        return switch (c.path()) {
            case CatalogKeys.ID -> p.id();
            case CatalogKeys.TITLE -> p.title();
            case CatalogKeys.ARCHITECTURE -> p.architecture().key();
            case CatalogKeys.INPUT -> p.input().key();
            case CatalogKeys.FACTORY_TRIM -> p.factoryTrim().key();
            case CatalogKeys.NULL_PINS -> Boolean.toString(p.nullPins());
            case CatalogKeys.CHANNELS -> Integer.toString(p.channels());
            case CatalogKeys.PACKAGES -> String.join("; ", p.packages());
            case CatalogKeys.TAGS -> String.join("; ", p.tags());
            case "price.unit" -> price.hasBreaks() ? "" : plain(price.unit());
            case "price.quantity" -> price.hasBreaks() ? "" : Integer.toString(price.quantity());
            case "price.currency" -> price.currency();
            case Columns.PRICE_BREAKS ->
                price.hasBreaks()
                        ? String.join(
                                "; ",
                                price.breaks().stream()
                                        .map(b -> b.quantity() + ": " + plain(b.unit()))
                                        .toList())
                        : "";
            case CatalogKeys.SOURCE -> p.source();
            case CatalogKeys.NOTES -> p.notes();
            case "measured.file" -> p.measured() == null ? "" : p.measured().file();
            default -> {
                Double v = CatalogKeys.value(p, c.path());
                yield v == null ? "" : exact(v, c);
            }
        };
    }

    /** The shortest decimal of {@code v} (a double's own digits read back as itself). */
    private static String plain(double v) {
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** Digits beyond which a cell in the column's unit reads badly ("800.0000000000001"). */
    private static final int READABLE_DIGITS = 6;

    /**
     * {@code v} as a cell that reads back as exactly {@code v}: a bare number in the column's
     * unit when a short one does; else a short number with a prefix of its own ({@code 0.8 mV}
     * in a {@code [uV]} column: "0.8 mV" and "800 uV" are different doubles, and the catalog holds
     * whichever the user typed); else the column's unit with all the digits it takes; else the SI
     * value with its unit, which always reads back (a factor of 1 rounds nothing).
     */
    static String exact(double v, Columns.Column c) {
        Dimension d = c.dimension();
        String bare = digits(v, c.unit(), d, 17);
        if (bare != null && significant(bare) <= READABLE_DIGITS) {
            return bare;
        }
        String best = null;
        for (String unit : prefixed(c.unit())) {
            String t = digits(v, unit, d, READABLE_DIGITS);
            if (t != null && (best == null || t.length() < best.length())) {
                best = t + " " + unit;
            }
        }
        if (best != null) {
            return best;
        }
        if (bare != null) {
            return bare;
        }
        String si = plain(v) + " " + d.symbol();
        if (Double.compare(parse(si, d), v) != 0) {
            throw new IllegalStateException(si + " does not read back as " + v);
        }
        return si;
    }

    /** The fewest digits (at most {@code max}) of {@code v} in {@code unit} that read back as {@code v}, or null. */
    private static String digits(double v, String unit, Dimension d, int max) {
        double factor = parse("1 " + unit, d);
        BigDecimal scaled = new BigDecimal(v / factor);
        for (int n = 1; n <= max; n++) {
            String text = scaled.round(new MathContext(n)).stripTrailingZeros().toPlainString();
            if (Double.compare(parse(text + " " + unit, d), v) == 0) {
                return text;
            }
        }
        return null;
    }

    private static int significant(String number) {
        return new BigDecimal(number).stripTrailingZeros().precision();
    }

    private static final List<String> PREFIXES = List.of("", "f", "p", "n", "u", "m", "k", "M", "G");
    private static final List<String> PREFIXABLE = List.of("V", "A", "Hz");

    /** {@code unit} with each other SI prefix on its numerator ("uV" gives "V", "mV", "nV", ...); none for dB, °C, h. */
    private static List<String> prefixed(String unit) {
        int slash = unit.indexOf('/');
        String num = slash < 0 ? unit : unit.substring(0, slash);
        String rest = slash < 0 ? "" : unit.substring(slash);
        String base = PREFIXABLE.contains(num)
                ? num
                : num.length() > 1 && PREFIXES.contains(num.substring(0, 1)) && PREFIXABLE.contains(num.substring(1))
                        ? num.substring(1)
                        : null;
        if (base == null) {
            return List.of();
        }
        List<String> out = new ArrayList<>();
        for (String p : PREFIXES) {
            String u = p + base + rest;
            if (!u.equals(unit)) {
                out.add(u);
            }
        }
        return out;
    }

    private static double parse(String text, Dimension d) {
        try {
            return Units.parse(text, d);
        } catch (UnitException e) {
            throw new IllegalStateException(text, e);
        }
    }
}
