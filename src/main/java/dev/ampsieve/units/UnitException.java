package dev.ampsieve.units;

/** A quantity could not be read. The message says what was wrong and what to write instead. */
public final class UnitException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String problem;
    private final String fix;

    public UnitException(String problem, String fix) {
        super(problem + "; " + fix);
        this.problem = problem;
        this.fix = fix;
    }

    public String problem() {
        return problem;
    }

    public String fix() {
        return fix;
    }
}
