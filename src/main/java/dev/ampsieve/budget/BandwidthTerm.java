package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;

/**
 * Term 7, closed-loop bandwidth: amplitude error at the band edge
 * {@code VFS * (1 - 1/sqrt(1 + (fH*NG/GBW)²))}, volts at the output, VFS the peak amplitude
 * of a full-scale sine at fH. The closed loop is a
 * single pole at GBW/NG (Franco, 4th ed., ch. 6; Sedra &amp; Smith, 7th ed., ch. 2
 * [from memory]); valid for a dominant-pole amplifier well below its second pole.
 *
 * <p>Transimpedance stage: {@code VFS * |1 - |H(fH)|/|H(0)||} with H the closed-loop
 * transimpedance of {@link TransimpedanceResponse} (Rf || Cf, the source's Ct, a single-pole
 * amplifier), exact within that model; peaking above |H(0)| counts as an error too. Referred to
 * |H(0)| rather than Rf: the DC shortfall of a finite loop gain is term 6's.
 */
public final class BandwidthTerm implements ErrorTerm {
    public static final String KEY = "bandwidth";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "closed-loop bandwidth";
    }

    @Override
    public boolean dc() {
        return false;
    }

    /** Relative amplitude loss of a single pole at GBW/NG, seen at fH. */
    public static double relativeError(double fH, double noiseGain, double gbw) {
        double x = fH * noiseGain / gbw;
        return 1.0 - 1.0 / Math.sqrt(1.0 + x * x);
    }

    /** Transimpedance: |1 - |H(fH)|/|H(0)||, the relative amplitude change at fH. */
    public static double transimpedanceError(TransimpedanceResponse r, double fH) {
        return Math.abs(1.0 - r.transimpedanceMagnitude(fH) / r.transimpedanceMagnitude(0));
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> singlePole(s, v);
            case TRANSIMPEDANCE -> transimpedance(s, v);
        };
    }

    private TermResult transimpedance(Stage s, PartValues v) {
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        if (Double.isNaN(v.gbw())) {
            return ErrorTerm.none(this, s, true, "gbw-missing"); // as NotCounted says
        }
        TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
        double out = vfs * transimpedanceError(r, s.bandHigh());
        double bw = r.bandwidth();
        TermWorking w = TermWorking.of("bandwidth-transimpedance")
                .put("VFS", vfs, Dimension.VOLTAGE)
                .put("fH", s.bandHigh(), Dimension.FREQUENCY)
                .put("f-3dB", bw, Dimension.FREQUENCY)
                .build();
        boolean est = v.inputCapacitance().basis() != Basis.GUARANTEED;
        return ErrorTerm.result(this, s, out, Double.NaN, est, w);
    }

    private TermResult singlePole(Stage s, PartValues v) {
        double vfs = s.fullScaleOutput() == null ? 0.0 : s.fullScaleOutput();
        if (Double.isNaN(v.gbw())) {
            return ErrorTerm.none(this, s, true, "gbw-missing"); // as NotCounted says
        }
        double out = vfs * relativeError(s.bandHigh(), s.noiseGain(), v.gbw());
        TermWorking w = TermWorking.of("bandwidth")
                .put("VFS", vfs, Dimension.VOLTAGE)
                .put("fH", s.bandHigh(), Dimension.FREQUENCY)
                .put("fCL", v.gbw() / s.noiseGain(), Dimension.FREQUENCY)
                .build();
        return ErrorTerm.result(this, s, out, Double.NaN, false, w);
    }
}
