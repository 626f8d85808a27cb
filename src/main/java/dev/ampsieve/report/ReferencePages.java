package dev.ampsieve.report;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.search.Schema;
import dev.ampsieve.stage.StageKeys;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The reference pages of {@code ampsieve help TOPIC}, generated from the tables the code reads
 * ({@link Schema}, {@link QueryLanguage#helpLines}, {@link StageKeys#ORDERED}, {@link CatalogKeys},
 * {@link Units#prefixes}), so a page cannot disagree with what the program accepts.
 */
public final class ReferencePages {
    private ReferencePages() {}

    /** The topics, in the order {@code help} lists them. */
    public static final List<String> TOPICS = List.of("query", "stage-keys", "catalog-keys", "units");

    /** One line per topic, for the list. */
    public static String summary(String topic) {
        return switch (topic) {
            case "query" -> "the query language of find and rank --query, with every field";
            case "stage-keys" -> "every key of a stage file: default, example, why it matters";
            case "catalog-keys" -> "every key of a catalog part: unit, required or not, plausibility bounds";
            case "units" -> "how values are written: SI prefixes, unit symbols, the case rule";
            default -> throw new IllegalArgumentException(topic);
        };
    }

    /** The page of {@code topic} (one of {@link #TOPICS}) laid out for {@code width} columns. */
    public static String page(String topic, int width) {
        String text = switch (topic) {
            case "query" -> query(width);
            case "stage-keys" -> stageKeys(width);
            case "catalog-keys" -> catalogKeys(width);
            case "units" -> units(width);
            default -> throw new IllegalArgumentException(topic);
        };
        return Wrap.prose(Visible.lines(text), width);
    }

    private static String query(int width) {
        StringBuilder o = new StringBuilder();
        QueryLanguage.helpLines().forEach(l -> o.append(l).append('\n'));
        o.append("\nEvery field\n");
        TextTable t = new TextTable().left("field").left("kind").flex("meaning").wrapFlex();
        for (Schema.Keyword k : Schema.KEYWORDS) {
            t.row(
                    k.name(),
                    "word",
                    k.meaning() + (k.values().isEmpty() ? "" : " (" + String.join(", ", k.values()) + ")"));
        }
        for (Schema.Text k : Schema.TEXTS) {
            t.row(k.name(), "text", k.meaning());
        }
        for (Schema.Interval i : Schema.INTERVALS) {
            t.row(i.name(), "rated " + unit(i.dimension()), i.meaning());
        }
        for (Schema.Numeric n : Schema.NUMERIC) {
            t.row(n.name(), "number " + unit(n.dimension()), n.meaning());
        }
        for (Map.Entry<String, String> a : Schema.ALIASES.entrySet()) {
            t.row(a.getKey(), "alias", "the same as " + a.getValue());
        }
        t.lines(width).forEach(l -> o.append(l).append('\n'));
        return o.toString();
    }

    private static String stageKeys(int width) {
        StringBuilder o = new StringBuilder();
        o.append("Keys of a stage file, one 'key: value' per line; a dotted key sits in its block ('temperature.min' is"
                + " 'min' below 'temperature:'). Only the limit and the gain are required.\n\n");
        for (StageKeys.Key k : StageKeys.ORDERED) {
            String choices = k.choices().isEmpty()
                    ? ""
                    : (k.kind() == StageKeys.Kind.CHOICES ? "; some of " : "; one of ")
                            + String.join(" | ", k.choices());
            o.append("- ")
                    .append(k.path())
                    .append(": ")
                    .append(k.why())
                    .append(" (default: ")
                    .append(k.defaultText())
                    .append("; example: ")
                    .append(k.example())
                    .append(choices)
                    .append(")\n");
        }
        o.append("\ndemo-catalog/stages/ holds commented examples; 'ampsieve help units' says how to write values.\n");
        return o.toString();
    }

    private static String catalogKeys(int width) {
        StringBuilder o = new StringBuilder();
        o.append("Keys of a catalog part (catalog-template/part.yaml shows each with its meaning). Required: "
                + String.join(", ", CatalogKeys.REQUIRED) + ". Beyond a warning bound a value is unusual and warned;"
                + " beyond an error bound no op amp has it and the part is refused (magnitudes compared; '-' is no"
                + " bound). A key without a unit holds a word, a list or a whole number.\n\n");
        TextTable t = new TextTable()
                .left("key")
                .left("unit")
                .right("warn below")
                .right("warn above")
                .right("error below")
                .right("error above")
                .left("example");
        for (String key : CatalogKeys.PART_KEYS) {
            List<String> sub = CatalogKeys.subKeys(key);
            List<String> paths = new ArrayList<>();
            if (sub.isEmpty()) {
                paths.add(key);
            } else {
                sub.forEach(s -> paths.add(CatalogKeys.path(key, s)));
            }
            for (String path : paths) {
                Dimension d = CatalogKeys.dimension(path);
                CatalogKeys.Bounds b = CatalogKeys.BOUNDS.get(path);
                String required = CatalogKeys.REQUIRED.contains(key) && path.equals(paths.get(0)) ? " *" : "";
                t.row(
                        path + required,
                        d == null ? "" : unit(d),
                        bound(b == null ? Double.NaN : b.warnBelow(), d),
                        bound(b == null ? Double.NaN : b.warnAbove(), d),
                        bound(b == null ? Double.NaN : b.errorBelow(), d),
                        bound(b == null ? Double.NaN : b.errorAbove(), d),
                        d == null ? "" : CatalogKeys.example(path));
            }
        }
        t.lines(width).forEach(l -> o.append(l).append('\n'));
        o.append("\n* required. Several parts in one file go under 'parts:' as a list.\n");
        return o.toString();
    }

    private static String units(int width) {
        StringBuilder o = new StringBuilder();
        o.append("Every value carries its unit: 2.5 uV, 0.6 uV/C, 12 nV/rtHz, 3 fA/rtHz, 110 dB, 1.5 MHz, 0.5 V/us,"
                + " 10 kohm, -40 C, 25 ppm/C, 1000 h. A bare number is read as dB in a decibel field, as ohms for a"
                + " resistance and as a fraction for a ratio; anywhere else it is refused with the unit to add.\n\n");
        List<String> ps = new ArrayList<>();
        for (Map.Entry<String, Double> p : Units.prefixes().entrySet()) {
            ps.add(p.getKey() + " " + String.format(Locale.ROOT, "%.0e", p.getValue()));
        }
        o.append("SI prefixes, case-sensitive (m is milli, M is mega): ")
                .append(String.join(", ", ps))
                .append(".\n");
        o.append("K is read as k (no SI prefix K exists), except alone in a temperature field, where it is kelvin."
                + " A prefix in the wrong case with no other reading is refused with the spelling that exists:"
                + " '10 UV' gets \"write '10 uV'\".\n\n");
        o.append("Unit symbols after the prefix are read case-blind where one reading exists (10uv, 1.5 MHZ,"
                        + " 10 KOHM, 110 DB), so 10 mv is 10 millivolts and 10 MV is 10 megavolts (refused by the"
                        + " plausibility bounds in any op amp field). Symbols read: ")
                .append(String.join(" ", Units.symbols()))
                .append("\n");
        o.append("\nWhat each kind of field takes:\n");
        TextTable t =
                new TextTable().left("kind").left("SI unit").flex("example").wrapFlex();
        for (Dimension d : Dimension.values()) {
            t.row(d.noun(), d.symbol().isEmpty() ? "-" : d.symbol(), d.example());
        }
        t.lines(width).forEach(l -> o.append(l).append('\n'));
        o.append("\nNumbers print with engineering prefixes from f to T, in scientific notation beyond.\n");
        return o.toString();
    }

    private static String unit(Dimension d) {
        return d.symbol().isEmpty() ? (d == Dimension.RATIO ? "ratio" : "plain") : d.symbol();
    }

    private static String bound(double v, Dimension d) {
        if (Double.isNaN(v) || d == null) {
            return "-";
        }
        return Units.format(v, d);
    }
}
