package dev.ampsieve.failure;

import java.util.List;

/**
 * Everything a user (or a shared catalog on disk) can cause: a problem in a catalog or stage
 * file, a query, a file that cannot be read or written, a command used wrongly. Each carries
 * its {@link Place} and its {@link ExitCode}; one handler in each front end's shared command
 * layer prints it ({@code commands.Failures}). Anything that is not a {@code UserError} is an
 * internal error.
 *
 * <p>Sealed so the handler knows every shape there is: {@link DataError} (findings in what the
 * user wrote, each at its place: {@code yaml.InputException}, {@code units.UnitException}) and
 * {@link Refusal} (a request that cannot be carried out as asked, one line). Checked, so the
 * compiler shows every path by which one reaches a front end.
 */
public abstract sealed class UserError extends Exception permits DataError, Refusal {
    private static final long serialVersionUID = 1L;

    UserError(String message) {
        super(message);
    }

    /** The first (or only) place the failure concerns; {@link Place#NONE} when none applies. */
    public abstract Place place();

    /** What the process exits with. */
    public abstract ExitCode exitCode();

    /** The lines to show, each complete (place, problem, fix); control characters already made visible. */
    public abstract List<String> lines();
}
