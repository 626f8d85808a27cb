package dev.ampsieve.search;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexNotFoundException;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
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
                boolean built = bringUpToDate(fs, catalog, fingerprint);
                DirectoryReader r = openVerified(fs, fingerprint);
                if (r != null) {
                    Source s = damaged ? Source.REBUILT : built ? Source.BUILT : Source.REUSED;
                    return new PartIndex(fs, r, s, folder, refusals);
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
                reindex(w, catalog.parts(), fingerprint);
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
    private static boolean bringUpToDate(Directory dir, Catalog catalog, String fingerprint) throws IOException {
        try (IndexWriter w = new IndexWriter(dir, config())) {
            if (fingerprint.equals(storedFingerprint(dir))) {
                return false;
            }
            reindex(w, catalog.parts(), fingerprint);
            return true;
        }
    }

    /** Replaces each part's document by id, drops parts no longer in the catalog, commits with the fingerprint. */
    private static void reindex(IndexWriter w, List<Part> parts, String fingerprint) throws IOException {
        List<BytesRef> ids = new ArrayList<>();
        // an empty index (new, or wiped after damage) has nothing to replace: adding skips a
        // delete-by-id per part
        boolean empty = !w.hasDeletions() && w.getDocStats().maxDoc == 0;
        for (Part p : parts) {
            if (empty) {
                w.addDocument(PartDocuments.of(p));
            } else {
                w.updateDocument(new Term(Schema.ID, p.id()), PartDocuments.of(p));
            }
            ids.add(new BytesRef(p.id()));
        }
        w.deleteDocuments(new BooleanQuery.Builder()
                .add(new MatchAllDocsQuery(), Occur.MUST)
                .add(new TermInSetQuery(Schema.ID, ids), Occur.MUST_NOT)
                .build());
        w.setLiveCommitData(Map.of(FINGERPRINT, fingerprint).entrySet());
        w.commit();
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
