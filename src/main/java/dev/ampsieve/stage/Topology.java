package dev.ampsieve.stage;

/** The stage-file word for each {@link Network}. */
public enum Topology {
    NON_INVERTING("non-inverting"),
    INVERTING("inverting"),
    FOLLOWER("follower"),
    DIFFERENCE("difference"),
    TRANSIMPEDANCE("transimpedance");

    private final String key;

    Topology(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static Topology of(String key) {
        for (Topology t : values()) {
            if (t.key.equals(key)) {
                return t;
            }
        }
        throw new IllegalArgumentException(key);
    }
}
