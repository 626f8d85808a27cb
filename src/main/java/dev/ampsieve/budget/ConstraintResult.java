package dev.ampsieve.budget;

/**
 * A hard requirement (supply, temperature grade, common-mode range, output swing, slew, price, ...).
 *
 * @param kind which constraint
 * @param ok   met, or not checked (see {@link #checked()})
 * @param fact what is needed against what the part offers, and by how much it misses
 */
public record ConstraintResult(ConstraintKind kind, boolean ok, ConstraintFact fact) {

    /** The constraint's name in reports and JSON. */
    public String name() {
        return kind.key();
    }

    /** False when a value was missing on either side (the constraint then passes). */
    public boolean checked() {
        return !(fact instanceof ConstraintFact.NotChecked);
    }
}
