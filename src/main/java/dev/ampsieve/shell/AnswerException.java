package dev.ampsieve.shell;

/** A typed answer cannot be used; says what is wrong and what to write. */
final class AnswerException extends Exception {
    private static final long serialVersionUID = 1L;
    private final String fix;

    AnswerException(String problem, String fix) {
        super(problem);
        this.fix = fix;
    }

    String fix() {
        return fix;
    }

    /** "problem; fix", one line. */
    String line() {
        return fix == null || fix.isEmpty() ? getMessage() : getMessage() + "; " + fix;
    }
}
