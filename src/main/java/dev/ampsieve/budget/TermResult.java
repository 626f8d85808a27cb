package dev.ampsieve.budget;

/**
 * One error term evaluated for one part in one stage.
 *
 * @param key       stable key used in JSON: offset, drift, bias, cmrr, psrr, open-loop-gain,
 *                  bandwidth, resistors, aging, noise
 * @param label     words for tables
 * @param outputV   worst-case magnitude at the output, volts
 * @param inputV    the same referred to the signal source: divided by |signal gain| (inverting: Rf/(Rg + Rs))
 * @param worstAtC  ambient temperature (°C) at which it is largest; NaN when it does not depend on it
 * @param estimated true when a missing catalog value was replaced by an estimate
 * @param working   how it was computed, as data: formula id, operands and remarks (report/TermNotes words it)
 * @param kind      where the term comes from: the part, its operating point, or the board
 */
public record TermResult(
        String key,
        String label,
        double outputV,
        double inputV,
        double worstAtC,
        boolean estimated,
        TermWorking working,
        TermKind kind) {

    public TermResult {
        kind = kind == null ? TermKind.PART : kind;
        working = working == null ? TermWorking.plain(key) : working;
    }

    /** A term of the part's own figures ({@link TermKind#PART}). */
    public TermResult(
            String key,
            String label,
            double outputV,
            double inputV,
            double worstAtC,
            boolean estimated,
            TermWorking working) {
        this(key, label, outputV, inputV, worstAtC, estimated, working, TermKind.PART);
    }
}
