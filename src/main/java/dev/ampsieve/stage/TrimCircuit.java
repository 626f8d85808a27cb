package dev.ampsieve.stage;

import java.util.Arrays;
import java.util.List;

/**
 * The circuit that applies a trim, and what the tool needs to size and price it (stage keys
 * {@code trim.circuit} and the {@code trim.} keys below; the defaults are common practice, stated as
 * such in {@link StageKeys}). The tool sizes the circuit for each part (budget.TrimSizing); this
 * record only holds what the stage says.
 *
 * @param kind            which circuit
 * @param margin          injection and DAC: the range must cover this many times the worst untrimmed offset
 * @param node            injection and DAC: where the injection resistor enters the amplifier
 * @param reference       injection: the potentiometer spans -reference..+reference about the node's reference, V
 * @param referenceTempco injection: the reference's temperature coefficient, 1/°C
 * @param resistorTempco  injection and DAC: each resistor's temperature coefficient, 1/°C
 * @param tracking        injection and DAC: the ratio tempco of the injection resistor against the
 *                        resistor it works with when both sit in one network, 1/°C; NaN: the two are
 *                        separate parts, 2 x resistorTempco
 * @param potSettability  null pins and injection: the smallest step a potentiometer can be set to, as a share of its travel
 * @param potTempco       null pins and injection: the potentiometer's temperature coefficient, 1/°C
 * @param potResistance   injection: the potentiometer's end-to-end resistance, ohm
 * @param dacBits         DAC: resolution, bits
 * @param dacReference    DAC: full-scale output, V (midscale injects nothing)
 * @param dacOffsetDrift  DAC: zero-code (offset) drift, V/°C
 * @param dacGainDrift    DAC: gain drift, 1/°C of the output from code 0
 * @param potCost         price of the trimming potentiometer, per unit
 * @param referenceCost   price of the injection network's reference, per unit
 * @param resistorCost    price of the injection resistor, per unit
 * @param dacCost         price of the trim DAC, per unit
 * @param adjustCost      labour of setting a potentiometer by hand, per unit (null pins and injection)
 */
