package dev.ampsieve.catalog;

import dev.ampsieve.yaml.BoundedFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.Located;
import dev.ampsieve.yaml.Node;
import dev.ampsieve.yaml.Problem;
import dev.ampsieve.yaml.YamlFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryIteratorException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Reads every {@code *.yaml} / {@code *.yml} file below a folder into validated {@link Part}s.
 *
 * <p>Files are read in sorted order of their path below the root, so problems and parts come
 * out the same on every machine. Hidden folders (the search index lives in one) and folders
 * named {@value #STAGES_FOLDER} (stage files, not parts) are skipped; links are followed only
 * to places inside the folder, and only regular files are read (see {@link Walk}). A file holds one part
 * (a mapping with {@code id}) or several (a {@code parts:} list). A part with an error is
 * left out and the rest load, unless {@code strict}.
 */
public final class CatalogLoader {
    private CatalogLoader() {}

    /** Sub-folders of this name hold stage files, which the catalog does not read. */
    public static final String STAGES_FOLDER = "stages";

    /** The fix for a catalog folder that cannot be used. */
    static final String ROOT_FIX =
            "give the catalog folder with --catalog DIR or the environment variable AMPSIEVE_CATALOG";

    /** At most this many catalog files (*.yaml, *.yml); a hand-typed catalog has tens to hundreds. */
    public static final int MAX_FILES = 20_000;
    /** At most this many bytes in all catalog files together (512 MiB). */
    public static final long MAX_TOTAL_BYTES = 512L * 1024 * 1024;
    /** At most this many folder entries of any kind are looked at: a guard against {@code --catalog /}. */
    public static final int MAX_ENTRIES = 200_000;

    /**
     * Bounds on one catalog; past any of them loading stops with an error, strict or not.
     *
     * @param files   catalog files found
     * @param bytes   bytes of catalog files, as reported while listing and as read
     * @param entries folder entries of any kind looked at
     */
    record Limits(int files, long bytes, int entries) {
        static final Limits DEFAULT = new Limits(MAX_FILES, MAX_TOTAL_BYTES, MAX_ENTRIES);
    }

    /**
     * @param strict when true, any error fails the whole load with an {@link InputException}
     *               carrying every problem found
     * @throws InputException when {@code root} is not a readable folder, when the catalog is past
     *                        one of its limits ({@link #MAX_FILES}, {@link #MAX_TOTAL_BYTES},
     *                        {@link #MAX_ENTRIES}), or {@code strict} and any error
     */
    public static Catalog load(Path root, boolean strict) throws InputException {
        return load(root, strict, Limits.DEFAULT, null);
    }

    /**
     * As {@link #load(Path, boolean)}, taking each file's parts from {@code cache} when the file's
     * bytes are unchanged since they were stored (and storing what had to be parsed). The result
     * is the same as without a cache, problems and places included: every file is still listed,
     * read and counted against the limits, and only its parsing is skipped. A file with an error
     * is never stored.
     *
     * @param cache null for none
     */
    public static Catalog load(Path root, boolean strict, Cache cache) throws InputException {
        return load(root, strict, Limits.DEFAULT, cache);
    }

    static Catalog load(Path root, boolean strict, Limits limits) throws InputException {
        return load(root, strict, limits, null);
    }

    static Catalog load(Path root, boolean strict, Limits limits, Cache cache) throws InputException {
        if (!Files.exists(root)) {
            throw new InputException(Problem.error(Located.nowhere(root), "", "catalog folder not found", ROOT_FIX));
        }
        if (!Files.isDirectory(root)) {
            throw new InputException(Problem.error(
                    Located.nowhere(root),
                    "",
                    "this is a file, not a catalog folder",
                    ROOT_FIX + " (the folder holding the *.yaml files)"));
        }
        List<Problem> problems = new ArrayList<>();
        List<Path> files = list(root, problems, limits);
        List<Part> parts = new ArrayList<>();
        Map<String, Located> ids = new HashMap<>();
        long[] bytesRead = {0};
        List<String> keys = new ArrayList<>();
        Map<Path, String> fileKeys = new HashMap<>();
        MessageDigest sources = sha256();
        sources.update(ParsedFileCodec.IDENTITY);
        try (Reads reads = new Reads(files, cache)) {
            for (int i = 0; i < files.size(); i++) {
                Path file = files.get(i);
                List<Problem> fileProblems = new ArrayList<>();
                String name = root.relativize(file).toString().replace('\\', '/');
                sources.update(name.getBytes(StandardCharsets.UTF_8));
                sources.update((byte) 0);
                byte[] content = accept(root, reads.get(i), limits, bytesRead, keys, parts, ids, fileProblems);
                sources.update(content == null ? new byte[1] : content);
                if (content != null) {
                    fileKeys.put(file, cacheKey(content));
                }
                // top to bottom within a file, whatever order the checks ran in
                fileProblems.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
                problems.addAll(fileProblems);
            }
        }
        if (files.isEmpty() && problems.isEmpty()) {
            problems.add(Problem.warning(
                    Located.nowhere(root),
                    "",
                    "no catalog files (*.yaml, *.yml) below this folder",
                    "add parts (catalog-template/part.yaml shows every key) or " + ROOT_FIX));
        }
        currencies(parts, problems);
        if (cache != null) {
            cache.retain(new HashSet<>(keys));
        }
        if (strict && problems.stream().anyMatch(Problem::isError)) {
            throw new InputException(problems);
        }
        return new Catalog(root, parts, problems, files.size(), HexFormat.of().formatHex(sources.digest()), fileKeys);
    }

    /**
     * The catalog files below {@code root} exactly as {@link #load} finds them (same walk, same
     * limits), for the search index's fingerprint; empty when the folder cannot be walked, in
     * which case {@link #load} has already failed.
     */
    public static List<Path> files(Path root) {
        try {
            return list(root, new ArrayList<>(), Limits.DEFAULT);
        } catch (InputException e) {
            return List.of();
        }
    }

    /** The catalog files below {@code root}, sorted by relative path; what cannot be read becomes problems. */
    static List<Path> list(Path root, List<Problem> problems, Limits limits) throws InputException {
        List<Problem> found = new ArrayList<>();
        Walk walk = new Walk(root, found, limits);
        try {
            walk.run();
        } catch (IOException e) {
            found.add(Problem.error(
                    Located.nowhere(root),
                    "",
                    "cannot list the folder (" + YamlFiles.describe(e) + ")",
                    "check its permissions"));
        }
        Comparator<Path> byPath =
                Comparator.comparing(p -> root.relativize(p).toString().replace('\\', '/'));
        found.sort(Comparator.comparing(Problem::file, byPath)); // stable: one file's problems keep their order
        problems.addAll(found);
        List<Path> files = walk.files;
        files.sort(byPath);
        return files;
    }

    /**
     * The walk below a catalog folder: its real folders, and links to files inside it. Links to
     * folders are never followed, so no link can make the walk loop or leave the catalog: a link
     * to a folder outside ({@code /}, a home folder) is skipped with a warning, as is a link
     * back to a folder that holds it ({@code sub/loop -> ..}) and one to a folder inside the
     * catalog (read in its own place). A link to a file is read if the file is inside the
     * catalog folder (compared by real path) and not read already under its own name. Pipes,
     * devices and sockets are never opened. Counts and sizes are bounded by {@link Limits}.
     *
     * <p>Each entry's type is read before it is used; something swapped between that look and
     * the read (a race only someone with write access to the folder could run) still meets the
     * limits, and {@link BoundedFiles}, which checks the type again before opening.
     */
    private static final class Walk {
        /** A link to a regular file inside the catalog: where it is, its target, the target's size. */
        private record FileLink(Path link, Path real, long size) {}

        final Path root;
        final List<Problem> problems;
        final Limits limits;
        final List<Path> files = new ArrayList<>();
        /** Real path of each catalog file taken, to the path it was taken by. */
        final Map<Path, Path> taken = new HashMap<>();
        /** Links to files inside the catalog, taken after the walk so a file's own name wins. */
        final List<FileLink> fileLinks = new ArrayList<>();

        Path rootReal;
        int entries;
        long bytes;

        Walk(Path root, List<Problem> problems, Limits limits) {
            this.root = root;
            this.problems = problems;
            this.limits = limits;
        }

        void run() throws IOException, InputException {
            rootReal = root.toRealPath();
            folder(root, rootReal);
            for (FileLink link : fileLinks) {
                Path first = taken.get(link.real());
                if (first != null) {
                    problems.add(Problem.warning(
                            Located.nowhere(link.link()),
                            "",
                            "the link leads to " + first + ", which is read under its own name; skipped",
                            "remove the link (each file is read once)"));
                } else {
                    take(link.link(), link.real(), link.size());
                }
            }
        }

        /** Reads one folder, entries sorted by name so problems come out in the same order everywhere. */
        private void folder(Path dir, Path dirReal) throws InputException {
            List<Path> children = new ArrayList<>();
            try (DirectoryStream<Path> stream = Files.newDirectoryStream(dir)) {
                for (Path child : stream) {
                    if (++entries > limits.entries()) {
                        throw new InputException(Problem.error(
                                Located.nowhere(root),
                                "",
                                "more than " + limits.entries()
                                        + " files and folders below the catalog folder; stopped",
                                "give the folder that holds the catalog files with --catalog DIR (the limit keeps a"
                                        + " mistyped folder such as / from being searched)"));
                    }
                    children.add(child);
                }
            } catch (IOException e) {
                problems.add(Problem.error(
                        Located.nowhere(dir),
                        "",
                        "cannot read (" + YamlFiles.describe(e) + ")",
                        "check its permissions"));
                return;
            } catch (DirectoryIteratorException e) { // an entry that fails while listing (e.g. in /proc)
                problems.add(Problem.error(
                        Located.nowhere(dir),
                        "",
                        "cannot read (" + YamlFiles.describe(e.getCause()) + ")",
                        "check its permissions"));
                return;
            }
            children.sort(Comparator.comparing(p -> p.getFileName().toString()));
            for (Path child : children) {
                entry(child, dirReal);
            }
        }

        private void entry(Path child, Path dirReal) throws InputException {
            String name = child.getFileName().toString();
            if (name.startsWith(".")) {
                return; // hidden files and folders; the search index (.ampsieve-index) is one
            }
            boolean catalogName = isCatalogFile(child);
            BasicFileAttributes own;
            try {
                own = Files.readAttributes(child, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
            } catch (IOException e) {
                if (catalogName) {
                    problems.add(Problem.error(
                            Located.nowhere(child),
                            "",
                            "cannot read (" + YamlFiles.describe(e) + ")",
                            "check its permissions"));
                }
                return;
            }
            if (own.isDirectory()) {
                if (!name.equals(STAGES_FOLDER)) {
                    folder(child, dirReal.resolve(name));
                }
                return;
            }
            if (!own.isSymbolicLink()) {
                if (catalogName) {
                    if (own.isRegularFile()) {
                        take(child, dirReal.resolve(name), own.size());
                    } else {
                        special(child, own);
                    }
                }
                return;
            }
            Path real;
            BasicFileAttributes target;
            try {
                real = child.toRealPath();
                target = Files.readAttributes(real, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
            } catch (NoSuchFileException e) {
                if (catalogName) {
                    problems.add(Problem.error(
                            Located.nowhere(child), "", "the link's target does not exist", "fix or remove the link"));
                }
                return;
            } catch (IOException e) {
                if (catalogName) {
                    problems.add(Problem.error(
                            Located.nowhere(child),
                            "",
                            "cannot follow the link (" + YamlFiles.describe(e) + ")",
                            "fix or remove the link"));
                }
                return;
            }
            if (target.isDirectory()) {
                if (!name.equals(STAGES_FOLDER)) {
                    folderLink(child, real, dirReal);
                }
            } else if (!catalogName) {
                return;
            } else if (!target.isRegularFile()) {
                special(child, target);
            } else if (!real.startsWith(rootReal)) {
                outside(child, real);
            } else {
                fileLinks.add(new FileLink(child, real, target.size()));
            }
        }

        private void folderLink(Path link, Path real, Path holderReal) {
            if (!real.startsWith(rootReal)) {
                outside(link, real);
            } else if (holderReal.startsWith(real)) {
                problems.add(Problem.warning(
                        Located.nowhere(link),
                        "",
                        "the link leads back to " + shown(real) + ", which holds it (a loop); skipped",
                        "remove the link"));
            } else {
                problems.add(Problem.warning(
                        Located.nowhere(link),
                        "",
                        "the link leads to " + shown(real) + ", a folder inside the catalog; links to folders are not"
                                + " followed (the folder is read, or skipped, in its own place)",
                        "remove the link"));
            }
        }

        private void outside(Path link, Path real) {
            problems.add(Problem.warning(
                    Located.nowhere(link),
                    "",
                    "the link leads outside the catalog folder (to " + real + "); skipped",
                    "copy what it points to into the catalog folder, or give that folder with --catalog DIR"));
        }

        private void special(Path file, BasicFileAttributes attrs) {
            problems.add(Problem.error(
                    Located.nowhere(file),
                    "",
                    "not a regular file (" + BoundedFiles.kind(file, attrs) + "); skipped",
                    "remove it or rename it: the catalog reads only regular *.yaml and *.yml files"));
        }

        /** A folder inside the catalog, named from the catalog folder as the user gave it. */
        private Path shown(Path real) {
            return root.resolve(rootReal.relativize(real));
        }

        /** @param size as the file reports it; the bytes read are counted again in {@link #accept(Path, FileRead, Limits, long[], List, List, Map, List)} */
        private void take(Path file, Path real, long size) throws InputException {
            if (files.size() >= limits.files()) {
                throw tooManyFiles(root, limits);
            }
            bytes += size;
            if (bytes > limits.bytes()) {
                throw tooManyBytes(root, limits);
            }
            taken.put(real, file);
            files.add(file);
        }
    }

    private static InputException tooManyFiles(Path root, Limits limits) {
        return new InputException(Problem.error(
                Located.nowhere(root),
                "",
                "more than " + limits.files() + " catalog files (*.yaml, *.yml) below this folder; stopped",
                "split the catalog into folders of fewer files and give one with --catalog DIR"));
    }

    private static InputException tooManyBytes(Path root, Limits limits) {
        return new InputException(Problem.error(
                Located.nowhere(root),
                "",
                "the catalog files add up to more than " + limits.bytes() + " bytes"
                        + BoundedFiles.mebibytes(limits.bytes()) + "; stopped",
                "split the catalog into smaller folders and give one with --catalog DIR"));
    }

    /**
     * Top-level keys of a stage file that no part has (the stage package's key table; the catalog
     * may not depend on it, so {@code CatalogLoaderTest} checks these against {@code StageKeys}).
     */
    static final List<String> STAGE_KEYS = List.of(
            "limit",
            "gain",
            "criterion",
            "topology",
            "rf",
            "rg",
            "band",
            "full-scale-output",
            "source-resistance",
            "max-to-sigma",
            "trials");

    /** A mapping with no {@code id} and at least one key only stage files have. */
    private static boolean looksLikeStage(Node.Mapping m) {
        return !m.entries().containsKey(CatalogKeys.ID)
                && m.entries().keySet().stream().anyMatch(STAGE_KEYS::contains);
    }

    private static boolean isCatalogFile(Path file) {
        String name = file.getFileName().toString();
        String lower = name.toLowerCase(Locale.ROOT);
        return !name.startsWith(".") && (lower.endsWith(".yaml") || lower.endsWith(".yml"));
    }

    /**
     * One catalog file read, hashed and parsed (or taken from the cache): everything about it that
     * depends on its bytes alone, so it can be made on any thread.
     *
     * @param problems why the file could not be read (then the rest is null), else empty
     * @param length   bytes read
     * @param content  the SHA-256 of the bytes
     * @param key      the cache key, null without a cache
     */
    private record FileRead(List<Problem> problems, long length, byte[] content, String key, ParsedFile parsed) {}

    /**
     * Reads {@code file}; stores its parse in {@code cache} when it was parsed afresh, had no error
     * and {@code caller} (the thread loading the catalog) was not interrupted.
     */
    private static FileRead read(Path file, Cache cache, Thread caller) {
        byte[] bytes;
        try {
            bytes = BoundedFiles.read(file, YamlFiles.MAX_BYTES);
        } catch (InputException e) {
            return new FileRead(e.problems(), 0, null, null, null);
        }
        byte[] content = sha256().digest(bytes);
        ParsedFile parsed = null;
        String key = null;
        if (cache != null) {
            key = cacheKey(content);
            parsed = cached(cache, key, file);
        }
        if (parsed == null) {
            parsed = parse(bytes, file);
            // a file with an error is read afresh each time: it is being edited, and an error may
            // come from the moment (an interrupted read) rather than from the bytes
            if (cache != null
                    && !parsed.hasErrors()
                    && !caller.isInterrupted()
                    && !Thread.currentThread().isInterrupted()) {
                cache.put(key, ParsedFileCodec.encode(parsed, file));
            }
        }
        return new FileRead(List.of(), bytes.length, content, key, parsed);
    }

    /** @return the SHA-256 of the file's bytes, or null when it could not be read */
    private static byte[] accept(
            Path catalogRoot,
            FileRead read,
            Limits limits,
            long[] bytesRead,
            List<String> keys,
            List<Part> parts,
            Map<String, Located> ids,
            List<Problem> problems)
            throws InputException {
        if (read.content() == null) {
            problems.addAll(read.problems());
            return null;
        }
        // counted again as read: a file may have grown since it was listed
        bytesRead[0] += read.length();
        if (bytesRead[0] > limits.bytes()) {
            throw tooManyBytes(catalogRoot, limits);
        }
        ParsedFile parsed = read.parsed();
        if (read.key() != null && !parsed.hasErrors()) {
            keys.add(read.key());
        }
        problems.addAll(parsed.leading());
        for (ParsedFile.Entry e : parsed.entries()) {
            accept(e, parts, ids, problems);
        }
        return read.content();
    }

    /**
     * The catalog's files read in order, several at once: each file is read, hashed and parsed
     * (or taken from the cache) on a pool of one thread per core, at most {@link #AHEAD} files
     * ahead of the one the loader takes next, while the loader takes the results strictly in file
     * order, so parts, ids, problems and limits come out exactly as from one thread. A file's
     * result depends on its bytes alone ({@link #parse}); parsing was most of the time of a first
     * load (about 1.3 ms of CPU per part, issue 13). Should the loading thread be interrupted (the
     * shell's Ctrl-C), the files not yet taken are read on that thread, as without the pool.
     */
    private static final class Reads implements AutoCloseable {
        /** Files read ahead per thread: enough to keep the pool busy, few enough to bound memory. */
        static final int AHEAD = 4;

        private final List<Path> files;
        private final Cache cache;
        private final Thread caller = Thread.currentThread();
        private final ExecutorService pool;
        private final List<Future<FileRead>> pending = new ArrayList<>();
        private final int window;

        Reads(List<Path> files, Cache cache) {
            this.files = files;
            this.cache = cache;
            int threads = Math.min(Runtime.getRuntime().availableProcessors(), files.size());
            if (threads < 2) {
                pool = null;
                window = 0;
                return;
            }
            pool = Executors.newFixedThreadPool(threads, r -> {
                Thread t = new Thread(r, "ampsieve-catalog-read");
                t.setDaemon(true);
                return t;
            });
            window = AHEAD * threads;
        }

        /** The read of file {@code i}; called with i = 0, 1, 2 ... in turn. */
        FileRead get(int i) {
            Path file = files.get(i);
            if (pool == null || caller.isInterrupted()) {
                return read(file, cache, caller);
            }
            while (pending.size() < files.size() && pending.size() <= i + window) {
                Path next = files.get(pending.size());
                pending.add(pool.submit(() -> read(next, cache, caller)));
            }
            Future<FileRead> f = pending.get(i);
            pending.set(i, null); // its result is not kept once taken
            try {
                return f.get();
            } catch (InterruptedException e) {
                caller.interrupt();
                return read(file, cache, caller);
            } catch (ExecutionException e) {
                // read() returns every input problem; anything else is a fault in the program
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException re) {
                    throw re;
                }
                if (cause instanceof Error err) {
                    throw err;
                }
                throw new IllegalStateException(cause);
            }
        }

        @Override
        public void close() {
            if (pool != null) {
                pool.shutdownNow(); // files read ahead of a load that stopped are not needed
            }
        }
    }

    /**
     * A store of parsed files by key (the SHA-256 of the loader's identity and a file's bytes),
     * kept by a caller that has a place for it (the search index's folder). Every method must
     * work as a cache: never fail, and a missing or unusable entry is simply null.
     */
    public interface Cache {
        /** The bytes stored under {@code key}, or null when there are none that can be trusted. */
        byte[] get(String key);

        /** Stores {@code value} under {@code key} (best effort). */
        void put(String key, byte[] value);

        /** Called after each load with the keys the catalog uses now; entries under other keys may go. */
        void retain(Set<String> keys);
    }

    /**
     * The hex SHA-256 of the loader's identity ({@link ParsedFileCodec#IDENTITY}) and a file's
     * content hash (the SHA-256 of its bytes).
     */
    static String cacheKey(byte[] contentSha256) {
        MessageDigest md = sha256();
        md.update(ParsedFileCodec.IDENTITY);
        md.update(contentSha256);
        return HexFormat.of().formatHex(md.digest());
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /** The entry under {@code key}, or null when there is none or it does not decode. */
    private static ParsedFile cached(Cache cache, String key, Path file) {
        byte[] stored = cache.get(key);
        if (stored == null) {
            return null;
        }
        try {
            return ParsedFileCodec.decode(stored, file);
        } catch (IOException e) {
            return null; // not trusted: parsed afresh (and stored again)
        }
    }

    /** One file's bytes read as catalog parts: a pure function of the bytes and the file's name. */
    static ParsedFile parse(byte[] bytes, Path file) {
        List<Problem> problems = new ArrayList<>();
        List<ParsedFile.Entry> entries = new ArrayList<>();
        Node root;
        try {
            root = YamlFiles.parse(YamlFiles.decode(bytes, file), file);
        } catch (InputException e) {
            return new ParsedFile(e.problems(), entries);
        }
        if (root instanceof Node.Scalar s && s.text() == null) {
            problems.add(Problem.warning(
                    root.at(),
                    "",
                    "empty file, no parts",
                    "add a part (catalog-template/part.yaml shows every key) or delete the file"));
            return new ParsedFile(problems, entries);
        }
        if (root instanceof Node.Mapping m && m.entries().containsKey(CatalogKeys.PARTS)) {
            for (var e : m.keyAt().entrySet()) {
                if (!e.getKey().equals(CatalogKeys.PARTS)) {
                    problems.add(Problem.error(
                            e.getValue(),
                            e.getKey(),
                            "unknown key beside 'parts:' (a file with a parts list holds only that list)",
                            "move it into one of the parts, or remove it"));
                }
            }
            Node list = m.entries().get(CatalogKeys.PARTS);
            if (list instanceof Node.Seq seq) {
                for (int i = 0; i < seq.items().size(); i++) {
                    entries.add(entry(PartReader.read(seq.items().get(i), CatalogKeys.PARTS + "[" + i + "]", false)));
                }
            } else if (list instanceof Node.Scalar s && s.text() == null) {
                problems.add(Problem.warning(
                        list.at(), CatalogKeys.PARTS, "the list is empty", "add parts as '- id: ...' items"));
            } else {
                problems.add(Problem.error(
                        list.at(),
                        CatalogKeys.PARTS,
                        "expected a list of parts, found " + list.kind(),
                        "write each part as an item starting with '- id: ...', indented below 'parts:'"));
            }
            return new ParsedFile(problems, entries);
        }
        if (root instanceof Node.Mapping m && looksLikeStage(m)) {
            problems.add(Problem.warning(
                    root.at(),
                    "",
                    "looks like a stage file (it has "
                            + String.join(
                                    ", ",
                                    m.entries().keySet().stream()
                                            .filter(STAGE_KEYS::contains)
                                            .limit(3)
                                            .toList())
                            + " and no id); skipped",
                    "move it to a '" + STAGES_FOLDER
                            + "' folder (which the catalog does not read) and pass it with --stage"));
            return new ParsedFile(problems, entries);
        }
        if (root instanceof Node.Seq) {
            problems.add(Problem.error(
                    root.at(),
                    "",
                    "the file is a bare list",
                    "put 'parts:' on a line of its own above the list and indent the list below it"));
            return new ParsedFile(problems, entries);
        }
        entries.add(entry(PartReader.read(root, "", true)));
        return new ParsedFile(problems, entries);
    }

    private static ParsedFile.Entry entry(PartReader.Result r) {
        return new ParsedFile.Entry(r.prefix(), r.id(), r.idAt(), r.part(), r.problems());
    }

    /** What {@link #readPart} found: the part (null when it has an error) and every problem. */
    public record PartText(Part part, List<Problem> problems) {}

    /**
     * Reads YAML text holding one part with exactly the rules a catalog file gets (for tools that
     * write catalog files and must not write one the catalog would refuse). Problems name
     * {@code file} and places in {@code text}.
     */
    public static PartText readPart(String text, Path file) {
        Node root;
        try {
            root = YamlFiles.parse(text, file);
        } catch (InputException e) {
            return new PartText(null, e.problems());
        }
        PartReader.Result r = PartReader.read(root, "", true);
        List<Problem> sorted = new ArrayList<>(r.problems());
        sorted.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
        return new PartText(r.part(), sorted);
    }

    /** The catalog's rule for an id: null when {@code id} is valid, else the error naming {@code at}. */
    public static Problem idProblem(String id, Located at) {
        return PartReader.idProblem(id, at, CatalogKeys.ID);
    }

    /** Keeps the part unless it has errors or its id was taken by an earlier part. */
    private static void accept(ParsedFile.Entry r, List<Part> parts, Map<String, Located> ids, List<Problem> problems) {
        problems.addAll(r.problems());
        boolean ok = r.part() != null;
        if (r.id() != null) {
            Located first = ids.putIfAbsent(r.id(), r.idAt());
            if (first != null) {
                problems.add(Problem.error(
                        r.idAt(),
                        idField(r),
                        "id '" + r.id() + "' is already used at " + first.file() + ":" + first.line(),
                        "give each part its own id"));
                ok = false;
            }
        }
        if (ok) {
            parts.add(r.part());
        }
    }

    private static String idField(ParsedFile.Entry r) {
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
            problems.add(Problem.warning(
                    other.where(),
                    "",
                    "part '" + other.id() + "' is priced in "
                            + other.price().currency() + "; the catalog uses " + String.join(", ", byCurrency.keySet())
                            + ", and prices are compared as plain numbers",
                    "convert every price to one currency"));
        }
    }
}
