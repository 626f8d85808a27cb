package dev.ampsieve.search;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;

/**
 * Where the index of a catalog lives: a hidden folder {@value #FOLDER} inside the catalog
 * folder, so it travels with the catalog; when that folder cannot be written (a catalog on a
 * read-only share), {@code $XDG_CACHE_HOME/ampsieve/<hash of the catalog path>}, else
 * {@code ~/.cache/ampsieve/<hash>} (XDG Base Directory Specification). Either folder is used
 * only when ampsieve made it ({@link IndexFolder}); otherwise the next one, else memory.
 */
public final class IndexLocation {
    private IndexLocation() {}

    public static final String FOLDER = ".ampsieve-index";

    /** The first location to try for {@code catalogRoot} on this machine. */
    public static Path choose(Path catalogRoot) {
        return choose(catalogRoot, System.getenv(), Path.of(System.getProperty("user.home", ".")), Files::isWritable);
    }

    static Path choose(Path catalogRoot, Map<String, String> env, Path home, Predicate<Path> writable) {
        return candidates(catalogRoot, env, home, writable).get(0);
    }

    /**
     * The folders to try, in order: inside the catalog when it can be written, then the per-user
     * cache folder.
     *
     * @param writable tells whether a folder may be written (injected so the choice can be tested
     *                 as any user: root may write anywhere)
     */
    static List<Path> candidates(Path catalogRoot, Map<String, String> env, Path home, Predicate<Path> writable) {
        Path root = catalogRoot.toAbsolutePath().normalize();
        Path inside = root.resolve(FOLDER);
        Path cache = cacheFolder(root, env, home);
        // not following links: for a link the catalog folder decides, and IndexFolder then refuses the link
        boolean insideOk =
                Files.isDirectory(inside, LinkOption.NOFOLLOW_LINKS) ? writable.test(inside) : writable.test(root);
        return insideOk ? List.of(inside, cache) : List.of(cache);
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
