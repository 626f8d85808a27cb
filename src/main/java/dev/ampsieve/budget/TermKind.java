package dev.ampsieve.budget;

/** Where an error term comes from: the part's datasheet figures, where the part runs, or the board around it. */
public enum TermKind {
    /** the amplifier's own figures at the datasheet's conditions */
    PART("part"),
    /** the part away from the datasheet's conditions: supply, common mode, die temperature, ripple */
    OPERATING_POINT("operating-point"),
    /** the board around the part: thermal EMF, leakage */
    BOARD("board");

    private final String key;

    TermKind(String key) {
        this.key = key;
    }

    /** The word used in JSON. */
    public String key() {
        return key;
    }
}
