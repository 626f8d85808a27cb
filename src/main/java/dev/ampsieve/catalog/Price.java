package dev.ampsieve.catalog;

/** Unit price at a stated order quantity. */
public record Price(double unit, int quantity, String currency) {
    public Price {
        currency = currency == null || currency.isBlank() ? "USD" : currency;
    }
}
