package dev.ampsieve.commands;

import picocli.CommandLine.Option;

/** {@code --json} or {@code --csv}, one at most (an exclusive picocli argument group), for tables that have both. */
public final class TableFormat {

    @Option(names = "--json", description = "Print JSON (keys described in README) instead of text.")
    boolean json;

    @Option(names = "--csv", description = "Print CSV (columns described in README) instead of text.")
    boolean csv;

    public boolean json() {
        return json;
    }

    public boolean csv() {
        return csv;
    }
}
