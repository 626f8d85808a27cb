package dev.ampsieve.search;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import dev.ampsieve.yaml.BoundedFiles;
import dev.ampsieve.yaml.InputException;
import dev.ampsieve.yaml.YamlFiles;
import java.io.ByteArrayOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Method;
import java.lang.reflect.RecordComponent;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * A SHA-256 over everything the index is built from: the schema version, every catalog file
 * (relative path and bytes; hidden folders such as the index itself are skipped) and the
 * parts as loaded. Stored in the index commit; any difference means the index is stale.
 */
public final class CatalogFingerprint {
    private CatalogFingerprint() {
    }

    public static String of(Catalog catalog) {
        MessageDigest md = sha256();
        update(md, "schema " + Schema.VERSION);
        Path root = catalog.root();
        for (Path f : catalogFiles(root)) {
            update(md, root.relativize(f).toString().replace('\\', '/'));
            try {
                byte[] bytes = BoundedFiles.read(f, YamlFiles.MAX_BYTES);
                update(md, Integer.toString(bytes.length));
                md.update(bytes);
            } catch (InputException e) {
                // refused by the catalog too (too large, not a regular file, gone): its reason stands in
                update(md, e.getMessage());
            }
        }
        // the parts too: a loader change that reads the same files differently must also rebuild
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
                throw new IllegalStateException("cannot read " + name + " of " + r.getClass().getName(), e);
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

    /** Every *.yaml / *.yml file below {@code root}, outside hidden folders, sorted. */
    static List<Path> catalogFiles(Path root) {
        if (root == null || !Files.isDirectory(root)) {
            return List.of();
        }
        try (Stream<Path> s = Files.walk(root)) {
            return s.filter(Files::isRegularFile)
                    .filter(f -> {
                        String n = f.getFileName().toString().toLowerCase(Locale.ROOT);
                        return n.endsWith(".yaml") || n.endsWith(".yml");
                    })
                    .filter(f -> !hidden(root.relativize(f)))
                    .sorted()
                    .toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static boolean hidden(Path relative) {
        for (Path part : relative) {
            if (part.toString().startsWith(".")) {
                return true;
            }
        }
        return false;
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
