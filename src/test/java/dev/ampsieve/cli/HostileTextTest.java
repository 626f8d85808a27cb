package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.ampsieve.commands.Commands;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.testing.DemoCatalog;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A catalog part and a stage file name that try to drive the reader's terminal: window title
 * (OSC 0 ended by BEL), screen clear (CSI 2 J), clipboard write (OSC 52), hyperlink (OSC 8), the
 * one-character C1 CSI (U+009B), bidi isolate and override. Every command prints them as
 * escapes ({@code \x1b}, {@code \x07}, {@code \x9b}, {@code \u202e} ...), never raw. Runs go
 * through {@link Commands#run}, without the writer filter {@code Main} adds, so what is
 * tested is that each data string is made visible where it is printed. Colour is off (no
 * console), so the output holds no escape character of ours either.
 */
class HostileTextTest {

    @TempDir
    static Path tmp;

    static Path catalog;
    static Path hostileFile;
    static Path stage;

    private static final char ESC = 0x1b;

    /**
     * YAML double-quoted escapes (YAML 1.1, section 5.7 [from memory]): \e ESC, \a BEL, \x9b
     * CSI, \u202e right-to-left override, \u2066 left-to-right isolate. The file itself is plain
     * ASCII, as a shared catalog would be. Lines and columns below are counted by hand.
     */
    private static final String HOSTILE = String.join(
            "\n",
            "id: hostile-01",
            "title: \"Harmless amp \\e]0;owned\\a\\e[2J\\x9b31m \\u202eevil\"",
            "architecture: standard",
            "input: bipolar",
            "packages: [soic-8, \"dip\\u20668\"]",
            "tags: [general, \"\\e]8;;http://x\\e\\\\link\\e]8;;\\e\\\\\"]",
            "price: {unit: 0.42, quantity: 1000, currency: \"=HYPERLINK(\\\"http://x\\\",\\\"y\\\")\"}",
            "supply: {min: 4 V, max: 36 V}",
            "temperature: {min: -40 C, max: 85 C}",
            "vos: {typ: 0.5 mV, max: 3 mV}",
            "vos-drift: {typ: 6 uV/C}",
            "ib: {typ: 200 nA, max: 500 nA}",
            "gbw: 8 MHz",
            "noise: {en: 8 nV/rtHz}",
            "source: \"copied \\x9b2J\"",
            "notes: \"\\e]52;c;ZWNobw==\\a\"",
            "");

    /** The title as the terminal must show it: each control written as its escape (Visible's table). */
    private static final String TITLE_SHOWN = "Harmless amp \\x1b]0;owned\\x07\\x1b[2J\\x9b31m \\u202eevil";

    @BeforeAll
    static void hostileCatalog() throws IOException {
        catalog = DemoCatalog.copyTo(tmp);
        hostileFile = Files.writeString(catalog.resolve("general").resolve("hostile.yaml"), HOSTILE);
        // a stage whose file name clears the screen
        stage = Files.copy(
                catalog.resolve("stages").resolve("bridge-amp.yaml"),
                catalog.resolve("stages").resolve("br" + ESC + "[2Jidge.yaml"));
    }

    static CliRun run(String... args) {
        List<String> a = new ArrayList<>(List.of("--catalog", catalog.toString()));
        a.addAll(List.of(args));
        return CliRun.of(a.toArray(String[]::new));
    }

    /** No character a terminal would obey: C0 but the line feed, DEL, C1, bidi controls. */
    static void assertInert(CliRun r) {
        String all = r.out() + r.err();
        for (int i = 0; i < all.length(); i++) {
            char c = all.charAt(i);
            boolean bad = c < 0x20 && c != '\n'
                    || c >= 0x7f && c <= 0x9f
                    || c >= 0x202a && c <= 0x202e
                    || c >= 0x2066 && c <= 0x2069;
            assertFalse(bad, String.format("U+%04X at %d in%n%s", (int) c, i, r));
        }
    }

    @Test
    void findShowsTheTitleEscaped() {
        CliRun r = run("find", "harmless");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertInert(r);
        assertTrue(r.out().contains(TITLE_SHOWN), r.out());
        // the currency a spreadsheet would run is shown as typed: only a CSV cell needs defusing
        assertTrue(r.out().contains("price =HYPERLINK(\"http://x\",\"y\")"), r.out());
    }

    @Test
    void aQueryEchoedBackIsEscaped() {
        CliRun r = run("find", ESC + "]0;x" + (char) 7);
        assertInert(r);
        assertTrue(r.out().contains("1 part matches '\\x1b]0;x\\x07'"), r.toString());
        CliRun bad = run("find", "vos<" + ESC + "[2J");
        assertEquals(ExitCode.FINDINGS.code(), bad.code(), bad.toString());
        assertInert(bad);
        assertTrue(bad.err().contains("vos<\\x1b[2J"), bad.toString());
    }

    @Test
    void jsonEscapesControlsAndKeepsTheTextExact() throws IOException {
        CliRun r = run("find", "harmless", "--json");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertInert(r);
        // RFC 8259 section 7: control characters as \\u00XX; Jackson writes the hex upper-case
        assertTrue(r.out().contains("Harmless amp \\u001B]0;owned\\u0007\\u001B[2J\\u009B31m \\u202Eevil"), r.out());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(
                "Harmless amp " + ESC + "]0;owned" + (char) 7 + ESC + "[2J" + (char) 0x9b + "31m " + (char) 0x202e
                        + "evil",
                j.get("parts").get(0).get("title").asText());
    }

    @Test
    void budgetShowsTitleAndStageNameEscaped() {
        CliRun r = run("budget", "hostile-01", "--stage", stage.toString());
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertInert(r);
        assertTrue(r.out().contains("Part       hostile-01  (" + TITLE_SHOWN + ")"), r.out());
        assertTrue(r.out().contains("br\\x1b[2Jidge.yaml: difference"), r.out());
        CliRun json = run("budget", "hostile-01", "--stage", stage.toString(), "--json");
        assertInert(json);
        assertTrue(json.out().contains("br\\u001B[2Jidge.yaml"), json.out());
    }

    @Test
    void rankInEveryFormat() {
        CliRun text = run("rank", "--stage", stage.toString(), "--top", "100");
        assertEquals(ExitCode.OK.code(), text.code(), text.toString());
        assertInert(text);
        assertTrue(text.out().startsWith("Stage br\\x1b[2Jidge.yaml: difference"), text.out());
        assertTrue(text.out().contains("hostile-01"), text.out());

        CliRun csv = run("rank", "--stage", stage.toString(), "--csv");
        assertInert(csv);
        // the currency cell starts with '=': defused with a leading ' and quoted (OWASP CSV Injection [from memory])
        assertTrue(csv.out().contains(",\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\","), csv.out());

        CliRun json = run("rank", "--stage", stage.toString(), "--json");
        assertInert(json);
        assertTrue(
                json.out().contains("\"stage\" : \"" + stage.toString().replace(String.valueOf(ESC), "\\u001B") + "\""),
                json.out());
    }

    @Test
    void compareAndChartsShowTheStageNameEscaped() {
        CliRun c = run("compare", "hostile-01", "gp-bip-07", "--stage", stage.toString());
        assertEquals(ExitCode.OK.code(), c.code(), c.toString());
        assertInert(c);
        assertTrue(c.out().startsWith("Stage br\\x1b[2Jidge.yaml: difference"), c.out());
        for (String cmd : List.of("bars", "scatter")) {
            List<String> args = new ArrayList<>(List.of(cmd));
            if (cmd.equals("bars")) {
                args.add("hostile-01");
            }
            args.addAll(List.of("--stage", stage.toString()));
            CliRun r = run(args.toArray(String[]::new));
            assertEquals(ExitCode.OK.code(), r.code(), r.toString());
            assertInert(r);
            assertTrue(r.out().contains("br\\x1b[2Jidge.yaml"), r.out());
        }
    }

    @Test
    void checkNamesEachFieldWithAControlCharacter() {
        CliRun r = run("check");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString()); // warnings only
        assertInert(r);
        List<String> lines = r.outLines();
        // names: Unicode NameAliases (ESCAPE, CONTROL SEQUENCE INTRODUCER) and UnicodeData [from memory]
        for (String expected : List.of(
                hostileFile + ":2:8: warning: title: contains control character U+001B (ESCAPE); remove it",
                hostileFile
                        + ":5:20: warning: packages[1]: contains control character U+2066 (LEFT-TO-RIGHT ISOLATE); remove it",
                hostileFile + ":6:17: warning: tags[1]: contains control character U+001B (ESCAPE); remove it",
                hostileFile
                        + ":15:9: warning: source: contains control character U+009B (CONTROL SEQUENCE INTRODUCER); remove it",
                hostileFile + ":16:8: warning: notes: contains control character U+001B (ESCAPE); remove it")) {
            assertTrue(lines.contains(expected), expected + "\nnot in\n" + r.out());
        }
    }

    @Test
    void unknownIdsAndWordsTypedByTheUserAreEchoedEscaped() {
        CliRun r = run("budget", "x" + ESC + "]0;t" + (char) 7, "--stage", stage.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertInert(r);
        assertTrue(r.err().startsWith("ampsieve: no part 'x\\x1b]0;t\\x07' in the catalog "), r.err());

        CliRun u = run("rank", "--stage", stage.toString(), ESC + "[2J");
        assertEquals(ExitCode.USAGE.code(), u.code(), u.toString());
        assertInert(u);
        assertTrue(u.err().contains("'\\x1b[2J'"), u.err());

        CliRun missing = run("rank", "--stage", "no" + ESC + "[2J.yaml");
        assertEquals(ExitCode.FINDINGS.code(), missing.code(), missing.toString());
        assertInert(missing);
        assertTrue(missing.err().startsWith("no\\x1b[2J.yaml"), missing.err());
    }

    @Test
    void lineFeedsAndTabsOfABlockScalarAreNoWarning(@TempDir Path dir) throws IOException {
        String plain = HOSTILE.replaceAll("(?m)^(title|packages|tags|source|notes):.*\n", "")
                + "notes: |\n  first line\n  second\tline\n";
        Files.writeString(dir.resolve("amp.yaml"), plain);
        CliRun r = CliRun.of("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertFalse(r.out().contains("control character"), r.out());
    }

    @Test
    void anIdWithAControlCharacterIsAnErrorEchoedEscaped(@TempDir Path dir) throws IOException {
        Path f = Files.writeString(dir.resolve("bad.yaml"), HOSTILE.replace("id: hostile-01", "id: \"bad\\e[2Jid\""));
        CliRun r = CliRun.of("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertInert(r);
        assertTrue(r.out().contains(f + ":1:5: id: 'bad\\x1b[2Jid' is not a valid id"), r.out());
    }
}
