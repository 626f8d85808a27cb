package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.commands.Commands;
import dev.ampsieve.commands.Parts;
import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Refusal;
import dev.ampsieve.fixtures.PartFixture;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BudgetCommandTest {

    @TempDir
    Path dir;

    @Test
    void unknownPartFromTheCommandLineIsOneLineAndExitOne() throws IOException {
        Files.writeString(dir.resolve("amp.yaml"), """
                id: cli-amp-01
                architecture: standard
                input: cmos
                vos: {max: 1 mV}
                gbw: 2 MHz
                supply: {min: 2.7 V, max: 5.5 V}
                temperature: {min: -40 C, max: 125 C}
                price: {unit: 0.60, quantity: 1000}
                """);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Commands.run(
                new String[] {"--catalog", dir.toString(), "budget", "cli-amp-1", "--stage", "s.yaml"},
                new PrintWriter(out),
                new PrintWriter(err));
        assertEquals(ExitCode.FINDINGS.code(), code);
        assertEquals(
                "ampsieve: no part 'cli-amp-1' in the catalog " + dir + "; did you mean 'cli-amp-01'?\n",
                err.toString().replace(System.lineSeparator(), "\n"));
        assertEquals("", out.toString());
    }

    private static Catalog catalog() {
        PartFixture a = PartFixture.ideal();
        a.id = "prec-amp-01";
        PartFixture b = PartFixture.ideal();
        b.id = "fast-amp-02";
        return new Catalog(Path.of("cat"), List.of(a.build(), b.build()), List.of(), 1);
    }

    @Test
    void unknownPartSuggestsTheClosestId() {
        Refusal e = assertThrows(Refusal.class, () -> Parts.find(catalog(), "prec-amp01"));
        assertEquals("no part 'prec-amp01' in the catalog cat; did you mean 'prec-amp-01'?", e.getMessage());
        assertEquals(ExitCode.FINDINGS, e.exitCode());
    }

    @Test
    void farOffIdsGetNoGuess() {
        Refusal e = assertThrows(Refusal.class, () -> Parts.find(catalog(), "zzzzzzzzzz"));
        assertEquals("no part 'zzzzzzzzzz' in the catalog cat; 'ampsieve check' lists what was read", e.getMessage());
    }

    @Test
    void knownPartIsFound() throws Exception {
        assertEquals("fast-amp-02", Parts.find(catalog(), "fast-amp-02").id());
    }
}
