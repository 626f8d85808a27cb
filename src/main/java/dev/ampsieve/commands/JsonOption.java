package dev.ampsieve.commands;

import picocli.CommandLine.Option;

/** {@code --json} (a picocli mixin) for the commands whose only other format is text. */
public final class JsonOption {

    @Option(names = "--json", description = "Print JSON (keys described in README) instead of text.")
    boolean json;

    public boolean json() {
        return json;
    }
}
