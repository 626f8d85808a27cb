package dev.ampsieve.report;

import dev.ampsieve.catalog.CatalogFact;
import dev.ampsieve.failure.UserError;
import dev.ampsieve.stage.StageFact;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Quantity;
import dev.ampsieve.units.Units;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.ProblemFact;
import java.util.List;

/**
 * The one place that words the problems the loaders report as facts ({@link StageFact},
 * {@link CatalogFact}): each kind's message and fix, with its numbers. A problem told in words
 * keeps them. Everything that shows a {@link Problem} to a user (the failure handler, {@code check},
 * a stage's warnings, the shell) takes its line from here.
 */
public final class ProblemText {
    private ProblemText() {}

    /** A problem's message and fix. */
    private record Words(String message, String fix) {}

    /** The problem as the user reads it: {@code file:line:col: [warning: ]field: message; fix}. */
    public static String line(Problem p) {
        Words w = words(p);
        return p.text(w.message(), w.fix());
    }

    /** One line per problem. */
    public static List<String> lines(List<Problem> problems) {
        return problems.stream().map(ProblemText::line).toList();
    }

    /** A user error's lines: an input error's problems worded here, any other error's own lines. */
    public static List<String> lines(UserError e) {
        return e instanceof InputException ie ? lines(ie.problems()) : e.lines();
    }

    /** What is wrong, without place, field or fix. */
    public static String message(Problem p) {
        return words(p).message();
    }

    /** What to do about it; empty when the problem has no fix. */
    public static String fix(Problem p) {
        return words(p).fix();
    }

    private static Words words(Problem p) {
        ProblemFact f = p.fact();
        if (f == null) {
            return new Words(p.message(), p.fix());
        }
        if (f instanceof StageFact s) {
            return stage(s);
        }
        if (f instanceof CatalogFact c) {
            return catalog(c);
        }
        throw new IllegalArgumentException("no words for " + f);
    }

    // ------------------------------------------------------------ stage files

    private static Words stage(StageFact f) {
        if (f instanceof StageFact.Beyond b) {
            return beyond(b);
        }
        if (f instanceof StageFact.Ambient a) {
            return new Words(
                    q(a.celsius(), Dimension.TEMPERATURE) + " is outside " + q(a.min(), Dimension.TEMPERATURE) + " to "
                            + q(a.max(), Dimension.TEMPERATURE) + ", an ambient no circuit sees",
                    "write the " + (a.calibration() ? "calibration temperature" : "ambient range") + " in °C, such as '"
                            + a.example() + "'");
        }
        if (f instanceof StageFact.Order o) {
            return switch (o.ends()) {
                case MIN_MAX -> new Words("min " + q(o.low()) + " is above max " + q(o.high()), "swap the two values");
                case LOW_HIGH ->
                    new Words(
                            "low " + q(o.low()) + " is not below high " + q(o.high()),
                            "make 'low' smaller than 'high'");
            };
        }
        if (f instanceof StageFact.SupplyVariation v) {
            return new Words(
                    "a variation of " + q(v.variation(), Dimension.VOLTAGE) + " on a "
                            + q(v.supply(), Dimension.VOLTAGE) + " supply would take it to 0 V or below",
                    // typed back into a stage file, so in the letters the parser reads everywhere
                    "write the peak change, well below the supply, such as '"
                            + q(v.suggested(), Dimension.VOLTAGE).replace("µ", "u") + "' (5 %)");
        }
        if (f instanceof StageFact.RatioTolerance t) {
            return new Words(
                    "a ratio tolerance of " + q(t.tolerance(), Dimension.RATIO) + " is not a resistor tolerance",
                    "write it with its unit, such as '0.1 %'");
        }
        if (f instanceof StageFact.FullScaleShare s) {
            return new Words(
                    q(s.share(), Dimension.RATIO) + " is outside (0, 100] %", "write a percentage such as '0.1 %'");
        }
        if (f instanceof StageFact.OutsideRails r) {
            return new Words(
                    "an output cannot go beyond the supply rails (0 to " + q(r.supply(), Dimension.VOLTAGE) + ")",
                    "write volts above the negative rail, within the supply");
        }
        if (f instanceof StageFact.LimitTooLarge l) {
            return new Words(
                    "a limit of " + q(l.written())
                            + (l.atOutput() ? "" : " (" + q(l.outputV(), Dimension.VOLTAGE) + " at the output)")
                            + " is above " + q(l.max(), Dimension.VOLTAGE) + " at the output, no error limit at all",
                    "check the prefix: write the largest error allowed, such as '1 mV'");
        }
        if (f instanceof StageFact.HighGain g) {
            return new Words(
                    "a gain of " + q(g.gain(), Dimension.NUMBER) + " is above " + q(g.warnAbove(), Dimension.NUMBER)
                            + ": even 140 dB (1e7) of open-loop gain leaves under 40 dB of loop gain, and the"
                            + " closed-loop bandwidth is GBW/" + q(g.noiseGain(), Dimension.NUMBER),
                    "split the gain over two stages, or check the value (100 dB is a gain of 100000)");
        }
        if (f instanceof StageFact.TooFewTrials t) {
            return new Words(
                    t.trials() + " trials cannot confirm a yield of " + Units.format(t.target(), Dimension.RATIO, 7)
                            + ": even when every unit passes, the 95 % interval's lower end is "
                            + Units.format(t.lowerEnd(), Dimension.RATIO, 4)
                            + ", so the verdict can only be uncertain",
                    "write 'trials: " + t.needed() + "' or more (at most " + t.most() + ")");
        }
        if (f instanceof StageFact.Outside o) {
            return outside(o);
        }
        StageFact.CalibrationOrder c = (StageFact.CalibrationOrder) f;
        return new Words(
                "the two calibration temperatures must differ, cold below hot; they are "
                        + q(c.cold(), Dimension.TEMPERATURE) + (c.coldFromRange() ? " (temperature.min)" : "") + " and "
                        + q(c.hot(), Dimension.TEMPERATURE) + (c.hotFromRange() ? " (temperature.max)" : ""),
                c.coldFromRange() && c.hotFromRange()
                        ? "give 'trim.cold' and 'trim.hot', such as '-40 C' and '85 C'"
                        : "write 'trim.cold' below 'trim.hot', such as 'cold: -40 C' and 'hot: 85 C'");
    }

