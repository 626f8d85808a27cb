package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import dev.ampsieve.commands.RootCommand;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.testing.DemoCatalog;
import dev.ampsieve.testing.SpecialFiles;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Stage files and catalog choices the program must refuse in one line, without hanging or a stack trace. */
class UnreadableInputTest {

    @TempDir
    Path dir;

    private CliRun run(String... args) {
        return assertTimeoutPreemptively(SpecialFiles.HANG_GUARD, () -> CliRun.of(args));
    }

    @Test
    void devZeroAsTheStageIsOneLineAndExitOne() throws Exception {
        // the old reader filled the heap with zeros and died with an OutOfMemoryError trace
        Path catalog = DemoCatalog.copyTo(dir);
        CliRun r = run(
                "--catalog",
                catalog.toString(),
                "budget",
                "prec-bip-02",
                "--stage",
                SpecialFiles.devZero().toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString()); // as any other unusable stage file
        assertEquals("/dev/zero: not a regular file (a character device); give a YAML file\n", r.err(), r.toString());
        assertEquals("", r.out());
    }

    @Test
    void aNamedPipeAsTheStageIsOneLineAndNoWait() throws Exception {
        Path catalog = DemoCatalog.copyTo(dir);
        Path fifo = SpecialFiles.fifo(dir.resolve("stage.yaml"));
        CliRun r = run("--catalog", catalog.toString(), "budget", "prec-bip-02", "--stage", fifo.toString());
        assertEquals(ExitCode.FINDINGS.code(), r.code(), r.toString());
        assertEquals(fifo + ": not a regular file (a named pipe); give a YAML file\n", r.err(), r.toString());
    }

    @Test
    void anEmptyCatalogOptionIsAUsageErrorNotTheCurrentFolder() {
        CliRun r = run("check", "--catalog", "");
        assertEquals(ExitCode.USAGE.code(), r.code(), r.toString());
        assertEquals(
                "ampsieve: --catalog was given an empty folder name; give the catalog folder (--catalog DIR), or"
                        + " leave the option out to use $AMPSIEVE_CATALOG or the demo catalog\n",
                r.err());
        assertEquals("", r.out());
    }

    @Test
    void anEmptyCatalogVariableIsRefusedAndAnUnsetOneMeansTheDemo() throws Exception {
        assertEquals(
                "AMPSIEVE_CATALOG is set but empty; set it to the catalog folder, or unset it to use the demo catalog",
                RootCommand.emptyCatalogChoice(null, ""));
        assertEquals(
                "AMPSIEVE_CATALOG is set but empty; set it to the catalog folder, or unset it to use the demo catalog",
                RootCommand.emptyCatalogChoice(null, "  "));
        assertNull(RootCommand.emptyCatalogChoice(null, null));
        assertNull(RootCommand.emptyCatalogChoice(Path.of("cat"), "")); // the option wins over the variable
        assertEquals(Path.of("cat"), RootCommand.chooseCatalog(Path.of("cat"), "other", null));
        assertEquals(Path.of("other"), RootCommand.chooseCatalog(null, "other", null));
        Files.createDirectories(dir.resolve("demo-catalog"));
        assertEquals(dir.resolve("demo-catalog"), RootCommand.chooseCatalog(null, null, dir.toString()));
    }
}
