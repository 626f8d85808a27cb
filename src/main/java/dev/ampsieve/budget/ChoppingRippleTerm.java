package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.List;

/**
 * Chopping (or auto-zero) ripple at the output: the part's input-referred ripple r at its chopping
 * frequency fc, amplified by the closed loop at fc and attenuated by the stage's filter,
 * <pre>  r x |NG(fc)| x |H(fc)|</pre>
 * with the closed-loop noise gain of a single-pole amplifier, {@code |NG(f)| = NG / √(1 + (f NG / GBW)²)}
 * (Franco, 4th ed., ch. 6 [from memory]; a transimpedance stage's frequency-dependent NG(f) x T/(1 + T)
 * from {@link TransimpedanceResponse}), and the Butterworth low-pass of order n
 * ({@code band.filter-order}) at band.high, {@code |H(f)| = 1 / √(1 + (f/fH)^(2n))} (Butterworth 1930;
 * Williams &amp; Taylor, <i>Electronic Filter Design Handbook</i>, ch. 2 [from memory]); without a
 * filter |H| = 1. Without a chopping frequency neither the loop nor the filter is credited (|NG|·|H| =
 * NG). Only chopper and auto-zero parts; an AC term (it is in the signal path whatever the coupling),
 * and no trim removes it.
 *
 * <p>A converter sampling the output at fs folds each harmonic k·fc to
 * {@code |k fc - fs round(k fc / fs)|} (Nyquist; Oppenheim &amp; Schafer, <i>Discrete-Time Signal
 * Processing</i>, ch. 4 [from memory]); {@link #aliases} lists those that land inside the band.
 */
public final class ChoppingRippleTerm implements ErrorTerm {
    public static final String KEY = "chopping-ripple";

    /** Harmonics of the chopping frequency checked for aliases: a chopped square wave's first few carry most of it (common practice). */
    public static final int HARMONICS = 5;

    /** One harmonic of the chopping frequency that a converter folds into the band. */
    public record Alias(int harmonic, double frequency, double alias) {}

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "chopping ripple";
    }

    @Override
    public boolean dc() {
        return false;
    }

    @Override
    public TermKind kind() {
        return TermKind.OPERATING_POINT;
    }

    /** |H| of the Butterworth low-pass of {@code order} (0: none) with its -3 dB corner at {@code corner}, at {@code f}. */
    public static double butterworth(int order, double corner, double f) {
        if (order <= 0) {
            return 1.0;
        }
        return 1.0 / Math.sqrt(1.0 + Math.pow(f / corner, 2.0 * order));
    }

    /** The stage's closed-loop gain at {@code f} for a source at the amplifier's input. */
    static double loopGain(Stage s, PartValues v, double f) {
        return switch (s.topology()) {
            case NON_INVERTING, INVERTING, FOLLOWER, DIFFERENCE -> {
                double ng = s.noiseGain();
                double gbw = v.gbw();
                yield Double.isNaN(gbw) ? ng : ng / Math.sqrt(1.0 + Math.pow(f * ng / gbw, 2));
            }
            case TRANSIMPEDANCE -> {
                TransimpedanceResponse r = TransimpedanceResponse.of(s, v);
                yield r.noiseGain(f).multiply(r.closedLoopFactor(f)).abs();
            }
        };
    }

    /** The output ripple, V peak, with {@code order} for the stage's filter. */
    static double output(Stage s, PartValues v, int order) {
        double r = v.operating().choppingRipple().bound();
        Double fc = v.part().choppingFrequency();
        if (r == 0) {
            return 0.0;
        }
        if (fc == null) {
            return r * s.noiseGain();
        }
        return r * loopGain(s, v, fc) * butterworth(order, s.bandHigh(), fc);
    }

    /**
     * The harmonics 1..{@link #HARMONICS} of {@code fc} that a converter sampling at {@code fs} folds to
     * at most {@code bandHigh} (below band.low an alias is a slowly wandering offset: still in the error).
     */
    public static List<Alias> aliases(double fc, double fs, double bandHigh) {
        List<Alias> out = new ArrayList<>();
        for (int k = 1; k <= HARMONICS; k++) {
            double f = k * fc;
            double a = Math.abs(f - fs * Math.rint(f / fs));
            if (a <= bandHigh) {
                out.add(new Alias(k, f, a));
            }
        }
        return List.copyOf(out);
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        Figure r = v.operating().choppingRipple();
        if (r.bound() == 0) {
            return ErrorTerm.none(this, s, false, v.part().selfCorrecting() ? "ripple-zero" : "not-self-correcting");
        }
        int n = s.noiseFilterOrder();
        double out = output(s, v, n);
        Double fc = v.part().choppingFrequency();
        TermWorking.Builder w = TermWorking.of("chopping-ripple")
                .put("ripple", r.bound(), Dimension.VOLTAGE)
                .remark(r.basis() == Basis.ASSUMED, TermRemark.RIPPLE_ASSUMED);
        if (fc == null) {
            w.put("NG", s.noiseGain(), Dimension.NUMBER).remark(TermRemark.CHOPPING_FREQUENCY_MISSING);
        } else {
            w.put("fc", fc, Dimension.FREQUENCY).put("|NG|", loopGain(s, v, fc), Dimension.NUMBER);
            if (n == 0) {
                w.remark(TermRemark.NO_FILTER);
            } else {
                w.put("|H|", butterworth(n, s.bandHigh(), fc), Dimension.NUMBER)
                        .put("order", n, Dimension.NUMBER)
                        .put("fH", s.bandHigh(), Dimension.FREQUENCY);
            }
        }
        return ErrorTerm.result(this, s, out, Double.NaN, r.basis().uncertain() || fc == null, w.build());
    }
}
