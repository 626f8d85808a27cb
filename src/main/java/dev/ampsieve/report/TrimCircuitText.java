package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.advice.TrimCircuitChoice;
import dev.ampsieve.budget.SizedTrim;
import dev.ampsieve.budget.TrimSizing;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.TrimCircuit;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Words for trim circuits: one sized circuit (the budget's "Trim circuit" line, its JSON object
 * {@code trimCircuit}) and the advice's comparison of the circuits a stage allows
 * ({@link TrimCircuitChoice}). The only place that words them.
 */
public final class TrimCircuitText {
    private TrimCircuitText() {}

    /** How a circuit is named in prose. */
    static String name(TrimCircuit.Kind k) {
        return switch (k) {
            case STORED -> "stored correction";
            case NULL_PINS -> "null pins";
            case INJECTION -> "injection network";
            case DAC -> "trim DAC";
        };
    }

    private static String v(double volts) {
        return Units.format(volts, Dimension.VOLTAGE);
    }

    private static String ohms(double r) {
        return Units.format(r, Dimension.RESISTANCE, 3);
    }

    /** Why a circuit cannot be used, as a clause. */
    static String unusable(SizedTrim t, Stage s) {
        return switch (t.unusable()) {
            case NONE -> "";
            case NO_NULL_PINS -> "the part has no offset-null pins (catalog null-pins: false)";
            case NO_FEEDBACK_RESISTOR ->
                "a " + s.topology().key()
                        + " stage has no feedback resistor to carry an injected current (use trim.node: plus)";
            case NO_PLUS_RESISTANCE -> "no resistance at the + input to inject against (use trim.node: minus)";
            case RESISTOR_TOO_SMALL ->
                "covering " + v(t.offsetV()) + " would need an injection resistor below 10 Ω (raise the reference)";
        };
    }

    /**
     * The sized circuit in one sentence (no trailing period): what was chosen, its range against the
     * offset it must cover, its step, the drift it adds (input-referred) and its effect on the gains.
     */
    public static String describe(SizedTrim t, Stage s) {
        if (t.unusable() != SizedTrim.Unusable.NONE) {
            return name(t.kind()) + ": cannot be used, " + unusable(t, s);
        }
        List<String> parts = new ArrayList<>();
        TrimCircuit c = s.trim().circuit().withKind(t.kind());
        switch (t.kind()) {
            case STORED -> parts.add("stored correction, resolution " + v(t.resolutionV()) + " at the output");
            case NULL_PINS -> {
                parts.add("null pins with a trimmer: range ±" + v(t.rangeV())
                        + " at the output (the part's vos.max x NG," + " taken as the pins' range)");
                parts.add("resolution " + v(t.resolutionV()) + " (settability "
                        + Units.format(c.potSettability(), Dimension.RATIO) + " of the travel)");
            }
            case INJECTION, DAC -> {
                String from = t.kind() == TrimCircuit.Kind.DAC
                        ? String.valueOf(c.dacBits()) + "-bit DAC of " + v(c.dacReference()) + " full scale"
                        : "trimmer across ±" + v(c.reference());
                String why = t.idealResistance() > TrimSizing.MAX_RESISTANCE
                        ? "E96, at the ceiling of " + ohms(TrimSizing.MAX_RESISTANCE) + "; " + ohms(t.idealResistance())
                                + " would give exactly "
                                + Units.format(c.margin(), Dimension.NUMBER, 3) + " x the offset"
                        : "E96, the largest not above " + ohms(t.idealResistance()) + ", which gives "
                                + Units.format(c.margin(), Dimension.NUMBER, 3) + " x the offset";
                parts.add(from + " through Rinj " + ohms(t.injectionResistance()) + " (" + why + ") into the "
                        + (c.node() == TrimCircuit.Node.MINUS ? "- input" : "+ input") + ": range ±"
                        + v(t.rangeV()) + " at the output");
                parts.add((t.kind() == TrimCircuit.Kind.DAC ? "LSB " : "resolution ") + v(t.resolutionV()));
                parts.add("noise gain " + Units.format(s.noiseGain(), Dimension.NUMBER, 4) + " + "
                        + Units.format(t.noiseGainChange(), Dimension.NUMBER, 3) + ", signal gain change "
                        + Units.format(t.gainChange(), Dimension.RATIO, 2));
            }
        }
        if (!Double.isNaN(t.rangeV())) {
            parts.add(
                    t.covers()
                            ? "covers the worst untrimmed offset " + v(t.offsetV())
                            : "does not reach " + v(t.uncoveredV()) + " of the worst untrimmed offset "
                                    + v(t.offsetV()));
        }
        if (t.kind() != TrimCircuit.Kind.STORED) {
            parts.add("adds " + Units.format(t.driftInVPerC(), Dimension.VOLTAGE_DRIFT) + " at the input");
            parts.add("parts and hand work " + Figures.money(t.partsCost()) + " per unit");
        }
        return String.join("; ", parts);
    }

