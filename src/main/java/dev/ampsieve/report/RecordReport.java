package dev.ampsieve.report;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.record.DecisionRecord;
import dev.ampsieve.record.Finding;
import dev.ampsieve.record.PartFacts;
import dev.ampsieve.record.RecordFacts;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.InputException;
import java.nio.file.Path;
import java.util.List;

/** Decision records (HTML, Markdown) and the re-check's report; the record format is in README. */
public final class RecordReport {
    private RecordReport() {}

    public static String html(DecisionRecord d) {
        List<RecordDoc.Block> blocks = RecordContent.blocks(d);
        String title = ((RecordDoc.Heading) blocks.get(0)).text();
        return RecordHtml.render(blocks, title, RecordJson.write(d.facts()));
    }

    public static String markdown(DecisionRecord d) {
        return RecordMarkdown.render(RecordContent.blocks(d), RecordJson.write(d.facts()));
    }

    /** True when {@code text} is a record of ours (it holds the record block), which a new record may replace. */
    public static boolean isRecord(String text) {
        return RecordJson.isRecord(text);
    }

    /** The facts a record embeds; an error naming {@code file} when it is not a record of ours or its block is damaged. */
    public static RecordFacts read(String text, Path file) throws InputException {
        return RecordJson.read(text, file);
    }

    /**
     * What the re-check found for one record, one line each, after a line naming the record:
     * "holds" when nothing changed.
     *
     * @param catalogNote how the catalog was chosen ("recorded" or "--catalog"), for the header
     */
    public static String recheck(String file, RecordFacts was, String catalog, List<Finding> findings) {
        StringBuilder o = new StringBuilder();
        o.append(Visible.of(file))
                .append(": ")
                .append(findings.isEmpty() ? "holds" : "CHANGED")
                .append(" (recorded ")
                .append(Visible.of(was.date()))
                .append(" for ")
                .append(Visible.of(was.stagePath()))
                .append("; checked against ")
                .append(Visible.of(catalog))
                .append(")\n");
        if (findings.isEmpty()) {
            o.append("  nothing changed: every recorded part's entry, verdict and largest term are as recorded, and no"
                    + " cheaper part fits\n");
        }
        for (Finding f : findings) {
            o.append("  ").append(line(f)).append('\n');
        }
        return o.toString();
    }

    private static String line(Finding f) {
        if (f instanceof Finding.EntryChanged e) {
            StringBuilder b = new StringBuilder(id(e.id()) + ": catalog entry changed:");
            for (Finding.FieldChange c : e.fields()) {
                b.append("\n    ")
                        .append(Visible.of(c.path()))
                        .append(": ")
                        .append(value(c.path(), c.was()))
                        .append(" -> ")
                        .append(value(c.path(), c.now()));
            }
            return b.toString();
        }
        if (f instanceof Finding.Disappeared d) {
            return id(d.id()) + ": no longer in the catalog";
        }
        if (f instanceof Finding.CheaperFits c) {
            PartFacts was = c.was();
            return id(c.now().id()) + " now fits at " + cost(c.now())
                    + (was == null
                            ? ", where no part fitted"
                            : ", cheaper than the recorded cheapest fitting part " + id(was.id()) + " at " + cost(was));
        }
        if (f instanceof Finding.VerdictChanged v) {
            return id(v.id()) + ": verdict " + Visible.of(v.was()) + " -> " + Visible.of(v.now());
        }
        Finding.LimitingChanged l = (Finding.LimitingChanged) f;
        return id(l.id()) + ": largest term " + term(l.was()) + " -> " + term(l.now());
    }

    private static String id(String id) {
        return Visible.of(id);
    }

    private static String term(String key) {
        return key == null ? "none" : Uncounted.label(key);
    }

    private static String cost(PartFacts p) {
        return Figures.money(p.effectiveCost()) + " " + Visible.of(p.currency())
                + (p.trimmed() ? " (trim included)" : "");
    }

    /** A stored field value as the user reads it: a quantity with its unit, a price as money, text quoted. */
    static String value(String path, String v) {
        if (v == null) {
            return "(absent)";
        }
        Dimension d = CatalogKeys.dimension(path);
        try {
            if (d != null) {
                return Units.format(Double.parseDouble(v), d);
            }
            if (path.startsWith("price.break.")) {
                return Figures.money(Double.parseDouble(v));
            }
        } catch (NumberFormatException e) {
            // a hand-edited record: show the text as stored
        }
        return "\"" + Visible.of(v) + "\"";
    }
}
