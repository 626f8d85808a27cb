package dev.ampsieve.advice;

import java.util.List;

/**
 * When nothing fits: the closest part, the term that limits it, and each single change to
 * the stage that would make it fit, with the number needed.
 *
 * @param closest      the candidate with the smallest error relative to the limit (null when
 *                     every part failed a hard constraint)
 * @param limitingTerm key of its largest error term
 * @param limitingV    that term, output volts
 */
public record NoFitAdvice(Candidate closest, String limitingTerm, double limitingV, List<Change> changes) {
    public NoFitAdvice {
        changes = List.copyOf(changes);
    }
}
