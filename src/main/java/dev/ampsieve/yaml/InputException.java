package dev.ampsieve.yaml;

import dev.ampsieve.failure.DataError;
import dev.ampsieve.failure.Place;
import java.util.List;

/**
 * The user's input (a catalog file, a stage file, a typed value, a query, a file that cannot be
 * read or written) cannot be used. Carries every {@link Problem} found, so one run reports them
 * all; the message is their lines. A {@link DataError}: exit code 1, printed by the one handler.
 */
public class InputException extends DataError {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public InputException(List<Problem> problems) {
        super(String.join("\n", problems.stream().map(Problem::toString).toList()));
        this.problems = List.copyOf(problems);
    }

    public InputException(Problem problem) {
        this(List.of(problem));
    }

    public List<Problem> problems() {
        return problems;
    }

    /** The first problem's place. */
    @Override
    public Place place() {
        return problems.isEmpty() ? Place.NONE : problems.get(0).place();
    }

    /** One line per problem, {@code file:line:col: field: problem; fix}. */
    @Override
    public List<String> lines() {
        return problems.stream().map(Problem::toString).toList();
    }
}
