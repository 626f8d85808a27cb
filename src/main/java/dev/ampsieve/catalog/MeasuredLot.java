package dev.ampsieve.catalog;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

/**
 * Units of one part measured on the bench, one value per unit and column, in SI units, as read
 * from a lot file by {@link LotReader}. Values at 25 °C are required for the offset; bias current
 * and the values at one second temperature are optional (empty arrays when the file has none).
 *
 * @param file     the file read
 * @param labels   each unit's label (the {@code unit} column, else its row number)
 * @param vos      offset voltage at 25 °C, V, one per unit
 * @param ib       bias current at 25 °C, A; empty when not measured
 * @param second   the second temperature, °C; NaN when the file has no second temperature
 * @param vosAt    offset at the second temperature, V; empty when not measured
 * @param ibAt     bias current at the second temperature, A; empty when not measured
 */
public record MeasuredLot(
        Path file, List<String> labels, double[] vos, double[] ib, double second, double[] vosAt, double[] ibAt) {

    public MeasuredLot {
        labels = List.copyOf(labels);
        vos = vos.clone();
        ib = ib.clone();
        vosAt = vosAt.clone();
        ibAt = ibAt.clone();
    }

    /** Number of units. */
    public int units() {
        return vos.length;
    }

    @Override
    public double[] vos() {
        return vos.clone();
    }

    @Override
    public double[] ib() {
        return ib.clone();
    }

    @Override
    public double[] vosAt() {
        return vosAt.clone();
    }

    @Override
    public double[] ibAt() {
        return ibAt.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof MeasuredLot m
                && file.equals(m.file)
                && labels.equals(m.labels)
                && Arrays.equals(vos, m.vos)
                && Arrays.equals(ib, m.ib)
                && Double.compare(second, m.second) == 0
                && Arrays.equals(vosAt, m.vosAt)
                && Arrays.equals(ibAt, m.ibAt);
    }

    @Override
    public int hashCode() {
        return 31 * file.hashCode() + Arrays.hashCode(vos);
    }

    @Override
    public String toString() {
        return "MeasuredLot[" + file + ", " + units() + " units]";
    }
}
