package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.List;
import picocli.CommandLine.Option;

/** {@code --query Q} (a picocli mixin) for the commands that budget many parts: which of them to take. */
public final class QueryOption {

    @Option(
            names = "--query",
            paramLabel = "Q",
            description = "Only parts matching this query (the language of 'find').")
    String query;

    /** The query as typed, or null for every part. */
    public String text() {
        return query;
    }

    /** Every catalog part, or those the query matches (index notes on {@code err}). */
    public List<Part> parts(Catalog catalog, PrintWriter err) throws InputException, IOException {
        // every budget of a ranking uses the parts' measured lots, with a query or without
        return query == null ? Parts.withLots(catalog.parts()) : Candidates.matching(catalog, query, err);
    }
}
