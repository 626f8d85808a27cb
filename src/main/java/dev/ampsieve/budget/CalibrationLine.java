package dev.ampsieve.budget;

import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * The correction of a two-temperature calibration: each unit's output error is measured at
 * {@code cold} and {@code hot} and the straight line through the two readings is subtracted at
 * every temperature. Writing the line as weights on the two readings,
 * <pre>
 *   L(T) = w1(T) * E(cold) + w2(T) * E(hot),  w1 = (hot - T)/(hot - cold),  w2 = (T - cold)/(hot - cold)
 * </pre>
 * (w1 + w2 = 1; both in [0, 1] between the points, one negative outside: extrapolation), the
 * correction removes exactly any error linear in T (offset and its drift) and leaves
 * <ul>
 * <li>the readings' resolution: each reading off by at most r, so the line is off by
 * |w1| r + |w2| r = r (|hot - T| + |T - cold|)/(hot - cold): r between the points, growing
 * linearly outside, r (1 + 2 d/(hot - cold)) at a distance d beyond either point (the
 * error of linear interpolation through two points each off by +/- r; the weights are the
 * Lagrange basis of degree 1, e.g. Burden and Faires, <i>Numerical Analysis</i>, §3.1
 * [from memory]). Over a range the factor is largest at one of its ends (it is convex in T);</li>
 * <li>the part of any error that is not linear in T: its deviation from the chord through the
 * two calibration points, {@link #deviation}.</li>
 * </ul>
 *
 * @param cold lower calibration temperature, °C
 * @param hot  upper calibration temperature, °C (above cold)
 */
record CalibrationLine(double cold, double hot) {

    /** The stage's two-temperature calibration (its trim.cold / trim.hot, else its range ends). */
    static CalibrationLine of(Stage s, Trim t) {
        return new CalibrationLine(t.coldIn(s), t.hotIn(s));
    }

    /** Weight of the cold reading at {@code t}. */
    double w1(double t) {
        return (hot - t) / (hot - cold);
    }

    /** Weight of the hot reading at {@code t}. */
    double w2(double t) {
        return (t - cold) / (hot - cold);
    }

    /** |w1| + |w2| at {@code t}: 1 between the points, 1 + 2 d/(hot - cold) at d beyond one. */
    double resolutionFactor(double t) {
        return Math.abs(w1(t)) + Math.abs(w2(t));
    }

    /** The largest {@link #resolutionFactor} over the range tMin..tMax (at one of its ends: the factor is convex). */
    double resolutionFactor(double tMin, double tMax) {
        return Math.max(resolutionFactor(tMin), resolutionFactor(tMax));
    }

    /** f(T) minus the chord of f through the two calibration points. */
    double residual(DoubleUnaryOperator f, double t) {
        return f.applyAsDouble(t) - w1(t) * f.applyAsDouble(cold) - w2(t) * f.applyAsDouble(hot);
    }

    /**
     * Largest |f(T) - chord(T)| over tMin..tMax for the engine's bias-current curve of a FET, CMOS
     * or zero-drift input ({@link PartValues#biasAt}): flat at the 25 °C value up to 25 °C,
     * {@code I25 e^(b (T - 25))} from 25 °C up to the knee (the rated upper end, when an
     * over-temperature figure caps it), flat above. On each flat piece the residual is linear, so
     * its extremes are the piece's ends; on the exponential piece it is convex, so they are the
     * ends and the one point where f' equals the chord's slope, {@code T* = 25 + ln(m/(b I25))/b}.
     * Evaluating the residual at those candidates (range ends, 25 °C, the knee, T*; each inside the
     * range) gives the exact maximum ({@link #candidates}).
     *
     * @param f     the curve, A (PartValues.ibAt or iosAt)
     * @param knee  where the curve stops growing, °C (NaN: it does not)
     */
    double deviation(DoubleUnaryOperator f, double knee, double tMin, double tMax) {
        double worst = 0;
        for (double t : candidates(f, knee, tMin, tMax)) {
            worst = Math.max(worst, Math.abs(residual(f, t)));
        }
        return worst;
    }

    /** The temperatures where |f - chord| can peak over tMin..tMax (see {@link #deviation}). */
    List<Double> candidates(DoubleUnaryOperator f, double knee, double tMin, double tMax) {
        List<Double> out = new ArrayList<>(List.of(tMin, tMax));
        addInside(out, Stage.T_REF, tMin, tMax);
        addInside(out, Math.nextUp(Stage.T_REF), tMin, tMax); // a curve that steps just above 25 °C (no rate known)
        addInside(out, knee, tMin, tMax);
        double i25 = f.applyAsDouble(Stage.T_REF);
        double slope = (f.applyAsDouble(hot) - f.applyAsDouble(cold)) / (hot - cold);
        // the exponential's rate from two of its own points (25 °C and 10 °C above, or the knee when nearer)
        double probe = Double.isNaN(knee) || knee > Stage.T_REF + 10 ? Stage.T_REF + 10 : knee;
        if (i25 > 0 && slope > 0 && probe > Stage.T_REF) {
            double b = Math.log(f.applyAsDouble(probe) / i25) / (probe - Stage.T_REF);
            if (b > 0) {
                addInside(out, Stage.T_REF + Math.log(slope / (b * i25)) / b, tMin, tMax);
            }
        }
        return out;
    }

    private static void addInside(List<Double> out, double t, double tMin, double tMax) {
        if (t > tMin && t < tMax) {
            out.add(t);
        }
    }
}
