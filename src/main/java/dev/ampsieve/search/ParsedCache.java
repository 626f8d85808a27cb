package dev.ampsieve.search;

import dev.ampsieve.catalog.CatalogLoader;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.Map;
import java.util.Set;
import java.util.function.Predicate;
import java.util.regex.Pattern;
import java.util.zip.CRC32C;

/**
 * The parsed-catalog cache: one file per catalog file, {@code parsed-<key>.bin}, beside the
 * search index in the folder the index uses ({@link IndexLocation}, claimed by the same rules,
 * {@link IndexFolder}), where {@code key} is the SHA-256 of the loader's identity and the
 * catalog file's bytes ({@link CatalogLoader.Cache}). An unchanged file is therefore found by
 * its bytes alone, whatever its name, and an edit of one file replaces only its own entry.
 *
 * <p>An entry is {@value #MAGIC}, the format number, the key, the payload's length, the payload
 * and a CRC-32C of all before it. It is trusted only when every one of these checks out (right
 * magic, format and key, length equal to the file's, checksum equal); anything else (truncated,
 * corrupted, another version, a link, a folder) is ignored and the file parsed afresh, and no
 * failure here ever fails a command. Writes go to a temporary file {@code parsed-<key>.bin.<random>.tmp}
 * made with {@code CREATE_NEW}, then renamed over the entry in one step: a reader sees the old
 * entry, the new one or none, never half of one, and processes writing the same entry at once
 * write the same bytes. Deleting the folder, or any entry, is always safe.
 *
 * <p>Only names this class makes are ever deleted (stale entries after a load, temporary files
 * left by a killed process after {@link #STALE_TEMP}), and only regular files, never through a link.
 */
public final class ParsedCache implements CatalogLoader.Cache {

    static final String MAGIC = "AMPSPCF1";
    static final int FORMAT = 1;
    /** Entries larger than this are not read (a catalog file is at most 4 MiB of text). */
    static final long MAX_BYTES = 256L * 1024 * 1024;
    /** A temporary file older than this was left by a process that died; younger ones may be in use. */
    static final Duration STALE_TEMP = Duration.ofMinutes(10);

    private static final Pattern ENTRY = Pattern.compile("parsed-([0-9a-f]{64})\\.bin");
    private static final Pattern TEMP = Pattern.compile("parsed-[0-9a-f]{64}\\.bin\\.[0-9a-f]{16}\\.tmp");
    private static final int HEADER = MAGIC.length() + 4 + 64 + 4;
    private static final LinkOption[] NOFOLLOW = {LinkOption.NOFOLLOW_LINKS};
    private static final SecureRandom RANDOM = new SecureRandom();

    private final Path folder;

    private ParsedCache(Path folder) {
        this.folder = folder;
    }

    /** The folder the entries are kept in. */
    public Path folder() {
        return folder;
    }

    /**
     * The cache of {@code catalogRoot}, in the first folder the index may use; null when none may
     * be used (each refused or not writable), in which case every file is parsed.
     */
    public static ParsedCache forCatalog(Path catalogRoot) {
        return forCatalog(
                catalogRoot, System.getenv(), Path.of(System.getProperty("user.home", ".")), Files::isWritable);
    }

    /** As {@link #forCatalog(Path)} with the environment, home folder and write test given (tests). */
    static ParsedCache forCatalog(Path catalogRoot, Map<String, String> env, Path home, Predicate<Path> writable) {
        for (Path f : IndexLocation.candidates(catalogRoot, env, home, writable)) {
            try {
                if (IndexFolder.claim(f) == null) {
                    return new ParsedCache(f);
                }
            } catch (IOException | RuntimeException e) {
                // not here: try the next place
            }
        }
        return null;
    }

    /** A cache in {@code folder}, which must already be claimed ({@link IndexFolder#claim}); for tests. */
    static ParsedCache in(Path folder) {
        return new ParsedCache(folder);
    }

    /** Whether {@code name} is one this cache writes (an entry or a temporary file). */
    static boolean isCacheFile(String name) {
        return ENTRY.matcher(name).matches() || TEMP.matcher(name).matches();
    }

    static String entryName(String key) {
        return "parsed-" + key + ".bin";
    }

