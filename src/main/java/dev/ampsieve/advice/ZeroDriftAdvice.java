package dev.ampsieve.advice;

import java.util.List;

/**
 * Whether a self-correcting (chopper or auto-zero) part is warranted: when only such a part
 * fits, or when one fits for less than every standard part that fits.
 *
 * @param selfCorrecting the cheapest fitting chopper / auto-zero part, or null
 * @param standard       the cheapest fitting standard part, or null
 * @param savingPerUnit  standard cost minus self-correcting cost; NaN when either is missing
 * @param caveats        what to check with the self-correcting part, with numbers
 */
public record ZeroDriftAdvice(Status status, Candidate selfCorrecting, Candidate standard, double savingPerUnit,
        double savingTotal, List<String> caveats) {

    public ZeroDriftAdvice {
        caveats = List.copyOf(caveats);
    }

    public enum Status {
        ONLY_OPTION("only-option"), CHEAPER("cheaper"), NOT_WARRANTED("not-warranted"), NONE_FITS("none-fits");

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
