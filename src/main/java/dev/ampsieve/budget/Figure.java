package dev.ampsieve.budget;

/**
 * A catalog value after the missing-value rules.
 *
 * @param bound the value the worst case uses: a maximum (or, for dB figures, a minimum), a
 *              typical value standing in for it, an estimate or an assumed default
 * @param typ   the typical value when a guaranteed bound is also given; NaN otherwise
 * @param basis where {@code bound} came from
 */
public record Figure(double bound, double typ, Basis basis) {

    public static Figure guaranteed(double bound, Double typ) {
        return new Figure(bound, typ == null ? Double.NaN : typ, Basis.GUARANTEED);
    }

    public static Figure of(double bound, Basis basis) {
        return new Figure(bound, Double.NaN, basis);
    }

    public boolean hasTyp() {
        return !Double.isNaN(typ);
    }
}
