package dev.ampsieve.search;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Stream;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexNotFoundException;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.MultiTerms;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.SortField;
import org.apache.lucene.search.TermInSetQuery;
import org.apache.lucene.search.TopFieldDocs;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.Lock;
import org.apache.lucene.store.LockObtainFailedException;
import org.apache.lucene.util.BytesRef;

/**
 * The searchable index of a catalog. It is a cache: {@link #open} reuses the one on disk
 * when its stored fingerprint ({@link CatalogFingerprint}) matches the catalog, and otherwise
 * brings it up to date. A missing, truncated or corrupt index is rebuilt, deleting only files
 * Lucene's index file names match; when another process holds the write lock, a current index
 * is opened read-only and a stale one is replaced by a private in-memory index for this run.
 * Only a folder ampsieve made is used ({@link IndexFolder}); any other is left untouched, named
 * in {@link #refusals()}, and the next place is tried. Deleting the folder is always safe.
 */
public final class PartIndex implements Closeable {

    /** How the index was obtained; tests and --verbose use it. */
    public enum Source {
        /** The index on disk was current and used as it is. */
        REUSED,
        /** The index on disk was missing or stale and was brought up to date. */
        BUILT,
        /** The index on disk was damaged, deleted and built again. */
        REBUILT,
        /** Another process holds the write lock; the current index on disk is read without it. */
        READ_ONLY,
        /** No usable index on disk could be had; this run searches an index in memory. */
        MEMORY
    }

    /** Commit user-data keys. */
    static final String FINGERPRINT = "ampsieve.fingerprint";

    private final Directory directory;
    private final DirectoryReader reader;
    private final IndexSearcher searcher;
    private final Source source;
    private final Path location;
    private final List<FolderRefusal> refusals;

    private PartIndex(
            Directory directory, DirectoryReader reader, Source source, Path location, List<FolderRefusal> refusals) {
        this.directory = directory;
        this.reader = reader;
        this.searcher = new IndexSearcher(reader);
        this.source = source;
        this.location = location;
        this.refusals = List.copyOf(refusals);
    }

    public Source source() {
        return source;
    }

    /** The folder on disk, or null for an index in memory. */
    public Path location() {
        return location;
    }

    /** Folders this open left untouched because ampsieve did not make them, in the order tried. */
    public List<FolderRefusal> refusals() {
        return refusals;
    }

    /** Opens the index of {@code catalog} at its usual place ({@link IndexLocation#candidates}). */
    public static PartIndex open(Catalog catalog) {
        return open(catalog, System.getenv(), Path.of(System.getProperty("user.home", ".")));
    }

    /** As {@link #open(Catalog)} with the environment and home folder given (tests). */
    static PartIndex open(Catalog catalog, Map<String, String> env, Path home) {
        String fingerprint = CatalogFingerprint.of(catalog);
        List<FolderRefusal> refusals = new ArrayList<>();
        for (Path folder : IndexLocation.candidates(catalog.root(), env, home, Files::isWritable)) {
            PartIndex index = openIn(catalog, folder, fingerprint, refusals);
            if (index != null) {
                return index;
            }
        }
        return inMemory(catalog, fingerprint, refusals);
    }

    /** Opens (building or repairing as needed) the index of {@code catalog} in {@code folder}, else in memory. */
    public static PartIndex open(Catalog catalog, Path folder) {
        String fingerprint = CatalogFingerprint.of(catalog);
        List<FolderRefusal> refusals = new ArrayList<>();
        PartIndex index = openIn(catalog, folder.toAbsolutePath().normalize(), fingerprint, refusals);
        return index != null ? index : inMemory(catalog, fingerprint, refusals);
    }

