package dev.ampsieve.budget;

/**
 * The outcome for one part in one stage. {@link #UNDECIDED} only under a yield criterion: the
 * 95 % interval of the yield still contains the target after {@code max-trials} units (and the
 * trim, where allowed, does not show the target met either).
 */
public enum Verdict {
    FITS("fits"),
    FITS_AFTER_TRIM("fits-after-trim"),
    UNDECIDED("undecided"),
    NO_FIT("no-fit");

    private final String key;

    Verdict(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** Shown to meet the criterion, as it is or after the trim; an undecided part is not. */
    public boolean fits() {
        return this == FITS || this == FITS_AFTER_TRIM;
    }
}
