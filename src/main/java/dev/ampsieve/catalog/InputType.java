package dev.ampsieve.catalog;

/** The input stage technology; decides how bias current behaves with temperature. */
public enum InputType {
    BIPOLAR("bipolar"),
    JFET("jfet"),
    CMOS("cmos");

    private final String key;

    InputType(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /** FET and CMOS inputs leak through junctions: bias current grows steeply with temperature. */
    public boolean fetLike() {
        return this != BIPOLAR;
    }

    public static InputType of(String key) {
        for (InputType a : values()) {
            if (a.key.equals(key)) {
                return a;
            }
        }
        throw new IllegalArgumentException(key);
    }
}
