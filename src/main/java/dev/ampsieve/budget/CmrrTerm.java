package dev.ampsieve.budget;

import dev.ampsieve.stage.Difference;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 4, common-mode rejection, volts at the output, dVcm the stage's peak common-mode change
 * (V), CMRR the amplifier's guaranteed minimum in dB, share the fraction of dVcm that reaches the
 * amplifier's pins ({@link dev.ampsieve.stage.Network#commonModeShare}: 1 where the stage states
 * dVcm at the pins).
 *
 * <p>The amplifier's own part, every topology: {@code NG * share * dVcm * 10^(-CMRR/20)}. The
 * finite rejection acts as an input-referred offset of (pin common mode)/CMRR, sign unknown
 * (Franco, 4th ed., ch. 5 [from memory]).
 *
 * <p>A difference stage adds the part its four resistors leave: with a = R2/(R1 + Rs-) and
 * b = R4/(R3 + Rs+) the output moves by {@code dVcm (b - a)/(1 + b)} per source common mode
 * (Franco, 4th ed., §2.2; Kitchin &amp; Counts, <i>A Designer's Guide to Instrumentation
 * Amplifiers</i>, 3rd ed., ch. 1 [both from memory]); with each pair's ratio off by at most
 * e = tol + tc x dT (the stage's {@code resistor-ratio}, per pair R2/R1 and R4/R3) its largest
 * magnitude is {@link Difference#worstCommonModeGain}(e), exact in the ratios and the unequal
 * legs. To first order with matched legs that is dVcm G/(1 + G) x 2e: a rejection of
 * (1 + G)/(2e) in per-pair terms, (1 + G)/(4ε) with four resistors at ±ε each. The two parts'
 * signs are unknown, so their magnitudes add (worst case). Neither part is removed by a trim: both
 * follow the common mode, which moves after the calibration.
 *
 * <p>DC (low-frequency) CMRR and resistor ratios; not valid for fast common-mode disturbances.
 */
public final class CmrrTerm implements ErrorTerm {
    public static final String KEY = "cmrr";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "common-mode rejection";
    }

    @Override
    public boolean dc() {
        return false; // the common-mode swing follows the signal, so it stays an in-band error
    }

    /** The amplifier's own part, V: NG x share x dVcm x 10^(-CMRR/20). */
    static double amplifierPart(Stage s, double cmrrDb) {
        return s.noiseGain() * s.network().commonModeShare() * s.commonModeSwing() * Decibels.rejected(cmrrDb);
    }

    /** The resistor-limited part of a difference stage, V: dVcm x worst |(b - a)/(1 + b)| at e = tol + tc x dT. */
    static double resistorPart(Stage s) {
        return switch (s.topology()) {
            case DIFFERENCE -> s.commonModeSwing() * ((Difference) s.network()).worstCommonModeGain(ratioError(s));
            case NON_INVERTING, INVERTING, FOLLOWER, TRANSIMPEDANCE -> 0.0;
        };
    }

    /** Per-pair ratio error at the far end of the range: tol + tc x dT. */
    private static double ratioError(Stage s) {
        return s.ratioTolerance() + s.ratioTempco() * s.deltaT();
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure db = v.cmrrDb();
        double amp = amplifierPart(s, db.bound());
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, TRANSIMPEDANCE ->
                ErrorTerm.result(
                        this,
                        s,
                        amp,
                        Double.NaN,
                        db.basis().uncertain(),
                        remark(
                                        TermWorking.of("cmrr")
                                                .put("dVcm", s.commonModeSwing(), Dimension.VOLTAGE)
                                                .put("CMRR", db.bound(), Dimension.DECIBEL),
                                        db.basis())
                                .build());
            case DIFFERENCE -> {
                double res = resistorPart(s);
                double at = s.ratioTempco() != 0 && s.deltaT() > 0 && res > 0 ? DriftTerm.farEnd(s) : Double.NaN;
                TermWorking.Builder w = TermWorking.of("cmrr-difference")
                        .put("dVcm", s.commonModeSwing(), Dimension.VOLTAGE)
                        .put("resistors", res, Dimension.VOLTAGE)
                        .put("tol", s.ratioTolerance(), Dimension.RATIO)
                        .put("tc", s.ratioTempco(), Dimension.RATIO_DRIFT)
                        .put("dT", s.deltaT(), Dimension.NUMBER)
                        .put("amplifier", amp, Dimension.VOLTAGE)
                        .put("pinShare", s.network().commonModeShare(), Dimension.NUMBER)
                        .put("CMRR", db.bound(), Dimension.DECIBEL);
                yield ErrorTerm.result(
                        this,
                        s,
                        res + amp,
                        at,
                        db.basis().uncertain(),
                        remark(w, db.basis()).build());
            }
        };
    }

    /** The remark a rejection figure's basis calls for: typical-only or assumed. */
    static TermWorking.Builder remark(TermWorking.Builder w, Basis b) {
        return switch (b) {
            case TYPICAL_ONLY -> w.remark(TermRemark.TYPICAL_LESS_MAX_TO_SIGMA);
            case ASSUMED -> w.remark(TermRemark.ASSUMED_NOT_IN_CATALOG);
            default -> w;
        };
    }
}
