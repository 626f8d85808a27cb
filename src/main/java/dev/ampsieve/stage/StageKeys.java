package dev.ampsieve.stage;

import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;
import java.util.stream.Collectors;

/**
 * Every key a stage file may hold, in one place: what it measures, its default, an example
 * and why the tool asks for it. The loader takes its key lists from here, the writer its
 * comments, and the interactive shell its questions and completions.
 *
 * <p>Paths are dotted: {@code temperature.min} is {@code min} inside the {@code temperature}
 * block. {@link #ORDERED} starts with what matters most (gain, temperature range, limit).
 */
public final class StageKeys {

    private StageKeys() {}

    /** What kind of value a key takes. */
    public enum Kind {
        /** a value with a unit; {@link Key#dimension()} says which */
        QUANTITY,
        /** a plain number (no unit) */
        NUMBER,
        /** a whole number */
        INTEGER,
        /** true or false */
        BOOLEAN,
        /** one word of {@link Key#choices()} */
        CHOICE,
        /** one or more words of {@link Key#choices()}: a list, or words separated by commas */
        CHOICES,
        /** worst-case | rss | yield P % */
        CRITERION,
        /** a gain: a plain number, or decibels */
        GAIN
    }

    /**
     * One stage key.
     *
     * @param path        dotted path, e.g. {@code temperature.min}
     * @param kind        what kind of value it takes
     * @param dimension   for {@link Kind#QUANTITY}: what it measures; otherwise null
     * @param choices     for {@link Kind#CHOICE} and {@link Kind#CRITERION}: the allowed words
     * @param defaultText the default in words ("required" when there is none)
     * @param example     a well-formed value
     * @param why         one line: why the tool asks
     */
    public record Key(
            String path,
            Kind kind,
            Dimension dimension,
            List<String> choices,
            String defaultText,
            String example,
            String why) {
        public Key {
            choices = List.copyOf(choices);
        }

        /** The block this key sits in ({@code temperature}), or "" at the top level. */
        public String section() {
            int dot = path.indexOf('.');
            return dot < 0 ? "" : path.substring(0, dot);
        }

        /** The key's own name inside its block ({@code min}). */
        public String name() {
            int dot = path.indexOf('.');
            return dot < 0 ? path : path.substring(dot + 1);
        }
    }

    /** Seed used when the stage gives none, so two runs of the same files agree. */
    public static final long DEFAULT_SEED = 20_261_201L;

    public static final double DEFAULT_RF = 10e3;
    public static final double DEFAULT_T_MIN = 0.0;
    public static final double DEFAULT_T_MAX = 70.0;
    public static final double DEFAULT_BAND_LOW = 0.1;
    public static final double DEFAULT_BAND_HIGH = 10.0;
    /** Datasheet maximum read as 3 sigma: common practice (reference-checks.md §7). */
    public static final double DEFAULT_MAX_TO_SIGMA = 3.0;

    public static final int DEFAULT_TRIALS = 20_000;
    public static final int MIN_TRIALS = 100;
    public static final int MAX_TRIALS = 10_000_000;
    /**
     * Cap on the units simulated under a yield criterion while the answer is undecided. At 200,000 units
     * the 95 % interval of a 99.9 % yield is about +/- 0.014 points (1.96 sqrt(0.999 x 0.001 / 200000)):
     * a part still undecided there sits closer to its target than the datasheet-based spreads can
     * tell apart, and the advice says how many units would settle it. Was 1,000,000: the few parts
     * that sat at the target then cost more units than all the others of a 10,000-part ranking.
     */
    public static final int DEFAULT_MAX_TRIALS = 200_000;

    public static final int DEFAULT_QUANTITY = 1000;
    public static final int MAX_QUANTITY = 1_000_000_000;

