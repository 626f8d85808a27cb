package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.Caution;
import dev.ampsieve.report.Glyphs;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.units.Dimension;
import dev.ampsieve.units.Units;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** bars and scatter on the demo catalog: the figures they draw are the ones budget and rank report. */
class ChartCommandsTest {

    @TempDir
    static Path tmp;

    static Path catalog;

    @BeforeAll
    static void copyDemo() throws IOException {
        catalog = DemoCatalog.copyTo(tmp);
    }

    static CliRun run(String... args) {
        List<String> a = new ArrayList<>(List.of("--catalog", catalog.toString()));
        a.addAll(List.of(args));
        return CliRun.of(a.toArray(String[]::new));
    }

    static String stage(String name) {
        return catalog.resolve("stages").resolve(name + ".yaml").toString();
    }

    static String volts(JsonNode n) {
        return Glyphs.ascii(Units.format(n.asDouble(), Dimension.VOLTAGE));
    }

    @Test
    void barsDrawTheBudgetsOwnFigures() throws IOException {
        JsonNode b = new ObjectMapper()
                .readTree(run("budget", "zd-chop-01", "--stage", stage("bridge-amp"), "--json")
                        .out());
        // --ascii: the same output whatever charset the test JVM's stdout has
        CliRun r = run("--ascii", "bars", "zd-chop-01", "--stage", stage("bridge-amp"));
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        double limit = b.get("limitV").asDouble();
        for (JsonNode t : b.get("terms")) {
            double v = t.get("outputV").asDouble();
            String share = String.format(Locale.ROOT, "%.0f %%", 100 * v / limit);
            // each term's row ends with its value and share of the limit, as budget computed them
            assertTrue(
                    r.outLines().stream()
                            .anyMatch(l -> l.matches(".*\\s"
                                    + java.util.regex.Pattern.quote(Glyphs.ascii(Units.format(v, Dimension.VOLTAGE)))
                                    + "\\s+" + share)),
                    t + "\n" + r);
        }
        assertTrue(
                r.outLines().stream()
                        .anyMatch(l -> l.startsWith("worst-case sum") && l.contains(volts(b.get("worstCaseV")))),
                r.out());
        assertTrue(
                r.outLines().stream()
                        .anyMatch(l -> l.startsWith("root-sum-square") && l.contains(volts(b.get("rssV")))),
                r.out());
        assertTrue(r.out().contains("limit " + volts(b.get("limitV"))), r.out());
        assertTrue(r.out().contains("Verdict " + b.get("verdict").asText()), r.out());
        assertTrue(dev.ampsieve.testing.Flat.of(r.out()).contains(Caution.TEXT), r.out());
        r.outLines().stream().filter(l -> l.contains("|")).forEach(l -> assertTrue(l.length() <= 80, l));
    }

    @Test
    void asciiBarsAreAsciiThroughout() {
        CliRun r = run("--ascii", "bars", "prec-bip-02", "--stage", stage("bridge-amp"));
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertTrue(r.out().chars().allMatch(c -> c < 128), r.out());
        // prec-bip-02's worst case on the bridge is above its 6 mV limit, so the worst case is the full scale and the
        // limit's mark falls inside the bars, with room for its label on the right
        assertTrue(r.out().contains("^ limit 6.00 mV"), r.out());
    }

    @Test
    void scatterLettersFollowTheRanking() throws IOException {
        JsonNode rank = new ObjectMapper()
                .readTree(run("rank", "--stage", stage("thermocouple"), "--json", "--top", "5")
                        .out());
        CliRun r = run("--ascii", "scatter", "--stage", stage("thermocouple"), "--top", "5");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        JsonNode first = rank.get("candidates").get(0);
        String legendA = r.outLines().stream()
                .filter(l -> l.startsWith("  a  "))
                .findFirst()
                .orElseThrow();
        assertTrue(legendA.contains(first.get("part").asText()), legendA);
        assertTrue(
                legendA.contains(String.format(
                        Locale.ROOT, "%.2f", first.get("effectiveCost").asDouble())),
                legendA);
        assertTrue(
                r.outLines().stream()
                        .anyMatch(l -> l.endsWith(" limit")
                                && l.startsWith(volts(rank.get("limitV")).strip())),
                r.out());
        assertEquals(
                5, r.outLines().stream().filter(l -> l.matches("  [a-e]  .*")).count(), r.out());
        assertTrue(dev.ampsieve.testing.Flat.of(r.out()).contains(Caution.TEXT), r.out());
    }

    @Test
    void badNumbersAreUsageErrors() {
        CliRun r = run("scatter", "--stage", stage("thermocouple"), "--height", "2");
        assertEquals(ExitCode.USAGE.code(), r.code(), r.toString());
    }
}
