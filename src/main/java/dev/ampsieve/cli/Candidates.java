package dev.ampsieve.cli;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.search.Hit;
import dev.ampsieve.search.PartIndex;
import dev.ampsieve.search.PartQuery;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.yaml.Fields;
import dev.ampsieve.yaml.InputException;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Shared steps of the commands that pick parts: query the index, look parts up by id. */
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

    /** The part, or a one-line error naming the closest id. */
    static Part byId(Catalog catalog, String id) {
        Optional<Part> p = catalog.find(id);
        if (p.isPresent()) {
            return p.get();
        }
        String near = Fields.closest(id, catalog.parts().stream().map(Part::id).toList());
        String msg = "no part '" + id + "' in the catalog " + catalog.root()
                + (near != null ? "; did you mean '" + near + "'?" : "; 'ampsieve find' lists the parts");
        if (catalog.hasErrors()) {
            msg += " (some catalog files have errors and were left out: run 'ampsieve check')";
        }
        throw new UserException(msg, ExitCode.FINDINGS);
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