    public static final List<String> TOPOLOGIES =
            java.util.Arrays.stream(Topology.values()).map(Topology::key).toList();
    public static final List<String> CRITERIA = List.of("worst-case", "rss", "yield 99.9 %");
    public static final List<String> TRIM_METHODS =
            java.util.Arrays.stream(Trim.Method.values()).map(Trim.Method::key).toList();
    public static final List<String> TRIM_CIRCUITS = TrimCircuit.Kind.keys();
    public static final List<String> TRIM_NODES = TrimCircuit.Node.keys();
    /** band.filter-order: "none", or the order of the Butterworth low-pass at band.high, 1..{@link Stage#MAX_FILTER_ORDER}. */
    public static final List<String> FILTER_ORDERS = java.util.stream.Stream.concat(
                    java.util.stream.Stream.of("none"),
                    java.util.stream.IntStream.rangeClosed(1, Stage.MAX_FILTER_ORDER)
                            .mapToObj(String::valueOf))
            .toList();

    private static Key q(String path, Dimension d, String def, String example, String why) {
        return new Key(path, Kind.QUANTITY, d, List.of(), def, example, why);
    }

    private static Key k(String path, Kind kind, List<String> choices, String def, String example, String why) {
        return new Key(path, kind, null, choices, def, example, why);
    }

