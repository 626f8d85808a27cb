package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.budget.Assumption;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.catalog.Architecture;
import dev.ampsieve.catalog.CatalogKeys;
import dev.ampsieve.catalog.InputType;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.lang.reflect.RecordComponent;
import java.util.List;
import java.util.Locale;

/**
 * The one place that words a budget's {@link Assumption}s: one sentence each, {@code field: what
 * stood in, and what to enter instead}. Every report (text, JSON, records, the rank's notes) takes
 * its warnings from here.
 */
public final class AssumptionText {
    private AssumptionText() {}

    /** The sentences of a budget's assumptions, in the budget's order. */
    public static List<String> of(Budget b) {
        return b.assumptions().stream().map(AssumptionText::sentence).toList();
    }

    /**
     * Puts a budget's {@code warnings} (the sentences) and {@code assumptions} (the facts: {@code field},
     * {@code rule}, {@code value} for the figure used, and the record's other numbers and flags by name, SI units)
     * on {@code o}.
     */
    static void put(ObjectNode o, Budget b) {
        ArrayNode ws = o.putArray("warnings");
        of(b).forEach(ws::add);
        ArrayNode as = o.putArray("assumptions");
        b.assumptions().forEach(a -> fact(as.addObject(), a));
    }

    /**
     * One fact as JSON. Read from the record's components so that the JSON keeps in step with the
     * records without a second list of their fields.
     */
    private static void fact(ObjectNode n, Assumption a) {
        n.put("field", a.field());
        n.put("rule", key(a.rule()));
        for (RecordComponent c : a.getClass().getRecordComponents()) {
            String name = c.getName();
            if (name.equals("field") || name.equals("rule")) {
                continue;
            }
            Object v;
            try {
                v = c.getAccessor().invoke(a);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException("unreadable component " + name + " of " + a, e);
            }
            String k = name.equals("used") ? "value" : name;
            if (v instanceof Double d) {
                JsonSupport.put(n, k, d);
            } else if (v instanceof Integer i) {
                n.put(k, i);
            } else if (v instanceof Boolean f) {
                n.put(k, f);
            } else if (v instanceof InputType t) {
                n.put(k, t.key());
            } else if (v instanceof Architecture t) {
                n.put(k, t.key());
            } else {
                JsonSupport.put(n, k, v == null ? null : String.valueOf(v));
            }
        }
    }

