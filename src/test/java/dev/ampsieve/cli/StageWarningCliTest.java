package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
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
                {"rank", "--stage", stage.toString(), "--top", "1"}}) {
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
        assertEquals(1, err.toString().lines().filter(l -> l.contains("warning: limit:")).count(), err.toString());
    }

    @Test
    void aStageTheShellNamesIsShownByItsNameWithoutTheCopysLines() throws Exception {
        // the shell hands commands a copy of its stage: the copy's line numbers would point into the wrong file
        Path copy = Files.writeString(dir.resolve("copy.yaml"), "# written by the shell\ngain: 10\nlimit: 10 V\nsupply: {voltage: 5 V}\n");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        RootCommand root = new RootCommand();
        root.setStageNames(f -> f.equals(copy) ? "bridge.yaml" : null);
        Commands.build(root, new PrintWriter(out), new PrintWriter(err)).execute("budget", "prec-bip-02", "--stage", copy.toString());
        assertTrue(err.toString().lines().anyMatch(l -> l.startsWith("bridge.yaml: warning: limit: a limit of 10.0 V")), err.toString());
    }
}
