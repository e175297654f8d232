package org.stellabar.cli;

import java.nio.file.AccessDeniedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.nio.file.Path;
import org.stellabar.physics.BadInputException;

/**
 * The one check every command that writes files makes of its {@code --out} folder before it
 * computes anything, and the one wording for a folder that fails later (a sub-folder in the way,
 * permissions that change under the run): both bad input, exit 2, one line.
 */
final class OutFolder {

    private OutFolder() {
    }

    /**
     * @param out the folder given with {@code --out}, or null when none was given
     * @throws BadInputException if it cannot be the folder of a run's files
     */
    static void check(Path out) {
        if (out == null) {
            return;
        }
        if (out.toString().isBlank()) {
            throw new BadInputException("--out", "\"" + out + "\" names no folder; give a folder name (\".\" for this one)");
        }
        if (Files.exists(out) && !Files.isDirectory(out)) {
            throw new BadInputException("--out", out + " is a file; give a folder");
        }
        Path existing = out.toAbsolutePath();
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing != null && !Files.isDirectory(existing)) {
            throw new BadInputException("--out", out + ": " + existing + " is a file, not a folder; give a folder");
        }
        if (existing != null && !Files.isWritable(existing)) {
            throw new BadInputException("--out", out + ": " + (existing.equals(out.toAbsolutePath()) ? "the folder"
                    : "its parent " + existing) + " is not writable; give a folder you can write to");
        }
    }

    /**
     * Fails before any work when a file stands where one of a run's folders must go, with the same
     * line as a failure while writing: a run that computes first and writes late (or writes from two
     * threads, as the demo does) would otherwise leave the files of one part behind.
     *
     * @param folders the folders the run will create
     * @throws BadInputException naming the file in the way
     */
    static void checkFolders(java.util.List<Path> folders) {
        for (Path folder : folders) {
            Path p = folder.toAbsolutePath();
            while (p != null && !Files.exists(p)) {
                p = p.getParent();
            }
            if (p != null && !Files.isDirectory(p)) {
                throw new BadInputException(describe(new java.nio.file.NotDirectoryException(p.toString())));
            }
        }
    }

    /**
     * @param e a file-system failure while writing a run's files
     * @return the one line for it
     */
    static String describe(FileSystemException e) {
        String file = e.getFile() == null ? "a file" : e.getFile();
        String why;
        if (e instanceof AccessDeniedException) {
            why = "permission denied";
        } else if (e instanceof NotDirectoryException || e instanceof FileAlreadyExistsException
                || String.valueOf(e.getReason()).contains("Not a directory")) {
            why = "a file of that name is in the way where a folder is needed";
        } else if (e instanceof NoSuchFileException) {
            why = "no such folder";
        } else {
            why = e.getReason() == null ? e.getClass().getSimpleName() : e.getReason();
        }
        return "cannot write " + file + ": " + why + "; give --out a folder you can write to";
    }
}
