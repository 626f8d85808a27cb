package dev.ampsieve.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.ampsieve.commands.Commands;
import dev.ampsieve.failure.ExitCode;
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

    @Test
    void mainOpensTheShellOnlyForOptionsWithoutACommand() {
        // what Main asks before it opens the shell (with a terminal); everything else is the command line's
        assertTrue(Commands.namesNoCommand(new String[0]));
        assertTrue(Commands.namesNoCommand(new String[] {"--catalog", "my-catalog", "--ascii"}));
        assertFalse(Commands.namesNoCommand(new String[] {"rank", "--stage", "s.yaml"}));
        assertFalse(Commands.namesNoCommand(new String[] {"--help"}));
        assertFalse(Commands.namesNoCommand(new String[] {"--version"}));
        assertFalse(Commands.namesNoCommand(new String[] {"--no-such-option"})); // the command line reports it
    }
}
