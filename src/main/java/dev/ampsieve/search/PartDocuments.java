package dev.ampsieve.search;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.DoubleDocValuesField;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.DoubleRange;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.FieldType;
import org.apache.lucene.document.SortedDocValuesField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexOptions;
import org.apache.lucene.util.BytesRef;

/** Turns one catalog {@link Part} into one Lucene document with the fields of {@link Schema}. */
public final class PartDocuments {
    private PartDocuments() {}

    /**
     * An analysed text field, indexed for which documents hold each word and nothing more: the
     * analyzer gives each word of a field once ({@link Words#terms} is a set), so every frequency
     * would be 1, which is what Lucene scores a document-only field with, and no query matches
     * phrases, so positions would go unread. Norms stay: BM25 weighs a word by the field's length.
     * A third of the text side of an index build went to writing those frequencies and positions.
     */
    static final FieldType WORDS = wordsType();

    private static FieldType wordsType() {
        FieldType t = new FieldType(TextField.TYPE_NOT_STORED);
        t.setIndexOptions(IndexOptions.DOCS);
        t.freeze();
        return t;
    }

    public static Document of(Part p) {
        Document d = new Document();
        // keyword, stored: the key for updateDocument and for finding the Part again
        d.add(new StringField(Schema.ID, p.id(), Field.Store.YES));
        // sorted doc values: last tie-break so equal hits always list in the same order
        d.add(new SortedDocValuesField(Schema.ID, new BytesRef(p.id())));
        // analysed, not stored (the catalog holds the text): free words, title counted apart
        d.add(new Field(Schema.TITLE, p.title(), WORDS));
        d.add(new Field(Schema.TEXT, String.join(" ", words(p)), WORDS));
        // keywords: exact, lower-case, one field instance per value
        keyword(d, Schema.ID_LOWER, p.id());
        if (p.input() != null) {
            keyword(d, Schema.INPUT, p.input().key());
        }
        if (p.architecture() != null) {
            keyword(d, Schema.ARCHITECTURE, p.architecture().key());
            if (p.selfCorrecting()) {
                keyword(d, Schema.ARCHITECTURE, "zero-drift");
            }
        }
        p.packages().forEach(v -> keyword(d, Schema.PACKAGE, v));
        p.tags().forEach(v -> keyword(d, Schema.TAG, v));
        keyword(d, Schema.TRIM, p.factoryTrim().key());
        keyword(d, Schema.NULL_PINS, String.valueOf(p.nullPins()));
        if (p.price() != null) {
            keyword(d, Schema.CURRENCY, p.price().currency());
        }
        if (p.measured() != null) {
            keyword(d, Schema.MEASURED_FILE, p.measured().file());
        }
        // words of one text each, for notes:word and source:word (the title has its own field above)
        d.add(new Field(Schema.NOTES, p.notes(), WORDS));
        d.add(new Field(Schema.SOURCE, p.source(), WORDS));
        if (railToRail(p.inputHeadroom())) {
            keyword(d, Schema.RAIL, "input");
        }
        if (railToRail(p.outputHeadroom())) {
            keyword(d, Schema.RAIL, "output");
        }
        // numbers: a point each (range queries). Not stored and without doc values: nothing reads
        // a number back from the index (the catalog holds it) and only the price sorts; the two
        // copies were two thirds of a document's fields and most of the build time of a large
        // catalog (bench/RESULTS.md, 2026-12-02, 116 s for 100,000 parts)
        for (Schema.Numeric n : Schema.NUMERIC) {
            Double v = value(n.name(), p);
            if (v != null && Double.isFinite(v)) {
                double x = v + 0.0; // -0.0 and 0.0 sort apart in points; keep one zero
                d.add(new DoublePoint(n.name(), x));
                if (n.name().equals(Schema.PRICE)) {
                    d.add(new DoubleDocValuesField(n.name(), x)); // the search order's second key
                }
            }
        }
        // intervals: "rated at" queries are containment queries on these
        for (Schema.Interval i : Schema.INTERVALS) {
            Double lo = value(i.min(), p);
            Double hi = value(i.max(), p);
            if (lo != null && hi != null && lo <= hi) {
                d.add(new DoubleRange(i.name(), new double[] {lo}, new double[] {hi}));
            }
        }
        return d;
    }

    /** The value the index holds for {@code field} (a name from {@link Schema}), or null when the catalog lacks it. */
    public static Double valueOf(String field, Part p) {
        return value(field, p);
    }

