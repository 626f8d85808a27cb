package dev.ampsieve.yaml;

import java.util.List;

/**
 * The user's input (a catalog file, a stage file, a typed value) cannot be used. Carries
 * every {@link Problem} found, so one run reports them all; the message is their lines.
 */
public class InputException extends Exception {
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
}
