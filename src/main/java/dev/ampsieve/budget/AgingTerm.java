package dev.ampsieve.budget;

import dev.ampsieve.catalog.LongTermDrift;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;

/**
 * Term 9, long-term drift: {@code NG * D * sqrt(L / t0)}, volts at the output, with D the
 * offset change the catalog gives per time t0 (commonly per 1000 h) and L the service life
 * (same unit). Offset aging behaves like a random walk, so it grows with the square root of
 * time (common practice; linear scaling would be the pessimistic alternative). Catalog
 * figures are usually typical only.
 */
public final class AgingTerm implements ErrorTerm {
    public static final String KEY = "aging";

    @Override
    public String key() {
        return KEY;
    }

    @Override
    public String label() {
        return "long-term drift";
    }

    @Override
    public boolean dc() {
        return true;
    }

    /** Input-referred offset change after {@code life} seconds, V (√t model). */
    public static double inputAging(LongTermDrift d, double life) {
        if (d == null || life <= 0 || d.per() <= 0) {
            return 0.0;
        }
        return d.value() * Math.sqrt(life / d.per());
    }

    @Override
    public TermResult evaluate(Stage s, PartValues v) {
        LongTermDrift d = v.part().longTermDrift();
        double life = s.serviceLife();
        if (life <= 0) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, false, "no service life given");
        }
        if (d == null) {
            return ErrorTerm.result(this, s, 0.0, Double.NaN, true, "no long-term drift figure in the catalog: not counted");
        }
        double out = s.noiseGain() * inputAging(d, life);
        String note = "NG x " + Units.format(d.value(), Dimension.VOLTAGE) + " per "
                + Units.format(d.per(), Dimension.TIME) + " x sqrt(" + Units.format(life, Dimension.TIME)
                + " / " + Units.format(d.per(), Dimension.TIME) + ") (random walk, typical figure)";
        return ErrorTerm.result(this, s, out, Double.NaN, false, note);
    }
}
