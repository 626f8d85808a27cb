package dev.ampsieve.advice;

import java.util.List;

/**
 * When nothing fits: the closest part, the term that limits it, each single change to the stage
 * that would make it fit, with the number needed, and the figures a part would need to fit the
 * stage as it is.
 *
 * @param closest      the candidate with the smallest error relative to the limit (null when
 *                     every part failed a hard constraint)
 * @param limitingTerm key of its largest error term
 * @param limitingV    that term, output volts
 * @param targets      part-side figures (IB, vos, drift), each alone enough with the rest of the
 *                     closest part, each re-checked through the budget
 */
public record NoFitAdvice(
        Candidate closest, String limitingTerm, double limitingV, List<Change> changes, List<PartTarget> targets) {
    public NoFitAdvice {
        changes = List.copyOf(changes);
        targets = List.copyOf(targets);
    }
}