    @Override
    public byte[] get(String key) {
        if (!validKey(key)) {
            return null;
        }
        Path file = folder.resolve(entryName(key));
        try {
            BasicFileAttributes a = Files.readAttributes(file, BasicFileAttributes.class, NOFOLLOW);
            if (!a.isRegularFile() || a.size() < HEADER + 8 || a.size() > MAX_BYTES) {
                return null;
            }
            byte[] all;
            try (InputStream in = Files.newInputStream(file, NOFOLLOW)) {
                all = in.readNBytes((int) a.size() + 1); // one more: a file that grew is not trusted
            }
            return payload(all, key);
        } catch (IOException | RuntimeException e) {
            return null; // absent, unreadable, or swapped meanwhile: parse afresh
        }
    }

    /** The payload of an entry's bytes when every check holds, else null. */
    static byte[] payload(byte[] all, String key) {
        if (all.length < HEADER + 8) {
            return null;
        }
        ByteBuffer b = ByteBuffer.wrap(all);
        byte[] magic = new byte[MAGIC.length()];
        b.get(magic);
        if (!Arrays.equals(magic, MAGIC.getBytes(StandardCharsets.US_ASCII)) || b.getInt() != FORMAT) {
            return null;
        }
        byte[] k = new byte[64];
        b.get(k);
        if (!Arrays.equals(k, key.getBytes(StandardCharsets.US_ASCII))) {
            return null;
        }
        int length = b.getInt();
        if (length < 0 || (long) HEADER + length + 8 != all.length) {
            return null; // truncated, or longer than written
        }
        CRC32C crc = new CRC32C();
        crc.update(all, 0, HEADER + length);
        if (crc.getValue() != ByteBuffer.wrap(all, HEADER + length, 8).getLong()) {
            return null;
        }
        return Arrays.copyOfRange(all, HEADER, HEADER + length);
    }

    /** The bytes of an entry holding {@code payload} under {@code key}. */
    static byte[] entry(String key, byte[] payload) {
        ByteBuffer b = ByteBuffer.allocate(HEADER + payload.length + 8);
        b.put(MAGIC.getBytes(StandardCharsets.US_ASCII));
        b.putInt(FORMAT);
        b.put(key.getBytes(StandardCharsets.US_ASCII));
        b.putInt(payload.length);
        b.put(payload);
        CRC32C crc = new CRC32C();
        crc.update(b.array(), 0, HEADER + payload.length);
        b.putLong(crc.getValue());
        return b.array();
    }

    @Override
    public void put(String key, byte[] value) {
        if (!validKey(key)) {
            return;
        }
        byte[] suffix = new byte[8];
        RANDOM.nextBytes(suffix);
        Path target = folder.resolve(entryName(key));
        Path tmp = folder.resolve(entryName(key) + "." + HexFormat.of().formatHex(suffix) + ".tmp");
        try {
            try (OutputStream out = Files.newOutputStream(
                    tmp, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE, LinkOption.NOFOLLOW_LINKS)) {
                out.write(entry(key, value));
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                // same folder, so a rename; without it no entry is better than a half-visible one
            }
        } catch (IOException | RuntimeException e) {
            // a cache: the next load parses again
        } finally {
            try {
                Files.deleteIfExists(tmp);
            } catch (IOException | RuntimeException e) {
                // a stray temporary file is removed by a later retain
            }
        }
    }

    @Override
    public void retain(Set<String> keys) {
        Instant staleBefore = Instant.now().minus(STALE_TEMP);
        try (DirectoryStream<Path> entries = Files.newDirectoryStream(folder)) {
            for (Path e : entries) {
                String name = e.getFileName().toString();
                var m = ENTRY.matcher(name);
                boolean stale = m.matches()
                        ? !keys.contains(m.group(1))
                        : TEMP.matcher(name).matches() && modifiedBefore(e, staleBefore);
                if (stale && Files.isRegularFile(e, NOFOLLOW)) {
                    Files.deleteIfExists(e);
                }
            }
        } catch (IOException | RuntimeException e) {
            // tidying is best effort
        }
    }

    private static boolean modifiedBefore(Path file, Instant t) {
        try {
            return Files.getLastModifiedTime(file, NOFOLLOW).toInstant().isBefore(t);
        } catch (IOException e) {
            return false;
        }
    }

    private static boolean validKey(String key) {
        return key != null && ENTRY.matcher(entryName(key)).matches();
    }
}
