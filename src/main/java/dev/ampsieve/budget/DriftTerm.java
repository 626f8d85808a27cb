package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 2, offset drift: {@code NG * drift.max * dT}, volts at the output, with
 * dT = max(|Tmin - 25|, |Tmax - 25|) in °C. Worst at the end of the range farthest from 25 °C.
 * Where the catalog gives the maximum offset over the rated range, terms 1 and 2 together
 * never exceed {@code NG * vos.maxOverTemp}: the datasheet drift figure is an average
 * "box" slope, the over-temperature maximum the guarantee (Franco, 4th ed., ch. 5
 * [from memory]). A missing drift figure is estimated as vos / T (bipolar pair:
 * Gray, Hurst, Lewis, Meyer, 5th ed., ch. 3 [from memory]), see {@link PartValues#estimatedDrift}.
 */
public final class DriftTerm implements ErrorTerm {
    public static final String KEY = "drift";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "offset drift";
    }

    @Override
    public boolean dc() {
        return true;
    }

    /** Temperature of the range end farthest from 25 °C (ties: the hot end). */
    static double farEnd(Stage s) {
        return Math.abs(s.tMax() - Stage.T_REF) >= Math.abs(s.tMin() - Stage.T_REF) ? s.tMax() : s.tMin();
    }

    /**
     * The drift left after a calibration at 25 °C, V at the output: the drift from 25 °C,
     * {@code NG * drift.max * dT} (the one-point trim residual TCVOS x |T - 25|). The cap of
     * {@link #evaluate} does not bound it (a unit trimmed at 25 °C keeps all of its change, not
     * what the over-temperature maximum leaves beside the largest offset); what does is
     * |vos(T) - vos(25)| &lt;= vos.maxOverTemp + vos.max, which is also the whole residual where
     * only the over-temperature maximum gives the drift ({@link PartValues#driftBound}).
     */
    static double afterTrim(Stage s, PartValues v) {
        double ng = DcModel.of(s).perVos();
        double dT = s.deltaT();
        double raw = ng * v.driftBound(dT) * dT;
        double cap = v.vosMaxOverTemp();
        if (Double.isNaN(cap)) {
            return raw;
        }
        return Math.min(raw, ng * (cap + v.vos().bound()));
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        double ng = DcModel.of(s).perVos();
        double dT = s.deltaT();
        double drift = v.driftBound(dT);
        double raw = ng * drift * dT;
        double out = raw;
        TermWorking.Builder w = TermWorking.of("drift")
                .put("NG", ng, Dimension.NUMBER)
                .put("drift", drift, Dimension.VOLTAGE_DRIFT)
                .put("dT", dT, Dimension.NUMBER);
        double cap = v.vosMaxOverTemp();
        if (!Double.isNaN(cap)) {
            double left = Math.max(0.0, ng * cap - OffsetTerm.magnitude(s, v));
            if (out > left) {
                out = left;
                w.put("vosOverTemperature", cap, Dimension.VOLTAGE).remark(TermRemark.DRIFT_CAPPED);
            }
        }
        if (v.drift().basis() == Basis.ESTIMATED) {
            w.remark(TermRemark.DRIFT_FROM_VOS);
        } else if (v.drift().basis() == Basis.TYPICAL_ONLY) {
            w.remark(TermRemark.TYPICAL_TIMES_MAX_TO_SIGMA);
        }
        double at = dT == 0 ? Double.NaN : farEnd(s);
        return ErrorTerm.result(this, s, out, at, v.drift().basis().uncertain(), w.build());
    }
}