public record TrimCircuit(
        Kind kind,
        double margin,
        Node node,
        double reference,
        double referenceTempco,
        double resistorTempco,
        double tracking,
        double potSettability,
        double potTempco,
        double potResistance,
        int dacBits,
        double dacReference,
        double dacOffsetDrift,
        double dacGainDrift,
        double potCost,
        double referenceCost,
        double resistorCost,
        double dacCost,
        double adjustCost) {

    /** Which circuit applies the correction. */
    public enum Kind {
        /** a correction stored and subtracted after the converter (no part at the amplifier) */
        STORED("stored"),
        /** the part's own offset-null pins with a potentiometer */
        NULL_PINS("null-pins"),
        /** a reference, a potentiometer and an injection resistor into the amplifier */
        INJECTION("injection"),
        /** a DAC driving an injection resistor into the amplifier */
        DAC("dac");

        private final String key;

        Kind(String key) {
            this.key = key;
        }

        /** The word the stage file uses. */
        public String key() {
            return key;
        }

        /** Whether the circuit injects through a resistor the tool sizes. */
        public boolean injects() {
            return this == INJECTION || this == DAC;
        }

        public static List<String> keys() {
            return Arrays.stream(values()).map(Kind::key).toList();
        }

        /** The kind the stage word names, or null. */
        public static Kind of(String word) {
            for (Kind k : values()) {
                if (k.key.equals(word)) {
                    return k;
                }
            }
            return null;
        }
    }

    /** Where an injection resistor enters the amplifier. */
    public enum Node {
        /** the inverting input (summing node): the output moves by Rf/Rinj per volt injected */
        MINUS("minus"),
        /** the non-inverting input, against R+: the output moves by NG R+/(R+ + Rinj) per volt */
        PLUS("plus");

        private final String key;

        Node(String key) {
            this.key = key;
        }

        public String key() {
            return key;
        }

        public static List<String> keys() {
            return Arrays.stream(values()).map(Node::key).toList();
        }
    }

    // Defaults, each common practice (StageKeys says so beside the key).
    /** Range over worst untrimmed offset: 1.5 leaves room for the part's own spread beyond the figures. */
    public static final double DEFAULT_MARGIN = 1.5;
    /** A 2.5 V reference: the usual value on a 5 V board. */
    public static final double DEFAULT_REFERENCE = 2.5;
    /** A mid-grade band-gap reference, 20 ppm/°C. */
    public static final double DEFAULT_REFERENCE_TEMPCO = 20e-6;
    /** A thin-film chip resistor, 25 ppm/°C. */
    public static final double DEFAULT_RESISTOR_TEMPCO = 25e-6;
    /** A multi-turn cermet trimmer sets to about 0.1 % of its travel. */
    public static final double DEFAULT_POT_SETTABILITY = 1e-3;
    /** A cermet trimmer, 100 ppm/°C. */
    public static final double DEFAULT_POT_TEMPCO = 100e-6;
    /** A 10 kohm trimmer. */
    public static final double DEFAULT_POT_RESISTANCE = 10e3;
    /** An 8-bit trim DAC. */
    public static final int DEFAULT_DAC_BITS = 8;
    /** Its full scale, 2.5 V. */
    public static final double DEFAULT_DAC_REFERENCE = 2.5;
    /** Zero-code drift of a string DAC, 10 uV/°C. */
    public static final double DEFAULT_DAC_OFFSET_DRIFT = 10e-6;
    /** Gain drift of a DAC with an internal reference, 10 ppm/°C. */
    public static final double DEFAULT_DAC_GAIN_DRIFT = 10e-6;
    /** A multi-turn trimmer in thousands. */
    public static final double DEFAULT_POT_COST = 0.40;
    /** A 2.5 V band-gap reference in thousands (shared by no other circuit on the board). */
    public static final double DEFAULT_REFERENCE_COST = 0.60;
    /** A 1 % thin-film chip resistor. */
    public static final double DEFAULT_RESISTOR_COST = 0.01;
    /** An 8-bit trim DAC in thousands. */
    public static final double DEFAULT_DAC_COST = 0.90;
    /** About a minute of an operator's time setting a trimmer at the bench. */
    public static final double DEFAULT_ADJUST_COST = 0.75;

    /** The stored correction (today's trim), with every other key at its default. */
    public static final TrimCircuit STORED = defaults(Kind.STORED);

    /** A circuit of {@code kind} with every key at its default. */
    public static TrimCircuit defaults(Kind kind) {
        return new TrimCircuit(
                kind,
                DEFAULT_MARGIN,
                Node.MINUS,
                DEFAULT_REFERENCE,
                DEFAULT_REFERENCE_TEMPCO,
                DEFAULT_RESISTOR_TEMPCO,
                Double.NaN,
                DEFAULT_POT_SETTABILITY,
                DEFAULT_POT_TEMPCO,
                DEFAULT_POT_RESISTANCE,
                DEFAULT_DAC_BITS,
                DEFAULT_DAC_REFERENCE,
                DEFAULT_DAC_OFFSET_DRIFT,
                DEFAULT_DAC_GAIN_DRIFT,
                DEFAULT_POT_COST,
                DEFAULT_REFERENCE_COST,
                DEFAULT_RESISTOR_COST,
                DEFAULT_DAC_COST,
                DEFAULT_ADJUST_COST);
    }

    /** The same settings with another kind (the advice compares the kinds a stage allows). */
    public TrimCircuit withKind(Kind k) {
        return new TrimCircuit(
                k,
                margin,
                node,
                reference,
                referenceTempco,
                resistorTempco,
                tracking,
                potSettability,
                potTempco,
                potResistance,
                dacBits,
                dacReference,
                dacOffsetDrift,
                dacGainDrift,
                potCost,
                referenceCost,
                resistorCost,
                dacCost,
                adjustCost);
    }

    /**
     * The ratio tempco of the injection resistor against the resistor it works with, 1/°C:
     * {@link #tracking} when given, else 2 x {@link #resistorTempco} (two separate parts whose
     * coefficients may have opposite signs).
     */
    public double ratioTempco() {
        return Double.isNaN(tracking) ? 2 * resistorTempco : tracking;
    }

    /**
     * What the circuit's parts and hand work add to the trim cost per unit: nothing for a stored
     * correction; potentiometer and adjustment for the null pins; reference, potentiometer,
     * resistor and adjustment for an injection network; DAC and resistor for a DAC (set by the
     * test program, whose time is the trim cost itself).
     */
    public double partsCost() {
        return switch (kind) {
            case STORED -> 0.0;
            case NULL_PINS -> potCost + adjustCost;
            case INJECTION -> referenceCost + potCost + resistorCost + adjustCost;
            case DAC -> dacCost + resistorCost;
        };
    }
}
