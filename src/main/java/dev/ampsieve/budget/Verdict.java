package dev.ampsieve.budget;

/** The outcome for one part in one stage. */
public enum Verdict {
    FITS("fits"), FITS_AFTER_TRIM("fits-after-trim"), NO_FIT("no-fit");

    private final String key;

    Verdict(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
