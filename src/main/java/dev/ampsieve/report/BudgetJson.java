package dev.ampsieve.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.BudgetCalculator;
import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.NoiseModel;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.stage.Trim;

/**
 * The budget as JSON, the keys documented in README: volts in SI (suffix V), ratios as
 * fractions, temperatures in °C; NaN (not applicable) is written as null.
 */
public final class BudgetJson {
    private BudgetJson() {}

    private static final ObjectMapper MAPPER = JsonSupport.MAPPER;

    public static ObjectNode tree(Budget b, String stageLabel) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("part", b.part().id());
        if (stageLabel != null) {
            o.put("stage", stageLabel);
        }
        o.put("topology", b.stage().topology().key());
        put(o, "noiseGain", b.noiseGain());
        put(o, "signalGain", b.stage().signalGain());
        if (b.stage().topology() == dev.ampsieve.stage.Topology.TRANSIMPEDANCE) {
            put(o, "signalGainOhms", b.stage().signalGain()); // -Rf: the signal gain named with its unit, V/A
        }
        o.put("criterion", CriterionText.of(b.stage().criterion()));
        ArrayNode terms = o.putArray("terms");
        for (TermResult t : b.terms()) {
            ObjectNode n = terms.addObject();
            n.put("key", t.key());
            n.put("label", t.label());
            n.put("kind", t.kind().key());
            put(n, "outputV", t.outputV());
            // at the signal source: amperes for a transimpedance stage, named so
            put(
                    n,
                    Figures.inputDimension(b.stage()) == dev.ampsieve.units.Dimension.CURRENT ? "inputA" : "inputV",
                    t.inputV());
            put(n, "shareOfLimit", b.limitV() > 0 ? t.outputV() / b.limitV() : Double.NaN);
            put(n, "worstAtC", t.worstAtC());
            n.put("estimated", t.estimated());
            n.put("counted", BudgetCalculator.counts(b.stage(), t.key()));
            if (BudgetCalculator.afterTrimOnly(t.key())) {
                n.put("afterTrimOnly", true); // the trim circuit's own error: in the trimmed totals only
            }
            n.put("note", TermNotes.of(t));
            // the note's facts: the formula's id and each operand in SI units (temperatures in °C)
            n.put("formula", t.working().formula());
            ArrayNode ops = n.putArray("operands");
            for (dev.ampsieve.budget.Operand op : t.working().operands()) {
                ObjectNode on = ops.addObject();
                on.put("name", op.name());
                put(on, "value", op.value());
                on.put("unit", TermNotes.unit(op));
            }
            ArrayNode remarks = n.putArray("remarks");
            t.working()
                    .remarks()
                    .forEach(r -> remarks.add(
                            r.name().toLowerCase(java.util.Locale.ROOT).replace('_', '-')));
        }
        put(o, "worstCaseV", b.worstCaseV());
        put(o, "rssV", b.rssV());
        put(o, "noiseRmsV", b.noiseRmsV());
        put(o, "noisePeakToPeakV", NoiseModel.PEAK_TO_PEAK * b.noiseRmsV());
        put(o, "limitV", b.limitV());
        ObjectNode y = o.putObject("yield");
        put(y, "value", b.yield().value());
        put(y, "low", b.yield().low());
        put(y, "high", b.yield().high());
        y.put("trials", b.yield().trials());
        y.put("decided", b.yield().decided());
        y.put("seed", b.stage().seed());
        ObjectNode tr = o.putObject("trimmed");
        Trim trim = BudgetCalculator.trimOf(b.stage());
        tr.put("method", BudgetText.methodName(trim.method()));
        tr.put("allowed", trim.allowed());
        put(tr, "worstCaseV", b.trimmed().worstCaseV());
        put(tr, "rssV", b.trimmed().rssV());
        if (trim.allowed() && b.trimmed().circuit() != null) {
            TrimCircuitText.json(o, b.trimmed().circuit());
        }
        if (b.trimmed().yield() != null) {
            YieldResult ty = b.trimmed().yield();
            ObjectNode tyn = tr.putObject("yield");
            put(tyn, "value", ty.value());
            put(tyn, "low", ty.low());
            put(tyn, "high", ty.high());
            tyn.put("trials", ty.trials());
            tyn.put("decided", ty.decided());
        }
        MeasuredText.put(o, b);
        o.put("verdict", b.verdict().key());
        if (b.limitingTerm() == null) {
            o.putNull("limitingTerm");
        } else {
            o.put("limitingTerm", b.limitingTerm());
        }
        Uncounted.put(o, b.notCounted());
        ArrayNode cs = o.putArray("constraints");
        for (ConstraintResult c : b.constraints()) {
            ObjectNode n = cs.addObject();
            n.put("name", c.name());
            n.put("ok", c.ok());
            n.put("checked", c.checked());
            n.put("detail", ConstraintText.detail(c));
            constraintFacts(n.putObject("facts"), c.fact());
        }
        AssumptionText.put(o, b);
        o.put("caution", Caution.TEXT);
        return o;
    }

    public static String render(Budget b, String stageLabel) {
        return render(b, java.util.List.of(), stageLabel);
    }

    /** @param bySigma written as {@code yieldBySigma} (left out when empty) */
    public static String render(Budget b, java.util.List<dev.ampsieve.budget.SigmaYield> bySigma, String stageLabel) {
        return render(b, bySigma, stageLabel, null);
    }

    /** @param datasheetYield the part's yield without its measured lot, written as {@code yieldFromDatasheet}; null to leave out */
    public static String render(
            Budget b,
            java.util.List<dev.ampsieve.budget.SigmaYield> bySigma,
            String stageLabel,
            YieldResult datasheetYield) {
        ObjectNode o = tree(b, stageLabel);
        MeasuredText.putDatasheetYield(o, datasheetYield);
        if (!bySigma.isEmpty()) {
            var arr = o.putArray("yieldBySigma");
            for (var y : bySigma) {
                ObjectNode n = arr.addObject();
                put(n, "maxToSigma", y.maxToSigma());
                put(n, "yield", y.yield());
                put(n, "low", y.low());
                put(n, "high", y.high());
                n.put("trials", y.trials());
            }
        }
        try {
            return MAPPER.writeValueAsString(o) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree failed to print", e);
        }
    }

    /** A constraint's facts in SI units (temperatures in °C), each kind with its own fields. */
    private static void constraintFacts(ObjectNode f, ConstraintFact fact) {
        if (fact instanceof ConstraintFact.NotChecked n) {
            f.put(
                    "missing",
                    n.missing().name().toLowerCase(java.util.Locale.ROOT).replace('_', '-'));
        } else if (fact instanceof ConstraintFact.Span sp) {
            f.put("unit", sp.dimension().symbol());
            put(f, "needLow", sp.needLow());
            put(f, "needHigh", sp.needHigh());
            put(f, "partLow", sp.partLow());
            put(f, "partHigh", sp.partHigh());
            put(f, "shortLow", sp.shortLow());
            put(f, "shortHigh", sp.shortHigh());
            ConstraintFact.HeadroomFacts h = sp.headroom();
            if (h != null) {
                put(f, "lowestSupplyV", h.lowestSupply());
                put(f, "headroomLowV", h.fromLow());
                put(f, "headroomHighV", h.fromHigh());
                f.put("headroomAssumed", h.assumed());
                put(f, "dcErrorV", h.dcWiden());
                if (!Double.isNaN(h.commonModeShare())) {
                    put(f, "commonModeShare", h.commonModeShare());
                }
            }
        } else if (fact instanceof ConstraintFact.Slew sl) {
            put(f, "needVPerS", sl.need());
            put(f, "partVPerS", sl.part());
            put(f, "shortVPerS", sl.shortfall());
        } else if (fact instanceof ConstraintFact.Price p) {
            put(f, "ceiling", p.ceiling());
            put(f, "unitPrice", p.unit());
            f.put("currency", p.currency());
            put(f, "over", p.over());
        } else if (fact instanceof ConstraintFact.Die d) {
            put(f, "dieHotC", d.hot());
            put(f, "ambientC", d.ambient());
            put(f, "thetaJaCPerW", d.thetaJa());
            put(f, "powerW", d.powerW());
            put(f, "ratedHighC", d.ratedHigh());
            put(f, "tooHotC", d.tooHot());
        } else if (fact instanceof ConstraintFact.Finite fin) {
            ArrayNode a = f.putArray("overflowed");
            fin.overflowed().forEach(t -> a.add(t.key()));
            ArrayNode tot = f.putArray("totalsOf");
            fin.totalsOf().forEach(tot::add);
        } else if (fact instanceof ConstraintFact.PhaseMargin pm) {
            put(f, "minimumDeg", pm.minimum());
            put(f, "marginDeg", pm.margin());
            put(f, "crossoverHz", pm.crossover());
            put(f, "cfF", pm.cf());
            put(f, "ctF", pm.ct());
            put(f, "inputCF", pm.inputC());
            f.put("inputCAssumed", pm.inputCAssumed());
            cfRange(f, pm.cfRange());
        } else if (fact instanceof ConstraintFact.Bandwidth bw) {
            put(f, "bandHighHz", bw.bandHigh());
            put(f, "bandwidthHz", bw.bandwidth());
            put(f, "cfF", bw.cf());
            cfRange(f, bw.cfRange());
        }
    }

    private static void cfRange(ObjectNode f, ConstraintFact.CfRange r) {
        if (r != null) {
            put(f, "cfLeastF", r.least());
            put(f, "cfMostF", r.most());
            put(f, "graemeCfF", r.graeme());
        }
    }

    private static void put(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }
}
