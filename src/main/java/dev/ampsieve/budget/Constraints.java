package dev.ampsieve.budget;

import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.Headroom;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
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
            ConstraintFact none = new ConstraintFact.NotChecked(ConstraintFact.Missing.CATALOG_GBW);
            return List.of(
                    new ConstraintResult(ConstraintKind.PHASE_MARGIN, true, none),
                    new ConstraintResult(ConstraintKind.SIGNAL_BANDWIDTH, true, none));
        }
        TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
        double pm = r.phaseMargin();
        double bw = r.bandwidth();
        double fH = s.bandHigh();
        boolean pmOk = pm >= MIN_PHASE_MARGIN;
        boolean bwOk = bw >= fH;
        ConstraintFact.CfRange range = null;
        if (!pmOk || !bwOk) {
            double least = r.cfForPhaseMargin(MIN_PHASE_MARGIN);
            double most = Double.isNaN(least) ? Double.NaN : largestCfFor(r, least, fH);
            range = new ConstraintFact.CfRange(
                    least,
                    most,
                    Double.isNaN(least) ? Double.NaN : r.withCf(least).bandwidth(),
                    TransimpedanceResponse.graemeCf(r.rf(), r.ct(), r.gbw()),
                    MIN_PHASE_MARGIN,
                    fH);
        }
        ConstraintFact.PhaseMargin pmFact = new ConstraintFact.PhaseMargin(
                MIN_PHASE_MARGIN,
                pm,
                r.crossover(),
                r.cf(),
                r.ct(),
                v.inputCapacitance().bound(),
                v.inputCapacitance().basis() != Basis.GUARANTEED,
                pmOk ? null : range);
        ConstraintFact.Bandwidth bwFact = new ConstraintFact.Bandwidth(fH, bw, r.cf(), bwOk ? null : range);
        return List.of(
                new ConstraintResult(ConstraintKind.PHASE_MARGIN, pmOk, pmFact),
                new ConstraintResult(ConstraintKind.SIGNAL_BANDWIDTH, bwOk, bwFact));
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
        List<TermResult> bad = new ArrayList<>();
        for (TermResult t : terms) {
            if (!Double.isFinite(t.outputV())) {
                bad.add(t);
            }
        }
        List<String> totalsOf = List.of();
        if (bad.isEmpty()
                && !(Double.isFinite(wc)
                        && Double.isFinite(rss)
                        && Double.isFinite(noiseRms)
                        && Double.isFinite(trimmed.worstCaseV())
                        && Double.isFinite(trimmed.rssV()))) {
            totalsOf = terms.stream().map(TermResult::label).toList();
        }
        boolean ok = bad.isEmpty() && totalsOf.isEmpty();
        return new ConstraintResult(ConstraintKind.FINITE, ok, new ConstraintFact.Finite(List.copyOf(bad), totalsOf));
    }

    static ConstraintResult supply(Stage s, Part p, List<Assumption> w) {
        if (s.supplyVoltage() == null) {
            return notChecked(ConstraintKind.SUPPLY, ConstraintFact.Missing.STAGE_SUPPLY);
        }
        if (p.supply() == null) {
            w.add(new Assumption.Note("supply", Assumption.Rule.NOT_CHECKED));
            return notChecked(ConstraintKind.SUPPLY, ConstraintFact.Missing.CATALOG_SUPPLY);
        }
        double lo = s.supplyVoltage() - s.supplyVariation();
        double hi = s.supplyVoltage() + s.supplyVariation();
        return range(ConstraintKind.SUPPLY, lo, hi, p.supply(), Dimension.VOLTAGE, null);
    }

    static ConstraintResult temperature(Stage s, Part p, List<Assumption> w) {
        if (p.temperature() == null) {
            w.add(new Assumption.Note("temperature", Assumption.Rule.NOT_CHECKED));
            return notChecked(ConstraintKind.TEMPERATURE, ConstraintFact.Missing.CATALOG_TEMPERATURE);
        }
        return range(ConstraintKind.TEMPERATURE, s.tMin(), s.tMax(), p.temperature(), Dimension.TEMPERATURE, null);
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
        double share = switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, TRANSIMPEDANCE -> Double.NaN;
            case DIFFERENCE -> s.network().commonModeShare();
        };
        return headroom(ConstraintKind.COMMON_MODE, neededCommonMode(s), 0.0, share, s, p.inputHeadroom(), w);
    }

    static ConstraintResult outputSwing(Stage s, Part p, double dc, List<Assumption> w) {
        return headroom(ConstraintKind.OUTPUT_SWING, neededOutput(s), dc, Double.NaN, s, p.outputHeadroom(), w);
    }

    private static ConstraintResult headroom(
            ConstraintKind kind, Range need, double widen, double share, Stage s, Headroom h, List<Assumption> w) {
        if (need == null) {
            return notChecked(
                    kind,
                    kind == ConstraintKind.OUTPUT_SWING
                            ? ConstraintFact.Missing.STAGE_SUPPLY_OR_FULL_SCALE
                            : ConstraintFact.Missing.STAGE_SUPPLY);
        }
        if (s.supplyVoltage() == null) {
            return notChecked(kind, ConstraintFact.Missing.STAGE_SUPPLY);
        }
        boolean assumed = h == null;
        if (assumed) {
            h = new Headroom(Assumed.HEADROOM_V, Assumed.HEADROOM_V);
            w.add(new Assumption.Headroom(
                    kind == ConstraintKind.OUTPUT_SWING ? CatalogKeys.OUTPUT_HEADROOM : CatalogKeys.INPUT_HEADROOM,
                    kind.key(),
                    Assumed.HEADROOM_V));
        }
        // the lowest supply of the stage leaves the least room at the top
        double vLow = s.supplyVoltage() - s.supplyVariation();
        Range offer = new Range(h.low(), vLow - h.high());
        ConstraintFact.HeadroomFacts facts =
                new ConstraintFact.HeadroomFacts(vLow, h.low(), h.high(), assumed, Math.max(widen, 0), share);
        ConstraintResult r = range(kind, need.min() - widen, need.max() + widen, offer, Dimension.VOLTAGE, facts);
        if (offer.min() > offer.max()) {
            return new ConstraintResult(kind, false, r.fact());
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
            return notChecked(ConstraintKind.SLEW, ConstraintFact.Missing.STAGE_FULL_SCALE);
        }
        if (p.slew() == null) {
            w.add(new Assumption.SlewNotChecked(need));
            return notChecked(ConstraintKind.SLEW, ConstraintFact.Missing.CATALOG_SLEW);
        }
        boolean ok = p.slew() >= need;
        return new ConstraintResult(
                ConstraintKind.SLEW, ok, new ConstraintFact.Slew(need, p.slew(), ok ? 0 : need - p.slew()));
    }

    static ConstraintResult price(Stage s, Part p, List<Assumption> w) {
        if (s.maxPrice() == null) {
            return new ConstraintResult(ConstraintKind.PRICE, true, new ConstraintFact.NoCeiling());
        }
        if (p.price() == null) {
            w.add(new Assumption.Note("price", Assumption.Rule.NOT_CHECKED));
            return notChecked(ConstraintKind.PRICE, ConstraintFact.Missing.CATALOG_PRICE);
        }
        double unit = p.unitPrice(s.quantity());
        boolean ok = unit <= s.maxPrice();
        return new ConstraintResult(
                ConstraintKind.PRICE,
                ok,
                new ConstraintFact.Price(s.maxPrice(), unit, p.price().currency(), ok ? 0 : unit - s.maxPrice()));
    }

    private static ConstraintResult notChecked(ConstraintKind k, ConstraintFact.Missing m) {
        return new ConstraintResult(k, true, new ConstraintFact.NotChecked(m));
    }

    private static ConstraintResult range(
            ConstraintKind kind, double lo, double hi, Range offer, Dimension d, ConstraintFact.HeadroomFacts h) {
        ConstraintFact.Span span = ConstraintFact.Span.of(lo, hi, offer, d, h);
        return new ConstraintResult(kind, span.met(), span);
    }
}
