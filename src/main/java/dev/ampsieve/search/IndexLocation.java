package dev.ampsieve.search;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.function.Predicate;

/**
 * Where the index of a catalog lives: a hidden folder {@value #FOLDER} inside the catalog
 * folder, so it travels with the catalog; when that folder cannot be written (a catalog on a
 * read-only share), {@code $XDG_CACHE_HOME/ampsieve/<hash of the catalog path>}, else
 * {@code ~/.cache/ampsieve/<hash>} (XDG Base Directory Specification).
 */
public final class IndexLocation {
    private IndexLocation() {
    }

    public static final String FOLDER = ".ampsieve-index";

    /** The location for {@code catalogRoot} on this machine. */
    public static Path choose(Path catalogRoot) {
        return choose(catalogRoot, System.getenv(), Path.of(System.getProperty("user.home", ".")), Files::isWritable);
    }

    /**
     * @param writable tells whether a folder may be written (injected so the choice can be tested
     *                 as any user: root may write anywhere)
     */
    static Path choose(Path catalogRoot, Map<String, String> env, Path home, Predicate<Path> writable) {
        Path root = catalogRoot.toAbsolutePath().normalize();
        Path inside = root.resolve(FOLDER);
        if (Files.isDirectory(inside) ? writable.test(inside) : writable.test(root)) {
            return inside;
        }
        return cacheFolder(root, env, home);
    }

    /** The per-user cache folder for {@code catalogRoot} (absolute, normalised). */
    static Path cacheFolder(Path root, Map<String, String> env, Path home) {
        String xdg = env.get("XDG_CACHE_HOME");
        // the specification says a relative XDG_CACHE_HOME is invalid and must be ignored
        Path base = xdg != null && !xdg.isBlank() && Path.of(xdg).isAbsolute() ? Path.of(xdg) : home.resolve(".cache");
        return base.resolve("ampsieve").resolve(shortHash(root.toString()));
    }

    private static String shortHash(String s) {
        try {
            byte[] d = MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(d, 0, 8);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }
}
