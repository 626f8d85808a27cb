package dev.ampsieve.budget;

import dev.ampsieve.catalog.InputType;
import dev.ampsieve.catalog.MinTyp;
import dev.ampsieve.catalog.Noise;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.catalog.Spread;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.PhysicalConstants;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;

/**
 * One part's catalog values after the missing-value rules of error-model.md, resolved once
 * so the error terms and the Monte Carlo use the same numbers. Every substitution is
 * listed in {@link #warnings()}; none of them makes a part look better than a guaranteed
 * catalog value would, except where a value is plainly missing, which is then said.
 *
 * @param vos            input offset at 25 °C, V (bound = max)
 * @param vosMaxOverTemp guaranteed maximum offset over the rated range, V; NaN when not given
 * @param drift          offset drift, V/°C; bound infinite when only vos over temperature bounds it
 * @param ib             input bias current at 25 °C, A
 * @param ios            input offset current at 25 °C, A
 * @param ibOverTemp     catalog maximum of IB over the rated range, A; NaN when not given
 * @param iosOverTemp    the same for IOS (IB's when IOS is assumed equal to IB)
 * @param cmrrDb         common-mode rejection, dB (bound = minimum)
 * @param psrrDb         supply rejection, dB (bound = minimum)
 * @param aolDb          open-loop gain, dB (bound = minimum)
 * @param gbw            gain-bandwidth product, Hz; NaN when not given
 * @param en             white voltage noise density, V/√Hz (0 when missing)
 * @param enCorner       its 1/f corner, Hz
 * @param in             white current noise density, A/√Hz (0 when missing)
 * @param inCorner       its 1/f corner, Hz
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
        Figure cmrrDb,
        Figure psrrDb,
        Figure aolDb,
        double gbw,
        double en,
        double enCorner,
        double in,
        double inCorner,
        List<String> warnings) {

    public PartValues {
        warnings = List.copyOf(warnings);
    }

    /**
     * Resolves {@code part}'s values for use in {@code stage} (the stage only decides which
     * missing values matter enough to warn about).
     */
    public static PartValues of(Part part, Stage stage) {
        List<String> w = new ArrayList<>();
        Spread vosS = orNone(part.vos());
        double vosOt = vosS.maxOverTemp() == null ? Double.NaN : vosS.maxOverTemp();
        Figure vos;
        if (vosS.max() != null) {
            vos = Figure.guaranteed(vosS.max(), vosS.typ());
        } else if (vosS.typ() != null) {
            vos = Figure.of(vosS.typ(), Basis.TYPICAL_ONLY);
            w.add("vos: no guaranteed maximum; the typical value is used as the limit and as one sigma");
        } else if (!Double.isNaN(vosOt)) {
            vos = Figure.of(vosOt, Basis.GUARANTEED);
            w.add("vos: only the maximum over temperature is given; it is used at 25 °C too");
        } else {
            vos = Figure.of(0.0, Basis.MISSING);
            w.add("vos: not given; offset is not counted (enter the datasheet maximum)");
        }

        Spread drS = orNone(part.vosDrift());
        Figure drift;
        if (drS.max() != null) {
            drift = Figure.guaranteed(drS.max(), drS.typ());
        } else if (drS.typ() != null) {
            drift = Figure.of(drS.typ(), Basis.TYPICAL_ONLY);
            w.add("vos-drift: no guaranteed maximum; the typical value is used as the limit and as one sigma");
        } else if (!Double.isNaN(vosOt) && vos.basis() == Basis.GUARANTEED && vosS.max() != null) {
            // the offset over temperature bounds offset plus drift: the drift term takes what is left
            // (not when it is the only offset figure: nothing is left, and a trim would then seem to
            // leave no drift at all, so the estimate below stands in)
            drift = Figure.of(Double.POSITIVE_INFINITY, Basis.GUARANTEED);
        } else {
            drift = Figure.of(estimatedDrift(vos.bound()), Basis.ESTIMATED);
            String rule = "vos-drift: not given; estimated as vos / T = "
                    + Units.format(drift.bound(), Dimension.VOLTAGE_DRIFT) + " (bipolar pair rule, T = 298.15 K)";
            if (part.input() != InputType.BIPOLAR) {
                rule += "; this rule holds for bipolar pairs and may understate a "
                        + part.input().key() + " input's drift: enter the datasheet figure";
            }
            w.add(rule);
        }

        Spread ibS = orNone(part.ib());
        Figure ib;
        if (ibS.max() != null) {
            ib = Figure.guaranteed(ibS.max(), ibS.typ());
        } else if (ibS.typ() != null) {
            ib = Figure.of(ibS.typ(), Basis.TYPICAL_ONLY);
            w.add("ib: no guaranteed maximum; the typical value is used as the limit");
        } else if (ibS.maxOverTemp() != null) {
            ib = Figure.of(ibS.maxOverTemp(), Basis.GUARANTEED);
            w.add("ib: only the maximum over temperature is given; it is used at 25 °C too");
        } else {
            ib = Figure.of(0.0, Basis.MISSING);
            w.add("ib: not given; bias current x resistance is not counted (enter the datasheet maximum)");
        }
        Spread iosS = orNone(part.ios());
        Figure ios;
        if (iosS.max() != null) {
            ios = Figure.guaranteed(iosS.max(), iosS.typ());
        } else if (iosS.typ() != null) {
            ios = Figure.of(iosS.typ(), Basis.TYPICAL_ONLY);
            w.add("ios: no guaranteed maximum; the typical value is used as the limit");
        } else if (iosS.maxOverTemp() != null) {
            ios = Figure.of(iosS.maxOverTemp(), Basis.GUARANTEED);
            w.add("ios: only the maximum over temperature is given; it is used at 25 °C too");
        } else {
            // bias-cancelled and FET inputs have IOS about equal to IB: the pessimistic reading
            ios = Figure.of(ib.bound(), Basis.ASSUMED);
            if (ib.basis() != Basis.MISSING) {
                w.add("ios: not given; assumed equal to ib (" + Units.format(ib.bound(), Dimension.CURRENT) + ")");
            }
        }
        double ibOt = overTemp(ibS, ib);
        // an assumed IOS = IB follows IB with temperature
        double iosOt = ios.basis() == Basis.ASSUMED ? ibOt : overTemp(iosS, ios);

        Figure cmrr = rejection("cmrr", part.cmrr(), Assumed.CMRR_DB, w);
        Figure psrr = rejection("psrr", part.psrr(), Assumed.PSRR_DB, w);
        Figure aol = rejection("aol", part.aol(), Assumed.AOL_DB, w);

        double gbw = part.gbw() > 0 && Double.isFinite(part.gbw()) ? part.gbw() : Double.NaN;
        if (Double.isNaN(gbw)) {
            w.add("gbw: not given; the bandwidth term is not counted and noise is integrated to 1.57 x fH");
        }

        Noise n = part.noise() == null ? Noise.NONE : part.noise();
        double en = n.en() == null ? 0.0 : n.en();
        if (n.en() == null) {
            w.add("noise.en: not given; the amplifier's voltage noise is not counted (resistor noise is)");
        }
        double enC = n.enCorner() == null ? 0.0 : n.enCorner();
        if (n.en() != null && n.enCorner() == null && !part.selfCorrecting()) {
            w.add("noise.en-corner: not given; white noise only, so low-frequency noise may be understated");
        }
        double in = n.in() == null ? 0.0 : n.in();
        boolean resistors = stage.rPlus() > 0 || stage.rMinus() > 0;
        if (n.in() == null && resistors) {
            w.add("noise.in: not given; current noise through the stage resistors is not counted");
        }
        double inC = n.inCorner() == null ? 0.0 : n.inCorner();
        if (part.longTermDrift() == null && stage.serviceLife() > 0) {
            w.add("long-term-drift: not given; offset aging over the service life is not counted");
        }
        if (ib.basis() != Basis.MISSING && Double.isNaN(ibOt) && part.input() != null && part.input().fetLike()
                && stage.tMax() > Stage.T_REF) {
            double f = biasFactor(part.input(), ib.bound(), Double.NaN, stage.tMax());
            w.add("ib: no maximum over temperature; the 25 °C maximum is doubled every 10 °C above 25 °C "
                    + "(junction-leakage rule, common practice), " + Units.format(ib.bound() * f, Dimension.CURRENT)
                    + " at " + Units.format(stage.tMax(), Dimension.TEMPERATURE)
                    + (part.selfCorrecting()
                            ? "; pessimistic for a chopper or auto-zero part, whose bias current is mostly charge"
                                    + " injection: enter the datasheet's over-temperature maximum"
                            : "; enter the datasheet's over-temperature maximum"));
        }
        return new PartValues(part, vos, vosOt, drift, ib, ios, ibOt, iosOt, cmrr, psrr, aol, gbw,
                en, enC, in, inC, w);
    }

    /** True when IB at {@code tC} comes from the doubling rule rather than a catalog figure. */
    public boolean ibExtrapolated(double tC) {
        return ib.basis() != Basis.MISSING && Double.isNaN(ibOverTemp) && part.input() != null
                && part.input().fetLike() && tC > Stage.T_REF;
    }

    /**
     * Offset drift of a bipolar differential pair from its offset: VOS = (kT/q) ln(IS2/IS1)
     * is proportional to absolute temperature, so dVOS/dT = VOS / T, about 3.35 µV/°C per mV
     * at 25 °C. Gray, Hurst, Lewis, Meyer, <i>Analysis and Design of Analog ICs</i>, 5th ed.,
     * ch. 3; Horowitz &amp; Hill, <i>The Art of Electronics</i>, 3rd ed., ch. 5 [from memory].
     *
     * @param vos offset at 25 °C, V
     * @return drift, V/°C, evaluated at T = 298.15 K
     */
    public static double estimatedDrift(double vos) {
        return vos / PhysicalConstants.ROOM_KELVIN;
    }

    /**
     * Bias or offset current limit at {@code tC} as a multiple of the 25 °C limit. The
     * catalog's over-temperature maximum wins where given (the ratio to the 25 °C maximum,
     * never below 1). Otherwise FET and CMOS inputs, whose bias current is junction leakage,
     * double every 10 °C above 25 °C (common practice; the real interval is about 8 to 11 °C)
     * and keep the 25 °C value below it; bipolar inputs keep the 25 °C maximum.
     */
    public static double biasFactor(InputType input, double maxAt25, double maxOverTemp, double tC) {
        if (tC == Stage.T_REF) {
            return 1.0;
        }
        if (!Double.isNaN(maxOverTemp)) {
            return maxAt25 > 0 ? Math.max(1.0, maxOverTemp / maxAt25) : 1.0;
        }
        if (input != null && input.fetLike() && tC > Stage.T_REF) {
            return Math.pow(2.0, (tC - Stage.T_REF) / 10.0);
        }
        return 1.0;
    }

    /** Bias current limit at {@code tC}, A. */
    public double ibAt(double tC) {
        return ib.bound() * biasFactor(part.input(), ib.bound(), ibOverTemp, tC);
    }

    /** Offset current limit at {@code tC}, A. */
    public double iosAt(double tC) {
        return ios.bound() * biasFactor(part.input(), ios.bound(), iosOverTemp, tC);
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

    /** Ratio of the bias current limit at {@code tC} to that at 25 °C. */
    public double ibFactor(double tC) {
        return biasFactor(part.input(), ib.bound(), ibOverTemp, tC);
    }

    /** Ratio of the offset current limit at {@code tC} to that at 25 °C. */
    public double iosFactor(double tC) {
        return biasFactor(part.input(), ios.bound(), iosOverTemp, tC);
    }

    /**
     * Drift bound over a range reaching {@code dT} from 25 °C: the catalog's (or estimated)
     * figure, or, when only the offset over temperature bounds it, what that leaves.
     */
    public double driftBound(double dT) {
        if (Double.isInfinite(drift.bound())) {
            return dT > 0 ? Math.max(0.0, vosMaxOverTemp - vos.bound()) / dT : 0.0;
        }
        return drift.bound();
    }

    private static double overTemp(Spread s, Figure f) {
        return s.maxOverTemp() != null && f.basis() != Basis.MISSING ? s.maxOverTemp() : Double.NaN;
    }

    private static Figure rejection(String name, MinTyp m, double assumed, List<String> w) {
        MinTyp v = m == null ? MinTyp.NONE : m;
        if (v.min() != null) {
            return Figure.guaranteed(v.min(), v.typ());
        }
        if (v.typ() != null) {
            w.add(name + ": no guaranteed minimum; the typical value is used");
            return Figure.of(v.typ(), Basis.TYPICAL_ONLY);
        }
        w.add(name + ": not given; a pessimistic " + Units.format(assumed, Dimension.DECIBEL) + " is assumed");
        return Figure.of(assumed, Basis.ASSUMED);
    }

    private static Spread orNone(Spread s) {
        return s == null ? Spread.NONE : s;
    }
}
