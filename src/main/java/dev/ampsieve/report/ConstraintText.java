package dev.ampsieve.report;

import dev.ampsieve.budget.ConstraintFact;
import dev.ampsieve.budget.ConstraintResult;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/** Words for a hard constraint's facts: what is needed, what the part offers, by how much it misses. */
public final class ConstraintText {
    private ConstraintText() {}

    /** The constraint's one-line detail. */
    public static String detail(ConstraintResult c) {
        ConstraintFact f = c.fact();
        if (f instanceof ConstraintFact.NotChecked n) {
            return "not checked: " + missing(n.missing());
        }
        if (f instanceof ConstraintFact.NoCeiling) {
            return "no price ceiling";
        }
        if (f instanceof ConstraintFact.Span sp) {
            return span(c, sp);
        }
        if (f instanceof ConstraintFact.Slew sl) {
            return "needs " + Units.format(sl.need(), Dimension.SLEW_RATE) + " (2π fH VFS); part "
                    + Units.format(sl.part(), Dimension.SLEW_RATE)
                    + (c.ok() ? "" : "; short by " + Units.format(sl.shortfall(), Dimension.SLEW_RATE));
        }
        if (f instanceof ConstraintFact.Price p) {
            return String.format(
                            Locale.ROOT,
                            "ceiling %.2f %s; part %.2f %s",
                            p.ceiling(),
                            p.currency(),
                            p.unit(),
                            p.currency())
                    + (c.ok() ? "" : String.format(Locale.ROOT, "; over by %.2f %s", p.over(), p.currency()));
        }
        if (f instanceof ConstraintFact.Die d) {
            return "die up to " + Units.format(d.hot(), Dimension.TEMPERATURE) + " (ambient "
                    + Units.format(d.ambient(), Dimension.TEMPERATURE) + " + "
                    + Units.format(d.thetaJa(), Dimension.THERMAL_RESISTANCE)
                    + " x " + Units.format(d.powerW() * 1e3, Dimension.NUMBER) + " mW), rated to "
                    + Units.format(d.ratedHigh(), Dimension.TEMPERATURE)
                    + (c.ok() ? "" : ": " + Units.format(d.tooHot(), Dimension.NUMBER) + " °C too hot");
        }
        if (f instanceof ConstraintFact.Finite fin) {
            return finite(c, fin);
        }
        if (f instanceof ConstraintFact.PhaseMargin pm) {
            return phaseMargin(pm);
        }
        ConstraintFact.Bandwidth bw = (ConstraintFact.Bandwidth) f;
        return "needs a -3 dB signal bandwidth of at least band.high "
                + Units.format(bw.bandHigh(), Dimension.FREQUENCY) + "; part "
                + Units.format(bw.bandwidth(), Dimension.FREQUENCY) + " with " + cf(bw.cf())
                + cfRange(bw.cfRange());
    }

    /** Each failed constraint as "name: detail", joined by "; ". */
    public static String reason(List<ConstraintResult> failed) {
        return failed.stream().map(c -> c.name() + ": " + detail(c)).collect(Collectors.joining("; "));
    }

    /** The first failed constraint in full, the others by name: one line for a table. */
    public static String shortReason(List<ConstraintResult> failed) {
        if (failed.size() <= 1) {
            return reason(failed);
        }
        return failed.get(0).name() + ": " + detail(failed.get(0)) + "; also "
                + failed.subList(1, failed.size()).stream()
                        .map(ConstraintResult::name)
                        .collect(Collectors.joining(", "));
    }

    private static String missing(ConstraintFact.Missing m) {
        return switch (m) {
            case STAGE_SUPPLY -> "the stage gives no supply voltage";
            case STAGE_SUPPLY_OR_FULL_SCALE -> "the stage gives no supply voltage or full-scale output";
            case STAGE_FULL_SCALE -> "the stage gives no full-scale output";
            case CATALOG_SUPPLY -> "no supply range in the catalog";
            case CATALOG_TEMPERATURE -> "no rated range in the catalog";
            case CATALOG_SLEW -> "no slew rate in the catalog";
            case CATALOG_PRICE -> "no price in the catalog";
            case CATALOG_GBW -> "no GBW in the catalog";
        };
    }

