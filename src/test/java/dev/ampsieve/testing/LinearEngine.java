package dev.ampsieve.testing;

import dev.ampsieve.advice.BudgetFunction;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintKind;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.budget.TermResult;
import dev.ampsieve.budget.Trimmed;
import dev.ampsieve.budget.Verdict;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.stage.Criterion;
import dev.ampsieve.stage.Stage;
import dev.ampsieve.stage.Trim;
import dev.ampsieve.units.Dimension;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * A deliberately small error model for advice tests, so every "what would make it fit"
 * number can be worked by hand. Not the tool's engine. Terms, output volts:
 * offset = NG * vos.max; drift = NG * drift.max * dT; bias = NG * ib.max * R+;
 * resistors = VFS * (NG-1)/NG * tolR. A one-point trim removes offset and adds the trim
 * resolution; a two-point trim also removes resistors. Counts its calls.
 */
public final class LinearEngine implements BudgetFunction {
    public int calls;

    @Override
    public Budget compute(Stage s, Part p) {
        calls++;
        double ng = s.noiseGain();
        List<TermResult> terms = new ArrayList<>();
        double offset = ng * abs(p.vos().max());
        double drift = ng * abs(p.vosDrift().max()) * s.deltaT();
        double bias = ng * abs(p.ib().max()) * s.rPlus();
        double vfs = s.fullScaleOutput() == null ? 0 : s.fullScaleOutput();
        double resistors = vfs * (ng - 1) / ng * s.ratioTolerance();
        terms.add(term("offset", "initial offset", offset, ng));
        terms.add(term("drift", "offset drift", drift, ng));
        terms.add(term("bias", "bias current", bias, ng));
        terms.add(term("resistors", "resistor ratio", resistors, ng));
        terms.sort(Comparator.comparingDouble(TermResult::outputV).reversed());
        double wc = offset + drift + bias + resistors;
        double rss = Math.sqrt(offset * offset + drift * drift + bias * bias + resistors * resistors);
        double tWc = wc - offset + s.trim().resolution();
        double tRss = Math.sqrt(drift * drift
                + bias * bias
                + resistors * resistors
                + s.trim().resolution() * s.trim().resolution());
        if (s.trim().method() == Trim.Method.TWO_POINT) {
            tWc -= resistors;
            tRss = Math.sqrt(Math.max(0, tRss * tRss - resistors * resistors));
        }
        double e = s.limitVolts();
        boolean rssCrit = s.criterion().kind() == Criterion.Kind.RSS;
        double total = rssCrit ? rss : wc;
        double tTotal = rssCrit ? tRss : tWc;
        Verdict v = total <= e
                ? Verdict.FITS
                : s.trim().allowed() && tTotal <= e ? Verdict.FITS_AFTER_TRIM : Verdict.NO_FIT;
        List<ConstraintResult> constraints = new ArrayList<>();
        constraints.add(new ConstraintResult(
                ConstraintKind.TEMPERATURE,
                p.temperature().contains(s.tMin(), s.tMax()),
                ConstraintFact.Span.of(s.tMin(), s.tMax(), p.temperature(), Dimension.TEMPERATURE, null)));
        if (s.supplyVoltage() != null) {
            constraints.add(new ConstraintResult(
                    ConstraintKind.SUPPLY,
                    p.supply().contains(s.supplyVoltage(), s.supplyVoltage()),
                    ConstraintFact.Span.of(s.supplyVoltage(), s.supplyVoltage(), p.supply(), Dimension.VOLTAGE, null)));
        }
        if (s.maxPrice() != null && p.price() != null) {
            boolean ok = p.price().unit() <= s.maxPrice();
            constraints.add(new ConstraintResult(
                    ConstraintKind.PRICE,
                    ok,
                    new ConstraintFact.Price(
                            s.maxPrice(),
                            p.price().unit(),
                            p.price().currency(),
                            ok ? 0 : p.price().unit() - s.maxPrice())));
        }
        YieldResult y = new YieldResult(
                wc <= e ? 1 : 0, wc <= e ? 1 : 0, wc <= e ? 1 : 0, 0, wc <= e ? "all-pass" : "none-pass");
        return new Budget(
                p,
                s,
                ng,
                terms,
                wc,
                rss,
                0,
                e,
                y,
                new Trimmed(tWc, tRss),
                v,
                terms.get(0).key(),
                constraints,
                List.of());
    }

    private static double abs(Double v) {
        return v == null ? 0 : Math.abs(v);
    }

    private static TermResult term(String key, String label, double v, double ng) {
        return new TermResult(
                key, label, v, v / ng, Double.NaN, false, dev.ampsieve.budget.TermWorking.plain("linear-test-model"));
    }
}
