package dev.ampsieve.stage;

import dev.ampsieve.catalog.Range;
import dev.ampsieve.yaml.Located;

/**
 * One amplifier stage and what it must achieve. SI units; temperatures in °C.
 * Derived values (noise gain, R+, R-, dT) follow the conventions of Franco,
 * <i>Design with Operational Amplifiers</i>, 4th ed., ch. 1 and 5 (recalled from memory).
 *
 * @param network           the topology with its resistors (and capacitors) and the source's resistance
 * @param supplyVoltage     total supply (V), null when not stated
 * @param supplyVariation   peak supply change (V) seen by PSRR
 * @param commonModeSwing   peak common-mode change (V) seen by CMRR, where the stage states it (at the
 *                          amplifier's pins; difference amplifier: at the source, see {@link Network#commonModeShare})
 * @param commonModeRange   input common-mode range needed, volts above the negative rail (null: mid-supply +/- commonModeSwing)
 * @param outputRange       output range needed, volts above the negative rail (null: mid-supply +/- fullScaleOutput)
 * @param filterOrder       order of the Butterworth low-pass at bandHigh that limits the noise band; 0: no
 *                          filter (only the closed-loop bandwidth GBW/NG does); null: not stated, counted as 0
 * @param fullScaleOutput   full-scale output: the peak output excursion from the output's zero (V), the
 *                          amplitude of a full-scale sine; null when not stated
 * @param serviceLife       seconds of operation for long-term drift
 * @param trials            simulated units for the yield; under a yield criterion the run may stop
 *                          earlier once the answer is plain, or go on while it is undecided
 * @param maxTrials         under a yield criterion, the most units simulated while the answer is
 *                          undecided (at least {@code trials})
 * @param quantity          build quantity (for price)
 * @param maxPrice          price ceiling per unit, null for none
 * @param acCoupled         DC terms only count toward headroom, not toward the error
 * @param loadResistance    resistance the output drives, returned to mid-supply (ohm); null: no load
 *                          stated (self-heating not counted)
 * @param sampleRate        rate of the converter that samples the output (Hz); null: none stated
 * @param board             board-level error sources (thermal EMF, leakage); {@link Board#NONE} when none is named
 * @param where             the file the stage came from (null when typed in)
 */
