package dev.ampsieve.failure;

/**
 * Findings in what the user wrote (a catalog or stage file, a typed value, a query) or in a
 * file that cannot be read or written: each line names its own place. Exit code
 * {@link ExitCode#FINDINGS}. Open for the packages that find them ({@code yaml.InputException},
 * {@code units.UnitException}), which a sealed class in another package cannot list by name.
 */
public abstract non-sealed class DataError extends UserError {
    private static final long serialVersionUID = 1L;

    protected DataError(String message) {
        super(message);
    }

    @Override
    public ExitCode exitCode() {
        return ExitCode.FINDINGS;
    }
}
