package dev.ampsieve.commands;

import dev.ampsieve.failure.ExitCode;
import dev.ampsieve.failure.Place;
import dev.ampsieve.failure.Refusal;
import picocli.CommandLine.Option;

/**
 * {@code --json} or {@code --csv}, one at most, for tables that have both. A mixin, not a picocli
 * argument group: picocli resets a mixin's options before each parse, while a group left out of a
 * command line keeps the object of the last one that named it, so in the shell a {@code rank --json}
 * made every later {@code rank} print JSON.
 */
public final class TableFormat {

    @Option(names = "--json", description = "Print JSON (keys described in README) instead of text.")
    boolean json;

    @Option(names = "--csv", description = "Print CSV (columns described in README) instead of text.")
    boolean csv;

    /** Refuses both at once (a usage error, as picocli's own for an exclusive group). */
    public void check() throws Refusal {
        if (json && csv) {
            throw new Refusal(
                    "--json and --csv: give one of them, not both", ExitCode.USAGE, Place.field("--json, --csv"));
        }
    }

    public boolean json() {
        return json;
    }

    public boolean csv() {
        return csv;
    }
}
