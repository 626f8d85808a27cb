package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.stats.NormalFit;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A measured lot as a user meets it: from the catalog, from --measured, a bad file, and the offset rig. */
class MeasuredLotCliTest {

    private static final String PART = """
            id: lot-amp-01
            architecture: standard
            input: bipolar
            vos: {max: 100 uV}
            vos-drift: {max: 1 uV/C}
            ib: {max: 2 nA}
            gbw: 1 MHz
            supply: {min: 4 V, max: 36 V}
            temperature: {min: -40 C, max: 125 C}
            price: {unit: 1.00, quantity: 1000}
            measured: {file: lots/lot.csv}
            """;

    private static final String STAGE = """
            topology: follower
            limit: "150 uV"
            temperature: {min: 20 C, max: 30 C}
            trials: 2000
            """;

    /** Ten units: mean 1 µV, values -8..10 µV (hand-picked), within the 100 µV maximum. */
    private static final String LOT = """
            # ten units
            unit, vos (uV), ib (pA)
            a, -8, 500
            b, -5, 700
            c, -3, 650
            d, -1, 800
            e, 0, 720
            f, 2, 690
            g, 3, 710
            h, 5, 760
            i, 8, 640
            j, 9, 730
            """;

    private Path catalog(Path dir, String lot) throws Exception {
        Files.createDirectories(dir.resolve("lots"));
        Files.writeString(dir.resolve("amp.yaml"), PART);
        Files.writeString(dir.resolve("lots/lot.csv"), lot);
        Files.writeString(dir.resolve("stage.yaml"), STAGE);
        return dir;
    }

    @Test
    void theCatalogsLotIsFittedAndShownBesideTheDatasheet(@TempDir Path dir) throws Exception {
        catalog(dir, LOT);
        CliRun r = CliRun.of(
                "--catalog",
                dir.toString(),
                "budget",
                "lot-amp-01",
                "--stage",
                dir.resolve("stage.yaml").toString(),
                "--json");
        assertEquals(0, r.code(), r::toString);
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode vos = j.get("measured").get(0);
        double[] x = {-8e-6, -5e-6, -3e-6, -1e-6, 0, 2e-6, 3e-6, 5e-6, 8e-6, 9e-6};
        // mean 10 µV / 10 = 1 µV (by hand); sigma and its interval by NormalFit on the same numbers
        NormalFit f = NormalFit.of(x);
        assertEquals("vos", vos.get("field").asText());
        assertEquals(10, vos.get("units").asInt());
        assertEquals(1e-6, vos.get("mean").asDouble(), 1e-15);
        assertEquals(f.sigma(), vos.get("sigma").asDouble(), 1e-15);
        assertEquals(f.sigmaLow(), vos.get("sigmaLow").asDouble(), 1e-15);
        assertEquals(f.sigmaHigh(), vos.get("sigmaHigh").asDouble(), 1e-15);
        assertEquals("anderson-darling", vos.get("fitTest").asText());
        assertEquals(f.pValue(), vos.get("pValue").asDouble(), 1e-12);
        assertEquals(100e-6, vos.get("datasheetMax").asDouble(), 1e-15);
        assertEquals(0, vos.get("beyondDatasheet").asInt());
        assertTrue(vos.get("usedInYield").asBoolean());
        assertEquals("ib", j.get("measured").get(1).get("field").asText());
        assertTrue(j.has("yieldFromDatasheet"), r.out());
        CliRun text = CliRun.of(
                "--catalog",
                dir.toString(),
                "budget",
                "lot-amp-01",
                "--stage",
                dir.resolve("stage.yaml").toString());
        assertTrue(text.out().contains("from 10 measured units"), text.out());
        assertTrue(text.out().contains("from the datasheet alone"), text.out());
    }

    @Test
    void aBadLotNamesItsLineColumnAndTheCatalogLineThatNamesItAndIsLeftAsItWas(@TempDir Path dir) throws Exception {
        catalog(dir, LOT.replace("e, 0, 720", "e, O, 720"));
        byte[] before = Files.readAllBytes(dir.resolve("lots/lot.csv"));
        CliRun r = CliRun.of(
                "--catalog",
                dir.toString(),
                "budget",
                "lot-amp-01",
                "--stage",
                dir.resolve("stage.yaml").toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r::toString);
        String lot = dir.resolve("lots/lot.csv").toString();
        assertTrue(
                r.err()
                        .contains(lot + ":7:4: vos: 'O' is not a plain number; write the value as a number in the"
                                + " column's unit"),
                r.err());
        assertTrue(
                r.err()
                        .contains(dir.resolve("amp.yaml") + ":11:18: measured.file: the measured lot of part"
                                + " 'lot-amp-01' cannot be used"),
                r.err());
        assertArrayEquals(before, Files.readAllBytes(dir.resolve("lots/lot.csv")));
        assertEquals("", r.out());
    }

