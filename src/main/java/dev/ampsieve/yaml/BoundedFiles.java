package dev.ampsieve.yaml;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * The one way the program reads a user's file: regular files only, and never more than a limit,
 * counted in bytes actually read. The size a file reports is not trusted: {@code /dev/zero}
 * reports 0 and never ends, a file in {@code /proc} reports 0 and has content, and a file may
 * grow while it is read.
 */
public final class BoundedFiles {
    private BoundedFiles() {}

    /**
     * Reads a regular file (a link to one is fine), at most {@code limit} bytes.
     *
     * @throws InputException naming the file when it is missing, unreadable, not a regular file
     *                        (a folder, pipe, device or socket) or longer than {@code limit}
     */
    public static byte[] read(Path file, long limit) throws InputException {
        return read(file, limit, "YAML");
    }

    /** As {@link #read(Path, long)}, for a file of another kind ("CSV"), which the messages name. */
    public static byte[] read(Path file, long limit, String kind) throws InputException {
        if (limit < 0 || limit >= Integer.MAX_VALUE) {
            throw new IllegalArgumentException("limit " + limit);
        }
        BasicFileAttributes attrs;
        try {
            attrs = Files.readAttributes(file, BasicFileAttributes.class); // follows links: the target counts
        } catch (IOException e) {
            throw cannotRead(file, e);
        }
        if (!attrs.isRegularFile()) {
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    "",
                    "not a regular file (" + kind(file, attrs) + ")",
                    "give a " + kind + " file"));
        }
        // The type is checked before opening because opening a named pipe for reading waits for a
        // writer, and Java has no non-blocking open. A file swapped for a pipe between the check
        // and the open (a race someone with write access to the folder would have to win) can
        // still make this wait; it cannot make it read without bound.
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes((int) limit + 1);
        } catch (IOException e) {
            throw cannotRead(file, e);
        }
        if (bytes.length > limit) {
            throw new InputException(Problem.error(
                    Located.nowhere(file),
                    "",
                    "file is over the limit of " + limit + " bytes" + mebibytes(limit) + " for one " + kind + " file",
                    "split it into several files (sub-folders are fine)"));
        }
        return bytes;
    }

    /** " (4 MiB)" for whole mebibytes, else nothing. */
    public static String mebibytes(long bytes) {
        long mib = 1024L * 1024;
        return bytes >= mib && bytes % mib == 0 ? " (" + bytes / mib + " MiB)" : "";
    }

    private static InputException cannotRead(Path file, IOException e) {
        return new InputException(Problem.error(
                Located.nowhere(file),
                "",
                "cannot read the file (" + YamlFiles.describe(e) + ")",
                "check that it exists and is readable"));
    }

    /**
     * What a file that is not a regular file is, in words: "a named pipe", "a character device",
     * "a block device", "a socket", "a folder", else "a special file". The Unix file type comes
     * from the {@code unix:mode} attribute (the {@code S_IFMT} bits of stat(2)) where the
     * platform offers it.
     *
     * @param attrs the file's attributes, links followed
     */
    public static String kind(Path file, BasicFileAttributes attrs) {
        if (attrs.isDirectory()) {
            return "a folder";
        }
        try {
            Object mode = Files.getAttribute(file, "unix:mode");
            if (mode instanceof Integer m) {
                switch (m & 0170000) {
                    case 0010000:
                        return "a named pipe";
                    case 0020000:
                        return "a character device";
                    case 0060000:
                        return "a block device";
                    case 0140000:
                        return "a socket";
                    case 0040000:
                        return "a folder";
                    default:
                        break;
                }
            }
        } catch (IOException | UnsupportedOperationException | IllegalArgumentException | SecurityException e) {
            // no Unix view (or the file went away): the general word below is still true
        }
        return "a special file";
    }
}
