package dev.ampsieve.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.rig.OffsetRig;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The words and JSON of an {@link OffsetRig}: the offset test circuit sized for a part and a meter. */
public final class RigText {
    private RigText() {}

    /** The rig as text, folded at {@code width}. */
    public static String text(String partId, OffsetRig r, int width) {
        List<String> o = new ArrayList<>();
        o.add("Offset rig for " + Visible.of(partId) + ": vos ≤ " + v(r.vosMax()) + ", ib ≤ " + a(r.ibMax())
                + ", ios ≤ " + a(r.iosMax()) + ", open-loop gain ≥ "
                + Units.format(20 * Math.log10(r.aolMin()), Dimension.DECIBEL) + ", at 25 °C");
        o.add("Meter      range " + v(r.meterRange()) + ", one count " + v(r.meterResolution()));
        o.add("");
        o.add("Circuit    the part as a non-inverting amplifier of its own offset (common practice):");
        o.add("  R1  " + ohm(r.r1()) + "  from the - input to ground");
        o.add("  R2  " + ohm(r.r2()) + "  from the output to the - input");
        o.add("  Rp  " + ohm(r.rp()) + "  from the + input to ground");
        o.add("           all E96 (IEC 60063), tolerance " + Units.format(r.tolerance(), Dimension.RATIO)
                + "; Rp is the"
                + " nearest to R1 || R2 = " + ohm(r.r1() * r.r2() / (r.r1() + r.r2()))
                + ", so both inputs see the same resistance and the bias currents leave only their difference");
        o.add("           gain 1 + R2/R1 = " + Units.format(r.gain(), Dimension.NUMBER, 6) + ", set by "
                + switch (r.limitedBy()) {
                    case METER_RANGE ->
                        "the meter's range (the worst offset reads at most half of it, so a unit at"
                                + " twice the datasheet maximum is still read)";
                    case OPEN_LOOP_GAIN -> "the part's open-loop gain (G / AOL at most 0.1 %)";
                    case MAX_GAIN -> "the largest gain used (10,000)";
                });
        o.add("Reading    vos = Vout / " + Units.format(r.gain(), Dimension.NUMBER, 6) + "; a unit at the datasheet"
                + " maximum with the worst bias error reads " + v(r.fullReading()) + " ("
                + Units.format(r.fullReading() / r.meterRange(), Dimension.RATIO) + " of the range); one count is "
                + v(r.inputResolution()) + " at the input ("
                + Units.format(r.inputResolution() / r.vosMax(), Dimension.RATIO) + " of the offset limit)");
        o.add("Rig error  at the input, worst case: gain " + v(r.gainError()) + " (resistor ratio and the loop), bias "
                + v(r.biasError()) + " (IOS x R1||R2 and IB x the Rp mismatch), resolution " + v(r.inputResolution())
                + "; total " + v(r.totalError()) + " ("
                + Units.format(r.totalError() / r.vosMax(), Dimension.RATIO) + " of the offset limit)");
        o.add("           not counted: the meter's own accuracy, and the thermal EMFs of the fixture's junctions"
                + " (they add directly at the input: keep the input wiring of one metal and the rig isothermal)");
        if (!r.fitsRange()) {
            o.add("Warning    the worst reading exceeds the meter's range: use a larger range");
        }
        if (!r.resolves()) {
            o.add("Warning    one count is more than 1 % of the offset limit: use a finer meter resolution");
        }
        if (!r.estimated().isEmpty()) {
            o.add("Warning    " + String.join(", ", r.estimated())
                    + ": estimated or typical-only (ampsieve budget names the rule); the rig is sized on that figure");
        }
        o.add("");
        o.add("Record each unit as a line of a lot file (README \"Measured units\") and give it to the part as"
                + " 'measured: {file: ...}' or to 'ampsieve budget --measured'.");
        return Wrap.prose(Visible.lines(String.join("\n", o) + "\n"), width);
    }

    /** The rig as JSON (keys in README). */
    public static String json(String partId, OffsetRig r) {
        ObjectNode o = JsonSupport.MAPPER.createObjectNode();
        o.put("part", partId);
        JsonSupport.put(o, "vosMaxV", r.vosMax());
        JsonSupport.put(o, "ibMaxA", r.ibMax());
        JsonSupport.put(o, "iosMaxA", r.iosMax());
        JsonSupport.put(o, "aolMin", r.aolMin());
        JsonSupport.put(o, "meterRangeV", r.meterRange());
        JsonSupport.put(o, "meterResolutionV", r.meterResolution());
        JsonSupport.put(o, "tolerance", r.tolerance());
        JsonSupport.put(o, "r1Ohm", r.r1());
        JsonSupport.put(o, "r2Ohm", r.r2());
        JsonSupport.put(o, "rpOhm", r.rp());
        JsonSupport.put(o, "gain", r.gain());
        o.put("gainLimitedBy", r.limitedBy().name().toLowerCase(Locale.ROOT).replace('_', '-'));
        JsonSupport.put(o, "fullReadingV", r.fullReading());
        JsonSupport.put(o, "inputResolutionV", r.inputResolution());
        JsonSupport.put(o, "gainErrorV", r.gainError());
        JsonSupport.put(o, "biasErrorV", r.biasError());
        JsonSupport.put(o, "totalErrorV", r.totalError());
        o.put("fitsRange", r.fitsRange());
        o.put("resolves", r.resolves());
        var est = o.putArray("estimated");
        r.estimated().forEach(est::add);
        try {
            return JsonSupport.MAPPER.writeValueAsString(o) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree failed to print", e);
        }
    }

    private static String v(double x) {
        return Units.format(x, Dimension.VOLTAGE);
    }

    private static String a(double x) {
        return Units.format(x, Dimension.CURRENT);
    }

    private static String ohm(double x) {
        return Units.format(x, Dimension.RESISTANCE);
    }
}