    /** A stage number outside its rule's range, as the loader wrote it when it was words. */
    private static Words outside(StageFact.Outside o) {
        return switch (o.rule()) {
            // a double as Java writes it (the value as read, "20.0")
            case MAX_TO_SIGMA ->
                new Words(
                        o.value() + " is outside " + plain(o.low()) + ".." + plain(o.high()),
                        "write how many standard deviations a datasheet maximum stands for; 3 is common practice");
            case MAX_TRIALS ->
                new Words(
                        plain(o.value()) + " is below trials (" + plain(o.low()) + ")",
                        "write max-trials at least " + plain(o.low()) + ", or lower trials");
            case DIFFERENCE_GAIN ->
                new Words(
                        "a difference gain of " + plain(o.value()) + " cannot be built",
                        "write the ratio r2/r1, such as 10 (at most " + plain(o.high()) + ")");
            case FOLLOWER_GAIN ->
                new Words(
                        "a follower has gain 1, not " + plain(o.value()),
                        "remove 'gain', or write 'topology: non-inverting'");
            case NON_INVERTING_GAIN ->
                new Words(
                        "a non-inverting stage cannot have gain " + plain(o.value()) + " (below 1)",
                        o.value() < 0
                                ? "write the magnitude with 'topology: inverting'"
                                : "write a gain of 1 or more, or use 'topology: inverting'");
            case TRIM_MARGIN ->
                new Words(
                        plain(o.value()) + " is outside 1 to " + plain(o.high())
                                + ": the range must at least cover the offset",
                        "write a factor such as '1.5'");
        };
    }

    /** A number as the user typed it: a whole number without ".0", else as Java writes a double. */
    private static String plain(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.valueOf(v);
    }

