package dev.ampsieve.record;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Price;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A part's catalog entry in a canonical form: every catalog key path (in the order of
 * {@link CatalogKeys#PART_KEYS}) with its value as text, numbers in SI units to 12 significant
 * digits ({@link #canonical}). Comments, key order,
 * quoting, the unit prefix the user typed and the file's line do not enter it, so the hash
 * changes exactly when a value the budget or the record can use changes.
 *
 * @param fields path -&gt; value; a key the entry does not give is absent
 * @param sha256 SHA-256 (hex) of the UTF-8 lines {@code path=value\n} in that order, with a
 *               backslash, CR and LF in a value written as {@code \\}, {@code \r}, {@code \n}
 */
public record Entry(Map<String, String> fields, String sha256) {

    public Entry {
        fields = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(fields));
    }

    /** The canonical entry of {@code p}. */
    public static Entry of(Part p) {
        return of(fields(p));
    }

    /** An entry from its fields (as a record stored them): the hash recomputed. */
    public static Entry of(Map<String, String> fields) {
        return new Entry(fields, hash(fields));
    }

    static Map<String, String> fields(Part p) {
        Map<String, String> f = new LinkedHashMap<>();
        for (String key : CatalogKeys.PART_KEYS) {
            List<String> sub = CatalogKeys.subKeys(key);
            if (key.equals(CatalogKeys.PRICE)) {
                price(f, p.price());
            } else if (key.equals(CatalogKeys.MEASURED)) {
                measured(f, p.measured());
            } else if (sub.isEmpty()) {
                put(f, key, plain(p, key));
            } else {
                for (String s : sub) {
                    String path = CatalogKeys.path(key, s);
                    put(f, path, number(p, path));
                }
            }
        }
        return f;
    }

    /**
     * A measured lot: the file as the entry names it and the SHA-256 of its bytes, so that a lot
     * measured again (the units change, the entry does not) changes the entry's hash too and a
     * re-check names it; "unreadable" when the file cannot be read now (the budget then says why).
     */
    private static void measured(Map<String, String> f, dev.ampsieve.catalog.Measured m) {
        if (m == null) {
            return;
        }
        put(f, "measured.file", m.file());
        String digest;
        try {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            digest = HexFormat.of().formatHex(d.digest(java.nio.file.Files.readAllBytes(m.path())));
        } catch (java.io.IOException | RuntimeException e) {
            digest = "unreadable";
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
        put(f, "measured.sha256", digest);
    }

    /** Price breaks one path each ({@code price.break.100}), so a change names the break. */
    private static void price(Map<String, String> f, Price price) {
        if (price == null) {
            return;
        }
        put(f, "price.currency", price.currency());
        for (Price.Break b : price.breaks()) {
            put(f, "price.break." + b.quantity(), canonical(b.unit()));
        }
    }

    private static String plain(Part p, String key) {
        return switch (key) {
            case CatalogKeys.ID -> p.id();
            case CatalogKeys.TITLE -> p.title();
            case CatalogKeys.ARCHITECTURE -> p.architecture().key();
            case CatalogKeys.INPUT -> p.input().key();
            case CatalogKeys.FACTORY_TRIM -> p.factoryTrim().key();
            case CatalogKeys.NULL_PINS -> Boolean.toString(p.nullPins());
            case CatalogKeys.CHANNELS -> Integer.toString(p.channels());
            case CatalogKeys.PACKAGES -> p.packages().isEmpty() ? null : String.join("; ", p.packages());
            case CatalogKeys.TAGS -> p.tags().isEmpty() ? null : String.join("; ", p.tags());
            case CatalogKeys.SOURCE -> p.source();
            case CatalogKeys.NOTES -> p.notes();
            default -> number(p, key);
        };
    }

    private static String number(Part p, String path) {
        if (CatalogKeys.dimension(path) == null) {
            return null; // a key that is not a quantity and not named above: nothing to compare
        }
        Double v = CatalogKeys.value(p, path);
        return v == null || v.isNaN() ? null : canonical(v);
    }

    /**
     * {@code v} to 12 significant digits, as {@link BigDecimal#toString} writes it: "5 uV" and
     * "0.005 mV" parse to doubles one unit in the last place apart, which is no revision of a
     * datasheet; no datasheet figure has 12 digits.
     */
    static String canonical(double v) {
        if (Double.isInfinite(v)) {
            return v > 0 ? "Infinity" : "-Infinity";
        }
        return new BigDecimal(v).round(new MathContext(12)).stripTrailingZeros().toString();
    }

    private static void put(Map<String, String> f, String path, String value) {
        if (value != null && !value.isEmpty()) {
            f.put(path, value);
        }
    }

    static String hash(Map<String, String> fields) {
        StringBuilder b = new StringBuilder();
        fields.forEach((k, v) -> b.append(k).append('=').append(escape(v)).append('\n'));
        try {
            MessageDigest d = MessageDigest.getInstance("SHA-256");
            return HexFormat.of().formatHex(d.digest(b.toString().getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }

    private static String escape(String v) {
        return v.replace("\\", "\\\\").replace("\r", "\\r").replace("\n", "\\n");
    }
}
