package dev.ampsieve.advice;

import dev.ampsieve.stage.Criterion;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.Locale;

/** Numbers in words, the same way in every sentence of the advice. */
final class Phrases {
    private Phrases() {
    }

    static String money(double amount, String currency) {
        if (Double.isNaN(amount)) {
            return "no price";
        }
        return String.format(Locale.ROOT, "%.2f", amount) + (currency == null || currency.isEmpty() ? "" : " " + currency);
    }

    static String volts(double v) {
        return Units.format(v, Dimension.VOLTAGE);
    }

    static String percent(double ratio) {
        return String.format(Locale.ROOT, "%.0f %%", ratio * 100);
    }

    static String percentFine(double ratio) {
        return String.format(Locale.ROOT, "%.1f %%", ratio * 100);
    }

    /** "worst-case", "RSS" (the yield criterion's error figure is RSS). */
    static String totalName(Criterion c) {
        return c.kind() == Criterion.Kind.WORST_CASE ? "worst-case" : "RSS";
    }

    /** How a candidate stands against the limit: "worst-case 1.20 mV of 2.00 mV (margin 40 %)". */
    static String standing(Candidate c) {
        Criterion crit = c.budget().stage().criterion();
        String s = totalName(crit) + (c.trimmed() ? " after the trim " : " ") + volts(c.errorV()) + " of "
                + volts(c.limitV()) + (c.margin() >= 0 ? " (margin " + percent(c.margin()) + ")"
                : " (" + percent(-c.margin()) + " over)");
        // the budget's yield is for the part as it is; after a trim it does not apply
        if (crit.kind() == Criterion.Kind.YIELD && c.budget().yield() != null && !c.trimmed()) {
            s = yieldText(c) + ", " + s;
        }
        return s;
    }

    /**
     * ", limited by offset drift (1.20 mV)". The limiting term is the untrimmed budget's: for
     * figures after a trim it is named as the largest term before the trim.
     */
    static String limitedBy(Candidate c) {
        String key = c.budget().limitingTerm();
        var t = key == null ? null : c.budget().term(key);
        if (t == null) {
            return "";
        }
        return (c.trimmed() ? ", largest term before the trim " : ", limited by ") + t.label() + " (" + volts(t.outputV()) + ")";
    }

    /** "yield 99.7 % (95 % interval from 99.6 %; target 99.0 %)". */
    static String yieldText(Candidate c) {
        var y = c.budget().yield();
        return "yield " + percentFine(y.value()) + " (95 % interval from " + percentFine(y.low()) + "; target "
                + percentFine(c.budget().stage().criterion().yieldTarget()) + ")";
    }

    static String number(double x) {
        return Units.format(x, Dimension.NUMBER);
    }

    static String ohms(double r) {
        return Units.format(r, Dimension.RESISTANCE);
    }

    static String celsius(double t) {
        return Units.format(t, Dimension.TEMPERATURE);
    }

    /** Rounds to 3 significant digits. */
    static double round3(double x) {
        if (x == 0 || !Double.isFinite(x)) {
            return x;
        }
        return Double.parseDouble(String.format(Locale.ROOT, "%.2e", x));
    }

    /** One unit in the third significant digit of x. */
    static double unit3(double x) {
        return Math.pow(10, Math.floor(Math.log10(Math.abs(x))) - 2);
    }
}
