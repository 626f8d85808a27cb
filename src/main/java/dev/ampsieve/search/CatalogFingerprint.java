package dev.ampsieve.search;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.CatalogLoader;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.yaml.Problem;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.reflect.Method;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HashSet;
import java.util.HexFormat;
import java.util.List;
import java.util.Set;

/**
 * A SHA-256 over everything the index is built from: the schema version, every catalog file
 * (relative path and the SHA-256 of its bytes, listed as {@code CatalogLoader} lists them:
 * links followed, hidden and {@code stages} folders skipped) and the parts as loaded. Stored in
 * the index commit; any difference means the index is stale.
 *
 * <p>Never fails for what is on disk: a file the loader could not use as a whole (unreadable,
 * too large, ...) is not read again, and a file that cannot be read now (gone, or changed since
 * the load) counts by its name and a mark. The index itself is built from the parts alone, which
 * are always hashed, so such a mark can cause an extra rebuild but never a stale index.
 */
public final class CatalogFingerprint {
    private CatalogFingerprint() {}

    public static String of(Catalog catalog) {
        return of(catalog, Files::newInputStream);
    }

    /** How a catalog file is opened; tests replace it to make a file vanish at the worst moment. */
    interface Opener {
        InputStream open(Path file) throws IOException;
    }

    static String of(Catalog catalog, Opener opener) {
        MessageDigest md = sha256();
        update(md, "schema " + Schema.VERSION);
        Path root = catalog.root();
        Set<Path> unused = new HashSet<>();
        for (Problem p : catalog.problems()) {
            // line 0: a problem with the file as a whole, whose parts were all left out
            if (p.isError() && p.line() == 0 && p.file() != null) {
                unused.add(p.file());
            }
        }
        for (Path f : CatalogLoader.files(root)) {
            update(md, root.relativize(f).toString().replace('\\', '/'));
            // a file the loader refused as a whole (too large, not a regular file, unreadable)
            // is never opened again: its reason stands in for its bytes
            update(md, unused.contains(f) ? "not used" : contentHash(opener, f));
        }
        for (Problem p : catalog.problems()) {
            if (p.line() == 0) {
                update(md, p.toString()); // folders that could not be listed, links skipped, limits
            }
        }
        // the parts too: a loader change that reads the same files differently must also rebuild.
        // A catalog the loader read names its sources (the loader's code and every file's bytes),
        // of which its parts are a function: hashing that is as good and far cheaper than every part.
        if (catalog.sources() != null) {
            update(md, "loaded from " + catalog.sources());
            return HexFormat.of().formatHex(md.digest());
        }
        ByteArrayOutputStream bytes = new ByteArrayOutputStream(1024);
        DataOutputStream out = new DataOutputStream(bytes);
        for (Part p : catalog.parts()) {
            bytes.reset();
            try {
                encode(out, p);
                out.flush();
            } catch (IOException e) {
                throw new UncheckedIOException(e); // writes to memory only
            }
            md.update(bytes.toByteArray());
        }
        return HexFormat.of().formatHex(md.digest());
    }

    /**
     * Every value of a part, nested records included, as tagged bytes: numbers by their bits,
     * text length-prefixed, so two different parts never encode alike. Faster than hashing the
     * parts' toString (Java 17's record toString runs String.format for every record and prints
     * every double in decimal), which took most of the time of opening a current index of a large
     * catalog (bench/RESULTS.md). Components are found by reflection, so a new field is covered
     * without touching this.
     */
    static void encode(DataOutputStream out, Object value) throws IOException {
        if (value == null) {
            out.writeByte(0);
        } else if (value instanceof Record r) {
            out.writeByte(1);
            for (Accessor a : ACCESSORS.get(r.getClass())) {
                encode(out, a.get(r));
            }
        } else if (value instanceof Double d) {
            out.writeByte(2);
            out.writeLong(Double.doubleToLongBits(d));
        } else if (value instanceof Integer i) {
            out.writeByte(3);
            out.writeInt(i);
        } else if (value instanceof List<?> l) {
            out.writeByte(4);
            out.writeInt(l.size());
            for (Object o : l) {
                encode(out, o);
            }
        } else {
            // text, booleans, enums, paths: by their text (writeUTF would refuse long notes)
            byte[] b = value.toString().getBytes(StandardCharsets.UTF_8);
            out.writeByte(5);
            out.writeInt(b.length);
            out.write(b);
        }
    }

    /** A record component's name and accessor. */
    private record Accessor(String name, Method method) {
        Object get(Record r) {
            try {
                return method.invoke(r);
            } catch (ReflectiveOperationException e) {
                throw new IllegalStateException(
                        "cannot read " + name + " of " + r.getClass().getName(), e);
            }
        }
    }

    /** Accessors per record class, looked up once. */
    private static final ClassValue<Accessor[]> ACCESSORS = new ClassValue<>() {
        @Override
        protected Accessor[] computeValue(Class<?> type) {
            RecordComponent[] rc = type.getRecordComponents();
            Accessor[] out = new Accessor[rc.length];
            for (int i = 0; i < rc.length; i++) {
                Method m = rc[i].getAccessor();
                m.setAccessible(true); // records nested in non-public classes too
                out[i] = new Accessor(rc[i].getName(), m);
            }
            return out;
        }
    };

    /** The hex SHA-256 of a file's bytes, or a mark saying why it could not be read. */
    private static String contentHash(Opener opener, Path file) {
        MessageDigest content = sha256();
        byte[] buffer = new byte[64 * 1024];
        try (InputStream in = opener.open(file)) {
            for (int n; (n = in.read(buffer)) > 0; ) {
                content.update(buffer, 0, n);
            }
        } catch (IOException e) {
            return "cannot read " + e.getClass().getSimpleName();
        }
        return HexFormat.of().formatHex(content.digest());
    }

    private static void update(MessageDigest md, String s) {
        md.update(s.getBytes(StandardCharsets.UTF_8));
        md.update((byte) 0);
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