    /**
     * The value indexed under numeric field {@code name}, or null when the catalog lacks it.
     * Offsets, drifts and currents are magnitudes (datasheets give them as ± limits).
     */
    static Double value(String name, Part p) {
        return switch (name) {
            case Schema.VOS -> abs(guaranteed(p.vos()));
            case "vos.typ" -> abs(p.vos() == null ? null : p.vos().typ());
            case "vos.max" -> abs(p.vos() == null ? null : p.vos().max());
            case "vos.maxtemp" -> abs(p.vos() == null ? null : p.vos().maxOverTemp());
            case Schema.DRIFT -> abs(guaranteed(p.vosDrift()));
            case "drift.typ" -> abs(p.vosDrift().typ());
            case "drift.max" -> abs(p.vosDrift().max());
            case Schema.IB -> abs(guaranteed(p.ib()));
            case "ib.typ" -> abs(p.ib().typ());
            case "ib.max" -> abs(p.ib().max());
            case "ib.maxtemp" -> abs(p.ib().maxOverTemp());
            case Schema.IOS -> abs(guaranteed(p.ios()));
            case "ios.typ" -> abs(p.ios().typ());
            case "ios.max" -> abs(p.ios().max());
            case Schema.CMRR -> guaranteed(p.cmrr());
            case "cmrr.min" -> p.cmrr().min();
            case "cmrr.typ" -> p.cmrr().typ();
            case Schema.PSRR -> guaranteed(p.psrr());
            case "psrr.min" -> p.psrr().min();
            case "psrr.typ" -> p.psrr().typ();
            case Schema.AOL -> guaranteed(p.aol());
            case "aol.min" -> p.aol().min();
            case "aol.typ" -> p.aol().typ();
            case Schema.GBW -> p.gbw() > 0 ? p.gbw() : null;
            case Schema.SLEW -> p.slew();
            case Schema.EN -> p.noise().en();
            case "en.corner" -> p.noise().enCorner();
            case Schema.IN -> p.noise().in();
            case "in.corner" -> p.noise().inCorner();
            case Schema.SUPPLY_MIN -> p.supply() == null ? null : p.supply().min();
            case Schema.SUPPLY_MAX -> p.supply() == null ? null : p.supply().max();
            case Schema.TEMPERATURE_MIN ->
                p.temperature() == null ? null : p.temperature().min();
            case Schema.TEMPERATURE_MAX ->
                p.temperature() == null ? null : p.temperature().max();
            case Schema.PRICE ->
                p.price() == null ? null : p.price().unit(); // the lowest-quantity break: no stage here
            case Schema.IQ -> p.quiescentCurrent();
            case Schema.CIN -> p.inputCapacitance();
            case Schema.CHANNELS -> p.channels() > 0 ? (double) p.channels() : null;
            case Schema.FCHOP -> p.choppingFrequency();
            case Schema.AGING ->
                p.longTermDrift() == null || p.longTermDrift().per() <= 0
                        ? null
                        // offset change scales with the square root of time (error-model.md, term 9)
                        : Math.abs(p.longTermDrift().value())
                                * Math.sqrt(1000 * 3600.0 / p.longTermDrift().per());
            case "ios.maxtemp" -> abs(p.ios().maxOverTemp());
            case "price.quantity" ->
                p.price() == null ? null : (double) p.price().quantity();
            // the catalog's own paths, as CatalogKeys reads them (headrooms signed, as typed)
            case "long-term-drift.value",
                    "long-term-drift.per",
                    "input-headroom.low",
                    "input-headroom.high",
                    "output-headroom.low",
                    "output-headroom.high",
                    "test-conditions.supply",
                    "test-conditions.common-mode",
                    "input-crossover.from-positive-rail",
                    "input-crossover.offset-step" -> CatalogKeys.value(p, name);
            case Schema.THETA_JA -> p.thetaJa();
            case Schema.RIPPLE -> p.choppingRipple();
            default -> throw new IllegalArgumentException("no value for index field " + name);
        };
    }

    /** What an engineer compares against: the guaranteed maximum, else the typical. */
    private static Double guaranteed(Spread s) {
        if (s == null) {
            return null;
        }
        return s.max() != null ? s.max() : s.typ();
    }

    /** Rejection ratios and gain: the guaranteed minimum, else the typical. */
    private static Double guaranteed(MinTyp m) {
        return m.min() != null ? m.min() : m.typ();
    }

    private static Double abs(Double v) {
        return v == null ? null : Math.abs(v);
    }

    /** Headroom 0 (or beyond the rail) on both sides. */
    static boolean railToRail(Headroom h) {
        return h != null && h.low() <= 0 && h.high() <= 0;
    }

    private static void keyword(Document d, String field, String value) {
        if (value != null && !value.isBlank()) {
            d.add(new StringField(field, value.strip().toLowerCase(Locale.ROOT), Field.Store.NO));
        }
    }

    /** Free-text words of a part, with the synonyms engineers search by. */
    static List<String> words(Part p) {
        List<String> w = new ArrayList<>();
        w.add(p.id());
        w.add(p.title());
        w.addAll(p.tags());
        w.addAll(p.packages());
        w.add(p.notes());
        if (p.architecture() != null) {
            w.add(p.architecture().key());
            if (p.selfCorrecting()) {
                w.add("zero-drift self-correcting");
            }
        }
        if (p.input() != null) {
            w.add(p.input().key());
            if (p.input().fetLike()) {
                w.add("fet-input");
            }
        }
        boolean rri = railToRail(p.inputHeadroom());
        boolean rro = railToRail(p.outputHeadroom());
        if (rri || rro) {
            w.add("rail-to-rail");
        }
        if (rri) {
            w.add("rri rail-to-rail-input");
        }
        if (rro) {
            w.add("rro rail-to-rail-output");
        }
        if (rri && rro) {
            w.add("rrio");
        }
        switch (p.channels()) {
            case 1 -> w.add("single");
            case 2 -> w.add("dual");
            case 4 -> w.add("quad");
            default -> {}
        }
        return w;
    }
}