    /**
     * The budget JSON's {@code trimCircuit}: kind, rangeV and resolutionV (output-referred),
     * addedDriftVPerC (input-referred), noiseGain, injectionResistance; a field the kind has not is absent.
     */
    public static void json(ObjectNode o, SizedTrim t) {
        ObjectNode n = o.putObject("trimCircuit");
        n.put("kind", t.kind().key());
        present(n, "rangeV", t.rangeV());
        present(n, "resolutionV", t.resolutionV());
        if (t.kind() != TrimCircuit.Kind.STORED) {
            present(n, "addedDriftVPerC", t.driftInVPerC());
        }
        present(n, "noiseGain", t.noiseGain());
        present(n, "injectionResistance", t.injectionResistance());
        if (!Double.isNaN(t.rangeV())) {
            n.put("covers", t.covers());
            present(n, "offsetV", t.offsetV());
        }
        if (t.unusable() != SizedTrim.Unusable.NONE) {
            n.put("unusable", t.unusable().key());
        }
        present(n, "partsCost", t.partsCost());
    }

    /**
     * The comparison as JSON, {@code trimCircuits: {trimAllowed, trimNeeded, cheapest (kind or null),
     * options[] {kind, outcome, fits, effectiveCost, errorV, limitV, circuitV, largestCircuitTerm,
     * trimCircuit{...}}}}, for a report that carries it beside the budget.
     */
    public static void json(ObjectNode o, TrimCircuitChoice c) {
        ObjectNode n = o.putObject("trimCircuits");
        n.put("trimAllowed", c.trimAllowed());
        n.put("trimNeeded", c.trimNeeded());
        if (c.cheapest() == null) {
            n.putNull("cheapest");
        } else {
            n.put("cheapest", c.cheapest().key());
        }
        ArrayNode arr = n.putArray("options");
        for (TrimCircuitChoice.Option op : c.options()) {
            ObjectNode e = arr.addObject();
            e.put("kind", op.kind().key());
            e.put("outcome", op.outcome().name().toLowerCase(Locale.ROOT).replace('_', '-'));
            e.put("fits", op.fits());
            present(e, "effectiveCost", op.effectiveCost());
            present(e, "errorV", op.errorV());
            present(e, "limitV", op.limitV());
            present(e, "circuitV", op.circuitV());
            if (op.largestCircuitTerm() != null) {
                e.put("largestCircuitTerm", op.largestCircuitTerm().key());
            }
            json(e, op.sized());
        }
    }

    private static void present(ObjectNode n, String key, double x) {
        if (Double.isFinite(x)) {
            n.put(key, x);
        }
    }

