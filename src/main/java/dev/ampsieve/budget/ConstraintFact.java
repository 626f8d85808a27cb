package dev.ampsieve.budget;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.units.Dimension;
import java.util.List;

/**
 * What a hard constraint found, as numbers: what the stage needs, what the part offers and by how
 * much it misses. Worded by {@code report.ConstraintText}.
 */
public sealed interface ConstraintFact {

    /** What was missing, so that a constraint could not be checked. */
    enum Missing {
        STAGE_SUPPLY,
        STAGE_SUPPLY_OR_FULL_SCALE,
        STAGE_FULL_SCALE,
        CATALOG_SUPPLY,
        CATALOG_TEMPERATURE,
        CATALOG_SLEW,
        CATALOG_PRICE,
        CATALOG_GBW
    }

    /** Not checked: a value is missing on one side; the constraint passes with a warning. */
    record NotChecked(Missing missing) implements ConstraintFact {}

    /** The stage sets no price ceiling. */
    record NoCeiling() implements ConstraintFact {}

    /**
     * A needed range against the part's range, in one dimension. Shortfalls are 0 at an end that is
     * met. {@code headroom} is null for a rated range (supply, temperature).
     */
    record Span(
            double needLow,
            double needHigh,
            double partLow,
            double partHigh,
            Dimension dimension,
            double shortLow,
            double shortHigh,
            HeadroomFacts headroom)
            implements ConstraintFact {

        public static Span of(double needLow, double needHigh, Range part, Dimension d, HeadroomFacts h) {
            return new Span(
                    needLow,
                    needHigh,
                    part.min(),
                    part.max(),
                    d,
                    needLow < part.min() ? part.min() - needLow : 0,
                    needHigh > part.max() ? needHigh - part.max() : 0,
                    h);
        }

        /** Met at both ends. */
        public boolean met() {
            return needLow >= partLow && needHigh <= partHigh;
        }

        /** The headroom leaves no reachable range at all on the lowest supply. */
        public boolean unreachable() {
            return partLow > partHigh;
        }
    }

    /**
     * How a reachable range (common mode, output) arises from the supply and the part's headroom.
     *
     * @param lowestSupply    the stage's lowest supply, V
     * @param fromLow         headroom from the low rail, V
     * @param fromHigh        headroom from the high rail, V
     * @param assumed         the headroom is not in the catalog
     * @param dcWiden         DC error an AC-coupled stage still carries, added at each end, V (0 if none)
     * @param commonModeShare a difference stage's share of the source's common mode at the pins; NaN otherwise
     */
    record HeadroomFacts(
            double lowestSupply,
            double fromLow,
            double fromHigh,
            boolean assumed,
            double dcWiden,
            double commonModeShare) {}

    /** Slew rate needed (2π fH VFS) against the part's, V/s; shortfall 0 when met. */
    record Slew(double need, double part, double shortfall) implements ConstraintFact {}

    /** Unit price at the stage's quantity against the ceiling; over 0 when met. */
    record Price(double ceiling, double unit, String currency, double over) implements ConstraintFact {}

    /**
     * The self-heated die: hottest temperature = ambient + thetaJA x power, against the rating, °C.
     *
     * @param tooHot 0 when met
     */
    record Die(double hot, double ambient, double thetaJa, double powerW, double ratedHigh, double tooHot)
            implements ConstraintFact {}

    /**
     * Terms or totals past the largest double.
     *
     * @param overflowed the terms whose output is not finite (empty when met or only a total is)
     * @param totalsOf   the labels of every term when only a total overflowed; empty otherwise
     */
    record Finite(List<TermResult> overflowed, List<String> totalsOf) implements ConstraintFact {}

    /**
     * The feedback capacitor range that meets both transimpedance checks: {@code least} gives the
     * minimum phase margin; {@code most} is the largest cf still reaching the bandwidth (NaN when none
     * does; {@code least} NaN when no cf reaches the phase margin).
     *
     * @param leastBandwidth -3 dB bandwidth with cf = least, Hz (NaN when least is)
     * @param graeme         Graeme's estimate sqrt(Ct/(2π rf GBW)), F
     */
    record CfRange(
            double least, double most, double leastBandwidth, double graeme, double minPhaseMargin, double bandHigh) {

        /** No cf gives both. */
        public boolean none() {
            return Double.isNaN(least) || Double.isNaN(most);
        }
    }

    /**
     * Transimpedance loop's phase margin, degrees (NaN when the loop gain never reaches 1).
     *
     * @param crossover      loop crossover, Hz
     * @param cf             feedback capacitor, F
     * @param ct             total input capacitance, F
     * @param inputC         the part's input capacitance, F (ct - inputC is the source's)
     * @param inputCAssumed  the input capacitance is assumed, not guaranteed
     * @param cfRange        a failure's cf range that meets both checks; null when met
     */
    record PhaseMargin(
            double minimum,
            double margin,
            double crossover,
            double cf,
            double ct,
            double inputC,
            boolean inputCAssumed,
            CfRange cfRange)
            implements ConstraintFact {}

    /**
     * Transimpedance -3 dB signal bandwidth against band.high, Hz.
     *
     * @param cfRange a failure's cf range that meets both checks; null when met
     */
    record Bandwidth(double bandHigh, double bandwidth, double cf, CfRange cfRange) implements ConstraintFact {}
}
