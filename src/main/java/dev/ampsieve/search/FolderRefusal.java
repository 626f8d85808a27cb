package dev.ampsieve.search;

import java.nio.file.Path;

/**
 * A folder the index would have used but left exactly as it found it, because ampsieve did not
 * make it ({@link IndexFolder}). The index went elsewhere ({@link PartIndex#location()}).
 *
 * @param folder the folder that was left alone
 * @param reason what it was
 * @param entry  for {@link Reason#FOREIGN_ENTRY}, the first entry inside it that is not part of
 *               an ampsieve index; otherwise null
 */
public record FolderRefusal(Path folder, Reason reason, Path entry) {

    public enum Reason {
        /** A symbolic link (to anywhere, or dangling); links are never followed. */
        SYMBOLIC_LINK,
        /** A plain file, pipe, device or socket. */
        NOT_A_FOLDER,
        /** A folder holding something other than ampsieve's marker, Lucene's files and its lock. */
        FOREIGN_ENTRY,
        /** A folder whose entries cannot be listed, so nothing about it can be checked. */
        UNREADABLE
    }
}
