package dev.ampsieve.yaml;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Writes a user's file without ever leaving half of one: the text goes to a temporary file in
 * the same folder (same file system, so the move is a rename), which then takes the name in one
 * step. Without {@code replace}, an existing name is never touched, even one that appears while
 * writing (a hard link fails on a taken name). Only a regular file is ever replaced: a link, a
 * folder, a pipe or a device under the name is refused, so no write lands somewhere else.
 */
public final class AtomicFiles {
    private AtomicFiles() {}

    /** Prefix and suffix of the temporary file: hidden, so the catalog walk never reads it. */
    static final String TEMP_SUFFIX = ".tmp";

    /**
     * @param replace an existing regular file may be replaced
     * @throws InputException naming {@code file}: it exists (and not {@code replace}), is not a
     *                        regular file, or cannot be written; {@code fix} then says what to do
     */
    public static void write(Path file, String text, boolean replace, String replaceFix) throws InputException {
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        BasicFileAttributes attrs = null;
        try {
            attrs = Files.readAttributes(target, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
        } catch (IOException e) {
            // absent (or unreadable, which the write will say)
        }
        if (attrs != null && !attrs.isRegularFile()) {
            String kind = attrs.isSymbolicLink() ? "a link" : attrs.isDirectory() ? "a folder" : "a special file";
            throw new InputException(Problem.error(
                    Located.nowhere(file), "", "is " + kind + "; left as it was", "give the name of a regular file"));
        }
        if (attrs != null && !replace) {
            throw exists(file, replaceFix);
        }
        Path tmp = null;
        try {
            tmp = Files.createTempFile(dir, "." + target.getFileName() + ".", TEMP_SUFFIX);
            Files.writeString(tmp, text, StandardCharsets.UTF_8);
            permissions(tmp, attrs != null ? target : null);
            if (replace) {
                try {
                    Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
                }
            } else {
                try {
                    Files.createLink(target, tmp);
                } catch (UnsupportedOperationException | IOException e) {
                    if (e instanceof FileAlreadyExistsException) {
                        throw e;
                    }
                    Files.move(tmp, target); // no hard links here: a plain move also fails on a taken name
                }
            }
        } catch (FileAlreadyExistsException e) {
            throw exists(file, replaceFix);
        } catch (IOException e) {
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    "",
                    "cannot write the file (" + YamlFiles.describe(e) + ")",
                    "check that the folder exists and is writable"));
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException e) {
                    // the write itself succeeded or already failed; a stray hidden file is harmless
                }
            }
        }
    }

    private static InputException exists(Path file, String fix) {
        return new InputException(
                Problem.error(Located.nowhere(file), "", "the file already exists and was left as it was", fix));
    }

    /**
     * A new file gets rw-r--r-- (temporary files start private; a catalog or stage file is for
     * sharing); a replaced file keeps its permissions.
     */
    private static void permissions(Path tmp, Path existing) throws IOException {
        PosixFileAttributeView view = Files.getFileAttributeView(tmp, PosixFileAttributeView.class);
        if (view == null) {
            return;
        }
        if (existing != null) {
            view.setPermissions(Files.getFileAttributeView(existing, PosixFileAttributeView.class)
                    .readAttributes()
                    .permissions());
        } else {
            view.setPermissions(PosixFilePermissions.fromString("rw-r--r--"));
        }
    }
}
