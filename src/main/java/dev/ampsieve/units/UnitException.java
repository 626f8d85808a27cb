package dev.ampsieve.units;

import dev.ampsieve.failure.DataError;
import dev.ampsieve.failure.Place;
import dev.ampsieve.text.Visible;
import java.util.List;

/**
 * A quantity could not be read. The message says what was wrong and what to write instead.
 * It has no place of its own: the caller, which knows the file and field, usually turns it
 * into a located problem; should one reach a front end as it is, it prints as one line.
 */
public final class UnitException extends DataError {
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

    @Override
    public Place place() {
        return Place.NONE;
    }

    @Override
    public List<String> lines() {
        return List.of(Visible.of(getMessage()));
    }
}
