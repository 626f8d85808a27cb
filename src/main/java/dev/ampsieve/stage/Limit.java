package dev.ampsieve.stage;

/**
 * The error limit as the user wrote it. All forms convert to volts at the output.
 *
 * @param kind      how it was written
 * @param value     volts (OUTPUT, INPUT), a ratio (PERCENT_OF_FULL_SCALE: 0.001 = 0.1 %),
 *                  or a number of LSBs (LSB)
 * @param bits      ADC resolution (LSB form only)
 * @param reference ADC reference / full-scale voltage (LSB form only); LSB = reference / 2^bits
 */
public record Limit(Kind kind, double value, int bits, double reference) {

    public enum Kind { OUTPUT, INPUT, PERCENT_OF_FULL_SCALE, LSB }

    public static Limit output(double volts) {
        return new Limit(Kind.OUTPUT, volts, 0, 0);
    }

    /**
     * Output-referred volts. Input-referred limits scale by the noise gain (the same factor
     * every error term is referred by); a percentage is of {@code fullScaleOutput}; one LSB is
     * reference / 2^bits (the convention stated in IEEE Std 1241; some use 2^bits - 1).
     */
    public double outputVolts(double noiseGain, Double fullScaleOutput) {
        return switch (kind) {
            case OUTPUT -> value;
            case INPUT -> value * noiseGain;
            case PERCENT_OF_FULL_SCALE -> value * (fullScaleOutput == null ? Double.NaN : fullScaleOutput);
            case LSB -> value * reference / Math.pow(2, bits);
        };
    }
}
