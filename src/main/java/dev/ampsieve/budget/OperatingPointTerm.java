package dev.ampsieve.budget;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * The offset's move from the datasheet's test conditions to the stage's operating point: the
 * 25 °C table was measured at its own supply Vs,t and common mode Vcm,t, the stage runs at Vs and
 * Vcm, and the offset moves by up to
 * <pre>  dVos = |Vs - Vs,t| / PSRR + |dVcm| / CMRR   (input-referred, V; PSRR and CMRR as ratios)</pre>
 * which is the definition of the two rejection ratios read backwards (Franco, <i>Design with
 * Operational Amplifiers</i>, 4th ed., ch. 5 [from memory]): PSRR = dVs / dVos, CMRR = dVcm / dVos,
 * each at its guaranteed minimum. The common modes are compared as distances from mid-supply,
 * {@code dVcm = (Vcm - Vs/2) - (Vcm,t - Vs,t/2)}, since a datasheet measures its PSRR moving both
 * rails symmetrically about mid-supply (a split supply's ground) with the common mode held there.
 * At the output: {@code NG x dVos}, sign unknown. The stage's common mode is the centre of the
 * range its pins must take ({@link Constraints#neededCommonMode}: the stated range, else mid-supply).
 * A static offset at the operating point: a trim at that point removes it.
 * Counted when the stage states {@code supply.voltage}; missing test conditions take the
 * conservative rules of {@link OperatingFigures}.
 */
public final class OperatingPointTerm implements ErrorTerm {
    public static final String KEY = "operating-point";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "operating point";
    }

    @Override
    public boolean dc() {
        return true;
    }

    @Override
    public TermKind kind() {
        return TermKind.OPERATING_POINT;
    }

    /** The stage's common mode at the pins, V from mid-supply (0 without a supply or a stated range). */
    static double commonModeFromMid(Stage s) {
        Range cm = Constraints.neededCommonMode(s);
        if (cm == null || s.supplyVoltage() == null) {
            return 0.0;
        }
        return (cm.min() + cm.max()) / 2 - s.supplyVoltage() / 2;
    }

    /** The input-referred offset shift, V; 0 without a stage supply. */
    static double inputShift(Stage s, PartValues v) {
        OperatingFigures o = v.operating();
        if (s.supplyVoltage() == null || Double.isNaN(o.testSupply().bound())) {
            return 0.0;
        }
        double dVs = Math.abs(s.supplyVoltage() - o.testSupply().bound());
        double dVcm = Math.abs(commonModeFromMid(s)
                - (o.testCommonMode().bound() - o.testSupply().bound() / 2));
        return dVs * Decibels.rejected(v.psrrDb().bound())
                + dVcm * Decibels.rejected(v.cmrrDb().bound());
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        OperatingFigures o = v.operating();
        if (s.supplyVoltage() == null || Double.isNaN(o.testSupply().bound())) {
            return ErrorTerm.none(this, s, false, "supply-voltage-missing");
        }
        double out = s.noiseGain() * inputShift(s, v);
        double dVs = Math.abs(s.supplyVoltage() - o.testSupply().bound());
        double dVcm = Math.abs(commonModeFromMid(s)
                - (o.testCommonMode().bound() - o.testSupply().bound() / 2));
        TermWorking w = TermWorking.of("operating-point")
                .put("testSupply", o.testSupply().bound(), Dimension.VOLTAGE)
                .put("testCommonMode", o.testCommonMode().bound(), Dimension.VOLTAGE)
                .put("NG", s.noiseGain(), Dimension.NUMBER)
                .put("dVs", dVs, Dimension.VOLTAGE)
                .put("PSRR", v.psrrDb().bound(), Dimension.DECIBEL)
                .put("dVcm", dVcm, Dimension.VOLTAGE)
                .put("CMRR", v.cmrrDb().bound(), Dimension.DECIBEL)
                .remark(o.testSupply().basis() == Basis.ASSUMED, TermRemark.TEST_SUPPLY_ASSUMED)
                .remark(o.testCommonMode().basis() == Basis.ASSUMED, TermRemark.TEST_COMMON_MODE_ASSUMED)
                .build();
        boolean est = o.testSupply().basis().uncertain()
                || o.testCommonMode().basis().uncertain()
                || dVs > 0 && v.psrrDb().basis().uncertain()
                || dVcm > 0 && v.cmrrDb().basis().uncertain();
        return ErrorTerm.result(this, s, out, Double.NaN, est, w);
    }
}
