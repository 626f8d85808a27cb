package dev.ampsieve.advice;

/**
 * A figure a part would need for the closest part's stage to fit as it is, the rest of the part
 * being the closest part's: a fact in numbers; the advice lines put it into words.
 *
 * @param quantity which catalog figure
 * @param value    its largest value that fits, SI units (A, V, V/°C), rounded toward the side that fits
 * @param atC      the temperature it applies at, °C: for the bias current the range's worst
 *                 temperature for the term; NaN when the figure is a 25 °C one (vos) or a slope (drift)
 */
public record PartTarget(Quantity quantity, double value, double atC) {

    public enum Quantity {
        /** Input bias current, maximum at {@code atC} and everywhere in the range; IOS counted equal to it. */
        IB("ib"),
        /** Input offset voltage, maximum at 25 °C. */
        VOS("vos"),
        /** Offset drift, maximum. */
        DRIFT("vos-drift"),
        /** Junction-to-ambient thermal resistance, largest: a cooler package or more copper. */
        THETA_JA("theta-ja");

        private final String key;

        Quantity(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }
}
