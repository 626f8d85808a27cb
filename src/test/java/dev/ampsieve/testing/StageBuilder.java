package dev.ampsieve.testing;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.stage.Board;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Limit;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Topology;
import dev.ampsieve.stage.Trim;

/** Stages for tests: non-inverting, Rf 99 k / Rg 1 k (noise gain 100), 0..70 °C, 1 mV output limit. */
public final class StageBuilder {
    private Topology topology = Topology.NON_INVERTING;
    private double rf = 99e3;
    private double rg = 1e3;
    private double rs;
    private double tMin = 0;
    private double tMax = 70;
    private Double supply = 5.0;
    private double bandHigh = 10;
    /** First-order band limit at bandHigh, as the advice tests' expected values assume. */
    private Integer filterOrder = 1;

    private Double fullScale = 2.5;
    private double ratioTolerance;
    private Limit limit = Limit.output(1e-3);
    private Criterion criterion = Criterion.WORST_CASE;
    private Trim trim = Trim.NONE;
    private int quantity = 1000;
    private Double maxPrice;
    private int maxTrials = dev.ampsieve.stage.StageKeys.DEFAULT_MAX_TRIALS;

    public static StageBuilder stage() {
        return new StageBuilder();
    }

    public StageBuilder topology(Topology v) {
        topology = v;
        return this;
    }

    public StageBuilder rf(double v) {
        rf = v;
        return this;
    }

    public StageBuilder rg(double v) {
        rg = v;
        return this;
    }

    public StageBuilder source(double v) {
        rs = v;
        return this;
    }

    public StageBuilder temperature(double lo, double hi) {
        tMin = lo;
        tMax = hi;
        return this;
    }

    public StageBuilder supply(Double v) {
        supply = v;
        return this;
    }

    public StageBuilder bandHigh(double v) {
        bandHigh = v;
        return this;
    }

    public StageBuilder filterOrder(Integer v) {
        filterOrder = v;
        return this;
    }

    public StageBuilder fullScale(Double v) {
        fullScale = v;
        return this;
    }

    public StageBuilder ratioTolerance(double v) {
        ratioTolerance = v;
        return this;
    }

    public StageBuilder limit(Limit v) {
        limit = v;
        return this;
    }

    public StageBuilder limitV(double v) {
        limit = Limit.output(v);
        return this;
    }

    public StageBuilder criterion(Criterion v) {
        criterion = v;
        return this;
    }

    public StageBuilder trim(boolean allowed, double resolution, double cost) {
        trim = new Trim(allowed, Trim.Method.ONE_POINT, resolution, cost);
        return this;
    }

    public StageBuilder trim(Trim v) {
        trim = v;
        return this;
    }

    public StageBuilder quantity(int v) {
        quantity = v;
        return this;
    }

    public StageBuilder maxPrice(Double v) {
        maxPrice = v;
        return this;
    }

    public StageBuilder maxTrials(int v) {
        maxTrials = v;
        return this;
    }

    public Stage build() {
        return new Stage(
                Networks.of(topology, rf, rg, rs, 0),
                tMin,
                tMax,
                supply,
                0,
                0,
                (Range) null,
                (Range) null,
                0.1,
                bandHigh,
                filterOrder,
                fullScale,
                ratioTolerance,
                0,
                0,
                limit,
                criterion,
                3,
                2000,
                maxTrials,
                1L,
                trim,
                quantity,
                maxPrice,
                false,
                null,
                null,
                Board.NONE,
                null);
    }
}