    private static String span(ConstraintResult c, ConstraintFact.Span sp) {
        Dimension d = sp.dimension();
        ConstraintFact.HeadroomFacts h = sp.headroom();
        String needWhat = switch (c.kind()) {
            case SUPPLY -> "supply";
            case TEMPERATURE -> "ambient";
            case COMMON_MODE -> "input common mode";
            default -> "output";
        };
        StringBuilder sb = new StringBuilder();
        sb.append("needs ").append(needWhat).append(' ').append(Units.format(sp.needLow(), d));
        if (sp.needHigh() != sp.needLow()) {
            sb.append(" to ").append(Units.format(sp.needHigh(), d));
        }
        if (h == null) {
            sb.append("; part rated ");
        } else {
            sb.append("; part reachable ");
        }
        if (h != null && sp.unreachable()) {
            // "reachable 3.00 V to 1.75 V" reads as a typo: say why there is no range at all
            sb.append("nowhere on a ")
                    .append(Units.format(h.lowestSupply(), Dimension.VOLTAGE))
                    .append(" supply (headroom ")
                    .append(Units.format(h.fromLow(), Dimension.VOLTAGE))
                    .append(" from the low rail plus ")
                    .append(Units.format(h.fromHigh(), Dimension.VOLTAGE))
                    .append(" from the high rail)");
        } else {
            sb.append(Units.format(sp.partLow(), d)).append(" to ").append(Units.format(sp.partHigh(), d));
        }
        if (sp.shortLow() > 0) {
            sb.append("; short by ").append(Units.format(sp.shortLow(), d)).append(" at the low end");
        }
        if (sp.shortHigh() > 0) {
            sb.append("; short by ").append(Units.format(sp.shortHigh(), d)).append(" at the high end");
        }
        if (h != null) {
            if (h.assumed()) {
                sb.append(" (headroom assumed, not in the catalog)");
            }
            if (h.dcWiden() > 0) {
                sb.append(" (includes ")
                        .append(Units.format(h.dcWiden(), Dimension.VOLTAGE))
                        .append(" of DC error an AC-coupled stage still carries)");
            }
            if (!Double.isNaN(h.commonModeShare())) {
                sb.append(" (at the pins: the source's common mode x ")
                        .append(Units.format(h.commonModeShare(), Dimension.NUMBER, 4))
                        .append(" about mid-supply, the reference taken at mid-supply)");
            }
        }
        return sb.toString();
    }

    private static String finite(ConstraintResult c, ConstraintFact.Finite f) {
        if (c.ok()) {
            return "every figure is a finite number";
        }
        String bad = f.overflowed().isEmpty()
                ? "the totals of " + f.totalsOf()
                : f.overflowed().stream()
                        .map(t -> t.label() + " (" + TermNotes.factsOrFormula(t) + ")")
                        .collect(Collectors.joining("; "));
        return "too large to compute: " + bad + "; check these catalog and stage values for a wrong prefix or exponent";
    }

    private static String cf(double cf) {
        return "cf " + Units.format(cf, Dimension.CAPACITANCE);
    }

    private static String phaseMargin(ConstraintFact.PhaseMargin pm) {
        String ct = "Ct " + Units.format(pm.ct(), Dimension.CAPACITANCE) + " (source "
                + Units.format(pm.ct() - pm.inputC(), Dimension.CAPACITANCE) + " + input "
                + Units.format(pm.inputC(), Dimension.CAPACITANCE)
                + (pm.inputCAssumed() ? ", assumed" : "") + ")";
        return "needs a phase margin of at least " + Units.format(pm.minimum(), Dimension.NUMBER)
                + "° (common practice); "
                + (Double.isNaN(pm.margin())
                        ? "the loop gain never reaches 1"
                        : "part " + Units.format(pm.margin(), Dimension.NUMBER, 3) + "° at the loop crossover "
                                + Units.format(pm.crossover(), Dimension.FREQUENCY))
                + " with " + cf(pm.cf()) + ", " + ct + cfRange(pm.cfRange());
    }

    /** A failure's advice on the feedback capacitor; empty when met. */
    private static String cfRange(ConstraintFact.CfRange r) {
        if (r == null) {
            return "";
        }
        String graeme = "Graeme's estimate sqrt(Ct/(2π rf GBW)) = " + Units.format(r.graeme(), Dimension.CAPACITANCE);
        if (r.none()) {
            return "; no cf gives both " + Units.format(r.minPhaseMargin(), Dimension.NUMBER)
                    + "° and a -3 dB bandwidth of "
                    + Units.format(r.bandHigh(), Dimension.FREQUENCY)
                    + ": the part's GBW is too low for this rf and source capacitance"
                    + (Double.isNaN(r.least())
                            ? ""
                            : " (cf " + Units.format(r.least(), Dimension.CAPACITANCE) + " gives "
                                    + Units.format(r.minPhaseMargin(), Dimension.NUMBER) + "° and "
                                    + Units.format(r.leastBandwidth(), Dimension.FREQUENCY) + "; " + graeme
                                    + ")");
        }
        return "; cf from " + Units.format(r.least(), Dimension.CAPACITANCE) + " to "
                + Units.format(r.most(), Dimension.CAPACITANCE) + " gives both (" + graeme + ")";
    }
}
