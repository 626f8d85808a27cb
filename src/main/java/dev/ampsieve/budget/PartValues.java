package dev.ampsieve.budget;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.LongTermDrift;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Noise;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.PhysicalConstants;
import java.util.ArrayList;
import java.util.List;

/**
 * One part's catalog values after the missing-value rules of error-model.md, resolved once
 * so the error terms and the Monte Carlo use the same numbers. Every substitution is
 * listed in {@link #assumptions()}. None makes a part look better than its datasheet allows:
 * a missing figure takes the conservative estimate of {@link Assumed} (flagged estimated), a
 * figure given only as typical enters as k x typical (k = the stage's max-to-sigma ratio;
 * flagged typical-only) with the typical value as one sigma.
 *
 * @param vos            input offset at 25 °C, V (bound = max)
 * @param vosMaxOverTemp guaranteed maximum offset over the rated range, V; NaN when not given
 * @param drift          offset drift, V/°C; bound infinite when only vos over temperature bounds it
 * @param ib             input bias current at 25 °C, A
 * @param ios            input offset current at 25 °C, A
 * @param ibOverTemp     catalog maximum of IB over the rated range, A; NaN when not given
 * @param iosOverTemp    the same for IOS (IB's when IOS is assumed equal to IB)
 * @param ratedHigh      upper end of the part's rated range, °C: where a FET input's
 *                       over-temperature maximum applies
 * @param cmrrDb         common-mode rejection, dB (bound = minimum)
 * @param psrrDb         supply rejection, dB (bound = minimum)
 * @param aolDb          open-loop gain, dB (bound = minimum)
 * @param gbw            gain-bandwidth product, Hz; NaN when not given
 * @param en             white voltage noise density, V/√Hz
 * @param enCorner       its 1/f corner, Hz
 * @param in             white current noise density, A/√Hz
 * @param inCorner       its 1/f corner, Hz
 * @param noiseEstimated a noise figure came from {@link Assumed}
 * @param aging          input-referred long-term drift over the stage's service life, V (bound
 *                       = the worst case, typ = one sigma where the catalog's typical figure is used)
 * @param inputCapacitance the capacitance one input presents (common-mode plus differential), F: the
 *                       catalog's, else {@link Assumed#INPUT_CAPACITANCE} (basis ASSUMED)
 * @param operating      the figures of the operating-point terms (test conditions, crossover, thermal
 *                       resistance, quiescent current, chopping ripple), resolved by the same rules
 */