    /**
     * The index in {@code folder}, or in memory when the folder is ours but no index can be had
     * there; null when the folder is not ours ({@code refusals} then names it) or cannot be made,
     * so the caller may try another place.
     */
    private static PartIndex openIn(Catalog catalog, Path folder, String fingerprint, List<FolderRefusal> refusals) {
        FSDirectory fs;
        try {
            FolderRefusal refused = IndexFolder.claim(folder);
            if (refused != null) {
                refusals.add(refused);
                return null;
            }
            fs = FSDirectory.open(folder);
            // FSDirectory works on the folder's real path: were the folder swapped for a link since
            // the check, that path would lie elsewhere
            if (!fs.getDirectory().equals(folder.getParent().toRealPath().resolve(folder.getFileName()))) {
                closeQuietly(fs);
                return null;
            }
        } catch (IOException e) {
            return null;
        }
        boolean damaged = false;
        for (int attempt = 0; attempt < 2; attempt++) {
            try {
                int written = bringUpToDate(fs, catalog, fingerprint);
                DirectoryReader r = openVerified(fs, fingerprint);
                if (r != null) {
                    Source s = damaged ? Source.REBUILT : written >= 0 ? Source.BUILT : Source.REUSED;
                    PartIndex index = new PartIndex(fs, r, s, folder, refusals);
                    index.written = Math.max(0, written);
                    return index;
                }
                damaged = true; // a commit we just made does not read back: treat as damage
            } catch (LockObtainFailedException e) {
                // another process is writing: read its index if it is current, else keep to memory
                DirectoryReader r = readOnly(fs, fingerprint);
                if (r != null) {
                    return new PartIndex(fs, r, Source.READ_ONLY, folder, refusals);
                }
                break;
            } catch (IOException | RuntimeException e) {
                // truncated or corrupt files (CorruptIndexException, EOFException,
                // IndexFormatTooOldException, NoSuchFileException ...): start afresh
                damaged = true;
            }
            if (!wipe(fs)) {
                break;
            }
        }
        closeQuietly(fs);
        return inMemory(catalog, fingerprint, refusals);
    }

    /** A private index in memory (when no folder can be used). */
    public static PartIndex inMemory(Catalog catalog) {
        return inMemory(catalog, CatalogFingerprint.of(catalog), List.of());
    }

    private static PartIndex inMemory(Catalog catalog, String fingerprint, List<FolderRefusal> refusals) {
        Directory mem = new ByteBuffersDirectory();
        try {
            try (IndexWriter w = new IndexWriter(mem, config())) {
                reindex(w, catalog, fingerprint);
            }
            return new PartIndex(mem, DirectoryReader.open(mem), Source.MEMORY, null, refusals);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot build the index in memory", e);
        }
    }

    /**
     * One segment's worth of documents is buffered before a flush: a 100,000-part catalog makes
     * about 150 MB of buffered postings, points and doc values, so with Lucene's default 16 MB it
     * flushed and merged many small segments during one build (bench/RESULTS.md, 2026-12-02).
     * 64 MB keeps the heap of a 100,000-part build under 512 MB.
     */
    static final double RAM_BUFFER_MB = 64;

    private static IndexWriterConfig config() {
        return new IndexWriterConfig(new WordAnalyzer())
                .setOpenMode(IndexWriterConfig.OpenMode.CREATE_OR_APPEND)
                .setRAMBufferSizeMB(RAM_BUFFER_MB)
                // written once per catalog change and read many times: no compound-file copy step
                .setUseCompoundFile(false);
    }

    /**
     * Takes the write lock (failing at once when another process holds it) and re-indexes when
     * the stored fingerprint differs. Returns whether it wrote.
     */
    private static int bringUpToDate(Directory dir, Catalog catalog, String fingerprint) throws IOException {
        try (IndexWriter w = new IndexWriter(dir, config())) {
            if (fingerprint.equals(storedFingerprint(dir))) {
                return -1;
            }
            return reindex(w, catalog, fingerprint);
        }
    }

