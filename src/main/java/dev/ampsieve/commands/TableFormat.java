package dev.ampsieve.commands;

import picocli.CommandLine.Option;

/** {@code --json} or {@code --csv}, one at most (an exclusive picocli argument group), for tables that have both. */
public final class TableFormat {

    @Option(names = "--json", description = "Print JSON (keys described in README).")
    boolean json;

    @Option(names = "--csv", description = "Print CSV, one row per part.")
    boolean csv;

    public boolean json() {
        return json;
    }

    public boolean csv() {
        return csv;
    }
}
