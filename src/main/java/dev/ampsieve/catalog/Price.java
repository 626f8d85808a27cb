package dev.ampsieve.catalog;

import java.util.Comparator;
import java.util.List;

/**
 * What a part costs: one or more price breaks (unit price from an order quantity up), in one
 * currency. A catalog gives either one price ({@code {unit, quantity, currency}}) or a list of
 * breaks; both become a list here, sorted by quantity, quantities distinct.
 *
 * @param breaks   at least one, ascending by quantity
 * @param currency "USD" when the catalog does not say
 */
public record Price(List<Break> breaks, String currency) {

    /** Unit price for orders of {@code quantity} or more (until the next break). */
    public record Break(int quantity, double unit) {}

    public Price {
        if (breaks == null || breaks.isEmpty()) {
            throw new IllegalArgumentException("a price needs at least one break");
        }
        breaks =
                breaks.stream().sorted(Comparator.comparingInt(Break::quantity)).toList();
        for (int i = 1; i < breaks.size(); i++) {
            if (breaks.get(i).quantity() == breaks.get(i - 1).quantity()) {
                throw new IllegalArgumentException(
                        "two breaks at quantity " + breaks.get(i).quantity());
            }
        }
        currency = currency == null || currency.isBlank() ? "USD" : currency;
    }

    /** The single-price form: {@code unit} at {@code quantity}. */
    public Price(double unit, int quantity, String currency) {
        this(List.of(new Break(quantity, unit)), currency);
    }

    /** Unit price of the lowest-quantity break (the one a small order pays; what {@code find} and the index show). */
    public double unit() {
        return breaks.get(0).unit();
    }

    /** Quantity of the lowest break. */
    public int quantity() {
        return breaks.get(0).quantity();
    }

    /**
     * Unit price for a build of {@code quantity}: the break with the largest quantity not above
     * it. Below the smallest break there is no quoted price; the smallest break's is used (a
     * distributor usually sells fewer at that price or more, so this may understate a tiny order's
     * cost, which the advice says when it happens).
     */
    public double at(int quantity) {
        Break chosen = breaks.get(0);
        for (Break b : breaks) {
            if (b.quantity() <= quantity) {
                chosen = b;
            }
        }
        return chosen.unit();
    }

    /** More than one break. */
    public boolean hasBreaks() {
        return breaks.size() > 1;
    }
}
