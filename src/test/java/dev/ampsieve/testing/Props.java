package dev.ampsieve.testing;

import static org.quicktheories.QuickTheory.qt;

import java.util.function.Predicate;
import org.quicktheories.QuickTheory;

/**
 * How the property tests run: a fixed seed, so CI sees the same inputs on every run and a
 * failure can be replayed, and a bounded number of tries, so the whole set stays within a few
 * seconds per property on a 2-core machine.
 *
 * <p>To explore inputs CI has not seen, give another seed and more tries:
 * {@code mvn -o test -Dtest='*Properties' -Dprops.seed=12345 -Dprops.tries=20000}. A failure
 * prints the shrunk input and the seed; turn the input into a plain JUnit regression test.
 */
public final class Props {
    private Props() {}

    /** The seed CI uses; any fixed value would do, this one is the date the tests were written. */
    public static final long SEED = 20261202L;

    /** A theory with the fixed (or -Dprops.seed) seed and {@code tries} examples (or -Dprops.tries). */
    public static QuickTheory theory(int tries) {
        long seed = Long.getLong("props.seed", SEED);
        int n = Integer.getInteger("props.tries", tries);
        return qt().withFixedSeed(seed).withExamples(n).withShrinkCycles(5_000).withGenerateAttempts(10 * n);
    }

    /** Code under test, which may throw anything. */
    @FunctionalInterface
    public interface Action {
        void run() throws Throwable;
    }

    /**
     * Runs {@code action} on {@code input}: normal return passes, an exception of {@code typed}
     * passes when {@code sound} accepts it (a message a user can act on); anything else
     * (NullPointerException, NumberFormatException, StackOverflowError, ...) fails the property
     * with the input shown escaped and the original as cause.
     */
    public static <E extends Throwable> void onlyTyped(
            String input, Class<E> typed, Predicate<E> sound, Action action) {
        try {
            action.run();
        } catch (Throwable t) {
            if (typed.isInstance(t)) {
                E e = typed.cast(t);
                if (!sound.test(e)) {
                    throw new AssertionError(
                            "unhelpful " + typed.getSimpleName() + " '" + t.getMessage() + "' for input "
                                    + escape(input),
                            t);
                }
                return;
            }
            throw new AssertionError("untyped " + t + " for input " + escape(input), t);
        }
    }

    /** {@code s} as a Java string literal, so control characters, NUL and lone surrogates are visible. */
    public static String escape(String s) {
        if (s == null) {
            return "null";
        }
        StringBuilder b = new StringBuilder("\"");
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '\n' -> b.append("\\n");
                case '\r' -> b.append("\\r");
                case '\t' -> b.append("\\t");
                case '"' -> b.append("\\\"");
                case '\\' -> b.append("\\\\");
                default -> {
                    if (c < 0x20 || c > 0x7e) {
                        b.append(String.format("\\u%04x", (int) c));
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.append('"').toString();
    }
}
