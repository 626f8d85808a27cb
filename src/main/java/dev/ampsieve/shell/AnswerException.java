package dev.ampsieve.shell;

import dev.ampsieve.failure.DataError;
import dev.ampsieve.failure.Place;
import dev.ampsieve.text.Visible;
import java.util.List;

/**
 * A typed answer cannot be used; says what is wrong and what to write. A {@link DataError} like
 * every other user-caused failure; the verbs turn it into a line naming the key (a refusal), and
 * the questions of {@code ask} show it and ask again, so it has no place of its own.
 */
final class AnswerException extends DataError {
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

    @Override
    public Place place() {
        return Place.NONE;
    }

    @Override
    public List<String> lines() {
        return List.of(Visible.of(line()));
    }
}
