package dev.ampsieve.advice;

import java.util.List;

/**
 * The stage advice, in numbers (the records) and in words ({@code lines}, full sentences
 * with the numbers in them).
 *
 * @param pick         the first candidate of the ranking that fits, or null
 * @param cheapestAsIs the cheapest part that fits without a trim, or null
 * @param noFit        what would make the closest part fit; null when something fits
 * @param undecided    the best-ranked part whose yield the sampling left undecided; null when none
 */
public record Advice(
        Candidate pick,
        Candidate cheapestAsIs,
        TrimAdvice trim,
        ZeroDriftAdvice zeroDrift,
        NoFitAdvice noFit,
        Unsettled undecided,
        List<String> lines) {
    public Advice {
        lines = List.copyOf(lines);
    }
}
