package dev.ampsieve.catalog;

/** How the maker trimmed the offset at the wafer or package stage. */
public enum FactoryTrim {
    NONE("none"),
    LASER("laser"),
    FUSE("fuse"),
    OTHER("other");

    private final String key;

    FactoryTrim(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static FactoryTrim of(String key) {
        for (FactoryTrim a : values()) {
            if (a.key.equals(key)) {
                return a;
            }
        }
        throw new IllegalArgumentException(key);
    }
}
