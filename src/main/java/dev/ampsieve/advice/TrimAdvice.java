package dev.ampsieve.advice;

/**
 * Whether a cheaper part plus a one-point (or two-point) trim costs less than the cheapest
 * part that fits as it is.
 *
 * @param withTrim      the cheapest part that fits after the trim (for WOULD_PAY_IF_ALLOWED:
 *                      the one that would, judged on its after-trim totals), or null
 * @param asIs          the cheapest part that fits as it is, or null
 * @param savingPerUnit asIs cost minus withTrim cost (negative: the trim costs more); NaN when
 *                      either is missing
 * @param savingTotal   savingPerUnit times the stage quantity
 */
public record TrimAdvice(Status status, Candidate withTrim, Candidate asIs, double savingPerUnit, double savingTotal) {

    public enum Status {
        /** A trimmed cheaper part costs less in total than the cheapest part as it is. */
        WARRANTED("warranted"),
        /** Nothing fits as it is; a trimmed part does. */
        REQUIRED("required"),
        /** A trimmed part fits but costs at least as much as the cheapest part as it is. */
        NOT_WARRANTED("not-warranted"),
        /** No part needs a trim to fit. */
        NOT_NEEDED("not-needed"),
        /** The stage allows no trim, and one would pay (or be the only way). */
        WOULD_PAY_IF_ALLOWED("would-pay-if-allowed"),
        /** Not even a trimmed part fits. */
        NO_HELP("no-help");

        private final String key;

        Status(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }
    }
}