    /** A rule's name in JSON: lower case, words joined by hyphens. */
    static String key(Assumption.Rule r) {
        return r.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** One assumption as a sentence. */
    public static String sentence(Assumption a) {
        return subject(a) + ": " + body(a);
    }

    /** What the sentence is about: the field, except for caveats that belong to the architecture or a constraint. */
    private static String subject(Assumption a) {
        if (a instanceof Assumption.Chopper c) {
            return c.architecture().key();
        }
        if (a instanceof Assumption.ChoppingNearBand c) {
            return c.architecture().key();
        }
        if (a instanceof Assumption.Headroom h) {
            return h.constraint();
        }
        return a.field();
    }

    private static String body(Assumption a) {
        if (a instanceof Assumption.TypicalAsLimit t) {
            return "no guaranteed maximum; " + number(t.factor()) + " x typical = "
                    + Units.format(t.used(), dimension(t.field()))
                    + " is used as the limit (max-to-sigma), the typical value as one sigma";
        }
        if (a instanceof Assumption.TypicalRejection t) {
            return "no guaranteed minimum; the typical " + Units.format(t.typical(), Dimension.DECIBEL)
                    + " less 20 log10(" + number(t.factor()) + ") = " + Units.format(t.used(), Dimension.DECIBEL, 4)
                    + " is used (k x the typical error)";
        }
        if (a instanceof Assumption.ByInputKind k) {
            return byKind(k);
        }
        if (a instanceof Assumption.DriftFromOffset d) {
            String s = "not given; estimated as vos / T = " + Units.format(d.used(), Dimension.VOLTAGE_DRIFT)
                    + " (bipolar pair rule, T = 298.15 K)";
            return d.input() == InputType.BIPOLAR
                    ? s
                    : s + "; this rule holds for bipolar pairs and may understate a "
                            + d.input().key() + " input's drift: enter the datasheet figure";
        }
        if (a instanceof Assumption.IosFromIb i) {
            return "not given; assumed equal to ib (" + Units.format(i.used(), Dimension.CURRENT) + ")";
        }
        if (a instanceof Assumption.CurrentNoise n) {
            return "not given; estimated as " + Units.format(n.used(), Dimension.CURRENT_DENSITY)
                    + (n.rule() == Assumption.Rule.CURRENT_NOISE_FLOOR
                            ? " (at least 1 pA/√Hz, common practice)"
                            : " (shot noise of ib, √(2 q ib))");
        }
        if (a instanceof Assumption.Aging g) {
            return "not given; estimated as " + Units.format(g.perThousandHours(), Dimension.VOLTAGE)
                    + " per √(1000 h) for a " + kind(g.input(), g.zeroDrift())
                    + " part (common practice, conservative), "
                    + Units.format(g.used(), Dimension.VOLTAGE) + " over the service life";
        }
        if (a instanceof Assumption.Default d) {
            return byDefault(d);
        }
        if (a instanceof Assumption.IbDoubling d) {
            return "no maximum over temperature; the 25 °C maximum is doubled every 10 °C above 25 °C "
                    + "(junction-leakage rule, common practice), " + Units.format(d.used(), Dimension.CURRENT) + " at "
                    + Units.format(d.temperature(), Dimension.TEMPERATURE)
                    + (d.zeroDrift()
                            ? "; pessimistic for a chopper or auto-zero part, whose bias current is mostly charge"
                                    + " injection: enter the datasheet's over-temperature maximum"
                            : "; enter the datasheet's over-temperature maximum");
        }
        if (a instanceof Assumption.TrimBiasResidual r) {
            return "no maximum over temperature; what a trim at 25 °C leaves of the bias currents is estimated"
                    + " from the 25 °C maxima" + (r.doubling() ? " and the doubling rule" : "") + " (ib may change by "
                    + (r.signKnown() ? "up to its larger end" : "the sum of both ends")
                    + ", ios by the sum of both ends as it can change sign): enter the datasheet's over-temperature"
                    + " maxima";
        }
        if (a instanceof Assumption.TestSupply t) {
            return "not given; the datasheet's table is taken at " + Units.format(t.used(), Dimension.VOLTAGE)
                    + ", the end of the rated supply farthest from the stage's "
                    + Units.format(t.stageSupply(), Dimension.VOLTAGE)
                    + " (conservative): enter the supply of the datasheet's 25 °C table";
        }
        if (a instanceof Assumption.TestCommonMode t) {
            return "not given; the datasheet's table is taken at the " + (t.used() == 0 ? "negative" : "positive")
                    + " rail of its supply, the farthest from the stage's common mode"
                    + " (conservative): enter the common mode of the datasheet's 25 °C table";
        }
        if (a instanceof Assumption.Crossover x) {
            return "not given for a rail-to-rail input; the stage's common mode reaches "
                    + Units.format(x.nearest(), Dimension.VOLTAGE) + " to "
                    + Units.format(x.farthest(), Dimension.VOLTAGE)
                    + " below the positive rail, where such inputs usually hand over between their pairs, so a step of"
                    + " 2 x vos = " + Units.format(x.step(), Dimension.VOLTAGE) + " is assumed (conservative):"
                    + " enter the datasheet's crossover and offset step, or 0 V for an input without one";
        }
        if (a instanceof Assumption.NoiseBand n) {
            return "not given; noise is integrated to pi/2 x the closed-loop bandwidth "
                    + Units.format(n.loopBandwidth(), Dimension.FREQUENCY) + " = "
                    + Units.format(n.noiseBand(), Dimension.FREQUENCY)
                    + ", as if nothing after the amplifier limited it (a first-order filter at band.high would end it at "
                    + Units.format(n.filteredBand(), Dimension.FREQUENCY) + "); give the filter's order if one follows";
        }
        if (a instanceof Assumption.CalibrationPoints c) {
            return "two-temperature calibration at " + Units.format(c.cold(), Dimension.TEMPERATURE) + " and "
                    + Units.format(c.hot(), Dimension.TEMPERATURE)
                    + (!c.coldGiven() && !c.hotGiven()
                            ? ", the range ends (trim.cold and trim.hot not given)"
                            : " (a calibration temperature not given is the range end)");
        }
        if (a instanceof Assumption.ChoppingNearBand c) {
            return "band edge " + Units.format(c.bandEdge(), Dimension.FREQUENCY)
                    + (c.bandEdge() >= c.choppingFrequency()
                            ? " is above the chopping frequency "
                            : " is not far below the chopping frequency ")
                    + Units.format(c.choppingFrequency(), Dimension.FREQUENCY)
                    + " (keep fH under a tenth of it): expect ripple and intermodulation in band";
        }
        if (a instanceof Assumption.ChoppingAlias c) {
            return (c.harmonic() == 1
                            ? "the chopping frequency "
                            : "harmonic " + c.harmonic() + " of the chopping frequency, ")
                    + Units.format(c.frequency(), Dimension.FREQUENCY) + ", sampled at "
                    + Units.format(c.sampleRate(), Dimension.FREQUENCY) + " aliases to "
                    + Units.format(c.alias(), Dimension.FREQUENCY) + ", inside the band (up to "
                    + Units.format(c.bandEdge(), Dimension.FREQUENCY)
                    + "): filter it out before the converter, or choose a sample rate whose multiples keep away from it";
        }
        if (a instanceof Assumption.SlewNotChecked s) {
            return "not given; slew rate not checked (needs " + Units.format(s.needed(), Dimension.SLEW_RATE) + ")";
        }
        if (a instanceof Assumption.Headroom h) {
            return "the part gives no "
                    + (h.field().equals(CatalogKeys.OUTPUT_HEADROOM) ? "output" : "input common mode")
                    + " headroom; "
                    + Units.format(h.used(), Dimension.VOLTAGE) + " from each rail is assumed";
        }
        if (a instanceof Assumption.MeasuredFit m) {
            return Double.isNaN(m.pValue())
                    ? "measured lot of " + m.units() + " units" + at(m.temperature())
                            + ": too few units (or all equal) to test the normal fit; the fit is used untested"
                            + " (units that all read the same give no spread: the datasheet's is used)"
                    : "measured lot" + at(m.temperature()) + ": the normal fit is poor (Anderson-Darling p = "
                            + Units.format(m.pValue(), Dimension.NUMBER, 2)
                            + " < 0.05): the lot may be skewed or hold two populations; the fitted sigma may misstate"
                            + " its tails";
        }
        if (a instanceof Assumption.MeasuredBeyondDatasheet m) {
            Dimension d = dimension(m.field());
            return m.beyond() + " of " + m.units() + " measured units" + at(m.temperature())
                    + " exceed the datasheet's " + Units.format(m.datasheet(), d) + " (largest "
                    + Units.format(m.largest(), d) + ")"
                    + (m.field().equals("vos")
                            ? ": the Monte Carlo draws the offset from the lot without the datasheet's bound; check the"
                                    + " test circuit's own error ('ampsieve offset-rig') and the units"
                            : ": check the test circuit and the units");
        }
        if (a instanceof Assumption.Chopper c) {
            return c.rule() == Assumption.Rule.CHOPPER_CAVEATS
                    ? "expect bias-current spikes from the switches (times the source resistance they become offset),"
                            + " higher current noise than plain CMOS, and ripple near the chopping frequency"
                    : "chopping frequency not given; ripple cannot be checked against the band";
        }
        return note(a);
    }

    private static String note(Assumption a) {
        return switch (a.rule()) {
            case OVER_TEMPERATURE_AT_25 -> "only the maximum over temperature is given; it is used at 25 °C too";
            case OFFSET_NOT_COUNTED -> "not given; offset is not counted (enter the datasheet maximum)";
            case BANDWIDTH_NOT_COUNTED ->
                "not given; the bandwidth term is not counted and noise is integrated to" + " 1.57 x fH";
            case STRAIGHT_LINE_CALIBRATION ->
                "a two-temperature calibration removes the offset's straight-line drift"
                        + " only; the offset's curvature over temperature is in no datasheet and not counted: confirm the"
                        + " residual on a few units at a temperature between the calibration points";
            case AC_COUPLED -> "offset, drift, bias and aging count only toward output headroom, not the error";
            case LIMIT_NEEDS_FULL_SCALE ->
                "a percentage of full scale needs full-scale-output; nothing can fit without" + " a limit";
            case GAIN_TERMS_NOT_COUNTED ->
                "not given; gain errors (open-loop gain, bandwidth, resistors) are not" + " counted";
            case NOT_CHECKED ->
                switch (a.field()) {
                    case "supply" -> "the part has no supply range; not checked";
                    case "temperature" -> "the part has no rated range; not checked";
                    case "price" -> "not given; the price ceiling is not checked";
                    default -> "not given; not checked";
                };
            default -> "assumed (" + key(a.rule()) + ")";
        };
    }

    private static String byKind(Assumption.ByInputKind k) {
        String kind = kind(k.input(), k.zeroDrift());
        return switch (k.field()) {
            case "ib" ->
                "not given; estimated as " + Units.format(k.value(), Dimension.CURRENT) + " at 25 °C for a " + kind
                        + " input (common practice, conservative): enter the datasheet maximum";
            case "noise.en" ->
                "not given; estimated as " + Units.format(k.value(), Dimension.VOLTAGE_DENSITY) + " for a " + kind
                        + " input (common practice, conservative): enter the datasheet figure";
            default ->
                "not given; a 1/f corner of " + Units.format(k.value(), Dimension.FREQUENCY) + " is assumed for a "
                        + kind + " input (common practice, conservative)";
        };
    }

    private static String byDefault(Assumption.Default d) {
        if (d.rule() == Assumption.Rule.PESSIMISTIC_REJECTION) {
            return "not given; a pessimistic " + Units.format(d.used(), Dimension.DECIBEL) + " is assumed";
        }
        return switch (d.field()) {
            case "input-capacitance" ->
                "not given; " + Units.format(d.used(), Dimension.CAPACITANCE)
                        + " is assumed (common practice, conservative): it adds to the source capacitance in the noise"
                        + " gain and the stability check; enter the datasheet's common-mode plus differential figure";
            case "theta-ja" ->
                "not given; " + Units.format(d.used(), Dimension.THERMAL_RESISTANCE)
                        + " is assumed for the die's self-heating (a small package on a small board, common practice,"
                        + " conservative): enter the package's figure";
            case "quiescent-current" ->
                "not given; " + Units.format(d.used(), Dimension.CURRENT)
                        + " per amplifier is assumed for the die's self-heating (common practice, conservative)";
            case "chopping-ripple" ->
                "not given; " + Units.format(d.used(), Dimension.VOLTAGE)
                        + " input-referred is assumed (common practice, conservative): enter the datasheet's ripple";
            default -> "not given; " + number(d.used()) + " is assumed";
        };
    }

    /** The unit of a typical-only figure by its field. */
    private static Dimension dimension(String field) {
        return switch (field) {
            case "vos" -> Dimension.VOLTAGE;
            case "vos-drift" -> Dimension.VOLTAGE_DRIFT;
            default -> Dimension.CURRENT;
        };
    }

    /** " at 85 °C" for a second temperature, nothing at 25 °C. */
    private static String at(double temperature) {
        return temperature == 25.0 ? "" : " at " + Units.format(temperature, Dimension.TEMPERATURE);
    }

    private static String number(double x) {
        return Units.format(x, Dimension.NUMBER);
    }

    private static String kind(InputType input, boolean zeroDrift) {
        return zeroDrift ? "zero-drift (" + input.key() + ")" : input.key();
    }
}
