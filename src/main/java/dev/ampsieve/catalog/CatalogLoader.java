package dev.ampsieve.catalog;

import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.io.IOException;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Reads every {@code *.yaml} / {@code *.yml} file below a folder into validated {@link Part}s.
 *
 * <p>Files are read in sorted order of their path below the root, so problems and parts come
 * out the same on every machine. Hidden folders (the search index lives in one) and folders
 * named {@value #STAGES_FOLDER} (stage files, not parts) are skipped. A file holds one part
 * (a mapping with {@code id}) or several (a {@code parts:} list). A part with an error is
 * left out and the rest load, unless {@code strict}.
 */
public final class CatalogLoader {
    private CatalogLoader() {
    }

    /** Sub-folders of this name hold stage files, which the catalog does not read. */
    public static final String STAGES_FOLDER = "stages";

    /** The fix for a catalog folder that cannot be used. */
    static final String ROOT_FIX = "give the catalog folder with --catalog DIR or the environment variable AMPSIEVE_CATALOG";

    /**
     * @param strict when true, any error fails the whole load with an {@link InputException}
     *               carrying every problem found
     * @throws InputException when {@code root} is not a readable folder, or {@code strict} and any error
     */
    public static Catalog load(Path root, boolean strict) throws InputException {
        if (!Files.exists(root)) {
            throw new InputException(Problem.error(Located.nowhere(root), "", "catalog folder not found", ROOT_FIX));
        }
        if (!Files.isDirectory(root)) {
            throw new InputException(Problem.error(Located.nowhere(root), "", "this is a file, not a catalog folder",
                    ROOT_FIX + " (the folder holding the *.yaml files)"));
        }
        List<Problem> problems = new ArrayList<>();
        List<Path> files = list(root, problems);
        List<Part> parts = new ArrayList<>();
        Map<String, Located> ids = new HashMap<>();
        for (Path file : files) {
            List<Problem> fileProblems = new ArrayList<>();
            readFile(file, parts, ids, fileProblems);
            // top to bottom within a file, whatever order the checks ran in
            fileProblems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
            problems.addAll(fileProblems);
        }
        if (files.isEmpty() && problems.isEmpty()) {
            problems.add(Problem.warning(Located.nowhere(root), "", "no catalog files (*.yaml, *.yml) below this folder",
                    "add parts (catalog-template/part.yaml shows every key) or " + ROOT_FIX));
        }
        currencies(parts, problems);
        if (strict && problems.stream().anyMatch(Problem::isError)) {
            throw new InputException(problems);
        }
        return new Catalog(root, parts, problems, files.size());
    }

    /** The catalog files below {@code root}, sorted by relative path; unreadable folders become problems. */
    static List<Path> list(Path root, List<Problem> problems) {
        List<Path> files = new ArrayList<>();
        try {
            Files.walkFileTree(root, EnumSet.of(FileVisitOption.FOLLOW_LINKS), Integer.MAX_VALUE,
                    new SimpleFileVisitor<>() {
                        @Override
                        public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                            if (dir.equals(root)) {
                                return FileVisitResult.CONTINUE;
                            }
                            String name = dir.getFileName().toString();
                            return name.startsWith(".") || name.equals(STAGES_FOLDER)
                                    ? FileVisitResult.SKIP_SUBTREE : FileVisitResult.CONTINUE;
                        }

                        @Override
                        public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                            if (attrs.isRegularFile() && isCatalogFile(file)) {
                                files.add(file);
                            } else if (attrs.isSymbolicLink() && isCatalogFile(file)) {
                                // FOLLOW_LINKS hands over the link itself only when its target is gone
                                problems.add(Problem.error(Located.nowhere(file), "", "the link's target does not exist",
                                        "fix or remove the link"));
                            }
                            return FileVisitResult.CONTINUE;
                        }

                        @Override
                        public FileVisitResult visitFileFailed(Path file, IOException e) {
                            // a hidden folder is skipped even when it cannot be opened (a loop such as
                            // '.ampsieve-index -> .' is caught here, before preVisitDirectory)
                            if (isCatalogFile(file) || Files.isDirectory(file) && !file.getFileName().toString().startsWith(".")) {
                                problems.add(Problem.error(Located.nowhere(file), "",
                                        "cannot read (" + YamlFiles.describe(e) + ")", "check its permissions"));
                            }
                            return FileVisitResult.CONTINUE;
                        }
                    });
        } catch (IOException e) {
            problems.add(Problem.error(Located.nowhere(root), "", "cannot list the folder (" + YamlFiles.describe(e) + ")",
                    "check its permissions"));
        }
        files.sort(Comparator.comparing(p -> root.relativize(p).toString().replace('\\', '/')));
        return files;
    }

    private static boolean isCatalogFile(Path file) {
        String name = file.getFileName().toString();
        String lower = name.toLowerCase(Locale.ROOT);
        return !name.startsWith(".") && (lower.endsWith(".yaml") || lower.endsWith(".yml"));
    }

    private static void readFile(Path file, List<Part> parts, Map<String, Located> ids, List<Problem> problems) {
        Node root;
        try {
            root = YamlFiles.read(file);
        } catch (InputException e) {
            problems.addAll(e.problems());
            return;
        }
        if (root instanceof Node.Scalar s && s.text() == null) {
            problems.add(Problem.warning(root.at(), "", "empty file, no parts",
                    "add a part (catalog-template/part.yaml shows every key) or delete the file"));
            return;
        }
        if (root instanceof Node.Mapping m && m.entries().containsKey(CatalogKeys.PARTS)) {
            for (var e : m.keyAt().entrySet()) {
                if (!e.getKey().equals(CatalogKeys.PARTS)) {
                    problems.add(Problem.error(e.getValue(), e.getKey(),
                            "unknown key beside 'parts:' (a file with a parts list holds only that list)",
                            "move it into one of the parts, or remove it"));
                }
            }
            Node list = m.entries().get(CatalogKeys.PARTS);
            if (list instanceof Node.Seq seq) {
                for (int i = 0; i < seq.items().size(); i++) {
                    accept(PartReader.read(seq.items().get(i), CatalogKeys.PARTS + "[" + i + "]", false), parts, ids,
                            problems);
                }
            } else if (list instanceof Node.Scalar s && s.text() == null) {
                problems.add(Problem.warning(list.at(), CatalogKeys.PARTS, "the list is empty", "add parts as '- id: ...' items"));
            } else {
                problems.add(Problem.error(list.at(), CatalogKeys.PARTS, "expected a list of parts, found " + list.kind(),
                        "write each part as an item starting with '- id: ...', indented below 'parts:'"));
            }
            return;
        }
        if (root instanceof Node.Seq) {
            problems.add(Problem.error(root.at(), "", "the file is a bare list",
                    "put 'parts:' on a line of its own above the list and indent the list below it"));
            return;
        }
        accept(PartReader.read(root, "", true), parts, ids, problems);
    }

    /** Keeps the part unless it has errors or its id was taken by an earlier part. */
    private static void accept(PartReader.Result r, List<Part> parts, Map<String, Located> ids, List<Problem> problems) {
        problems.addAll(r.problems());
        boolean ok = r.part() != null;
        if (r.id() != null) {
            Located first = ids.putIfAbsent(r.id(), r.idAt());
            if (first != null) {
                problems.add(Problem.error(r.idAt(), idField(r), "id '" + r.id() + "' is already used at "
                        + first.file() + ":" + first.line(), "give each part its own id"));
                ok = false;
            }
        }
        if (ok) {
            parts.add(r.part());
        }
    }

    private static String idField(PartReader.Result r) {
        return r.prefix().isEmpty() ? CatalogKeys.ID : r.prefix() + "." + CatalogKeys.ID;
    }

    /** One warning when prices are in several currencies: ranking compares the numbers as written. */
    private static void currencies(List<Part> parts, List<Problem> problems) {
        Map<String, Part> byCurrency = new LinkedHashMap<>();
        for (Part p : parts) {
            byCurrency.putIfAbsent(p.price().currency(), p);
        }
        if (byCurrency.size() > 1) {
            Part other = new ArrayList<>(byCurrency.values()).get(1);
            problems.add(Problem.warning(other.where(), "", "part '" + other.id() + "' is priced in "
                    + other.price().currency() + "; the catalog uses " + String.join(", ", byCurrency.keySet())
                    + ", and prices are compared as plain numbers", "convert every price to one currency"));
        }
    }
}