    /** All keys, most important first. */
    public static final List<Key> ORDERED = List.of(
            k(
                    "gain",
                    Kind.GAIN,
                    List.of(),
                    "required unless rf and rg are given",
                    "100",
                    "every input error reaches the output multiplied by the noise gain; non-inverting: 1 + rf/rg, "
                            + "inverting: the ratio rf/rg (a sign is ignored); difference: r2/r1; also as '40 dB' "
                            + "(transimpedance: none, rf is the gain)"),
            q(
                    "temperature.min",
                    Dimension.TEMPERATURE,
                    "0 C",
                    "-40 C",
                    "drift terms grow with the distance from 25 C; the part must be rated down to here"),
            q(
                    "temperature.max",
                    Dimension.TEMPERATURE,
                    "70 C",
                    "85 C",
                    "drift and FET bias currents grow with heat; the part must be rated up to here"),
            q(
                    "limit",
                    Dimension.VOLTAGE,
                    "required",
                    "1 mV",
                    "the largest error allowed at the output; every part is judged against it "
                            + "(or give one of limit.input, limit.percent-of-full-scale, limit.lsb)"),
            q(
                    "limit.input",
                    Dimension.VOLTAGE,
                    "none",
                    "10 uV",
                    "the limit referred to the signal source instead; multiplied by the signal gain's magnitude "
                            + "(inverting: rf/(rg + source-resistance))"),
            q(
                    "limit.input-current",
                    Dimension.CURRENT,
                    "none",
                    "1 nA",
                    "transimpedance only: the limit as a current at the source; multiplied by rf"),
            q(
                    "limit.percent-of-full-scale",
                    Dimension.RATIO,
                    "none",
                    "0.1 %",
                    "the limit as a share of full-scale-output, the peak excursion (a bare number is read as percent)"),
            k(
                    "limit.lsb",
                    Kind.NUMBER,
                    List.of(),
                    "none",
                    "0.5",
                    "the limit in converter codes: lsb x reference / 2^bits"),
            k("limit.bits", Kind.INTEGER, List.of(), "none", "16", "converter resolution for limit.lsb"),
            q("limit.reference", Dimension.VOLTAGE, "none", "2.5 V", "converter reference (full span) for limit.lsb"),
            k(
                    "topology",
                    Kind.CHOICE,
                    TOPOLOGIES,
                    "non-inverting",
                    "non-inverting",
                    "sets the noise gain, how the source enters and the common-mode swing: non-inverting, inverting, "
                            + "follower, difference (one amplifier, four resistors: a bridge or a shunt), transimpedance "
                            + "(a current source such as a photodiode)"),
            q(
                    "rf",
                    Dimension.RESISTANCE,
                    "10 kohm (follower: 0; transimpedance: required)",
                    "100 kohm",
                    "bias current times rf appears at the output, and rf adds thermal noise; transimpedance: the gain "
                            + "in volts per ampere"),
            q(
                    "rg",
                    Dimension.RESISTANCE,
                    "derived from gain and rf",
                    "1 kohm",
                    "with rf sets the gain; give it with rf instead of 'gain'"),
            q(
                    "r1",
                    Dimension.RESISTANCE,
                    "r2/gain",
                    "1 kohm",
                    "difference: the input resistor of the inverting side (the minus leg drives it)"),
            q("r2", Dimension.RESISTANCE, "10 kohm", "10 kohm", "difference: the feedback resistor; the gain is r2/r1"),
            q(
                    "r3",
                    Dimension.RESISTANCE,
                    "r1",
                    "1 kohm",
                    "difference: the input resistor of the non-inverting side (the plus leg drives it)"),
            q(
                    "r4",
                    Dimension.RESISTANCE,
                    "r2",
                    "10 kohm",
                    "difference: from the + input to the reference; r4/r3 must match r2/r1 to reject the common mode"),
            q(
                    "cf",
                    Dimension.CAPACITANCE,
                    "0 F (the stability check then names the capacitor needed)",
                    "2 pF",
                    "transimpedance: the capacitor across rf; it sets the signal bandwidth and the phase margin"),
            q(
                    "source-capacitance",
                    Dimension.CAPACITANCE,
                    "required (transimpedance)",
                    "50 pF",
                    "transimpedance: the source's capacitance (a photodiode's junction plus wiring); above the zero it sets "
                            + "the voltage noise is amplified by 1 + Cs/Cf"),
            q(
                    "source-resistance",
                    Dimension.RESISTANCE,
                    "0 ohm (transimpedance: required)",
                    "350 ohm",
                    "bias current and current noise flow through it; its thermal noise adds; difference: both legs, or "
                            + "give source-resistance.minus and .plus; transimpedance: the source's shunt resistance"),
            q(
                    "source-resistance.minus",
                    Dimension.RESISTANCE,
                    "0 ohm",
                    "350 ohm",
                    "difference: the resistance of the leg driving r1"),
            q(
                    "source-resistance.plus",
                    Dimension.RESISTANCE,
                    "0 ohm",
                    "350 ohm",
                    "difference: the resistance of the leg driving r3; unequal legs unbalance the two ratios"),
            q(
                    "balance-resistance",
                    Dimension.RESISTANCE,
                    "0 ohm",
                    "1 kohm",
                    "a resistor from the + input to the reference, in series with source-resistance (non-inverting, "
                            + "follower): matched bias currents cancel when source-resistance + balance-resistance equals "
                            + "rf||rg (inverting: when balance-resistance equals rf||(rg + source-resistance); "
                            + "transimpedance: rf||source-resistance); not for a difference stage"),
            q(
                    "full-scale-output",
                    Dimension.VOLTAGE,
                    "none (open-loop gain, bandwidth and resistor terms not counted)",
                    "2.5 V",
                    "the peak output excursion from the output's zero (a sine's amplitude, not its span): gain errors "
                            + "(open-loop gain, bandwidth, resistors) scale with it, the slew rate needed is 2 pi x band.high x it, "
                            + "and without output-range the output must reach mid-supply +/- it"),
            q(
                    "band.low",
                    Dimension.FREQUENCY,
                    "0.1 Hz",
                    "0.1 Hz",
                    "lower edge for integrating 1/f noise (must be above 0 Hz)"),
            q(
                    "band.high",
                    Dimension.FREQUENCY,
                    "10 Hz",
                    "1 kHz",
                    "upper signal frequency: closed-loop gain error, slew rate, and the corner of the filter "
                            + "named by band.filter-order"),
            k(
                    "band.filter-order",
                    Kind.CHOICE,
                    FILTER_ORDERS,
                    "none",
                    "2",
                    "sets the noise bandwidth: the order of a Butterworth low-pass at band.high after the amplifier "
                            + "(1, an RC: pi/2 x band.high; 2: 1.11 x; 3: 1.05 x), never beyond pi/2 x GBW/NG; 'none' (the "
                            + "default, which never understates the noise): only the closed-loop bandwidth GBW/NG limits it"),
            q("supply.voltage", Dimension.VOLTAGE, "none", "5 V", "the part must run from this total supply"),
            q(
                    "supply.variation",
                    Dimension.VOLTAGE,
                    "0 V (supply rejection not counted)",
                    "0.25 V",
                    "peak supply change, times the part's supply rejection; a regulator's tolerance plus "
                            + "ripple (5 % of the supply is common practice for a plain linear regulator)"),
            q(
                    "common-mode-swing",
                    Dimension.VOLTAGE,
                    "non-inverting: full-scale-output/gain; follower: full-scale-output; inverting, transimpedance: 0; "
                            + "difference: full-scale-output/(2 x gain); without full-scale-output 0 (common-mode rejection "
                            + "not counted)",
                    "1 V",
                    "peak common-mode change at the inputs (not peak-to-peak); multiplied by the part's common-mode "
                            + "rejection, and without common-mode-range the inputs must reach mid-supply +/- it; difference: "
                            + "at the source, where the resistor mismatch also turns it into output error"),
            q(
                    "common-mode-range.min",
                    Dimension.VOLTAGE,
                    "mid-supply - common-mode-swing",
                    "0.5 V",
                    "lowest input voltage needed, volts above the negative rail (difference: at the source; the pins see "
                            + "it divided by r4/(r3 + r4) about mid-supply)"),
            q(
                    "common-mode-range.max",
                    Dimension.VOLTAGE,
                    "mid-supply + common-mode-swing",
                    "4 V",
                    "highest input voltage needed, volts above the negative rail (difference: at the source)"),
            q(
                    "output-range.min",
                    Dimension.VOLTAGE,
                    "mid-supply - full-scale-output",
                    "0.1 V",
                    "lowest output voltage needed, volts above the negative rail"),
            q(
                    "output-range.max",
                    Dimension.VOLTAGE,
                    "mid-supply + full-scale-output",
                    "4.9 V",
                    "highest output voltage needed, volts above the negative rail"),
            q(
                    "resistor-ratio.tolerance",
                    Dimension.RATIO,
                    "0 (with tempco 0: resistor ratio not counted)",
                    "0.1 %",
                    "the rf/rg ratio error becomes a gain error at full scale; difference: per pair (r2/r1 and r4/r3), "
                            + "which also limits the common-mode rejection to about (1 + gain)/(2 x tolerance); transimpedance: "
                            + "rf's own tolerance"),
            q(
                    "resistor-ratio.tempco",
                    Dimension.RATIO_DRIFT,
                    "0",
                    "10 ppm/C",
                    "ratio change with temperature; a trim at 25 C cannot remove it"),
            q(
                    "service-life",
                    Dimension.TIME,
                    "0 h (long-term drift not counted)",
                    "10 y",
                    "long-term offset drift grows with the square root of operating time"),
            k(
                    "thermal-emf.junctions",
                    Kind.INTEGER,
                    List.of(),
                    "0 (thermal EMF not counted)",
                    "2",
                    "board-level: unpaired junctions of dissimilar metals in the input path (a connector, a relay, solder to"
                            + " a lead frame); each adds seebeck x gradient in series with the input"),
            q(
                    "thermal-emf.seebeck",
                    Dimension.VOLTAGE_DRIFT,
                    "required with junctions",
                    "3 uV/C",
                    "volts per degree of one junction; common practice: copper to copper under 0.2 uV/C, copper to "
                            + "tin-lead solder 1 to 3 uV/C, copper to a Kovar lead frame about 40 uV/C, oxidised copper up to "
                            + "1 mV/C"),
            q(
                    "thermal-emf.gradient",
                    Dimension.TEMPERATURE,
                    "required with junctions",
                    "0.5 C",
                    "the temperature difference across the junctions (a warm regulator or part beside them)"),
            q(
                    "leakage.resistance",
                    Dimension.RESISTANCE,
                    "none (leakage not counted)",
                    "10 Gohm",
                    "board-level: surface leakage from a nearby trace into the high-impedance input (board, flux residue,"
                            + " humidity); its current adds to that input's bias current"),
            q(
                    "leakage.voltage",
                    Dimension.VOLTAGE,
                    "required with resistance",
                    "12 V",
                    "the potential of that trace relative to the node"),
            k(
                    "leakage.input",
                    Kind.CHOICE,
                    List.of("plus", "minus"),
                    "plus (non-inverting, follower, difference); minus (inverting, transimpedance)",
                    "plus",
                    "the input the leakage reaches: the high-impedance node"),
            k(
                    "criterion",
                    Kind.CRITERION,
                    CRITERIA,
                    "worst-case",
                    "yield 99.9 %",
                    "worst-case sum, root-sum-square, or the share of built units that must pass"),
            k(
                    "max-to-sigma",
                    Kind.NUMBER,
                    List.of(),
                    "3",
                    "3",
                    "how many standard deviations a datasheet maximum stands for (for the yield)"),
            k(
                    "trials",
                    Kind.INTEGER,
                    List.of(),
                    String.valueOf(DEFAULT_TRIALS),
                    "20000",
                    "simulated units for the yield; more gives a narrower interval"),
            k(
                    "max-trials",
                    Kind.INTEGER,
                    List.of(),
                    String.valueOf(DEFAULT_MAX_TRIALS),
                    "1000000",
                    "under a yield criterion, the most units simulated while the interval still contains the target"),
            k(
                    "seed",
                    Kind.INTEGER,
                    List.of(),
                    String.valueOf(DEFAULT_SEED),
                    "42",
                    "random seed, so a yield can be reproduced"),
            k(
                    "trim.allowed",
                    Kind.BOOLEAN,
                    List.of(),
                    "false (true once a trim block is written)",
                    "true",
                    "whether each unit may be calibrated; a trim can make a cheaper part fit"),
            k(
                    "trim.method",
                    Kind.CHOICE,
                    TRIM_METHODS,
                    "one-point",
                    "two-temperature",
                    "one-point removes offset at 25 C; two-point also removes the static gain error at 25 C; "
                            + "two-temperature removes offset and its linear drift (calibrated at trim.cold and trim.hot)"),
            q(
                    "trim.cold",
                    Dimension.TEMPERATURE,
                    "temperature.min (two-temperature only)",
                    "-40 C",
                    "lower calibration temperature of a two-temperature trim; outside cold..hot the resolution's error grows"),
            q(
                    "trim.hot",
                    Dimension.TEMPERATURE,
                    "temperature.max (two-temperature only)",
                    "85 C",
                    "upper calibration temperature of a two-temperature trim; a wider spacing makes the correction line steadier"),
            q(
                    "trim.resolution",
                    Dimension.VOLTAGE,
                    "0 V",
                    "0.5 mV",
                    "the step of the correction, at the output; it stays"),
            k(
                    "trim.cost",
                    Kind.NUMBER,
                    List.of(),
                    "0",
                    "0.60",
                    "cost of trimming one unit (test time, storing the correction; the circuit's own parts and hand work are trim.*-cost), to compare with a better part"),
            // trim circuits: every default below is common practice, not a figure of any part
            k(
                    "trim.circuit",
                    Kind.CHOICE,
                    TRIM_CIRCUITS,
                    "stored",
                    "dac",
                    "what applies the correction: stored (subtracted after the converter), null-pins (the part's own "
                            + "pins and a trimmer), injection (reference, trimmer and a resistor into the amplifier), dac (a "
                            + "DAC into that resistor); the tool sizes it for each part and counts what it adds"),
            k(
                    "trim.circuits",
                    Kind.CHOICES,
                    TRIM_CIRCUITS,
                    "trim.circuit alone",
                    "stored, injection",
                    "the circuits the advice compares for each part (the cheapest that makes it fit is named)"),
            k(
                    "trim.margin",
                    Kind.NUMBER,
                    List.of(),
                    "1.5 (common practice)",
                    "1.5",
                    "injection and dac: the range must cover this many times the worst untrimmed offset"),
            k(
                    "trim.node",
                    Kind.CHOICE,
                    TRIM_NODES,
                    "minus",
                    "minus",
                    "injection and dac: the injection resistor goes to the inverting input (minus: it raises the noise "
                            + "gain by rf/Rinj) or the non-inverting input (plus: against the resistance there)"),
            q(
                    "trim.reference",
                    Dimension.VOLTAGE,
                    "2.5 V (common practice)",
                    "2.5 V",
                    "injection: the trimmer spans -reference..+reference about the node's reference"),
            q(
                    "trim.reference-tempco",
                    Dimension.RATIO_DRIFT,
                    "20 ppm/C (common practice: a mid-grade band-gap reference)",
                    "20 ppm/C",
                    "injection: the injected correction moves with the reference"),
            q(
                    "trim.resistor-tempco",
                    Dimension.RATIO_DRIFT,
                    "25 ppm/C (common practice: thin-film chip resistors)",
                    "25 ppm/C",
                    "injection and dac: the injected correction moves with the resistors' ratio (2 x this without tracking)"),
            q(
                    "trim.tracking",
                    Dimension.RATIO_DRIFT,
                    "none (separate parts: 2 x trim.resistor-tempco)",
                    "5 ppm/C",
                    "injection and dac: the ratio tempco when the injection resistor sits in one network with the "
                            + "resistor it works with"),
            q(
                    "trim.pot-settability",
                    Dimension.RATIO,
                    "0.1 % (common practice: a multi-turn cermet trimmer)",
                    "0.1 %",
                    "null-pins and injection: the smallest step a trimmer can be set to, as a share of its travel; "
                            + "with the range it sets the resolution"),
            q(
                    "trim.pot-tempco",
                    Dimension.RATIO_DRIFT,
                    "100 ppm/C (common practice: cermet)",
                    "100 ppm/C",
                    "null-pins and injection: the trimmer's resistance moves the setting with temperature"),
            q(
                    "trim.pot-resistance",
                    Dimension.RESISTANCE,
                    "10 kohm (common practice)",
                    "10 kohm",
                    "injection: the trimmer's end-to-end resistance; up to a quarter of it sits in series with Rinj"),
            k(
                    "trim.dac-bits",
                    Kind.INTEGER,
                    List.of(),
                    "8 (common practice for a trim DAC)",
                    "8",
                    "dac: with the range it sets the step of the correction"),
            q(
                    "trim.dac-reference",
                    Dimension.VOLTAGE,
                    "2.5 V (common practice)",
                    "2.5 V",
                    "dac: its full-scale output; midscale injects nothing, so the range is +-half of it"),
            q(
                    "trim.dac-offset-drift",
                    Dimension.VOLTAGE_DRIFT,
                    "10 uV/C (common practice: a string DAC)",
                    "10 uV/C",
                    "dac: its zero-code drift, injected through Rinj"),
            q(
                    "trim.dac-gain-drift",
                    Dimension.RATIO_DRIFT,
                    "10 ppm/C (common practice: internal reference)",
                    "10 ppm/C",
                    "dac: its gain drift, on the output it holds"),
            k(
                    "trim.pot-cost",
                    Kind.NUMBER,
                    List.of(),
                    "0.40 (common practice: a multi-turn trimmer in thousands)",
                    "0.40",
                    "null-pins and injection: the trimmer's price, added to the trim cost"),
            k(
                    "trim.reference-cost",
                    Kind.NUMBER,
                    List.of(),
                    "0.60 (common practice)",
                    "0.60",
                    "injection: the reference's price, added to the trim cost"),
            k(
                    "trim.resistor-cost",
                    Kind.NUMBER,
                    List.of(),
                    "0.01 (common practice)",
                    "0.01",
                    "injection and dac: the injection resistor's price"),
            k(
                    "trim.dac-cost",
                    Kind.NUMBER,
                    List.of(),
                    "0.90 (common practice: an 8-bit trim DAC in thousands)",
                    "0.90",
                    "dac: the DAC's price, added to the trim cost"),
            k(
                    "trim.adjust-cost",
                    Kind.NUMBER,
                    List.of(),
                    "0.75 (common practice: about a minute of bench time)",
                    "0.75",
                    "null-pins and injection: setting a trimmer by hand, per unit (a DAC is set by the test program, "
                            + "whose time is trim.cost)"),
            k(
                    "quantity",
                    Kind.INTEGER,
                    List.of(),
                    String.valueOf(DEFAULT_QUANTITY),
                    "1000",
                    "build quantity, for totals over the build (prices stay the catalog's, at their stated quantity)"),
            k(
                    "max-price",
                    Kind.NUMBER,
                    List.of(),
                    "none",
                    "5.00",
                    "ceiling on the part's catalog price per unit (trim cost not included); dearer parts are excluded"),
            k(
                    "ac-coupled",
                    Kind.BOOLEAN,
                    List.of(),
                    "false",
                    "false",
                    "when true, DC errors count only toward output headroom, not toward the error"),
            // operating point
            q(
                    "load-resistance",
                    Dimension.RESISTANCE,
                    "none (self-heating not counted)",
                    "2 kohm",
                    "the resistance the output drives, returned to mid-supply: with the quiescent current it heats the "
                            + "die (theta-ja), and drift and FET bias currents are read at the die's temperature"),
            q(
                    "sample-rate",
                    Dimension.FREQUENCY,
                    "none (aliases not checked)",
                    "30 kHz",
                    "the rate of the converter sampling the output: a chopping frequency or harmonic that folds into the "
                            + "band is named"));

