package dev.ampsieve.advice;

import java.util.List;

/**
 * Whether a self-correcting (chopper or auto-zero) part is warranted: when only such a part
 * fits, or when one fits for less than every standard part that fits.
 *
 * @param selfCorrecting the cheapest fitting chopper / auto-zero part, or null
 * @param standard       the cheapest fitting standard part, or null
 * @param savingPerUnit  standard cost minus self-correcting cost; NaN when either is missing
 * @param caveats        what to check with the self-correcting part, in numbers
 * @param fittingCount   how many self-correcting parts fit
 * @param resistorOption when a zero-drift part is warranted under a worst-case or RSS criterion: a
 *                       standard part cheaper than it that would fit with better resistors, and
 *                       the resistors it needs; null when there is none
 */
public record ZeroDriftAdvice(
        Status status,
        Candidate selfCorrecting,
        Candidate standard,
        double savingPerUnit,
        double savingTotal,
        List<Caveat> caveats,
        int fittingCount,
        ResistorOption resistorOption) {

    /** A standard part and the change of resistors ({@link Change.Kind#BETTER_RESISTORS}) that lets it fit. */
    public record ResistorOption(Candidate part, Change change) {}

    public ZeroDriftAdvice(
            Status status,
            Candidate selfCorrecting,
            Candidate standard,
            double savingPerUnit,
            double savingTotal,
            List<Caveat> caveats,
            int fittingCount) {
        this(status, selfCorrecting, standard, savingPerUnit, savingTotal, caveats, fittingCount, null);
    }

    /** The same advice with {@code option} as its resistor option. */
    public ZeroDriftAdvice withResistorOption(ResistorOption option) {
        return new ZeroDriftAdvice(
                status, selfCorrecting, standard, savingPerUnit, savingTotal, caveats, fittingCount, option);
    }

    public ZeroDriftAdvice {
        caveats = List.copyOf(caveats);
    }

    public enum Status {
        ONLY_OPTION("only-option"),
        CHEAPER("cheaper"),
        NOT_WARRANTED("not-warranted"),
        NONE_FITS("none-fits");

        private final String key;

        Status(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }

    public boolean warranted() {
        return status == Status.ONLY_OPTION || status == Status.CHEAPER;
    }
}