    /** A stage value past a bound: "V is above L, reason", and the bound's fix. */
    private static Words beyond(StageFact.Beyond b) {
        String v = q(b.value());
        String l = q(b.limit());
        String above = v + " is above " + l;
        String ex = b.example();
        return switch (b.bound()) {
            case BAND_EDGE ->
                new Words(
                        above + ", beyond the fastest op amp's gain-bandwidth",
                        "check the prefix (Hz, kHz, MHz); write the top signal frequency, such as '1 kHz'");
            case RATIO_TEMPCO ->
                new Words(
                        above + ", more than any resistor pair drifts",
                        "write the ratio tracking in ppm/C, such as '10 ppm/C'");
            case SERVICE_LIFE ->
                new Words(
                        above + ", longer than any circuit is kept in service",
                        "write the operating time in hours or years, such as '10 y'");
            case LOAD_SHORT ->
                new Words(
                        v + " is below " + l + ", a short for an op amp's output",
                        "write the resistance the output drives, such as '2 kohm'; leave the key out for no load");
            case LOAD_OPEN -> new Words(above + ", no load at all", "leave the key out when the output drives no load");
            case SAMPLE_RATE ->
                new Words(
                        above + ", faster than any converter samples",
                        "check the prefix (Hz, kHz, MHz); write the converter's sample rate, such as '30 kHz'");
            case RESISTOR ->
                new Words(
                        above + ", where board leakage decides the value",
                        "check the prefix (kohm, Mohm); write the resistor, such as '" + ex + "'");
            case LEG_RESISTOR ->
                new Words(above + ", where board leakage decides the value", "check the prefix (kohm, Mohm)");
            case SHUNT -> new Words(above, "check the prefix (Mohm, Gohm)");
            case CAPACITANCE -> new Words(above, "check the prefix (pF, nF)");
            case VOLTAGE ->
                new Words(
                        above + ", more than any op amp's supply",
                        "check the prefix (mV, V, kV); write for example '" + ex + "'");
            case MONEY ->
                new Words(
                        above + ", more than any amplifier costs",
                        "write the amount per unit, for example '" + ex + "'");
            case GAIN ->
                new Words(
                        "gain " + above + ", more than any op amp can hold (the best have about 1e8 of open-loop gain,"
                                + " which would leave under 40 dB of loop gain)",
                        "split the gain over two stages, or check the value (40 dB is a gain of 100)");
            case RF_RG_GAIN ->
                new Words(
                        "rf/rg = " + v + " is a gain above " + l + ", more than any op amp can hold",
                        "check the prefixes of rf and rg (kohm, Mohm)");
            case R2_R1_GAIN ->
                new Words("r2/r1 = " + v + " is a gain above " + l, "check the prefixes of r1 and r2 (kohm, Mohm)");
            case SEEBECK ->
                new Words(
                        above + ", more than an oxidised copper contact (about 1 mV/C)",
                        "check the prefix: write microvolts per degree, such as '3 uV/C'");
            case GRADIENT ->
                new Words(
                        above + " between junctions a few millimetres apart",
                        "write the temperature difference across the junctions, such as '0.5 C'");
            case LEAKAGE_VOLTAGE -> new Words(above, "write the potential of the nearby trace relative to the node");
            case LIMIT_TINY ->
                new Words(
                        "a limit of " + v + " at the output is below " + l + ", far below the noise of any resistor",
                        "check the prefix: write the largest error allowed, such as '1 uV'");
            case LIMIT_OVER_SUPPLY ->
                new Words(
                        "a limit of " + v + " at the output is not below the whole supply of " + l
                                + ": no output error can reach it, so the stage constrains nothing",
                        "write the largest error allowed at the output, such as '1 mV' (check the prefix)");
            case LIMIT_OVER_FULL_SCALE ->
                new Words(
                        "a limit of " + v + " at the output is not below the full-scale output of " + l
                                + ": an error as large as the whole signal",
                        "write the largest error allowed at the output, such as '1 mV' (check the prefix)");
        };
    }

    // ------------------------------------------------------------ catalog files

    private static Words catalog(CatalogFact f) {
        if (f instanceof CatalogFact.OutOfBounds b) {
            return outOfBounds(b);
        }
        if (f instanceof CatalogFact.Sign s) {
            return new Words(
                    q(s.value()) + (s.zero() ? " is negative, which is impossible here" : " must be above zero"),
                    s.fix());
        }
        if (f instanceof CatalogFact.Order o) {
            return new Words(
                    o.low() + " (" + q(o.lowValue()) + ") is above " + o.high() + " (" + q(o.highValue()) + ")",
                    o.fix());
        }
        if (f instanceof CatalogFact.PriceRises r) {
            return new Words(
                    String.format(
                            java.util.Locale.ROOT,
                            "the unit price at %d (%.2f) is above the price at %d (%.2f)",
                            r.higherQuantity(),
                            r.higherUnit(),
                            r.lowerQuantity(),
                            r.lowerUnit()),
                    "check the columns: larger orders usually cost less per unit");
        }
        CatalogFact.Spread s = (CatalogFact.Spread) f;
        return new Words(
                s.max() + " (" + q(s.maxValue()) + ") is " + s.times() + " times " + s.typ() + " (" + q(s.typValue())
                        + ")",
                "check the prefixes (u, n, m, p) of both against the datasheet");
    }

    /** A catalog figure past an error bound (impossible) or a warning bound (implausible). */
    private static Words outOfBounds(CatalogFact.OutOfBounds b) {
        Dimension d = b.value().dimension();
        double v = b.value().value();
        String what = d == Dimension.TEMPERATURE ? "a rated range" : "an op amp";
        // a negative value compared by its size: "-2.00 V is below -1.00 V"
        String past = !b.above()
                ? q(v, d) + " is below " + q(b.bound(), d)
                : v < 0 && b.bound() > 0
                        ? q(v, d) + " is below " + q(-b.bound(), d)
                        : q(v, d) + " is above " + q(b.bound(), d);
        String size = b.signed() ? "value" : "size";
        if (b.impossible()) {
            return new Words(
                    past + ", impossible for " + what + " (" + b.why() + ")",
                    "check the unit prefix (p, n, u, m, k, M) and the datasheet column; the "
                            + (b.above() ? "largest " : "smallest ") + size + " accepted here is " + q(b.bound(), d));
        }
        return new Words(
                past + ", implausible for " + what,
                b.above()
                        ? "check the unit prefix (u, m, k, M) and the column"
                        : b.signed()
                                ? "check the sign and the unit"
                                : "check the unit prefix (p, n, u, k, M) and the column");
    }

    private static String q(Quantity x) {
        return Units.format(x.value(), x.dimension());
    }

    private static String q(double v, Dimension d) {
        return Units.format(v, d);
    }
}
