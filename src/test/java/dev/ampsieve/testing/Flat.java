package dev.ampsieve.testing;

/** Text with every run of white space (folded lines included) read as one space, for contains-checks. */
public final class Flat {
    private Flat() {}

    public static String of(String s) {
        return s.replaceAll("\\s+", " ").strip();
    }
}
