package dev.ampsieve.failure;

/** Process exit codes, named; the numbers are part of the program's promise to scripts. */
public enum ExitCode {
    /** Everything worked and nothing needs the user's attention. */
    OK(0),
    /** The user's data has problems (catalog, stage, query, a file), or the answer is "no". */
    FINDINGS(1),
    /** The command line itself was wrong. */
    USAGE(2),
    /** A fault in ampsieve; a bug report is welcome. */
    INTERNAL(3);

    private final int code;

    ExitCode(int code) {
        this.code = code;
    }

    /** The number the process exits with. */
    public int code() {
        return code;
    }
}
