package dev.ampsieve.budget;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * The hard constraints of error-model.md: a part that fails one is not a candidate, whatever
 * its error. Each result says what the stage needs, what the part offers, and by how much it
 * misses. A constraint that cannot be checked (a value missing on either side) passes with
 * "not checked" in its detail and a warning, so the user sees what was not verified.
 */
public final class Constraints {
    private Constraints() {}

    public static final String SUPPLY = "supply";
    public static final String TEMPERATURE = "temperature";
    public static final String COMMON_MODE = "common-mode";
    public static final String OUTPUT_SWING = "output-swing";
    public static final String SLEW = "slew";
    public static final String PRICE = "price";
    /** Every figure of the budget is a finite number (a product of extreme catalog and stage values may overflow). */
    public static final String FINITE = "finite";
    /** The self-heated die within the part's rated temperature ({@link SelfHeatingTerm#dieLimit}). */
    public static final String DIE_TEMPERATURE = "die-temperature";

    /**
     * @param dcHeadroomV output-referred DC error an AC-coupled stage must still swing around
     *                    (0 for DC-coupled stages, whose error is inside the limit)
     * @param warnings    receives a line for each constraint that could not be checked
     */
    public static List<ConstraintResult> check(Stage s, Part p, double dcHeadroomV, List<Assumption> warnings) {
        List<ConstraintResult> out = new ArrayList<>();
        out.add(supply(s, p, warnings));
        out.add(temperature(s, p, warnings));
        out.add(commonMode(s, p, warnings));
        out.add(outputSwing(s, p, dcHeadroomV, warnings));
        out.add(slew(s, p, warnings));
        out.add(price(s, p, warnings));
        out.addAll(speed(s, p));
        return out;
    }

    // ---------------------------------------------------------------- transimpedance stability and speed

    /** Transimpedance: the loop's phase margin. */
    public static final String PHASE_MARGIN = "phase-margin";
    /** Transimpedance: the -3 dB signal bandwidth against band.high. */
    public static final String SIGNAL_BANDWIDTH = "signal-bandwidth";
    /**
     * Least phase margin accepted, degrees: 45° (common practice: below it the step response rings
     * and the closed loop peaks; Franco, 4th ed., ch. 8; Graeme, <i>Photodiode Amplifiers</i>, 1996,
     * ch. 2 [from memory]).
     */
    public static final double MIN_PHASE_MARGIN = 45.0;