    private static final Map<String, Key> BY_PATH =
            ORDERED.stream().collect(Collectors.toUnmodifiableMap(Key::path, Function.identity()));

    /** Blocks: top-level keys whose value is a mapping of their own. */
    public static final Set<String> SECTIONS = Set.of(
            "temperature",
            "supply",
            "common-mode-range",
            "output-range",
            "band",
            "resistor-ratio",
            "trim",
            "thermal-emf",
            "leakage");

    /** The key at {@code path}, or null. */
    public static Key get(String path) {
        return BY_PATH.get(path);
    }

    /** Every dotted path, in {@link #ORDERED} order (for completion). */
    public static List<String> paths() {
        return ORDERED.stream().map(Key::path).toList();
    }

    /** Names allowed at the top of a stage file. */
    public static List<String> topLevel() {
        Set<String> out = new LinkedHashSet<>();
        for (Key key : ORDERED) {
            out.add(key.section().isEmpty() ? key.path() : key.section());
        }
        return List.copyOf(out);
    }

    /**
     * Whether {@code key} means anything in a stage of {@code topology}: the resistor keys of one
     * network are refused by the others, so the writer leaves them out and the shell does not ask.
     */
    public static boolean appliesTo(Key key, Topology topology) {
        String p = key.path();
        return switch (p) {
            case "gain" -> topology != Topology.TRANSIMPEDANCE;
            case "rg" -> topology == Topology.NON_INVERTING || topology == Topology.INVERTING;
            case "rf" -> topology != Topology.DIFFERENCE;
            case "r1", "r2", "r3", "r4", "source-resistance.minus", "source-resistance.plus" ->
                topology == Topology.DIFFERENCE;
            case "cf", "source-capacitance", "limit.input-current" -> topology == Topology.TRANSIMPEDANCE;
            case "limit.input" -> topology != Topology.TRANSIMPEDANCE;
            case "balance-resistance" -> topology != Topology.DIFFERENCE;
            default -> true;
        };
    }

    /** Names allowed inside the block {@code section}. */
    public static List<String> inside(String section) {
        List<String> out = new ArrayList<>();
        for (Key key : ORDERED) {
            if (key.section().equals(section)) {
                out.add(key.name());
            }
        }
        return out;
    }
}
