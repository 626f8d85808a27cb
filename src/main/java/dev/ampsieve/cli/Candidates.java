package dev.ampsieve.cli;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.search.Hit;
import dev.ampsieve.search.PartIndex;
import dev.ampsieve.search.PartQuery;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;

/** Shared steps of the commands that pick parts from the catalog through the index. */
final class Candidates {
    private Candidates() {
    }

    /** The catalog parts matching {@code queryText}, most relevant first, then cheapest. */
    static List<Part> matching(Catalog catalog, String queryText) throws InputException, IOException {
        PartQuery q = QueryLanguage.parse(queryText);
        List<Part> out = new ArrayList<>();
        try (PartIndex index = PartIndex.open(catalog)) {
            for (Hit h : index.search(q)) {
                catalog.find(h.id()).ifPresent(out::add);
            }
        }
        return out;
    }

    /** A one-line note on stderr when catalog files with errors were left out. */
    static void noteProblems(Catalog catalog, PrintWriter err) {
        if (catalog.hasErrors()) {
            long n = catalog.problems().stream().filter(dev.ampsieve.yaml.Problem::isError).count();
            err.println("ampsieve: note: " + n + " catalog error(s); parts of files with errors are left out"
                    + " ('ampsieve check' lists them)");
            err.flush();
        }
    }
}
