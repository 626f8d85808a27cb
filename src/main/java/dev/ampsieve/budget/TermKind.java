package dev.ampsieve.budget;

/**
 * Where an error term comes from, so reports can group and mark it: the part's own datasheet
 * figures in the stage as stated ({@link #PART}), where the part really runs (its supply, common
 * mode, die temperature and chopping: {@link #OPERATING_POINT}), or the board around it
 * ({@link #BOARD}). {@link #key()} is the word used in JSON.
 */
public enum TermKind {
    PART("part"),
    OPERATING_POINT("operating-point"),
    BOARD("board");

    private final String key;

    TermKind(String key) {
        this.key = key;
    }

    /** The stable JSON word: part, operating-point, board. */
    public String key() {
        return key;
    }
}
