package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.Caution;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class FindCommandTest {

    @TempDir
    Path dir;

    /** Four invented parts; values made up. */
    static final String CATALOG = """
            parts:
              - id: fx-chop-1
                title: Invented chopper amplifier
                architecture: chopper
                input: cmos
                packages: [sot-23-5]
                vos: {typ: 1 uV, max: 5 uV}
                vos-drift: {max: 0.02 uV/C}
                ib: {max: 300 pA}
                gbw: 2 MHz
                chopping-frequency: 20 kHz
                supply: {min: 2.7 V, max: 5.5 V}
                temperature: {min: -40 C, max: 125 C}
                price: {unit: 1.80, quantity: 1000}
                noise: {en: 20 nV/rtHz}
              - id: fx-az-1
                title: Invented auto-zero amplifier
                architecture: auto-zero
                input: cmos
                packages: [sc-70]
                vos: {max: 10 uV}
                gbw: 350 kHz
                supply: {min: 1.8 V, max: 5.5 V}
                temperature: {min: -40 C, max: 85 C}
                price: {unit: 1.10, quantity: 1000}
                noise: {en: 50 nV/rtHz}
              - id: fx-bip-1
                title: Invented general-purpose bipolar amplifier
                architecture: standard
                input: bipolar
                packages: [so-8]
                vos: {typ: 0.5 mV, max: 2 mV}
                gbw: 1 MHz
                supply: {min: 5 V, max: 36 V}
                temperature: {min: -40 C, max: 85 C}
                price: {unit: 0.30, quantity: 1000}
                noise: {en: 20 nV/rtHz}
              - id: fx-jfet-1
                title: Invented JFET-input audio amplifier
                architecture: standard
                input: jfet
                packages: [so-8]
                vos: {max: 1 mV}
                gbw: 8 MHz
                supply: {min: 9 V, max: 36 V}
                temperature: {min: 0 C, max: 70 C}
                price: {unit: 1.20, quantity: 1000}
                noise: {en: 4 nV/rtHz}
            """;

    @BeforeEach
    void writeCatalog() throws Exception {
        Files.writeString(dir.resolve("parts.yaml"), CATALOG);
    }

    private CliRun find(String... query) {
        List<String> args = new ArrayList<>(List.of("--catalog", dir.toString(), "find"));
        args.addAll(List.of(query));
        return CliRun.of(args.toArray(String[]::new));
    }

    /** Ids in the order listed: table rows begin with an id at column 0. */
    private static List<String> ids(CliRun r) {
        return r.outLines().stream()
                .filter(l -> l.startsWith("fx-"))
                .map(l -> l.split("\\s+")[0])
                .toList();
    }

    @Test
    void listsMatchesWithFiguresAndTheCaution() {
        CliRun r = find("zero-drift", "vos<=10uV");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        // both titles say "amplifier" only; relevance ties, so the cheaper auto-zero part comes first
        assertEquals(List.of("fx-az-1", "fx-chop-1"), ids(r));
        String chop = r.outLines().stream()
                .filter(l -> l.startsWith("fx-chop-1"))
                .findFirst()
                .orElseThrow();
        assertTrue(
                chop.contains("1.80")
                        && chop.contains("5.00 µV")
                        && chop.contains("20.0 nV/°C")
                        && chop.contains("300 pA")
                        && chop.contains("2.00 MHz")
                        && chop.contains("2.7-5.5 V"),
                chop);
        // the title on its own line, under the figures, indented past the id column ("fx-chop-1" + 2)
        assertTrue(r.outLines().contains(" ".repeat(11) + "Invented chopper amplifier"), r.out());
        assertTrue(dev.ampsieve.testing.Flat.of(r.out()).endsWith(Caution.TEXT), r.out());
        assertEquals("", r.err());
        for (String line : r.outLines()) {
            if (!line.equals(Caution.TEXT)) {
                assertTrue(line.length() <= 100, line);
            }
        }
        assertTrue(Files.isDirectory(dir.resolve(".ampsieve-index")));
    }

    @Test
    void quotedQueryInOneArgumentWorksTheSame() {
        assertEquals(ids(find("zero-drift", "vos<=10uV")), ids(find("zero-drift vos<=10uV")));
    }

    @Test
    void jsonCarriesSiValuesAndTheCaution() throws Exception {
        CliRun r = find("--json", "supply>=5V");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals("supply>=5V", j.get("query").asText());
        // rated at 5 V: fx-chop-1 (2.7-5.5), fx-az-1 (1.8-5.5), fx-bip-1 (5-36); fx-jfet-1 starts at 9 V
        List<String> got = new ArrayList<>();
        j.get("parts").forEach(p -> got.add(p.get("id").asText()));
        assertEquals(List.of("fx-bip-1", "fx-az-1", "fx-chop-1"), got);
        assertEquals(5e-6, j.get("parts").get(2).get("vosV").asDouble(), 1e-18);
        assertEquals(Caution.TEXT, j.get("caution").asText());
    }

    @Test
    void queryErrorsAreOneLineEachWithExitOne() {
        CliRun r = find("vos<5nA", "inptu:cmos");
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        List<String> err = r.err().lines().toList();
        assertEquals(2, err.size(), r.err());
        assertTrue(err.get(0).contains("'5nA' is a current but a voltage belongs here"), err.get(0));
        assertTrue(err.get(1).contains("unknown field 'inptu'; did you mean 'input'?"), err.get(1));
        assertEquals("", r.out());
    }

    @Test
    void noMatchSaysSoAndExitsOne() {
        CliRun r = find("input:jfet", "gbw>100MHz");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertTrue(
                r.out().startsWith("no part matches 'input:jfet gbw>100MHz'."),
                r.out()); // by hand: no demo JFET part is that fast
    }

    @Test
    void anEditedCatalogIsSeenOnTheNextRun() throws Exception {
        assertEquals(List.of("fx-bip-1", "fx-az-1", "fx-jfet-1", "fx-chop-1"), ids(find()));
        // the JFET part gets cheaper than every other part
        Files.writeString(dir.resolve("parts.yaml"), CATALOG.replace("unit: 1.20", "unit: 0.10"));
        assertEquals(List.of("fx-jfet-1", "fx-bip-1", "fx-az-1", "fx-chop-1"), ids(find()));
    }

    @Test
    void helpDocumentsTheQueryLanguage() {
        CliRun r = CliRun.of("find", "--help");
        assertEquals(ExitCode.OK.code(), r.code());
        assertTrue(r.out().contains("field=lo..hi    both ends included"), r.out());
        assertTrue(r.out().contains("supply>=5V or supply=5V: rated to run on 5 V"), r.out());
        assertFalse(r.out().contains("%n"), r.out());
    }

    @Test
    void aDashWordExcludesWithoutDoubleDash() {
        // by hand: fx-chop-1 is the only chopper; the other three, cheapest first
        CliRun r = find("-chopper");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertEquals(List.of("fx-bip-1", "fx-az-1", "fx-jfet-1"), ids(r));
        assertTrue(r.out().startsWith("3 parts match '-chopper', most relevant first"), r.out());
        // the same with '--', as before
        assertEquals(List.of("fx-bip-1", "fx-az-1", "fx-jfet-1"), ids(find("--", "-chopper")));
    }

    @Test
    void aDashWordStartingWithAShortOptionLetterIsStillAWord() {
        // -h and -V are options; "-jfet" excludes, "-hot" and "-Vx" exclude words no part has
        assertEquals(List.of("fx-bip-1", "fx-az-1", "fx-chop-1"), ids(find("-jfet", "-hot", "-Vx")));
    }

    @Test
    void realOptionsStillWorkBetweenDashWords() {
        CliRun r = find("-chopper", "--json", "cmos");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        // by hand: cmos parts are fx-chop-1 and fx-az-1; without the chopper, one remains
        assertTrue(r.out().contains("\"query\" : \"-chopper cmos\""), r.out());
        assertTrue(r.out().contains("\"count\" : 1"), r.out());
        assertTrue(find("-h").out().contains("Usage: ampsieve find"));
    }

    @Test
    void messagesSaySingularOrPlural() {
        assertTrue(find("fx-jfet-1").out().startsWith("1 part matches 'fx-jfet-1', most relevant first"));
        assertTrue(find("cmos").out().startsWith("2 parts match 'cmos', most relevant first"));
        assertTrue(find().out().startsWith("4 parts in the catalog, most relevant first"));
    }

    @Test
    void helpShowsHowToExcludeAndListsTheCatalogNames() {
        CliRun r = CliRun.of("find", "--help");
        assertTrue(
                r.out().contains("  -word           excludes: find 'drift<=1uV/C' -chopper (no '--' needed"), r.out());
        assertTrue(r.out().contains("null-pins"), r.out());
        assertTrue(r.out().contains("factory-trim (trim)"), r.out());
    }
}
