package dev.ampsieve.search;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import org.apache.lucene.index.IndexFileNames;
import org.apache.lucene.index.IndexWriter;

/**
 * The rule that keeps the index cache from touching anything it did not make. The index deletes
 * files (a rebuild, and Lucene itself when it drops old segments), so it works only in a folder
 * that is
 * <ul>
 *   <li>a real directory, checked without following links: a symbolic link is never followed,
 *       whatever it points to (Lucene's {@code FSDirectory} would follow it);</li>
 *   <li>marked as ours by {@value #MARKER}, written when we create the folder;</li>
 *   <li>holding nothing but that marker, Lucene's own files ({@link #isIndexFile}) and the
 *       parsed-catalog cache's ({@link ParsedCache#isCacheFile}), regular files only: a link, a
 *       sub-folder or any other name means someone else uses the folder.</li>
 * </ul>
 * An unmarked folder holding only Lucene files (an index of an older version, or an empty folder)
 * is adopted: the marker is added. Anything else is refused and left exactly as it was.
 * Folders above the index folder may be links (a user may move {@code ~/.cache} to another disk):
 * nothing above the index folder is ever deleted, only the index folder itself is created there.
 */
final class IndexFolder {
    private IndexFolder() {}

    /** The marker file; not a name Lucene writes or deletes. */
    static final String MARKER = "made-by-ampsieve.txt";

    static final String MARKER_TEXT = """
            This folder is a search index that ampsieve built from a catalog of parts.
            It is a cache: deleting the whole folder is safe, ampsieve builds it again.
            ampsieve only ever deletes files in it that Lucene's index file names match,
            and its own parsed-catalog cache files (parsed-*.bin).
            """;

    private static final LinkOption[] NOFOLLOW = {LinkOption.NOFOLLOW_LINKS};

    /**
     * Makes {@code folder} ready for the index when it may be used: creates and marks it when it is
     * missing, adopts an unmarked folder holding only index files.
     *
     * @return null when the folder is ready; otherwise why it was left alone (nothing was changed)
     * @throws IOException when the folder cannot be created or marked (a read-only place)
     */
    static FolderRefusal claim(Path folder) throws IOException {
        for (int attempt = 0; ; attempt++) {
            BasicFileAttributes a;
            try {
                a = Files.readAttributes(folder, BasicFileAttributes.class, NOFOLLOW);
            } catch (NoSuchFileException e) {
                Files.createDirectories(folder.getParent());
                try {
                    Files.createDirectory(folder);
                } catch (FileAlreadyExistsException race) {
                    if (attempt == 0) {
                        continue; // another process made it just now: look at it again
                    }
                    throw race;
                }
                mark(folder);
                return null;
            }
            if (a.isSymbolicLink()) {
                return new FolderRefusal(folder, FolderRefusal.Reason.SYMBOLIC_LINK, null);
            }
            if (!a.isDirectory()) {
                return new FolderRefusal(folder, FolderRefusal.Reason.NOT_A_FOLDER, null);
            }
            boolean marked;
            try {
                Path foreign = firstForeignEntry(folder);
                if (foreign != null) {
                    return new FolderRefusal(folder, FolderRefusal.Reason.FOREIGN_ENTRY, foreign);
                }
                marked = isRegularFile(folder.resolve(MARKER));
            } catch (IOException e) {
                return new FolderRefusal(folder, FolderRefusal.Reason.UNREADABLE, null);
            }
            if (!marked) {
                mark(folder); // an index of an older version, or an empty folder: adopt it
            }
            return null;
        }
    }

    /**
     * Whether Lucene counts {@code name} as one of its files: exactly the names its
     * {@code IndexFileDeleter} may delete ({@code segments*}, {@code pending_segments*} and the
     * codec pattern {@code _<segment>...}), and its write lock. Lucene's own pattern is used, so
     * the test follows Lucene upgrades.
     */
    static boolean isIndexFile(String name) {
        return name.equals(IndexWriter.WRITE_LOCK_NAME)
                || name.startsWith(IndexFileNames.SEGMENTS)
                || name.startsWith(IndexFileNames.PENDING_SEGMENTS)
                || IndexFileNames.CODEC_FILE_PATTERN.matcher(name).matches();
    }

    /** Whether a rebuild may delete {@code file}: an index file (not the lock), a regular file, not a link. */
    static boolean deletable(Path file) {
        String name = file.getFileName().toString();
        return !name.equals(IndexWriter.WRITE_LOCK_NAME) && isIndexFile(name) && isRegularFile(file);
    }

    /** The first entry that is not the marker or an index file, each a regular file; null when none. */
    private static Path firstForeignEntry(Path folder) throws IOException {
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
            for (Path e : entries) {
                String name = e.getFileName().toString();
                boolean known = name.equals(MARKER) || isIndexFile(name) || ParsedCache.isCacheFile(name);
                BasicFileAttributes a;
                try {
                    a = Files.readAttributes(e, BasicFileAttributes.class, NOFOLLOW);
                } catch (NoSuchFileException gone) {
                    continue; // Lucene in another process dropped an old file meanwhile
                }
                if (!known || !a.isRegularFile()) {
                    return e;
                }
            }
        }
        return null;
    }

    private static boolean isRegularFile(Path p) {
        return Files.isRegularFile(p, NOFOLLOW);
    }

    /** Writes the marker, never over anything: a marker another process wrote meanwhile is as good. */
    private static void mark(Path folder) throws IOException {
        Path marker = folder.resolve(MARKER);
        try {
            Files.writeString(
                    marker,
                    MARKER_TEXT,
                    StandardCharsets.UTF_8,
                    StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE,
                    LinkOption.NOFOLLOW_LINKS);
        } catch (FileAlreadyExistsException e) {
            if (!isRegularFile(marker)) {
                throw e;
            }
        }
    }
}
