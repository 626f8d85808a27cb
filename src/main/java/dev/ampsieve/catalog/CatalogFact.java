package dev.ampsieve.catalog;

import dev.ampsieve.units.Quantity;
import dev.ampsieve.yaml.ProblemFact;

/**
 * A catalog figure the loader refuses or questions, as facts: the values with their dimensions
 * (SI units, temperatures in °C, dB) and, for the checks whose fix differs by field, the fix the
 * check gives (words without a number). {@code report.ProblemText} words each kind.
 */
public sealed interface CatalogFact extends ProblemFact {

    /**
     * A value past one of its {@link CatalogKeys.Bounds}.
     *
     * @param bound      the bound passed, in the value's dimension: compared with |value| unless {@code signed}
     * @param above      true when the value (or its size) is above the bound, false when below
     * @param impossible true for an error bound (no op amp has it), false for a warning bound (unusual)
     * @param signed     the bound is on the signed value, not on its size
     * @param why        the error bound's physical reason ({@link CatalogKeys.Bounds#why})
     */
    record OutOfBounds(Quantity value, double bound, boolean above, boolean impossible, boolean signed, String why)
            implements CatalogFact {}

    /**
     * A value of the wrong sign.
     *
     * @param zero true when zero is allowed (the value is negative), false when it must be above zero
     * @param fix  what to write instead
     */
    record Sign(Quantity value, boolean zero, String fix) implements CatalogFact {}

    /**
     * Two figures of one field in the wrong order: {@code low} (named by its key) above {@code high}.
     *
     * @param fix what to check
     */
    record Order(String low, Quantity lowValue, String high, Quantity highValue, String fix) implements CatalogFact {}

    /**
     * A warning: the maximum is {@code times} (rounded) the typical value, more than datasheets spread.
     */
    record Spread(String max, Quantity maxValue, String typ, Quantity typValue, long times) implements CatalogFact {}

    /**
     * A larger order's unit price above a smaller one's (a warning: usually swapped columns).
     *
     * @param higherQuantity the larger order quantity; {@code higherUnit} its unit price
     * @param lowerQuantity  the smaller order quantity; {@code lowerUnit} its unit price
     */
    record PriceRises(int higherQuantity, double higherUnit, int lowerQuantity, double lowerUnit)
            implements CatalogFact {}
}
