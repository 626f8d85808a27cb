package dev.ampsieve.budget;

/** Where a value used in the budget came from. */
public enum Basis {
    /** A guaranteed maximum (or minimum) from the catalog. */
    GUARANTEED,
    /** Only a typical value was given; used in place of the limit. */
    TYPICAL_ONLY,
    /** Derived from other catalog values by a published rule (e.g. drift = vos / T). */
    ESTIMATED,
    /** Not in the catalog; a deliberately pessimistic default stands in. */
    ASSUMED,
    /** Not in the catalog and not estimated: the contribution is left out (with a warning). */
    MISSING;

    /** True when the figure is not a guaranteed catalog value. */
    public boolean uncertain() {
        return this != GUARANTEED;
    }
}
