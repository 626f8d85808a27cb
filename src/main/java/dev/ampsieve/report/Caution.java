package dev.ampsieve.report;

/** The caution every output and report carries. One text, used everywhere. */
public final class Caution {
    private Caution() {}

    public static final String TEXT =
            "Caution: these figures rest on the catalog entries you typed in. Confirm them against current "
                    + "datasheets and by measurement; for medical, safety or mains equipment, the applicable "
                    + "standards and qualified review govern the design.";
}
