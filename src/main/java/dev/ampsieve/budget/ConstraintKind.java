package dev.ampsieve.budget;

/** Which hard constraint a {@link ConstraintResult} is about; {@link #key()} is its name in reports and JSON. */
public enum ConstraintKind {
    SUPPLY("supply"),
    TEMPERATURE("temperature"),
    COMMON_MODE("common-mode"),
    OUTPUT_SWING("output-swing"),
    SLEW("slew"),
    PRICE("price"),
    PHASE_MARGIN("phase-margin"),
    SIGNAL_BANDWIDTH("signal-bandwidth"),
    DIE_TEMPERATURE("die-temperature"),
    FINITE("finite");

    private final String key;

    ConstraintKind(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }
}
