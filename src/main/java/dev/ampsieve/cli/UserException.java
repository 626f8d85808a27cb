package dev.ampsieve.cli;

/** A request the tool cannot carry out as asked, with what to do instead. Printed as one line. */
public final class UserException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int exitCode;

    public UserException(String message, int exitCode) {
        super(message);
        this.exitCode = exitCode;
    }

    public UserException(String message) {
        this(message, ExitCode.FINDINGS);
    }

    public int exitCode() {
        return exitCode;
    }
}
