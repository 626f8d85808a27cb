package dev.ampsieve.budget;

import dev.ampsieve.catalog.MeasuredLot;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stats.NormalFit;
import dev.ampsieve.stats.TruncatedNormal;
import java.util.ArrayList;
import java.util.List;

/**
 * What a part's measured lot tells the budget (issue 16): each measured quantity fitted by a
 * normal distribution ({@link NormalFit}: mean, s, the chi-square 95 % interval of sigma, the
 * Anderson-Darling test) beside the datasheet's bound, and the offset spread the Monte Carlo draws
 * from. The Monte Carlo uses the lot's mean and the UPPER confidence bound of sigma, so a small lot
 * (a wide interval) never flatters: 5 units give an upper bound 2.9 x s, 30 units 1.34 x s.
 * Truncated at the datasheet's maximum when every unit lies inside it (the guarantee still holds);
 * untruncated when a unit lies beyond it, or the catalog has no maximum, since then nothing bounds
 * the lot. The lot's bias currents and its values at a second temperature are fitted and compared
 * with the datasheet, but drawn from the datasheet as before. A lot whose units all read the same
 * (sigma 0: a meter too coarse for them) estimates no spread; the datasheet's stands.
 */
public final class Measurements {
    private Measurements() {}

    /** The part's lot, or null when it has none (or it is not read yet). */
    static MeasuredLot lot(Part part) {
        return part.measured() == null ? null : part.measured().lot();
    }

    /** Every fitted quantity of the part's lot, offset first; empty without a lot. */
    public static List<Measurement> of(Part part, Stage stage) {
        MeasuredLot lot = lot(part);
        if (lot == null) {
            return List.of();
        }
        PartValues v = PartValues.of(part, stage);
        List<Measurement> out = new ArrayList<>();
        TruncatedNormal sheet = YieldModel.symmetric(v.vos(), v.vos().bound(), stage.maxToSigma());
        out.add(fit(
                "vos",
                Stage.T_REF,
                lot.vos(),
                v.vos().basis() == Basis.MISSING ? Double.NaN : v.vos().bound(),
                sheet == null ? Double.NaN : sheet.sigma(),
                lot));
        if (lot.ib().length > 0) {
            out.add(fit("ib", Stage.T_REF, lot.ib(), v.ib().bound(), Double.NaN, lot));
        }
        double t2 = lot.second();
        if (lot.vosAt().length > 0) {
            double[] at25 = lot.vos();
            double[] at = lot.vosAt();
            double[] drift = new double[at.length];
            for (int i = 0; i < at.length; i++) {
                drift[i] = (at[i] - at25[i]) / (t2 - Stage.T_REF);
            }
            double bound = Double.isFinite(v.drift().bound()) ? v.drift().bound() : Double.NaN;
            out.add(fit("vos-drift", t2, drift, bound, Double.NaN, lot));
        }
        if (lot.ibAt().length > 0) {
            out.add(fit("ib", t2, lot.ibAt(), v.ibAt(t2), Double.NaN, lot));
        }
        return List.copyOf(out);
    }

    /** @param sheetSigma the datasheet's sigma for a quantity the Monte Carlo draws from the lot, else NaN */
    private static Measurement fit(
            String field, double t, double[] x, double bound, double sheetSigma, MeasuredLot lot) {
        NormalFit f = NormalFit.of(x);
        int beyond = 0;
        double largest = 0;
        for (double xi : x) {
            largest = Math.max(largest, Math.abs(xi));
            if (bound >= 0 && Math.abs(xi) > bound) {
                beyond++;
            }
        }
        return new Measurement(
                field,
                t,
                f.n(),
                f.mean(),
                f.sigma(),
                f.sigmaLow(),
                f.sigmaHigh(),
                NormalFit.TEST,
                f.pValue(),
                bound,
                beyond,
                largest,
                field.equals("vos"),
                sheetSigma,
                lot.file());
    }

    /** The typed warnings of a lot: a poor or untested fit, units beyond the datasheet. */
    static List<Assumption> warnings(Part part, Stage stage) {
        List<Assumption> w = new ArrayList<>();
        for (Measurement m : of(part, stage)) {
            if (!(m.pValue() >= NormalFit.POOR_FIT)) {
                w.add(new Assumption.MeasuredFit(m.field(), m.temperature(), m.units(), m.pValue()));
            }
            if (m.beyond() > 0) {
                w.add(new Assumption.MeasuredBeyondDatasheet(
                        m.field(), m.temperature(), m.units(), m.beyond(), m.largest(), m.datasheet()));
            }
        }
        return w;
    }

    /**
     * The offset at 25 °C the Monte Carlo draws per unit: from the lot N(mean, sigmaHigh) (truncated at
     * +/- the datasheet maximum only when the whole lot lies inside it), else the datasheet's spread
     * ({@link YieldModel#symmetric}).
     */
    static TruncatedNormal offsetSpread(PartValues v, double k) {
        MeasuredLot lot = lot(v.part());
        if (lot == null) {
            return YieldModel.symmetric(v.vos(), v.vos().bound(), k);
        }
        NormalFit f = NormalFit.of(lot.vos());
        if (!(f.sigmaHigh() > 0)) {
            // every unit read the same (a meter too coarse): no spread can be estimated, and none is assumed
            return YieldModel.symmetric(v.vos(), v.vos().bound(), k);
        }
        double b = bounding(v, lot);
        return new TruncatedNormal(f.mean(), f.sigmaHigh(), -b, b);
    }

    /** The truncation of the measured offset: the datasheet maximum, or infinity when the lot or the catalog breaks it. */
    static double bounding(PartValues v, MeasuredLot lot) {
        double b = v.vos().basis() == Basis.MISSING ? 0.0 : v.vos().bound();
        for (double x : lot.vos()) {
            if (!(Math.abs(x) <= b)) {
                return Double.POSITIVE_INFINITY;
            }
        }
        return b;
    }

    /** True when the Monte Carlo's offset reaches beyond what the worst case counts (a lot beyond the datasheet). */
    static boolean beyondWorstCase(PartValues v) {
        MeasuredLot lot = lot(v.part());
        return lot != null && Double.isInfinite(bounding(v, lot));
    }
}