public record Stage(
        Network network,
        double tMin,
        double tMax,
        Double supplyVoltage,
        double supplyVariation,
        double commonModeSwing,
        Range commonModeRange,
        Range outputRange,
        double bandLow,
        double bandHigh,
        Integer filterOrder,
        Double fullScaleOutput,
        double ratioTolerance,
        double ratioTempco,
        double serviceLife,
        Limit limit,
        Criterion criterion,
        double maxToSigma,
        int trials,
        int maxTrials,
        long seed,
        Trim trim,
        int quantity,
        Double maxPrice,
        boolean acCoupled,
        Double loadResistance,
        Double sampleRate,
        Board board,
        Located where) {

    /** Reference temperature of datasheet 25 °C columns and of a one-point trim. */
    public static final double T_REF = 25.0;

    /** {@link #filterOrder()} of a stage whose noise only the amplifier's closed-loop bandwidth limits. */
    public static final int NO_FILTER = 0;

    /** Highest filter order a stage may name; beyond it the noise bandwidth is within 0.7 % of band.high. */
    public static final int MAX_FILTER_ORDER = 8;

    public Stage {
        board = board == null ? Board.NONE : board;
        if (filterOrder != null && (filterOrder < NO_FILTER || filterOrder > MAX_FILTER_ORDER)) {
            throw new IllegalArgumentException("filter order " + filterOrder + " outside 0.." + MAX_FILTER_ORDER);
        }
    }

    /** The filter order the noise band is computed with: {@link #NO_FILTER} when the stage names none. */
    public int noiseFilterOrder() {
        return filterOrder == null ? NO_FILTER : filterOrder;
    }

    /** The topology's stage-file word. */
    public Topology topology() {
        return network.topology();
    }

    /** DC noise gain ({@link Network#noiseGain}). */
    public double noiseGain() {
        return network.noiseGain();
    }

    /** Signed signal gain, V/V (transimpedance: V/A) ({@link Network#signalGain}). */
    public double signalGain() {
        return network.signalGain();
    }

    /**
     * |signal gain|: the factor from the signal source to the output. Input-referred figures
     * (the input form of the limit, the budget's input column) are referred to the signal source
     * by it, not by the noise gain: for an inverting stage that is Rf/(Rg + Rs), while the noise
     * gain 1 + Rf/(Rg + Rs) is the factor for the amplifier's own input errors.
     */
    public double sourceGain() {
        return Math.abs(signalGain());
    }

    /** Resistance seen from the - input ({@link Network#rMinus}). */
    public double rMinus() {
        return network.rMinus();
    }

    /** Resistance seen from the + input ({@link Network#rPlus}). */
    public double rPlus() {
        return network.rPlus();
    }

    /** The feedback resistor from the output to the - input ({@link Network#feedback}). */
    public double rf() {
        return network.feedback();
    }

    /** The source's resistance ({@link Network#sourceResistance}). */
    public double sourceResistance() {
        return network.sourceResistance();
    }

    /** Largest distance of the range from 25 °C. */
    public double deltaT() {
        return Math.max(Math.abs(tMin - T_REF), Math.abs(tMax - T_REF));
    }

    /** The same stage said to come from {@code place} (null: typed in); for comparing stages read from different files. */
    public Stage withWhere(Located place) {
        return toBuilder().where(place).build();
    }

    /** The same stage with datasheet maxima read as {@code k} standard deviations. */
    public Stage withMaxToSigma(double k) {
        return toBuilder().maxToSigma(k).build();
    }

    /** The error limit in output volts. */
    public double limitVolts() {
        return limit.outputVolts(sourceGain(), fullScaleOutput);
    }

    /** A builder holding every value of this stage, to change a few and build a new stage. */
    public Builder toBuilder() {
        return new Builder(this);
    }

    /**
     * A copy of a stage with some values changed: {@code s.toBuilder().rf(20e3).build()}. Every
     * value starts as the original's, so a new stage field never needs edits at each copy site
     * (the compact constructor still checks the result).
     */
    public static final class Builder {
        private Network network;
        private double tMin;
        private double tMax;
        private Double supplyVoltage;
        private double supplyVariation;
        private double commonModeSwing;
        private Range commonModeRange;
        private Range outputRange;
        private double bandLow;
        private double bandHigh;
        private Integer filterOrder;
        private Double fullScaleOutput;
        private double ratioTolerance;
        private double ratioTempco;
        private double serviceLife;
        private Limit limit;
        private Criterion criterion;
        private double maxToSigma;
        private int trials;
        private int maxTrials;
        private long seed;
        private Trim trim;
        private int quantity;
        private Double maxPrice;
        private boolean acCoupled;
        private Double loadResistance;
        private Double sampleRate;
        private Board board;
        private Located where;

        private Builder(Stage s) {
            network = s.network;
            tMin = s.tMin;
            tMax = s.tMax;
            supplyVoltage = s.supplyVoltage;
            supplyVariation = s.supplyVariation;
            commonModeSwing = s.commonModeSwing;
            commonModeRange = s.commonModeRange;
            outputRange = s.outputRange;
            bandLow = s.bandLow;
            bandHigh = s.bandHigh;
            filterOrder = s.filterOrder;
            fullScaleOutput = s.fullScaleOutput;
            ratioTolerance = s.ratioTolerance;
            ratioTempco = s.ratioTempco;
            serviceLife = s.serviceLife;
            limit = s.limit;
            criterion = s.criterion;
            maxToSigma = s.maxToSigma;
            trials = s.trials;
            maxTrials = s.maxTrials;
            seed = s.seed;
            trim = s.trim;
            quantity = s.quantity;
            maxPrice = s.maxPrice;
            acCoupled = s.acCoupled;
            loadResistance = s.loadResistance;
            sampleRate = s.sampleRate;
            board = s.board;
            where = s.where;
        }

        public Builder network(Network network) {
            this.network = network;
            return this;
        }

        /** The gain-setting resistor changed ({@link Network#withFeedback}). */
        public Builder rf(double rf) {
            this.network = network.withFeedback(rf);
            return this;
        }

        /** The source resistance changed ({@link Network#withSourceResistance}). */
        public Builder sourceResistance(double sourceResistance) {
            this.network = network.withSourceResistance(sourceResistance);
            return this;
        }

        public Builder tMin(double tMin) {
            this.tMin = tMin;
            return this;
        }

        public Builder tMax(double tMax) {
            this.tMax = tMax;
            return this;
        }

        public Builder supplyVoltage(Double supplyVoltage) {
            this.supplyVoltage = supplyVoltage;
            return this;
        }

        public Builder supplyVariation(double supplyVariation) {
            this.supplyVariation = supplyVariation;
            return this;
        }

        public Builder commonModeSwing(double commonModeSwing) {
            this.commonModeSwing = commonModeSwing;
            return this;
        }

        public Builder commonModeRange(Range commonModeRange) {
            this.commonModeRange = commonModeRange;
            return this;
        }

        public Builder outputRange(Range outputRange) {
            this.outputRange = outputRange;
            return this;
        }

        public Builder bandLow(double bandLow) {
            this.bandLow = bandLow;
            return this;
        }

        public Builder bandHigh(double bandHigh) {
            this.bandHigh = bandHigh;
            return this;
        }

        public Builder filterOrder(Integer filterOrder) {
            this.filterOrder = filterOrder;
            return this;
        }

        public Builder fullScaleOutput(Double fullScaleOutput) {
            this.fullScaleOutput = fullScaleOutput;
            return this;
        }

        public Builder ratioTolerance(double ratioTolerance) {
            this.ratioTolerance = ratioTolerance;
            return this;
        }

        public Builder ratioTempco(double ratioTempco) {
            this.ratioTempco = ratioTempco;
            return this;
        }

        public Builder serviceLife(double serviceLife) {
            this.serviceLife = serviceLife;
            return this;
        }

        public Builder limit(Limit limit) {
            this.limit = limit;
            return this;
        }

        public Builder criterion(Criterion criterion) {
            this.criterion = criterion;
            return this;
        }

        public Builder maxToSigma(double maxToSigma) {
            this.maxToSigma = maxToSigma;
            return this;
        }

        public Builder trials(int trials) {
            this.trials = trials;
            return this;
        }

        public Builder maxTrials(int maxTrials) {
            this.maxTrials = maxTrials;
            return this;
        }

        public Builder seed(long seed) {
            this.seed = seed;
            return this;
        }

        public Builder trim(Trim trim) {
            this.trim = trim;
            return this;
        }

        public Builder quantity(int quantity) {
            this.quantity = quantity;
            return this;
        }

        public Builder maxPrice(Double maxPrice) {
            this.maxPrice = maxPrice;
            return this;
        }

        public Builder board(Board board) {
            this.board = board;
            return this;
        }

        public Builder acCoupled(boolean acCoupled) {
            this.acCoupled = acCoupled;
            return this;
        }

        public Builder loadResistance(Double loadResistance) {
            this.loadResistance = loadResistance;
            return this;
        }

        public Builder sampleRate(Double sampleRate) {
            this.sampleRate = sampleRate;
            return this;
        }

        public Builder where(Located where) {
            this.where = where;
            return this;
        }

        public Stage build() {
            return new Stage(
                    network,
                    tMin,
                    tMax,
                    supplyVoltage,
                    supplyVariation,
                    commonModeSwing,
                    commonModeRange,
                    outputRange,
                    bandLow,
                    bandHigh,
                    filterOrder,
                    fullScaleOutput,
                    ratioTolerance,
                    ratioTempco,
                    serviceLife,
                    limit,
                    criterion,
                    maxToSigma,
                    trials,
                    maxTrials,
                    seed,
                    trim,
                    quantity,
                    maxPrice,
                    acCoupled,
                    loadResistance,
                    sampleRate,
                    board,
                    where);
        }
    }
}
