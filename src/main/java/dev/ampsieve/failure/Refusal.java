package dev.ampsieve.failure;

import dev.ampsieve.text.Visible;
import java.util.List;

/**
 * A request the tool cannot carry out as asked, with what to do instead: an unknown part id, an
 * option out of range, a folder where a file was meant. Printed as one line (a message may hold
 * two, for two unknown ids).
 */
public final class Refusal extends UserError {
    private static final long serialVersionUID = 1L;
    private final ExitCode exitCode;
    private final transient Place place;

    /** @param place what the refusal is about (an option, a part id ...), {@link Place#NONE} when nothing in particular */
    public Refusal(String message, ExitCode exitCode, Place place) {
        super(message);
        if (exitCode == ExitCode.OK || exitCode == ExitCode.INTERNAL) {
            throw new IllegalArgumentException("a refusal exits with FINDINGS or USAGE, not " + exitCode);
        }
        this.exitCode = exitCode;
        this.place = place == null ? Place.NONE : place;
    }

    public Refusal(String message, ExitCode exitCode) {
        this(message, exitCode, Place.NONE);
    }

    /** A refusal about the user's data or a "no": exit code {@link ExitCode#FINDINGS}. */
    public Refusal(String message) {
        this(message, ExitCode.FINDINGS, Place.NONE);
    }

    @Override
    public Place place() {
        return place;
    }

    @Override
    public ExitCode exitCode() {
        return exitCode;
    }

    /** The message, its quoted ids, queries and paths made visible. */
    @Override
    public List<String> lines() {
        return Visible.lines(getMessage()).lines().toList();
    }
}
