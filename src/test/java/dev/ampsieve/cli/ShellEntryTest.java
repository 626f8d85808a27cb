package dev.ampsieve.cli;

import dev.ampsieve.failure.ExitCode;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** No command: the shell when a console is present; without one (a pipe, a test) the usage. */
class ShellEntryTest {

    @Test
    void withoutAConsoleNoCommandPrintsTheUsage() {
        assertNull(System.console(), "tests run without a console");
        CliRun r = CliRun.of();
        assertEquals(ExitCode.OK.code(), r.code(), r.toString());
        assertTrue(r.out().contains("Usage: ampsieve"), r.out());
        assertTrue(r.out().contains("scatter") && r.out().contains("bars"), r.out());
    }
}