    /**
     * The comparison of the circuits a stage allows for one part: a table (circuit, verdict, trimmed
     * total against the limit, cost per unit), a sentence per circuit that does not fit saying why,
     * and the cheapest that fits (or that none does).
     */
    public static String render(TrimCircuitChoice c, Stage s) {
        StringBuilder o = new StringBuilder();
        String id = c.part().id();
        if (!c.trimAllowed()) {
            return "Trim circuits for " + id + ": the stage allows no trim (trim.allowed: false)\n";
        }
        o.append("Trim circuits for ")
                .append(id)
                .append(" (criterion ")
                .append(CriterionText.of(s.criterion()))
                .append(")\n");
        TextTable t = new TextTable()
                .left("circuit")
                .left("verdict")
                .right("after trim")
                .right("of limit")
                .right("cost/unit");
        for (TrimCircuitChoice.Option op : c.options()) {
            t.row(
                    name(op.kind()),
                    op.outcome() == TrimCircuitChoice.Outcome.FITS ? "fits" : "no fit",
                    v(op.errorV()),
                    op.limitV() > 0
                            ? String.format(java.util.Locale.ROOT, "%.1f %%", 100 * op.errorV() / op.limitV())
                            : "-",
                    Figures.money(op.effectiveCost()));
        }
        for (String line : t.lines(TextTable.WIDTH)) {
            o.append(line).append('\n');
        }
        for (TrimCircuitChoice.Option op : c.options()) {
            o.append("  ")
                    .append(name(op.kind()))
                    .append(": ")
                    .append(reason(op, s))
                    .append('\n');
        }
        if (!c.trimNeeded()) {
            o.append("No trim is needed: the part fits as it is.\n");
        } else if (c.cheapest() == null) {
            o.append("No allowed trim circuit makes ").append(id).append(" fit.\n");
        } else {
            TrimCircuitChoice.Option best = c.options().stream()
                    .filter(x -> x.kind() == c.cheapest())
                    .findFirst()
                    .orElseThrow();
            o.append("Cheapest that fits: ")
                    .append(name(best.kind()))
                    .append(", ")
                    .append(Figures.money(best.effectiveCost()))
                    .append(
                            c.part().price() == null
                                    ? ""
                                    : " " + c.part().price().currency())
                    .append(" per unit with the trim.\n");
        }
        return o.toString();
    }

    /** Why a circuit fits or not, with its numbers. */
    static String reason(TrimCircuitChoice.Option op, Stage s) {
        SizedTrim t = op.sized();
        String over = v(op.errorV()) + " after the trim against the limit " + v(op.limitV());
        String range =
                Units.format(s.tMin(), Dimension.TEMPERATURE) + ".." + Units.format(s.tMax(), Dimension.TEMPERATURE);
        String own = ownEffect(t, s);
        return switch (op.outcome()) {
            case FITS -> "fits, " + over + (own.isEmpty() ? "" : "; " + own);
            case UNUSABLE -> unusable(t, s);
            case RANGE_SHORT ->
                "its range ±" + v(t.rangeV()) + " leaves " + v(t.uncoveredV()) + " of the worst offset "
                        + v(t.offsetV()) + " untrimmed, and " + over;
            case CIRCUIT_TERMS ->
                own + "; its own terms add " + v(op.circuitV()) + " at the output"
                        + (op.largestCircuitTerm() == null
                                ? ""
                                : " (largest: " + op.largestCircuitTerm().label() + " "
                                        + v(op.largestCircuitTerm().outputV()) + ", "
                                        + TermNotes.of(op.largestCircuitTerm()) + ")")
                        + ", which fails over " + range + ": " + over + " (a stored correction would fit)";
            case FAILS_AFTER_TRIM -> "the part fails after this trim too: " + over + (own.isEmpty() ? "" : "; " + own);
            case CONSTRAINT -> "a hard constraint fails; no trim helps";
        };
    }

    /** What the circuit itself adds, as a clause ("" for a stored correction). */
    private static String ownEffect(SizedTrim t, Stage s) {
        String drift = Units.format(t.driftInVPerC(), Dimension.VOLTAGE_DRIFT);
        return switch (t.kind()) {
            case STORED -> "";
            case NULL_PINS ->
                "nulling " + v(Math.min(t.offsetV(), t.rangeV()) / s.noiseGain()) + " at the pins adds "
                        + Units.format(t.driftOutVPerC() / s.noiseGain(), Dimension.VOLTAGE_DRIFT) + " there (" + drift
                        + " at the input)";
            case INJECTION, DAC ->
                "Rinj " + ohms(t.injectionResistance()) + " adds " + drift + " at the input and raises the"
                        + " noise gain by " + Units.format(t.noiseGainChange(), Dimension.NUMBER, 3);
        };
    }
}
