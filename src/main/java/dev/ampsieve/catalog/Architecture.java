package dev.ampsieve.catalog;

/** How the amplifier treats its own offset. */
public enum Architecture {
    STANDARD("standard"),
    CHOPPER("chopper"),
    AUTO_ZERO("auto-zero");

    private final String key;

    Architecture(String key) {
        this.key = key;
    }

    /** The word used in catalog files. */
    public String key() {
        return key;
    }

    public static Architecture of(String key) {
        for (Architecture a : values()) {
            if (a.key.equals(key)) {
                return a;
            }
        }
        throw new IllegalArgumentException(key);
    }
}