    /**
     * Not a search field (no query names it): which file a document came from, as the SHA-256 of
     * the file's key ({@link Catalog#fileKeys()}) and the ids kept from it. Equal terms mean equal
     * documents, so a catalog edit re-indexes only the files whose term changed.
     */
    static final String SOURCE_FILE = "ampsieve.source-file";

    /**
     * Brings the index to the catalog and commits with the fingerprint: only the documents of
     * changed files when every document carries its file's term ({@link #incremental}), else every
     * part's document replaced by id and the parts no longer in the catalog dropped.
     *
     * @return the documents written
     */
    private static int reindex(IndexWriter w, Catalog catalog, String fingerprint) throws IOException {
        List<Part> parts = catalog.parts();
        Map<Path, String> fileTerms = fileTerms(catalog);
        // an empty index (new, or wiped after damage) has nothing to replace: adding skips a
        // delete-by-id per part
        boolean empty = !w.hasDeletions() && w.getDocStats().maxDoc == 0;
        int written = empty || fileTerms == null ? -1 : incremental(w, parts, fileTerms);
        if (written < 0) {
            write(w, parts, fileTerms, !empty);
            List<BytesRef> ids = new ArrayList<>();
            for (Part p : parts) {
                ids.add(new BytesRef(p.id()));
            }
            w.deleteDocuments(new BooleanQuery.Builder()
                    .add(new MatchAllDocsQuery(), Occur.MUST)
                    .add(new TermInSetQuery(Schema.ID, ids), Occur.MUST_NOT)
                    .build());
            written = parts.size();
        }
        w.setLiveCommitData(Map.of(FINGERPRINT, fingerprint).entrySet());
        w.commit();
        return written;
    }

    /** Below this many documents one thread writes them all: starting another costs more than it saves. */
    static final int PARALLEL_FROM = 2_000;

    /**
     * Writes the documents of {@code parts}, replacing each by id when {@code replace}, else
     * adding it. {@link IndexWriter} takes documents from several threads at once, each thread
     * filling its own in-memory segment, so a large catalog is split into one contiguous slice per
     * core (at most {@link #maxThreads}), the calling thread writing the first. Which segment
     * holds a document changes nothing a search returns: scores use the whole index's statistics
     * and hits are ordered by score, price and id.
     */
    private static void write(IndexWriter w, List<Part> parts, Map<Path, String> fileTerms, boolean replace)
            throws IOException {
        int threads = parts.size() < PARALLEL_FROM ? 1 : maxThreads();
        if (threads == 1) {
            writeSlice(w, parts, fileTerms, replace, new AtomicBoolean());
            return;
        }
        AtomicBoolean failed = new AtomicBoolean();
        List<Thread> helpers = new ArrayList<>();
        List<Throwable> errors = new CopyOnWriteArrayList<>();
        int n = parts.size();
        for (int t = 1; t < threads; t++) {
            List<Part> slice = parts.subList(n * t / threads, n * (t + 1) / threads);
            Thread helper = new Thread(
                    () -> {
                        try {
                            writeSlice(w, slice, fileTerms, replace, failed);
                        } catch (IOException | RuntimeException | Error e) {
                            failed.set(true);
                            errors.add(e);
                        }
                    },
                    "ampsieve-index-" + t);
            helper.setDaemon(true);
            helper.start();
            helpers.add(helper);
        }
        try {
            writeSlice(w, parts.subList(0, n / threads), fileTerms, replace, failed);
        } catch (IOException | RuntimeException | Error e) {
            failed.set(true);
            errors.add(0, e);
        } finally {
            // the writer is closed by the caller: no helper may still be adding to it then
            boolean interrupted = false;
            for (Thread h : helpers) {
                while (h.isAlive()) {
                    try {
                        h.join();
                    } catch (InterruptedException e) {
                        interrupted = true;
                    }
                }
            }
            if (interrupted) {
                Thread.currentThread().interrupt();
            }
        }
        if (!errors.isEmpty()) {
            Throwable first = errors.get(0);
            errors.subList(1, errors.size()).forEach(first::addSuppressed);
            if (first instanceof IOException io) {
                throw io;
            }
            if (first instanceof RuntimeException re) {
                throw re;
            }
            throw (Error) first;
        }
    }

