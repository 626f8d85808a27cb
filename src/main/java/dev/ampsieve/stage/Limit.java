package dev.ampsieve.stage;

/**
 * The error limit as the user wrote it. All forms convert to volts at the output.
 *
 * @param kind      how it was written
 * @param value     volts (OUTPUT, INPUT), amperes (INPUT_CURRENT, transimpedance), a ratio (PERCENT_OF_FULL_SCALE: 0.001 = 0.1 %),
 *                  or a number of LSBs (LSB)
 * @param bits      ADC resolution (LSB form only)
 * @param reference ADC reference / full-scale voltage (LSB form only); LSB = reference / 2^bits
 */
public record Limit(Kind kind, double value, int bits, double reference) {

    public enum Kind {
        OUTPUT,
        INPUT,
        INPUT_CURRENT,
        PERCENT_OF_FULL_SCALE,
        LSB
    }

    public static Limit output(double volts) {
        return new Limit(Kind.OUTPUT, volts, 0, 0);
    }

    /**
     * Output-referred volts. An input-referred limit is at the signal source, so it scales by
     * the magnitude of the signal gain ({@link Stage#sourceGain()}; inverting: Rf/(Rg + Rs), not
     * the noise gain; transimpedance: rf, ohms, for a current); a percentage is of {@code fullScaleOutput} (the peak excursion); one LSB is
     * reference / 2^bits (the convention stated in IEEE Std 1241; some use 2^bits - 1).
     *
     * @param sourceGain |signal gain| of the stage
     */
    public double outputVolts(double sourceGain, Double fullScaleOutput) {
        return switch (kind) {
            case OUTPUT -> value;
            case INPUT, INPUT_CURRENT -> value * sourceGain; // transimpedance: amperes times rf
            case PERCENT_OF_FULL_SCALE -> value * (fullScaleOutput == null ? Double.NaN : fullScaleOutput);
            case LSB -> value * reference / Math.pow(2, bits);
        };
    }
}
