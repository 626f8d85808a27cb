package dev.ampsieve.report;

import dev.ampsieve.advice.Candidate;
import dev.ampsieve.advice.PartTarget;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.Locale;

/** Numbers in words, the same way in every sentence of the advice (moved here from {@code advice}: only {@code report} writes words). */
final class Phrases {
    private Phrases() {}

    static String money(double amount, String currency) {
        if (Double.isNaN(amount)) {
            return "no price";
        }
        return String.format(Locale.ROOT, "%.2f", amount)
                + (currency == null || currency.isEmpty() ? "" : " " + currency);
    }

    static String volts(double v) {
        return Units.format(v, Dimension.VOLTAGE);
    }

    static String percent(double ratio) {
        return String.format(Locale.ROOT, "%.0f %%", ratio * 100);
    }

    static String percentFine(double ratio) {
        String s = String.format(Locale.ROOT, "%.1f %%", ratio * 100);
        // a target of 99.99 % must not read as 100.0 %
        return ratio < 1 && s.equals("100.0 %") ? Units.format(ratio, Dimension.RATIO, 7) : s;
    }

    /**
     * A simulated yield or the lower end of its interval, rounded DOWN to 0.01 %: "99.99 %", never
     * "100 %" unless every unit passed (a rounded-up yield would claim more than was found).
     */
    static String yieldPercent(double ratio) {
        if (ratio >= 1.0) {
            return "100 %";
        }
        return String.format(Locale.ROOT, "%.2f %%", Math.floor(ratio * 10000 + 1e-9) / 100);
    }

    /** "worst-case", "RSS" (the yield criterion's error figure is RSS). */
    static String totalName(Criterion c) {
        return c.kind() == Criterion.Kind.WORST_CASE ? "worst-case" : "RSS";
    }

    /** How a candidate stands against the limit: "worst-case 1.20 mV of 2.00 mV (margin 40 %)". */
    static String standing(Candidate c) {
        Criterion crit = c.budget().stage().criterion();
        String s = totalName(crit) + (c.trimmed() ? " after the trim " : " ") + volts(c.errorV()) + " of "
                + volts(c.limitV());
        if (crit.kind() == Criterion.Kind.YIELD) {
            // the margin of a yield criterion is the yield's, never the RSS figure's; after a trim only the yield after
            // it applies
            if (yieldOf(c) != null) {
                s = yieldText(c) + " (" + margin(crit, c.margin()) + "), " + s;
            }
        } else {
            s += " (" + margin(crit, c.margin()) + ")";
        }
        return s + estimateNote(c);
    }

    /**
     * A margin in words: "margin 40 %" or "40 % over" (of the limit); under a yield criterion
     * "margin +0.05 %" or "margin -0.12 %" (the interval's lower end minus the target, in points of
     * yield, rounded down so it never claims more than was found).
     */
    static String margin(Criterion crit, double m) {
        if (crit.kind() == Criterion.Kind.YIELD) {
            return "margin " + yieldMargin(m);
        }
        return m >= 0 ? "margin " + percent(m) : percent(-m) + " over";
    }

    /** A candidate's margin as a number: "40 %" of the limit, or "+0.05 %" of yield under a yield criterion. */
    static String marginValue(Candidate c) {
        return c.budget().stage().criterion().kind() == Criterion.Kind.YIELD
                ? yieldMargin(c.margin())
                : percent(c.margin());
    }

    /** "+0.05 %", "-0.12 %": points of yield to 0.01 (0.0001 below 0.01), rounded down. */
    static String yieldMargin(double m) {
        if (Double.isNaN(m)) {
            return "unknown";
        }
        double scale = Math.abs(m) < 1e-4 && m != 0 ? 1e6 : 1e4;
        double r = Math.floor(m * scale + 1e-9) / scale * 100;
        return String.format(Locale.ROOT, scale > 1e4 ? "%+.4f %%" : "%+.2f %%", r);
    }

    /**
     * "; resting on estimated or typical-only figures for bias current, noise" when the candidate's
     * verdict rests on them, so a sentence that names the part says so; empty otherwise.
     */
    static String estimateNote(Candidate c) {
        if (!c.restsOnEstimate()) {
            return "";
        }
        return "; resting on estimated or typical-only figures for "
                + String.join(
                        ", ",
                        c.estimatedTerms().stream()
                                .map(dev.ampsieve.budget.TermResult::label)
                                .toList());
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
        String where = t.kind() == dev.ampsieve.budget.TermKind.OPERATING_POINT
                ? ", an operating-point term: " + lever(t.key())
                : "";
        return (c.trimmed() ? ", largest term before the trim " : ", limited by ") + t.label() + " ("
                + volts(t.outputV()) + where + ")";
    }

    /** The lever of an operating-point term, in words (no numbers: the changes below give those). */
    static String lever(String key) {
        return switch (key) {
            case "self-heating" -> "a cooler part (lower quiescent power or theta-ja) or a higher load resistance";
            case "chopping-ripple" -> "a stage filter that removes the ripple, or a part with less ripple";
            case "operating-point" ->
                "a part whose datasheet table is nearer this supply and common mode, or better PSRR and CMRR";
            case "input-crossover" -> "keep the common mode clear of the crossover, or a part without one";
            default -> "where the part runs";
        };
    }

    /** The yield the candidate is judged by: after the trim when its figures include one; null when not simulated. */
    static dev.ampsieve.budget.YieldResult yieldOf(Candidate c) {
        return c.trimmed()
                ? (c.budget().trimmed() == null ? null : c.budget().trimmed().yield())
                : c.budget().yield();
    }

    /** "yield 99.71 % (95 % interval from 99.62 %; target 99.0 %)"; "yield after the trim ..." for trimmed figures. */
    static String yieldText(Candidate c) {
        var y = yieldOf(c);
        return "yield " + (c.trimmed() ? "after the trim " : "") + yieldPercent(y.value()) + " (95 % interval from "
                + yieldPercent(y.low()) + "; target "
                + percentFine(c.budget().stage().criterion().yieldTarget()) + ")";
    }

    /** "IB ≤ 12.3 pA at 70 °C (IOS counted equal to it)", "vos.max ≤ 25.0 µV", "drift ≤ 0.250 µV/°C". */
    static String target(PartTarget t, dev.ampsieve.stage.Stage stage) {
        return switch (t.quantity()) {
            case IB ->
                "IB ≤ " + Units.format(t.value(), Dimension.CURRENT)
                        + (Double.isNaN(t.atC())
                                ? " from " + celsius(stage.tMin()) + " to " + celsius(stage.tMax())
                                : " at " + celsius(t.atC()))
                        + " (IOS counted equal to it)";
            case VOS -> "vos.max ≤ " + volts(t.value()) + " at 25 °C (drift as now)";
            case DRIFT -> "drift ≤ " + Units.format(t.value(), Dimension.VOLTAGE_DRIFT);
            case THETA_JA ->
                "theta-ja ≤ " + Units.format(t.value(), Dimension.THERMAL_RESISTANCE)
                        + " (a cooler package, or more copper under it)";
        };
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
}
