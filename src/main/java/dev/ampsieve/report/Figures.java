package dev.ampsieve.report;

import dev.ampsieve.catalog.Part;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.Locale;

/**
 * Short catalog figures for tables: "n/a"-free, a dash when the catalog has no value (or a
 * figure is not a number), {@code ∞} for an infinite one, scientific notation past the SI prefixes.
 */
final class Figures {
    private Figures() {}

    /** After a term's label: where the term comes from ("" for the part's own figures). */
    static String kindTag(dev.ampsieve.budget.TermKind k) {
        return switch (k) {
            case PART -> "";
            case OPERATING_POINT -> " (op)";
            case BOARD -> " (board)";
        };
    }

    /** The kind of the term {@code key} ({@link dev.ampsieve.budget.TermKind#PART} for a key no term has). */
    static dev.ampsieve.budget.TermKind kindOf(String key) {
        return dev.ampsieve.budget.BudgetCalculator.TERMS.stream()
                .filter(t -> t.key().equals(key))
                .map(dev.ampsieve.budget.ErrorTerm::kind)
                .findFirst()
                .orElse(dev.ampsieve.budget.TermKind.PART);
    }

    /** The legend of the tags {@link #kindTag} puts on the terms of {@code kinds}, printed under a table that shows one. */
    static String kindLegend(java.util.Collection<dev.ampsieve.budget.TermKind> kinds) {
        java.util.List<String> out = new java.util.ArrayList<>();
        if (kinds.contains(dev.ampsieve.budget.TermKind.OPERATING_POINT)) {
            out.add(
                    "(op) operating-point term: where the part runs (its supply and common mode, die temperature, chopping)");
        }
        if (kinds.contains(dev.ampsieve.budget.TermKind.BOARD)) {
            out.add("(board) board-level term: the board around the part");
        }
        return String.join("; ", out);
    }

    static final String NONE = "-";

    static String q(Double v, Dimension d) {
        return v == null || Double.isNaN(v) ? NONE : Units.format(v, d);
    }

    /** Guaranteed maximum, else typical (as the query language compares them). */
    static Double guaranteed(dev.ampsieve.catalog.Spread s) {
        if (s == null) {
            return null;
        }
        Double v = s.max() != null ? s.max() : s.typ();
        return v == null ? null : Math.abs(v);
    }

    static String vos(Part p) {
        return q(guaranteed(p.vos()), Dimension.VOLTAGE);
    }

    static String drift(Part p) {
        return q(guaranteed(p.vosDrift()), Dimension.VOLTAGE_DRIFT);
    }

    static String ib(Part p) {
        return q(guaranteed(p.ib()), Dimension.CURRENT);
    }

    static String gbw(Part p) {
        return p.gbw() > 0 ? Units.format(p.gbw(), Dimension.FREQUENCY) : NONE;
    }

    static String en(Part p) {
        return q(p.noise().en(), Dimension.VOLTAGE_DENSITY);
    }

    /** "2.7-5.5 V": the rated total supply. */
    static String supply(Part p) {
        if (p.supply() == null) {
            return NONE;
        }
        return plain(p.supply().min()) + "-" + plain(p.supply().max()) + " V";
    }

    /**
     * The price with no stage to pick a break: the lowest-quantity break's unit price, followed by
     * "(from N)" when the part has price breaks (that price holds for orders from N up).
     */
    static String price(Part p) {
        if (p.price() == null) {
            return NONE;
        }
        String m = money(p.price().unit());
        return p.price().hasBreaks() ? m + " (from " + p.price().quantity() + ")" : m;
    }

    static String money(double x) {
        if (Double.isNaN(x)) {
            return NONE;
        }
        return Math.abs(x) < BIG ? String.format(Locale.ROOT, "%.2f", x) : Units.format(x, Dimension.NUMBER);
    }

    static String volts(double v) {
        return Double.isNaN(v) ? NONE : Units.format(v, Dimension.VOLTAGE);
    }

    /**
     * A figure referred to the signal source: volts, or amperes for a transimpedance stage, whose
     * source is a current (output volts over its signal gain in ohms).
     */
    static String atInput(dev.ampsieve.stage.Stage s, double v) {
        return Double.isNaN(v) ? NONE : Units.format(v, inputDimension(s));
    }

    /** What a figure at the signal source measures. */
    static Dimension inputDimension(dev.ampsieve.stage.Stage s) {
        return switch (s.topology()) {
            case TRANSIMPEDANCE -> Dimension.CURRENT;
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> Dimension.VOLTAGE;
        };
    }

    /**
     * A yield margin (the interval's lower end minus the target) in points of yield: "+0.05 %",
     * "-0.12 %"; to 0.0001 points when smaller than 0.01; rounded down, so it never claims more
     * than was found.
     */
    static String yieldMargin(double m) {
        if (Double.isNaN(m)) {
            return NONE;
        }
        double scale = Math.abs(m) < 1e-4 && m != 0 ? 1e6 : 1e4;
        double r = Math.floor(m * scale + 1e-9) / scale * 100;
        return String.format(Locale.ROOT, scale > 1e4 ? "%+.4f %%" : "%+.2f %%", r);
    }

    static String percent(double ratio) {
        if (Double.isNaN(ratio)) {
            return NONE;
        }
        double pct = 100 * ratio;
        return Math.abs(pct) < BIG
                ? String.format(Locale.ROOT, "%.0f %%", pct)
                : Units.format(pct, Dimension.NUMBER) + " %";
    }

    /** From here on a fixed-point number is a long row of digits: printed as 1e+12 (or ∞) instead. */
    private static final double BIG = 1e12;

    /**
     * Yield with the precision a high yield needs (99.97 %), rounded down: a simulated yield or the
     * lower end of its interval never reads higher than found ("100 %" only when every unit passed).
     */
    static String yield(double ratio) {
        if (!Double.isFinite(ratio)) {
            return NONE;
        }
        if (ratio >= 1.0) {
            return "100 %";
        }
        return ratio >= 0.99
                ? String.format(Locale.ROOT, "%.2f %%", Math.floor(ratio * 10000 + 1e-9) / 100)
                : String.format(Locale.ROOT, "%.1f %%", Math.floor(ratio * 1000 + 1e-9) / 10);
    }

    /** The upper end of a yield interval, rounded up (the printed interval never narrower than found). */
    static String yieldHigh(double ratio) {
        if (!Double.isFinite(ratio)) {
            return NONE;
        }
        // + 0.0 turns the -0.0 that ceil gives for a yield of 0 into 0.0 (printed "0.0 %", not "-0.0 %")
        return ratio >= 0.99
                ? String.format(Locale.ROOT, "%.2f %%", Math.ceil(ratio * 10000 - 1e-9) / 100 + 0.0)
                : String.format(Locale.ROOT, "%.1f %%", Math.ceil(ratio * 1000 - 1e-9) / 10 + 0.0);
    }

    /** A voltage number without trailing zeros: 2.7, 36, 1.8. */
    private static String plain(double v) {
        if (!(Math.abs(v) < BIG)) {
            return Units.format(v, Dimension.NUMBER);
        }
        String s = String.format(Locale.ROOT, "%.2f", v);
        s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        return s;
    }

    /** One currency for a column header when all parts share it, else empty. */
    static String currency(java.util.Collection<Part> parts) {
        java.util.Set<String> c = new java.util.TreeSet<>();
        for (Part p : parts) {
            if (p.price() != null) {
                c.add(p.price().currency());
            }
        }
        return c.size() == 1 ? c.iterator().next() : "";
    }
}