    @Test
    void measuredOnTheCommandLineReplacesTheCatalogs(@TempDir Path dir) throws Exception {
        catalog(dir, LOT);
        Path other = dir.resolve("other.csv");
        Files.writeString(other, "vos (uV)\n50\n60\n70\n");
        CliRun r = CliRun.of(
                "--catalog",
                dir.toString(),
                "budget",
                "lot-amp-01",
                "--stage",
                dir.resolve("stage.yaml").toString(),
                "--measured",
                other.toString(),
                "--json");
        assertEquals(0, r.code(), r::toString);
        JsonNode vos = new ObjectMapper().readTree(r.out()).get("measured").get(0);
        assertEquals(3, vos.get("units").asInt());
        assertEquals(60e-6, vos.get("mean").asDouble(), 1e-15); // (50 + 60 + 70) / 3
        assertEquals(10e-6, vos.get("sigma").asDouble(), 1e-15); // sqrt((100 + 0 + 100) / 2) µV
        // three units are too few to test the fit: said as a warning
        assertTrue(
                Arrays.stream(new ObjectMapper()
                                .readTree(r.out())
                                .get("warnings")
                                .toString()
                                .split("\","))
                        .anyMatch(w -> w.contains("too few units")),
                r.out());
    }

    @Test
    void theOffsetRigForAPart(@TempDir Path dir) throws Exception {
        catalog(dir, LOT);
        CliRun r = CliRun.of("--catalog", dir.toString(), "offset-rig", "lot-amp-01", "--json");
        assertEquals(0, r.code(), r::toString);
        JsonNode j = new ObjectMapper().readTree(r.out());
        // vos 100 µV on 2 V: range cap 0.5 x 2 / 100 µV = 10,000; AOL assumed 80 dB (missing) -> loop cap 10
        // (0.1 % of 10,000); R1 = E96 >= max(10, 10k / 9) = 1.13 kohm; R2 = E96 <= 1130 x 9 = 10,170 -> 10.0
        // kohm; G = 1 + 10000/1130 = 9.8496
        assertEquals("open-loop-gain", j.get("gainLimitedBy").asText());
        assertEquals(1130.0, j.get("r1Ohm").asDouble(), 1e-9);
        assertEquals(10e3, j.get("r2Ohm").asDouble(), 1e-9);
        assertEquals(1 + 10000 / 1130.0, j.get("gain").asDouble(), 1e-12);
        // aol assumed (80 dB) and ios taken equal to ib: the rig says it rests on them
        assertEquals("[\"ios\",\"aol\"]", j.get("estimated").toString());
        CliRun bad = CliRun.of("--catalog", dir.toString(), "offset-rig", "lot-amp-01", "--meter-range", "2 A");
        assertEquals(ExitCode.USAGE.code(), bad.code(), bad::toString);
        assertTrue(bad.err().startsWith("ampsieve: --meter-range: "), bad.err());
    }

    @Test
    void aRankingWithoutAQueryUsesTheLotAsTheBudgetDoes() throws Exception {
        // demo prec-bip-01 carries demo-catalog/lots/prec-bip-01-lot.csv: its yield in the ranking (no --query, every
        // part) must be the budget's, lot included; before, only a ranking with a query read the lots
        String stage = "demo-catalog/stages/bridge-amp.yaml";
        CliRun budget = CliRun.of("budget", "prec-bip-01", "--stage", stage, "--json");
        CliRun rank = CliRun.of("rank", "--stage", stage, "--json", "--top", "48");
        assertEquals(0, budget.code(), budget::toString);
        assertEquals(0, rank.code(), rank::toString);
        JsonNode b = new ObjectMapper().readTree(budget.out());
        assertTrue(b.has("measured"), budget.out());
        double fromBudget = b.get("yield").get("value").asDouble();
        double fromRank = Double.NaN;
        for (JsonNode c : new ObjectMapper().readTree(rank.out()).get("candidates")) {
            if (c.get("part").asText().equals("prec-bip-01")) {
                fromRank = c.get("yield").get("value").asDouble();
            }
        }
        assertEquals(fromBudget, fromRank, 0.0);
        // and it is not the datasheet-only yield the budget shows beside it
        assertTrue(b.get("yieldFromDatasheet").get("value").asDouble() != fromRank, budget.out());
    }
}