    /** Threads for a large build: one per core, at most 4 (each holds a segment in memory). */
    static int maxThreads() {
        return Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));
    }

    private static void writeSlice(
            IndexWriter w, List<Part> slice, Map<Path, String> fileTerms, boolean replace, AtomicBoolean failed)
            throws IOException {
        for (Part p : slice) {
            if (failed.get()) {
                return; // another thread failed: the build is given up
            }
            Document d = document(p, fileTerms);
            if (replace) {
                w.updateDocument(new Term(Schema.ID, p.id()), d);
            } else {
                w.addDocument(d);
            }
        }
    }

    private static Document document(Part p, Map<Path, String> fileTerms) {
        Document d = PartDocuments.of(p);
        if (fileTerms != null) {
            d.add(new StringField(SOURCE_FILE, fileTerms.get(p.where().file()), Field.Store.NO));
        }
        return d;
    }

    /**
     * Each catalog file's term ({@link #SOURCE_FILE}), by the file its parts name; null when a
     * part's file has no key (a catalog put together in memory), which re-indexes everything.
     */
    static Map<Path, String> fileTerms(Catalog catalog) {
        Map<Path, List<String>> idsByFile = new LinkedHashMap<>();
        for (Part p : catalog.parts()) {
            Path f = p.where() == null ? null : p.where().file();
            if (f == null || !catalog.fileKeys().containsKey(f)) {
                return null;
            }
            idsByFile.computeIfAbsent(f, k -> new ArrayList<>()).add(p.id());
        }
        Map<Path, String> out = new HashMap<>();
        for (var e : idsByFile.entrySet()) {
            MessageDigest md = sha256();
            md.update(catalog.fileKeys().get(e.getKey()).getBytes(StandardCharsets.UTF_8));
            for (String id : e.getValue()) {
                md.update((byte) 0);
                md.update(id.getBytes(StandardCharsets.UTF_8));
            }
            out.put(e.getKey(), HexFormat.of().formatHex(md.digest()));
        }
        return out;
    }

    /**
     * Replaces only the documents of files whose term changed: drops the documents of terms the
     * catalog no longer has, adds those of terms the index lacks. False (nothing changed) when
     * the index cannot be trusted for it: a document without a term (an index of an older
     * version), or a kept term whose document count is not its parts' count.
     *
     * @return the documents written, or -1 when nothing was changed
     */
    private static int incremental(IndexWriter w, List<Part> parts, Map<Path, String> fileTerms) throws IOException {
        try (DirectoryReader r = DirectoryReader.open(w)) {
            Set<String> present = new HashSet<>();
            Terms terms = MultiTerms.getTerms(r, SOURCE_FILE);
            if (terms != null) {
                TermsEnum te = terms.iterator();
                for (BytesRef t = te.next(); t != null; t = te.next()) {
                    present.add(t.utf8ToString());
                }
            }
            IndexSearcher s = new IndexSearcher(r);
            if (s.count(new TermInSetQuery(SOURCE_FILE, refs(present))) != r.numDocs()) {
                return -1;
            }
            Set<String> current = new HashSet<>(fileTerms.values());
            Set<String> kept = new HashSet<>(present);
            kept.retainAll(current);
            long expected = parts.stream()
                    .filter(p -> kept.contains(fileTerms.get(p.where().file())))
                    .count();
            if (s.count(new TermInSetQuery(SOURCE_FILE, refs(kept))) != expected) {
                return -1;
            }
            Set<String> stale = new HashSet<>(present);
            stale.removeAll(current);
            if (!stale.isEmpty()) {
                w.deleteDocuments(new TermInSetQuery(SOURCE_FILE, refs(stale)));
            }
            List<Part> changed = new ArrayList<>();
            for (Part p : parts) {
                if (!kept.contains(fileTerms.get(p.where().file()))) {
                    changed.add(p);
                }
            }
            write(w, changed, fileTerms, false);
            return changed.size();
        }
    }

    private static List<BytesRef> refs(Set<String> terms) {
        List<BytesRef> out = new ArrayList<>();
        for (String t : terms) {
            out.add(new BytesRef(t));
        }
        return out;
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    private static String storedFingerprint(Directory dir) throws IOException {
        try {
            return SegmentInfos.readLatestCommit(dir).getUserData().get(FINGERPRINT);
        } catch (IndexNotFoundException e) {
            return null; // a fresh folder
        }
    }

    /** Opens a reader and checks every file's checksum (the index is small, this takes milliseconds). */
    private static DirectoryReader openVerified(Directory dir, String fingerprint) throws IOException {
        DirectoryReader r = DirectoryReader.open(dir);
        try {
            if (!fingerprint.equals(r.getIndexCommit().getUserData().get(FINGERPRINT))) {
                r.close();
                return null;
            }
            for (LeafReaderContext leaf : r.leaves()) {
                leaf.reader().checkIntegrity();
            }
            return r;
        } catch (IOException | RuntimeException e) {
            r.close();
            throw e;
        }
    }

    private static DirectoryReader readOnly(Directory dir, String fingerprint) {
        try {
            return openVerified(dir, fingerprint);
        } catch (IOException | RuntimeException e) {
            return null;
        }
    }

    /**
     * Deletes the index files under the write lock: only regular files whose names Lucene's
     * index file names match ({@link IndexFolder#deletable}); the marker, the lock and anything
     * else stay. False when another process holds the lock.
     */
    private static boolean wipe(FSDirectory fs) {
        try (Lock lock = fs.obtainLock(IndexWriter.WRITE_LOCK_NAME)) {
            lock.ensureValid();
            try (Stream<Path> files = Files.list(fs.getDirectory())) {
                for (Path f : files.toList()) {
                    if (IndexFolder.deletable(f)) {
                        Files.deleteIfExists(f);
                    }
                }
            }
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    private static void closeQuietly(Directory d) {
        try {
            d.close();
        } catch (IOException e) {
            // nothing was written through it that could be lost
        }
    }

    /** Documents written to bring the index up to date by this open: 0 when it was current. */
    private int written;

    /** Documents written to bring the index up to date by this open (0 when it was current or in memory). */
    public int written() {
        return written;
    }

    /** Number of parts indexed. */
    public int size() {
        return reader.numDocs();
    }

    /** Every part matching {@code query}, most relevant first, then cheapest, then by id. */
    public List<Hit> search(PartQuery query) {
        return search(query.toLucene());
    }

    List<Hit> search(Query query) {
        Sort order = new Sort(SortField.FIELD_SCORE, priceField(), new SortField(Schema.ID, SortField.Type.STRING));
        try {
            // sized by the matches, not the catalog: the collector allocates its queue up front
            int n = Math.max(1, searcher.count(query));
            TopFieldDocs top = searcher.search(query, n, order, true);
            StoredFields stored = searcher.storedFields();
            List<Hit> hits = new ArrayList<>();
            for (ScoreDoc sd : top.scoreDocs) {
                hits.add(new Hit(stored.document(sd.doc).get(Schema.ID), sd.score));
            }
            return hits;
        } catch (IOException e) {
            throw new UncheckedIOException("reading the part index", e);
        }
    }

    /** Price ascending, parts without a price last. */
    private static SortField priceField() {
        SortField f = new SortField(Schema.PRICE, SortField.Type.DOUBLE);
        f.setMissingValue(Double.POSITIVE_INFINITY);
        return f;
    }

    @Override
    public void close() throws IOException {
        try {
            reader.close();
        } finally {
            directory.close();
        }
    }
}
