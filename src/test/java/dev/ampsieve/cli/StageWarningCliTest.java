package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.commands.StageSource;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.stage.StageLoader;
import dev.ampsieve.yaml.Problem;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A stage's warnings reach stderr as file:line:col: warning: lines, once per root command. */
class StageWarningCliTest {

    @TempDir
    Path dir;

    @Test
    void budgetRankAndSufficesShowTheStageWarningOnStderr() throws Exception {
        Path stage = Files.writeString(dir.resolve("loose.yaml"), "gain: 10\nlimit: 10 V\nsupply: {voltage: 5 V}\n");
        String expected = stage + ":2:8: warning: limit: a limit of 10.0 V at the output is not below the whole supply"
                + " of 5.00 V: no output error can reach it, so the stage constrains nothing; write the largest error"
                + " allowed at the output, such as '1 mV' (check the prefix)";
        for (String[] args : new String[][] {
            {"budget", "prec-bip-02", "--stage", stage.toString()},
            {"suffices", "prec-bip-02", "--stage", stage.toString()},
            {"rank", "--stage", stage.toString(), "--top", "1"}
        }) {
            CliRun r = CliRun.of(args);
            assertTrue(r.err().lines().anyMatch(expected::equals), r.toString());
            assertEquals(1, r.err().lines().filter(expected::equals).count(), r.toString());
        }
    }

    @Test
    void oneRootShowsEachWarningOnce() throws Exception {
        // the shell runs many commands through one root: the same warning is not repeated
        Path stage = Files.writeString(dir.resolve("loose.yaml"), "gain: 10\nlimit: 10 V\nsupply: {voltage: 5 V}\n");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        RootCommand root = new RootCommand();
        var tree = Commands.build(root, new PrintWriter(out), new PrintWriter(err));
        tree.execute("budget", "prec-bip-02", "--stage", stage.toString());
        tree.execute("budget", "prec-bip-02", "--stage", stage.toString());
        assertEquals(
                1,
                err.toString()
                        .lines()
                        .filter(l -> l.contains("warning: limit:"))
                        .count(),
                err.toString());
    }

    @Test
    void aCurrentStageInMemoryIsUsedWithoutStageAndNamedAsItsSourceSays() throws Exception {
        // the shell hands commands its stage in memory, with the name the user knows it by and
        // its warnings without a line (the YAML behind them is not the user's)
        StageLoader.Loaded loaded = StageLoader.parseWithWarnings(
                "gain: 10\nlimit: 10 V\nsupply: {voltage: 5 V}\n", Path.of("bridge.yaml"));
        List<Problem> unplaced = loaded.warnings().stream()
                .map(p -> new Problem(
                        p.severity(), p.file(), 0, 0, p.field(), ProblemText.message(p), ProblemText.fix(p)))
                .toList();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        RootCommand root = new RootCommand();
        root.useCurrentStage(() -> new StageSource.Given(loaded.stage(), unplaced, "bridge.yaml", "bridge.yaml"));
        int code = Commands.build(root, new PrintWriter(out), new PrintWriter(err))
                .execute("budget", "prec-bip-02", "--json");
        assertEquals(ExitCode.OK.code(), code, err.toString());
        assertTrue(
                err.toString().lines().anyMatch(l -> l.startsWith("bridge.yaml: warning: limit: a limit of 10.0 V")),
                err.toString());
        assertTrue(out.toString().contains("\"stage\" : \"bridge.yaml\""), out.toString());
        try (var written = Files.list(dir)) {
            assertFalse(written.findAny().isPresent(), "nothing written to disk");
        }
    }
}
