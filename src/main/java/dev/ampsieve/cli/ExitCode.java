package dev.ampsieve.cli;

/** Process exit codes, named. */
public final class ExitCode {
    private ExitCode() {
    }

    /** Everything worked and nothing needs the user's attention. */
    public static final int OK = 0;
    /** The user's data has problems (catalog or stage), or the answer is "no". */
    public static final int FINDINGS = 1;
    /** The command line itself was wrong. */
    public static final int USAGE = 2;
    /** A fault in ampsieve; a bug report is welcome. */
    public static final int INTERNAL = 3;
}
