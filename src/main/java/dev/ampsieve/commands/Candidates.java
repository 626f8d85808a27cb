package dev.ampsieve.commands;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.report.ProblemText;
import dev.ampsieve.search.FolderRefusal;
import dev.ampsieve.search.Hit;
import dev.ampsieve.search.PartIndex;
import dev.ampsieve.search.PartQuery;
import dev.ampsieve.search.QueryLanguage;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Problem;
import java.io.IOException;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/** Shared steps of the commands that pick parts from the catalog through the index. */
final class Candidates {
    private Candidates() {}

    /** Index notes already shown by this process: the shell runs many commands, each note is shown once. */
    private static final Set<String> SHOWN = ConcurrentHashMap.newKeySet();

    /**
     * The catalog parts matching {@code queryText}, most relevant first, then cheapest. Folders the
     * index left alone are noted on {@code err}.
     */
    static List<Part> matching(Catalog catalog, String queryText, PrintWriter err) throws InputException, IOException {
        PartQuery q = QueryLanguage.parse(queryText);
        List<Part> out = new ArrayList<>();
        synchronized (Candidates.class) {
            Open o = open(catalog);
            noteRefusals(o.index(), err);
            for (Hit h : o.index().search(q)) {
                Part p = o.byId().get(h.id());
                if (p != null) {
                    out.add(Parts.withLot(p)); // a measured lot is read when its budget is computed
                }
            }
        }
        return out;
    }

    /** The index open for one loaded catalog, and its parts by id. */
    private record Open(Catalog catalog, PartIndex index, Map<String, Part> byId) {}

    /**
     * The index of the catalog last searched, kept open while the same catalog (the same loaded
     * object) is searched again: the shell loads the catalog once and runs many commands, each of
     * which would otherwise check the fingerprint and every index file again (about a second at
     * 100,000 parts). A reader holds no lock, so keeping it open stops no other process.
     */
    private static Open last;

    private static Open open(Catalog catalog) throws IOException {
        if (last != null && last.catalog() == catalog) {
            return last;
        }
        if (last != null) {
            last.index().close();
            last = null;
        }
        Map<String, Part> byId = new HashMap<>();
        for (Part p : catalog.parts()) {
            byId.put(p.id(), p);
        }
        last = new Open(catalog, PartIndex.open(catalog), byId);
        return last;
    }

    /**
     * Each whole-file error on stderr as {@code check} prints it, then a one-line note when other
     * catalog files with errors were left out.
     */
    static void noteProblems(Catalog catalog, PrintWriter err) {
        long shown = noteUnusedFiles(catalog, err);
        long n = catalog.problems().stream().filter(Problem::isError).count() - shown;
        if (n > 0) {
            err.println("ampsieve: note: " + (shown > 0 ? n + " more" : n)
                    + " catalog error(s); parts of files with errors" + " are left out ('ampsieve check' lists them)");
        }
        err.flush();
    }

    /**
     * The errors about a file or folder as a whole (line 0: it cannot be read, its link is dangling,
     * it is too large ...), one line each as {@code check} prints them: every part in it is missing.
     *
     * @return how many lines were printed
     */
    static long noteUnusedFiles(Catalog catalog, PrintWriter err) {
        long n = 0;
        for (Problem p : catalog.problems()) {
            if (p.isError() && p.line() == 0) {
                err.println(ProblemText.line(p));
                n++;
            }
        }
        err.flush();
        return n;
    }

    /** One line per folder the index would have used but left untouched, once per process. */
    private static void noteRefusals(PartIndex index, PrintWriter err) {
        String where = index.location() != null ? "in " + index.location() : "in memory for this run";
        for (FolderRefusal r : index.refusals()) {
            String what = switch (r.reason()) {
                case SYMBOLIC_LINK -> "is a symbolic link, which the index never follows";
                case NOT_A_FOLDER -> "is not a folder";
                case FOREIGN_ENTRY -> "holds '" + r.entry().getFileName() + "', which is not part of an ampsieve index";
                case UNREADABLE -> "cannot be listed";
            };
            String fix = switch (r.reason()) {
                case SYMBOLIC_LINK -> "remove the link to let ampsieve make its own folder there";
                case NOT_A_FOLDER -> "rename or remove it to let ampsieve make its own folder there";
                case FOREIGN_ENTRY -> "move that out, or delete the folder, to let ampsieve use it";
                case UNREADABLE -> "check its permissions";
            };
            String line = "ampsieve: note: " + r.folder() + " " + what
                    + "; it was left untouched and the search index is kept " + where + " instead; " + fix;
            if (SHOWN.add(line)) {
                err.println(line);
            }
        }
        err.flush();
    }
}
