package dev.ampsieve.search;

import dev.ampsieve.catalog.Catalog;
import dev.ampsieve.catalog.Part;
import java.io.IOException;
import java.io.UncheckedIOException;
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
                byte[] bytes = Files.readAllBytes(f);
                update(md, Integer.toString(bytes.length));
                md.update(bytes);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
        // the parts too: a loader change that reads the same files differently must also rebuild
        for (Part p : catalog.parts()) {
            update(md, p.toString());
        }
        return HexFormat.of().formatHex(md.digest());
    }

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