    /** The stability and speed checks a topology needs beyond the others (only a transimpedance stage has them). */
    private static List<ConstraintResult> speed(Stage s, Part p) {
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> List.of();
            case TRANSIMPEDANCE -> transimpedance(s, PartValues.of(p, s));
        };
    }

    /**
     * Phase margin at least {@link #MIN_PHASE_MARGIN} and -3 dB signal bandwidth at least band.high,
     * both from {@link TransimpedanceResponse} (the part's minimum open-loop gain, GBW and input
     * capacitance, assumed where missing: PartValues warns). A failure names the feedback capacitor
     * range that meets both, or says none does.
     */
    static List<ConstraintResult> transimpedance(Stage s, PartValues v) {
        if (Double.isNaN(v.gbw())) {
            return List.of(
                    new ConstraintResult(PHASE_MARGIN, true, "not checked: no GBW in the catalog"),
                    new ConstraintResult(SIGNAL_BANDWIDTH, true, "not checked: no GBW in the catalog"));
        }
        TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
        double pm = r.phaseMargin();
        double bw = r.bandwidth();
        double fH = s.bandHigh();
        boolean pmOk = pm >= MIN_PHASE_MARGIN;
        boolean bwOk = bw >= fH;
        String ct = "Ct " + Units.format(r.ct(), Dimension.CAPACITANCE) + " (source "
                + Units.format(r.ct() - v.inputCapacitance().bound(), Dimension.CAPACITANCE) + " + input "
                + Units.format(v.inputCapacitance().bound(), Dimension.CAPACITANCE)
                + (v.inputCapacitance().basis() != Basis.GUARANTEED ? ", assumed" : "") + ")";
        String cfNow = "cf " + Units.format(r.cf(), Dimension.CAPACITANCE);
        String advice = "";
        if (!pmOk || !bwOk) {
            double least = r.cfForPhaseMargin(MIN_PHASE_MARGIN);
            double most = Double.isNaN(least) ? Double.NaN : largestCfFor(r, least, fH);
            String graeme = "Graeme's estimate sqrt(Ct/(2π rf GBW)) = "
                    + Units.format(TransimpedanceResponse.graemeCf(r.rf(), r.ct(), r.gbw()), Dimension.CAPACITANCE);
            if (Double.isNaN(least) || Double.isNaN(most)) {
                advice = "; no cf gives both " + Units.format(MIN_PHASE_MARGIN, Dimension.NUMBER)
                        + "° and a -3 dB bandwidth of "
                        + Units.format(fH, Dimension.FREQUENCY)
                        + ": the part's GBW is too low for this rf and source capacitance"
                        + (Double.isNaN(least)
                                ? ""
                                : " (cf " + Units.format(least, Dimension.CAPACITANCE) + " gives "
                                        + Units.format(MIN_PHASE_MARGIN, Dimension.NUMBER) + "° and "
                                        + Units.format(r.withCf(least).bandwidth(), Dimension.FREQUENCY) + "; " + graeme
                                        + ")");
            } else {
                advice = "; cf from " + Units.format(least, Dimension.CAPACITANCE) + " to "
                        + Units.format(most, Dimension.CAPACITANCE) + " gives both (" + graeme + ")";
            }
        }
        String pmText = "needs a phase margin of at least " + Units.format(MIN_PHASE_MARGIN, Dimension.NUMBER)
                + "° (common practice); "
                + (Double.isNaN(pm)
                        ? "the loop gain never reaches 1"
                        : "part " + Units.format(pm, Dimension.NUMBER, 3) + "° at the loop crossover "
                                + Units.format(r.crossover(), Dimension.FREQUENCY))
                + " with " + cfNow + ", " + ct + (pmOk ? "" : advice);
        String bwText = "needs a -3 dB signal bandwidth of at least band.high " + Units.format(fH, Dimension.FREQUENCY)
                + "; part " + Units.format(bw, Dimension.FREQUENCY) + " with " + cfNow + (bwOk ? "" : advice);
        return List.of(
                new ConstraintResult(PHASE_MARGIN, pmOk, pmText), new ConstraintResult(SIGNAL_BANDWIDTH, bwOk, bwText));
    }

    /**
     * The largest cf, at least {@code least}, whose -3 dB bandwidth still reaches {@code fH} (the
     * bandwidth falls as cf grows past the one that settles the loop): Brent on log cf; NaN when
     * even {@code least} is too slow.
     */
    private static double largestCfFor(TransimpedanceResponse r, double least, double fH) {
        double lo = Math.log10(Math.max(least, 1e-18));
        if (!(r.withCf(Math.pow(10, lo)).bandwidth() >= fH)) {
            return Double.NaN;
        }
        double hi = lo + 6;
        org.apache.commons.math3.analysis.UnivariateFunction g =
                x -> Math.log(r.withCf(Math.pow(10, x)).bandwidth() / fH);
        if (g.value(hi) >= 0) {
            return Math.pow(10, hi);
        }
        return Math.pow(10, new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-10).solve(1000, g, lo, hi));
    }

    /**
     * Fails when a term or total is past the largest double (or not a number): names each such
     * term with the catalog and stage values it was computed from (its note). Load-time limits
     * keep every product of accepted values finite; this stands behind them, so a part that
     * overflows is refused with its reason instead of stopping a whole ranking.
     */
    static ConstraintResult finite(List<TermResult> terms, double wc, double rss, double noiseRms, Trimmed trimmed) {
        List<String> bad = new ArrayList<>();
        for (TermResult t : terms) {
            if (!Double.isFinite(t.outputV())) {
                bad.add(t.label() + " (" + t.note() + ")");
            }
        }
        if (bad.isEmpty()
                && !(Double.isFinite(wc)
                        && Double.isFinite(rss)
                        && Double.isFinite(noiseRms)
                        && Double.isFinite(trimmed.worstCaseV())
                        && Double.isFinite(trimmed.rssV()))) {
            bad.add("the totals of " + terms.stream().map(TermResult::label).toList());
        }
        if (bad.isEmpty()) {
            return new ConstraintResult(FINITE, true, "every figure is a finite number");
        }
        return new ConstraintResult(
                FINITE,
                false,
                "too large to compute: " + String.join("; ", bad)
                        + "; check these catalog and stage values for a wrong prefix or exponent");
    }

    static ConstraintResult supply(Stage s, Part p, List<Assumption> w) {
        if (s.supplyVoltage() == null) {
            return new ConstraintResult(SUPPLY, true, "not checked: the stage gives no supply voltage");
        }
        if (p.supply() == null) {
            w.add(new Assumption.Note("supply", Assumption.Rule.NOT_CHECKED));
            return new ConstraintResult(SUPPLY, true, "not checked: no supply range in the catalog");
        }
        double lo = s.supplyVoltage() - s.supplyVariation();
        double hi = s.supplyVoltage() + s.supplyVariation();
        return range(SUPPLY, lo, hi, p.supply(), Dimension.VOLTAGE, "supply", "rated");
    }

    static ConstraintResult temperature(Stage s, Part p, List<Assumption> w) {
        if (p.temperature() == null) {
            w.add(new Assumption.Note("temperature", Assumption.Rule.NOT_CHECKED));
            return new ConstraintResult(TEMPERATURE, true, "not checked: no rated range in the catalog");
        }
        return range(TEMPERATURE, s.tMin(), s.tMax(), p.temperature(), Dimension.TEMPERATURE, "ambient", "rated");
    }

    /**
     * Needed common-mode range at the amplifier's pins: the stage's, else mid-supply +/- the
     * common-mode swing (a peak change). A difference stage states both at the source; its pins see
     * them divided, {@code pins = mid + (source - mid) x share} with share = R4/(R3 + Rs+ + R4)
     * ({@link dev.ampsieve.stage.Network#commonModeShare}), assuming the reference (R4's far end) is at
     * mid-supply, where a single-supply stage centres its output (a stated range should include the
     * + leg's half of the differential signal, which the default swing already does).
     */
    public static Range neededCommonMode(Stage s) {
        Range source = s.commonModeRange();
        if (source == null && s.supplyVoltage() == null) {
            return null;
        }
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, TRANSIMPEDANCE ->
                source != null
                        ? source
                        : new Range(
                                s.supplyVoltage() / 2 - s.commonModeSwing(),
                                s.supplyVoltage() / 2 + s.commonModeSwing());
            case DIFFERENCE -> {
                if (s.supplyVoltage() == null) {
                    yield source; // not checked without a supply (headroom says so): kept as stated
                }
                double mid = s.supplyVoltage() / 2;
                double share = s.network().commonModeShare();
                Range at = source != null ? source : new Range(mid - s.commonModeSwing(), mid + s.commonModeSwing());
                yield new Range(mid + (at.min() - mid) * share, mid + (at.max() - mid) * share);
            }
        };
    }

    /**
     * Needed output range: the stage's, else mid-supply +/- the full-scale output, which is the peak
     * excursion from the output's zero (error-model.md, VFS).
     */
    public static Range neededOutput(Stage s) {
        if (s.outputRange() != null) {
            return s.outputRange();
        }
        if (s.supplyVoltage() == null || s.fullScaleOutput() == null) {
            return null;
        }
        double mid = s.supplyVoltage() / 2;
        return new Range(mid - s.fullScaleOutput(), mid + s.fullScaleOutput());
    }

    static ConstraintResult commonMode(Stage s, Part p, List<Assumption> w) {
        ConstraintResult r =
                headroom(COMMON_MODE, "input common mode", neededCommonMode(s), 0.0, s, p.inputHeadroom(), w);
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, TRANSIMPEDANCE -> r;
            case DIFFERENCE ->
                s.supplyVoltage() == null
                        ? r
                        : new ConstraintResult(
                                r.name(),
                                r.ok(),
                                r.detail()
                                        + " (at the pins: the source's common mode x "
                                        + Units.format(s.network().commonModeShare(), Dimension.NUMBER, 4)
                                        + " about mid-supply, the reference taken at mid-supply)");
        };
    }

    static ConstraintResult outputSwing(Stage s, Part p, double dc, List<Assumption> w) {
        return headroom(OUTPUT_SWING, "output", neededOutput(s), dc, s, p.outputHeadroom(), w);
    }

    private static ConstraintResult headroom(
            String name, String what, Range need, double widen, Stage s, Headroom h, List<Assumption> w) {
        if (need == null) {
            return new ConstraintResult(
                    name,
                    true,
                    "not checked: the stage gives no supply voltage"
                            + (name.equals(OUTPUT_SWING) ? " or full-scale output" : ""));
        }
        if (s.supplyVoltage() == null) {
            return new ConstraintResult(name, true, "not checked: the stage gives no supply voltage");
        }
        boolean assumed = h == null;
        if (assumed) {
            h = new Headroom(Assumed.HEADROOM_V, Assumed.HEADROOM_V);
            w.add(new Assumption.Headroom(
                    name.equals(OUTPUT_SWING) ? CatalogKeys.OUTPUT_HEADROOM : CatalogKeys.INPUT_HEADROOM,
                    name,
                    Assumed.HEADROOM_V));
        }
        // the lowest supply of the stage leaves the least room at the top
        double vLow = s.supplyVoltage() - s.supplyVariation();
        Range offer = new Range(h.low(), vLow - h.high());
        Range needed = new Range(need.min() - widen, need.max() + widen);
        ConstraintResult r = range(name, needed.min(), needed.max(), offer, Dimension.VOLTAGE, what, "reachable");
        if (offer.min() > offer.max()) {
            // "reachable 3.00 V to 1.75 V" reads as a typo: say why there is no range at all
            String v = Units.format(vLow, Dimension.VOLTAGE);
            r = new ConstraintResult(
                    r.name(),
                    false,
                    r.detail()
                            .replace(
                                    "part reachable " + Units.format(offer.min(), Dimension.VOLTAGE) + " to "
                                            + Units.format(offer.max(), Dimension.VOLTAGE),
                                    "part reachable nowhere on a " + v + " supply (headroom "
                                            + Units.format(h.low(), Dimension.VOLTAGE) + " from the low rail plus "
                                            + Units.format(h.high(), Dimension.VOLTAGE) + " from the high rail)"));
        }
        if (assumed) {
            r = new ConstraintResult(r.name(), r.ok(), r.detail() + " (headroom assumed, not in the catalog)");
        }
        if (widen > 0) {
            return new ConstraintResult(
                    r.name(),
                    r.ok(),
                    r.detail() + " (includes " + Units.format(widen, Dimension.VOLTAGE)
                            + " of DC error an AC-coupled stage still carries)");
        }
        return r;
    }

    /**
     * Slew rate needed for a full-scale sine at fH: 2 pi fH VFS, VFS the sine's peak amplitude
     * (the largest slope of VFS sin(2 pi fH t); Franco, 4th ed., ch. 6 [from memory]).
     */
    public static double neededSlew(Stage s) {
        return s.fullScaleOutput() == null ? Double.NaN : 2 * Math.PI * s.bandHigh() * s.fullScaleOutput();
    }

    static ConstraintResult slew(Stage s, Part p, List<Assumption> w) {
        double need = neededSlew(s);
        if (Double.isNaN(need)) {
            return new ConstraintResult(SLEW, true, "not checked: the stage gives no full-scale output");
        }
        if (p.slew() == null) {
            w.add(new Assumption.SlewNotChecked(need));
            return new ConstraintResult(SLEW, true, "not checked: no slew rate in the catalog");
        }
        boolean ok = p.slew() >= need;
        String d = "needs " + Units.format(need, Dimension.SLEW_RATE) + " (2π fH VFS); part "
                + Units.format(p.slew(), Dimension.SLEW_RATE)
                + (ok ? "" : "; short by " + Units.format(need - p.slew(), Dimension.SLEW_RATE));
        return new ConstraintResult(SLEW, ok, d);
    }

    static ConstraintResult price(Stage s, Part p, List<Assumption> w) {
        if (s.maxPrice() == null) {
            return new ConstraintResult(PRICE, true, "no price ceiling");
        }
        if (p.price() == null) {
            w.add(new Assumption.Note("price", Assumption.Rule.NOT_CHECKED));
            return new ConstraintResult(PRICE, true, "not checked: no price in the catalog");
        }
        double unit = p.unitPrice(s.quantity());
        boolean ok = unit <= s.maxPrice();
        String cur = p.price().currency();
        String d = String.format(java.util.Locale.ROOT, "ceiling %.2f %s; part %.2f %s", s.maxPrice(), cur, unit, cur)
                + (ok ? "" : String.format(java.util.Locale.ROOT, "; over by %.2f %s", unit - s.maxPrice(), cur));
        return new ConstraintResult(PRICE, ok, d);
    }

    private static ConstraintResult range(
            String name, double lo, double hi, Range offer, Dimension d, String needWhat, String offerWhat) {
        boolean ok = lo >= offer.min() && hi <= offer.max();
        StringBuilder sb = new StringBuilder();
        sb.append("needs ").append(needWhat).append(' ').append(Units.format(lo, d));
        if (hi != lo) {
            sb.append(" to ").append(Units.format(hi, d));
        }
        sb.append("; part ")
                .append(offerWhat)
                .append(' ')
                .append(Units.format(offer.min(), d))
                .append(" to ")
                .append(Units.format(offer.max(), d));
        if (!ok) {
            if (lo < offer.min()) {
                sb.append("; short by ")
                        .append(Units.format(offer.min() - lo, d))
                        .append(" at the low end");
            }
            if (hi > offer.max()) {
                sb.append("; short by ")
                        .append(Units.format(hi - offer.max(), d))
                        .append(" at the high end");
            }
        }
        return new ConstraintResult(name, ok, sb.toString());
    }
}
