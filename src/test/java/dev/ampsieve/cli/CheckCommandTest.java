package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.failure.ExitCode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {

    @TempDir
    Path dir;

    /** An invented part; no noise data, so it loads with exactly one warning. */
    private static final String PART = """
            id: check-amp
            architecture: standard
            input: cmos
            vos: {typ: 0.2 mV, max: 1 mV, max-over-temp: 1.5 mV}
            gbw: 2 MHz
            supply: {min: 2.7 V, max: 5.5 V}
            temperature: {min: -40 C, max: 125 C}
            price: {unit: 0.60, quantity: 1000}
            ib: {max: 10 pA, max-over-temp: 1 nA}
            ios: {max: 5 pA}
            long-term-drift: {value: 2 uV, per: 1000 h}
            cmrr: {min: 80 dB}
            psrr: {min: 85 dB}
            aol: {min: 100 dB}
            """;

    private record Run(int code, String out, String err) {
        List<String> outLines() {
            return out.lines().toList();
        }
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Commands.run(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void aCatalogWithOnlyWarningsChecksClean() throws IOException {
        Path f = Files.writeString(dir.resolve("amp.yaml"), PART);
        Run r = run("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.OK.code(), r.code(), r.out() + r.err());
        assertEquals(
                List.of(
                        "== " + f + ": part check-amp: 1 warning",
                        f
                                + ":1:1: warning: noise: not given: en, en-corner, in will be estimated for a cmos input (common practice,"
                                + " conservative) and marked estimated; add 'noise: {en: 12 nV/rtHz, in: 0.1 pA/rtHz}' with the"
                                + " datasheet's white-noise densities and their 1/f corners",
                        "",
                        dir + ": 1 file(s), 1 part(s), 0 error(s), 1 warning(s)",
                        "",
                        dev.ampsieve.report.Caution.TEXT),
                r.outLines()); // every text output ends with the caution (RULES.md)
        assertEquals("", r.err());
    }

    @Test
    void anErrorListsTheProblemAndExitsWithFindings() throws IOException {
        Files.writeString(dir.resolve("good.yaml"), PART);
        Path bad = Files.writeString(
                dir.resolve("sub-bad.yaml"),
                PART.replace("check-amp", "other-amp").replace("gbw: 2 MHz", "gbw: 2 mA"));
        Run r = run("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertTrue(
                r.outLines()
                        .contains(bad + ":5:6: gbw: '2 mA' is a current but a frequency belongs here;"
                                + " write a frequency such as '1.5 MHz'"),
                r.out());
        assertEquals(
                dir + ": 2 file(s), 1 part(s), 1 error(s), 1 warning(s)",
                r.outLines().get(r.outLines().size() - 3));
        assertEquals(
                dev.ampsieve.report.Caution.TEXT, r.outLines().get(r.outLines().size() - 1));
    }

    @Test
    void strictRefusesTheCatalogAndListsEveryProblemOnStderr() throws IOException {
        Files.writeString(dir.resolve("amp.yaml"), PART.replace("gbw: 2 MHz", "gbw: 2 mA"));
        Run r = run("--catalog", dir.toString(), "--strict", "check");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals("", r.out());
        assertEquals(1, r.err().lines().count(), r.err());
        assertTrue(r.err().contains("amp.yaml:5:6: gbw: '2 mA' is a current"), r.err());
    }

    @Test
    void aMissingCatalogFolderIsOneLineWithTheFixNotAStackTrace() {
        Path missing = dir.resolve("nope");
        Run r = run("check", "--catalog", missing.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals(
                missing + ": catalog folder not found; give the catalog folder with --catalog DIR"
                        + " or the environment variable AMPSIEVE_CATALOG",
                r.err().strip());
        assertFalse(r.err().contains("Exception"), r.err());
    }

    @Test
    void malformedYamlIsReportedWithoutAStackTrace() throws IOException {
        Path f = Files.writeString(dir.resolve("broken.yaml"), "id: x\nvos: {max: 1 mV\n");
        Run r = run("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals("== " + f + ": no part loaded: 1 error", r.outLines().get(0));
        assertTrue(r.outLines().get(1).startsWith(f + ":3:1: YAML syntax: "), r.out());
        assertFalse((r.out() + r.err()).contains("Exception"));
    }

    @Test
    void problemsAreGroupedUnderOneHeadingPerFile() throws IOException {
        Path a = Files.writeString(dir.resolve("a.yaml"), PART);
        Path b = Files.writeString(
                dir.resolve("b.yaml"), PART.replace("check-amp", "other-amp").replace("gbw: 2 MHz", "gbw: 2 mA"));
        Run r = run("--catalog", dir.toString(), "check");
        List<String> lines = r.outLines();
        // a.yaml: its part loads with the one noise warning; b.yaml: the gbw error (a part with an error
        // gets no absence warnings), and its part is left out
        assertEquals("== " + a + ": part check-amp: 1 warning", lines.get(0));
        assertTrue(lines.get(1).startsWith(a + ":1:1: warning: noise: not given:"), lines.get(1));
        assertEquals("", lines.get(2));
        assertEquals("== " + b + ": no part loaded: 1 error", lines.get(3));
    }

    @Test
    void quietShowsOnlyErrorsAndTheSummary() throws IOException {
        Files.writeString(dir.resolve("a.yaml"), PART);
        Path b = Files.writeString(
                dir.resolve("b.yaml"), PART.replace("check-amp", "other-amp").replace("gbw: 2 MHz", "gbw: 2 mA"));
        Run r = run("--catalog", dir.toString(), "check", "--quiet");
        assertEquals(ExitCode.FINDINGS.code(), r.code());
        assertEquals(
                List.of(
                        "== " + b + ": no part loaded: 1 error",
                        b
                                + ":5:6: gbw: '2 mA' is a current but a frequency belongs here; write a frequency such as '1.5 MHz'",
                        "",
                        dir + ": 2 file(s), 1 part(s), 1 error(s), 1 warning(s)"),
                r.outLines());
        // no error at all: the summary line alone, exit 0
        Files.delete(b);
        Run clean = run("--catalog", dir.toString(), "check", "-q");
        assertEquals(ExitCode.OK.code(), clean.code());
        assertEquals(List.of(dir + ": 1 file(s), 1 part(s), 0 error(s), 1 warning(s)"), clean.outLines());
    }

    @Test
    void aStageFileInTheCatalogFolderIsSkippedWithOneLine() throws IOException {
        Files.writeString(dir.resolve("amp.yaml"), PART);
        Path stage = Files.writeString(dir.resolve("bridge.yaml"), "gain: 100\nlimit: 1 mV\ncriterion: worst-case\n");
        Run r = run("--catalog", dir.toString(), "check");
        assertEquals(ExitCode.OK.code(), r.code(), r.out());
        assertTrue(
                r.outLines()
                        .contains(
                                stage
                                        + ":1:1: warning: looks like a stage file (it has gain, limit, criterion and no id);"
                                        + " skipped; move it to a 'stages' folder (which the catalog does not read) and pass it with --stage"),
                r.out());
        // one line for the file, not one per missing part key
        assertEquals(
                1,
                r.outLines().stream()
                        .filter(l -> l.startsWith(stage.toString()))
                        .count(),
                r.out());
    }
}