public record PartValues(
        Part part,
        Figure vos,
        double vosMaxOverTemp,
        Figure drift,
        Figure ib,
        Figure ios,
        double ibOverTemp,
        double iosOverTemp,
        double ratedHigh,
        Figure cmrrDb,
        Figure psrrDb,
        Figure aolDb,
        double gbw,
        double en,
        double enCorner,
        double in,
        double inCorner,
        boolean noiseEstimated,
        Figure aging,
        Figure inputCapacitance,
        OperatingFigures operating,
        List<Assumption> assumptions) {

    public PartValues {
        assumptions = List.copyOf(assumptions);
    }

    /**
     * Resolves {@code part}'s values for use in {@code stage} (the stage gives the max-to-sigma
     * ratio, the service life, and decides which missing values matter enough to warn about).
     */
    public static PartValues of(Part part, Stage stage) {
        List<Assumption> w = new ArrayList<>();
        double k = stage.maxToSigma();
        InputType input = inputOf(part);
        boolean sc = part.selfCorrecting();

        Spread vosS = orNone(part.vos());
        double vosOt = vosS.maxOverTemp() == null ? Double.NaN : vosS.maxOverTemp();
        Figure vos;
        if (vosS.max() != null) {
            vos = Figure.guaranteed(vosS.max(), vosS.typ());
        } else if (vosS.typ() != null) {
            vos = typicalOnly(vosS.typ(), k);
            w.add(new Assumption.TypicalAsLimit("vos", vosS.typ(), k, vos.bound()));
        } else if (!Double.isNaN(vosOt)) {
            vos = Figure.of(vosOt, Basis.GUARANTEED);
            w.add(new Assumption.Note("vos", Assumption.Rule.OVER_TEMPERATURE_AT_25));
        } else {
            vos = Figure.of(0.0, Basis.MISSING);
            w.add(new Assumption.Note("vos", Assumption.Rule.OFFSET_NOT_COUNTED));
        }

        Spread drS = orNone(part.vosDrift());
        Figure drift;
        if (drS.max() != null) {
            drift = Figure.guaranteed(drS.max(), drS.typ());
        } else if (drS.typ() != null) {
            drift = typicalOnly(drS.typ(), k);
            w.add(new Assumption.TypicalAsLimit("vos-drift", drS.typ(), k, drift.bound()));
        } else if (!Double.isNaN(vosOt) && vos.basis() == Basis.GUARANTEED && vosS.max() != null) {
            // the offset over temperature bounds offset plus drift: the drift term takes what is left
            // (not when it is the only offset figure: nothing is left, and a trim would then seem to
            // leave no drift at all, so the estimate below stands in)
            drift = Figure.of(Double.POSITIVE_INFINITY, Basis.GUARANTEED);
        } else {
            drift = Figure.of(estimatedDrift(vos.bound()), Basis.ESTIMATED);
            w.add(new Assumption.DriftFromOffset(vos.bound(), drift.bound(), input));
        }

        Spread ibS = orNone(part.ib());
        Figure ib;
        if (ibS.max() != null) {
            ib = Figure.guaranteed(ibS.max(), ibS.typ());
        } else if (ibS.typ() != null) {
            ib = typicalOnly(ibS.typ(), k);
            w.add(new Assumption.TypicalAsLimit("ib", ibS.typ(), k, ib.bound()));
        } else if (ibS.maxOverTemp() != null) {
            ib = Figure.of(ibS.maxOverTemp(), Basis.GUARANTEED);
            w.add(new Assumption.Note("ib", Assumption.Rule.OVER_TEMPERATURE_AT_25));
        } else {
            ib = Figure.of(Assumed.ib(input, sc), Basis.ESTIMATED);
            w.add(new Assumption.ByInputKind("ib", ib.bound(), input, sc));
        }
        Spread iosS = orNone(part.ios());
        Figure ios;
        if (iosS.max() != null) {
            ios = Figure.guaranteed(iosS.max(), iosS.typ());
        } else if (iosS.typ() != null) {
            ios = typicalOnly(iosS.typ(), k);
            w.add(new Assumption.TypicalAsLimit("ios", iosS.typ(), k, ios.bound()));
        } else if (iosS.maxOverTemp() != null) {
            ios = Figure.of(iosS.maxOverTemp(), Basis.GUARANTEED);
            w.add(new Assumption.Note("ios", Assumption.Rule.OVER_TEMPERATURE_AT_25));
        } else {
            // bias-cancelled and FET inputs have IOS about equal to IB: the pessimistic reading
            ios = Figure.of(ib.bound(), Basis.ASSUMED);
            w.add(new Assumption.IosFromIb(ib.bound()));
        }
        double ibOt = ibS.maxOverTemp() != null ? ibS.maxOverTemp() : Double.NaN;
        // an assumed IOS = IB follows IB with temperature
        double iosOt =
                ios.basis() == Basis.ASSUMED ? ibOt : iosS.maxOverTemp() != null ? iosS.maxOverTemp() : Double.NaN;
        double ratedHigh =
                part.temperature() == null ? Double.NaN : part.temperature().max();

        Figure cmrr = rejection("cmrr", part.cmrr(), Assumed.CMRR_DB, k, w);
        Figure psrr = rejection("psrr", part.psrr(), Assumed.PSRR_DB, k, w);
        Figure aol = rejection("aol", part.aol(), Assumed.AOL_DB, k, w);

        double gbw = part.gbw() > 0 && Double.isFinite(part.gbw()) ? part.gbw() : Double.NaN;
        if (Double.isNaN(gbw)) {
            w.add(new Assumption.Note("gbw", Assumption.Rule.BANDWIDTH_NOT_COUNTED));
        }

        Noise n = part.noise() == null ? Noise.NONE : part.noise();
        boolean noiseEst = false;
        double en;
        if (n.en() != null) {
            en = n.en();
        } else {
            en = Assumed.en(input, sc);
            noiseEst = true;
            w.add(new Assumption.ByInputKind("noise.en", en, input, sc));
        }
        double enC;
        if (n.enCorner() != null) {
            enC = n.enCorner();
        } else {
            enC = Assumed.enCorner(input, sc);
            if (enC > 0) {
                noiseEst = true;
                w.add(new Assumption.ByInputKind("noise.en-corner", enC, input, sc));
            }
        }
        double in;
        if (n.in() != null) {
            in = n.in();
        } else {
            in = Assumed.in(input, sc, ib.bound());
            noiseEst = true;
            w.add(new Assumption.CurrentNoise(
                    input == InputType.BIPOLAR || sc
                            ? Assumption.Rule.CURRENT_NOISE_FLOOR
                            : Assumption.Rule.SHOT_NOISE_OF_IB,
                    in,
                    ib.bound()));
        }
        double inC;
        if (n.inCorner() != null) {
            inC = n.inCorner();
        } else {
            inC = Assumed.inCorner(input, sc);
            if (inC > 0) {
                noiseEst = true;
                w.add(new Assumption.ByInputKind("noise.in-corner", inC, input, sc));
            }
        }

        Figure aging = aging(part.longTermDrift(), stage.serviceLife(), input, sc, k, w);

        Figure cin;
        if (part.inputCapacitance() != null) {
            cin = Figure.of(part.inputCapacitance(), Basis.GUARANTEED);
        } else {
            cin = Figure.of(Assumed.INPUT_CAPACITANCE, Basis.ASSUMED);
            if (stage.topology() == dev.ampsieve.stage.Topology.TRANSIMPEDANCE) {
                // only a transimpedance stage puts the input's capacitance in its noise gain
                w.add(new Assumption.Default(
                        "input-capacitance", Assumption.Rule.DEFAULT_VALUE, Assumed.INPUT_CAPACITANCE));
            }
        }

        if (Double.isNaN(ibOt) && exponential(part) && stage.tMax() > Stage.T_REF) {
            double f = Math.pow(2.0, (stage.tMax() - Stage.T_REF) / 10.0);
            w.add(new Assumption.IbDoubling(ib.bound(), f, ib.bound() * f, stage.tMax(), sc));
        }
        if (stage.trim() != null && stage.trim().allowed() && stage.deltaT() > 0 && Double.isNaN(ibOt)) {
            w.add(new Assumption.TrimBiasResidual(exponential(part), inputOf(part) == InputType.BIPOLAR && !sc));
        }
        OperatingFigures operating = OperatingFigures.of(part, stage, vos, w);
        return new PartValues(
                part, vos, vosOt, drift, ib, ios, ibOt, iosOt, ratedHigh, cmrr, psrr, aol, gbw, en, enC, in, inC,
                noiseEst, aging, cin, operating, w);
    }

    private static InputType inputOf(Part part) {
        return part.input() == null ? InputType.BIPOLAR : part.input();
    }

    /** A typical-only figure: k x typ as the bound, typ as one sigma (error-model.md "Missing and typical-only figures"). */
    static Figure typicalOnly(double typ, double k) {
        return new Figure(k * typ, typ, Basis.TYPICAL_ONLY);
    }

    /**
     * Long-term drift over {@code life} seconds, input-referred V: the catalog figure (published as
     * typical) scaled by √(life / per) as one sigma, k times it as the bound; without a figure the
     * {@link Assumed} estimate, scaled the same way, as the bound.
     */
    private static Figure aging(
            LongTermDrift d, double life, InputType input, boolean sc, double k, List<Assumption> w) {
        if (life <= 0) {
            return Figure.of(0.0, Basis.GUARANTEED);
        }
        if (d == null || d.per() <= 0) {
            double est = Assumed.agingPer1000h(input, sc) * Math.sqrt(life / Assumed.THOUSAND_HOURS);
            w.add(new Assumption.Aging(Assumed.agingPer1000h(input, sc), est, input, sc));
            return Figure.of(est, Basis.ESTIMATED);
        }
        double typ = d.value() * Math.sqrt(life / d.per());
        return typicalOnly(typ, k);
    }

    /**
     * Offset drift of a bipolar differential pair from its offset: VOS = (kT/q) ln(IS2/IS1)
     * is proportional to absolute temperature, so dVOS/dT = VOS / T, about 3.35 µV/°C per mV
     * at 25 °C. Gray, Hurst, Lewis, Meyer, <i>Analysis and Design of Analog ICs</i>, 5th ed.,
     * ch. 3; Horowitz &amp; Hill, <i>The Art of Electronics</i>, 3rd ed., ch. 5 [from memory].
     * Each unit's drift is its own offset over T (same sign), not an independent draw.
     *
     * @param vos offset at 25 °C, V
     * @return drift, V/°C, evaluated at T = 298.15 K
     */
    public static double estimatedDrift(double vos) {
        return vos / PhysicalConstants.ROOM_KELVIN;
    }

    /** True when the drift is the offset's own vos / T (each unit's drift follows its offset). */
    public boolean driftFromOffset() {
        return drift.basis() == Basis.ESTIMATED;
    }

    /** FET, CMOS and chopper / auto-zero inputs: bias current is leakage or charge injection, growing with temperature. */
    static boolean exponential(Part p) {
        return inputOf(p).fetLike() || p.selfCorrecting();
    }

    /**
     * Plain bipolar inputs: the bias current is base current and flows with a known sign (a
     * bound on its change is its larger end, not the sum of both ends, and it is never sampled
     * below zero).
     */
    public boolean biasSignKnown() {
        return inputOf(part) == InputType.BIPOLAR && !part.selfCorrecting();
    }

    /**
     * Bias or offset current limit at {@code tC}, A (error-model.md term 3, temperature).
     * <ul>
     * <li>FET, CMOS and zero-drift inputs (junction leakage, charge injection): at or below 25 °C
     * the 25 °C maximum; above it the exponential through the 25 °C maximum and the
     * over-temperature maximum, which the datasheet specifies at the upper end {@code tHigh} of
     * the rated range, {@code I25 * (Iot/I25)^((T - 25)/(tHigh - 25))}, never above the
     * over-temperature maximum. The doubling-per-10 °C law of junction leakage (common practice;
     * Sze, <i>Physics of Semiconductor Devices</i>, ch. 2 [from memory]) is the shape; the two
     * datasheet points set it. Without an over-temperature figure: doubling every 10 °C
     * (estimated).</li>
     * <li>Bipolar inputs (base current rises when cold): the over-temperature maximum at any
     * temperature other than 25 °C where given, else the 25 °C maximum.</li>
     * </ul>
     * An over-temperature figure below the 25 °C one is read as the 25 °C one.
     */
    public static double biasAt(boolean exponential, double at25, double overTemp, double tHigh, double tC) {
        if (tC == Stage.T_REF) {
            return at25;
        }
        if (!exponential) {
            return Double.isNaN(overTemp) ? at25 : Math.max(at25, overTemp);
        }
        if (tC < Stage.T_REF) {
            return at25;
        }
        if (Double.isNaN(overTemp)) {
            return at25 * Math.pow(2.0, (tC - Stage.T_REF) / 10.0);
        }
        double hi = Math.max(at25, overTemp);
        if (at25 <= 0 || !(tHigh > Stage.T_REF) || tC >= tHigh) {
            return hi;
        }
        return Math.min(hi, at25 * Math.pow(hi / at25, (tC - Stage.T_REF) / (tHigh - Stage.T_REF)));
    }

    /** Bias current limit at {@code tC}, A. */
    public double ibAt(double tC) {
        return biasAt(exponential(part), ib.bound(), ibOverTemp, ratedHigh, tC);
    }

    /** Offset current limit at {@code tC}, A. */
    public double iosAt(double tC) {
        return biasAt(exponential(part), ios.bound(), iosOverTemp, ratedHigh, tC);
    }

    /** True when IB at {@code tC} comes from the doubling rule rather than a catalog figure. */
    public boolean ibExtrapolated(double tC) {
        return Double.isNaN(ibOverTemp) && exponential(part) && tC > Stage.T_REF;
    }

    /**
     * False when the catalog gives IB only as a maximum over temperature: its 25 °C value is then
     * unknown and a 25 °C trim cannot be credited with removing any of it.
     */
    public boolean ibKnownAt25() {
        Spread s = orNone(part.ib());
        return s.max() != null || s.typ() != null || s.maxOverTemp() == null;
    }

    /** The same for IOS (an IOS assumed equal to IB follows IB). */
    public boolean iosKnownAt25() {
        if (ios.basis() == Basis.ASSUMED) {
            return ibKnownAt25();
        }
        Spread s = orNone(part.ios());
        return s.max() != null || s.typ() != null || s.maxOverTemp() == null;
    }

    /** Ratio of the bias current limit at {@code tC} to that at 25 °C (1 when that is 0). */
    public double ibFactor(double tC) {
        return ib.bound() > 0 ? ibAt(tC) / ib.bound() : 1.0;
    }

    /** Ratio of the offset current limit at {@code tC} to that at 25 °C (1 when that is 0). */
    public double iosFactor(double tC) {
        return ios.bound() > 0 ? iosAt(tC) / ios.bound() : 1.0;
    }

    /**
     * Drift bound over a range reaching {@code dT} from 25 °C: the catalog's (or estimated)
     * figure, or, when only the offset over temperature bounds it, the largest change that
     * bound allows a unit, (vos.maxOverTemp + vos.max) / dT (a unit may sit at -vos.max at
     * 25 °C and +vos.maxOverTemp at the range end; untrimmed, the over-temperature cap of
     * {@link DriftTerm} then leaves vos.maxOverTemp - vos.max).
     */
    public double driftBound(double dT) {
        if (Double.isInfinite(drift.bound())) {
            return dT > 0 ? (vosMaxOverTemp + vos.bound()) / dT : 0.0;
        }
        return drift.bound();
    }

    /**
     * A dB minimum: given, typical only (then 20 log10(k) dB below the typical, so the error it
     * causes is k times the typical error), or the assumed default.
     */
    private static Figure rejection(String name, MinTyp m, double assumed, double k, List<Assumption> w) {
        MinTyp v = m == null ? MinTyp.NONE : m;
        if (v.min() != null) {
            return Figure.guaranteed(v.min(), v.typ());
        }
        if (v.typ() != null) {
            Figure f = new Figure(v.typ() - Decibels.of(k), v.typ(), Basis.TYPICAL_ONLY);
            w.add(new Assumption.TypicalRejection(name, v.typ(), k, f.bound()));
            return f;
        }
        w.add(new Assumption.Default(name, Assumption.Rule.PESSIMISTIC_REJECTION, assumed));
        return Figure.of(assumed, Basis.ASSUMED);
    }

    private static Spread orNone(Spread s) {
        return s == null ? Spread.NONE : s;
    }
}
