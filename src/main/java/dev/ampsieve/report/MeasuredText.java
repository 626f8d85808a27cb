package dev.ampsieve.report;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.ampsieve.budget.Budget;
import dev.ampsieve.budget.Measurement;
import dev.ampsieve.budget.YieldResult;
import dev.ampsieve.text.Visible;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The words and JSON of a budget's measured lot ({@link Measurement}): the fitted figures beside the datasheet's. */
final class MeasuredText {
    private MeasuredText() {}

    /**
     * The lines of the text budget's "Measured" block; empty without a lot.
     *
     * @param datasheetYield the yield of the same part from its datasheet alone, or null
     */
    static List<String> lines(Budget b, YieldResult datasheetYield) {
        List<Measurement> ms = b.measured();
        if (ms.isEmpty()) {
            return List.of();
        }
        Measurement vos = ms.get(0);
        List<String> out = new ArrayList<>();
        out.add(String.format(
                "%-10s from %d measured units (%s), normal fit, σ with its 95 %% interval (chi-square)",
                "Measured", vos.units(), Visible.of(shown(vos.file()))));
        TextTable t = new TextTable()
                .left("quantity")
                .left("at")
                .right("mean")
                .right("σ")
                .right("σ 95 % interval")
                .right("fit p")
                .right("datasheet max")
                .right("beyond");
        for (Measurement m : ms) {
            Dimension d = dimension(m.field());
            t.row(
                    m.field(),
                    m.field().equals("vos-drift")
                            ? "25.." + Units.format(m.temperature(), Dimension.TEMPERATURE)
                            : Units.format(m.temperature(), Dimension.TEMPERATURE),
                    Units.format(m.mean(), d),
                    Units.format(m.sigma(), d),
                    Units.format(m.sigmaLow(), d) + " .. " + Units.format(m.sigmaHigh(), d),
                    Double.isNaN(m.pValue()) ? "untested" : Units.format(m.pValue(), Dimension.NUMBER, 2),
                    Double.isNaN(m.datasheet()) ? "-" : Units.format(m.datasheet(), d),
                    m.beyond() + " of " + m.units());
        }
        for (String row : t.lines(TextTable.WIDTH - 2)) {
            out.add("  " + row);
        }
        Dimension v = Dimension.VOLTAGE;
        out.add(String.format(
                "%-10s the Monte Carlo draws each unit's offset from N(%s, %s): the lot's mean and the upper end of"
                        + " σ's interval, so a small lot never flatters (the datasheet alone gives σ = %s)%s. The"
                        + " bias currents and the second temperature are compared with the datasheet only. A lot"
                        + " speaks for parts to come only while they come from the same process: re-measure a"
                        + " sample of each new lot.",
                "",
                Units.format(vos.mean(), v),
                Units.format(vos.sigmaHigh(), v),
                Double.isNaN(vos.datasheetSigma()) ? "nothing" : Units.format(vos.datasheetSigma(), v),
                vos.beyond() > 0
                        ? "; drawn without the datasheet's bound, since units lie beyond it"
                        : "; drawn within ± the datasheet maximum, which every unit met"));
        if (datasheetYield != null) {
            out.add(String.format(
                    "%-10s yield %s with the lot, %s from the datasheet alone (95 %% interval %s to %s)",
                    "",
                    BudgetText.pct(b.yield().value()),
                    BudgetText.pct(datasheetYield.value()),
                    BudgetText.pct(datasheetYield.low()),
                    BudgetText.pct(datasheetYield.high())));
        }
        return out;
    }

    /** {@code measured}: one object per fitted quantity; absent without a lot. */
    static void put(ObjectNode o, Budget b) {
        List<Measurement> ms = b.measured();
        if (ms.isEmpty()) {
            return;
        }
        ArrayNode arr = o.putArray("measured");
        for (Measurement m : ms) {
            ObjectNode n = arr.addObject();
            n.put("field", m.field());
            JsonSupport.put(n, "temperatureC", m.temperature());
            n.put("units", m.units());
            JsonSupport.put(n, "mean", m.mean());
            JsonSupport.put(n, "sigma", m.sigma());
            JsonSupport.put(n, "sigmaLow", m.sigmaLow());
            JsonSupport.put(n, "sigmaHigh", m.sigmaHigh());
            n.put("fitTest", m.fitTest());
            JsonSupport.put(n, "pValue", m.pValue());
            JsonSupport.put(n, "datasheetMax", m.datasheet());
            n.put("beyondDatasheet", m.beyond());
            JsonSupport.put(n, "largest", m.largest());
            n.put("usedInYield", m.usedInYield());
            JsonSupport.put(n, "datasheetSigma", m.datasheetSigma());
            JsonSupport.put(n, "file", m.file().toString());
        }
    }

    /** {@code yieldFromDatasheet}: the same part's yield without its lot. */
    static void putDatasheetYield(ObjectNode o, YieldResult datasheetYield) {
        if (datasheetYield != null) {
            ObjectNode y = o.putObject("yieldFromDatasheet");
            JsonSupport.put(y, "value", datasheetYield.value());
            JsonSupport.put(y, "low", datasheetYield.low());
            JsonSupport.put(y, "high", datasheetYield.high());
            y.put("trials", datasheetYield.trials());
            y.put("decided", datasheetYield.decided());
        }
    }

    /** The file as the user would type it from here: relative to the working folder when it lies below it. */
    private static String shown(Path file) {
        Path here = Path.of("").toAbsolutePath();
        Path f = file.toAbsolutePath().normalize();
        return f.startsWith(here) ? here.relativize(f).toString() : file.toString();
    }

    private static Dimension dimension(String field) {
        return switch (field) {
            case "vos" -> Dimension.VOLTAGE;
            case "vos-drift" -> Dimension.VOLTAGE_DRIFT;
            default -> Dimension.CURRENT;
        };
    }
}
