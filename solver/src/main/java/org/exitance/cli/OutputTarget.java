package org.exitance.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Where a command writes its main output: standard output, or a file that is never overwritten
 * unless the user said {@code --force}, in a directory that must exist unless the user said
 * {@code --create-dirs}. A file is written to a temporary sibling and moved into place, so an
 * interrupted run leaves no half-written file.
 */
final class OutputTarget {
    private OutputTarget() {
    }

    /**
     * A temporary file is created owner-only; give the result the permissions of the file it
     * replaces, or rw-r--r-- for a new file (where the file system has POSIX permissions).
     */
    static void keepUsualPermissions(Path tmp, Path target) throws IOException {
        if (!Files.getFileStore(tmp).supportsFileAttributeView(java.nio.file.attribute.PosixFileAttributeView.class)) {
            return;
        }
        java.util.Set<java.nio.file.attribute.PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(tmp, perms);
    }

    /**
     * Refuses a file the command may not write, before any work is done: it exists and
     * {@code --force} is off, or its directory does not exist and {@code --create-dirs} is off.
     *
     * @param file the file, or null for standard output (always allowed)
     */
    static void check(Path file, SharedOptions.Force files) {
        if (file == null) {
            return;
        }
        if (Files.isDirectory(file)) {
            throw new UserError(file + ": is a directory; name a file to write", ExitCodes.BAD_INPUT);
        }
        if (Files.exists(file) && !files.on()) {
            throw new UserError(file + ": exists; not overwritten (add --force to replace it)", ExitCodes.BAD_INPUT);
        }
        Path dir = file.toAbsolutePath().getParent();
        if (dir != null && !Files.exists(dir) && !files.createDirs()) {
            throw new UserError(file + ": directory " + dir + " does not exist (create it, or add --create-dirs)",
                    ExitCodes.BAD_INPUT);
        }
        if (dir != null && Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new UserError(file + ": " + dir + " is not a directory", ExitCodes.BAD_INPUT);
        }
    }

    /** Writes text produced by {@code body} to stdout (file == null) or to the file. */
    static void write(Path file, SharedOptions.Force files, PrintStream stdout,
                      java.util.function.Consumer<PrintStream> body) {
        if (file == null) {
            body.accept(stdout);
            stdout.flush();
            return;
        }
        check(file, files);
        Path dir = file.toAbsolutePath().getParent();
        try {
            Files.createDirectories(dir);
            Path tmp = Files.createTempFile(dir, ".exitance-", ".tmp");
            try (OutputStream os = Files.newOutputStream(tmp, StandardOpenOption.TRUNCATE_EXISTING);
                 PrintStream ps = new PrintStream(os, false, StandardCharsets.UTF_8)) {
                body.accept(ps);
            } catch (RuntimeException e) {
                Files.deleteIfExists(tmp);
                throw e;
            }
            keepUsualPermissions(tmp, file);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            throw new UserError(file + ": cannot write: " + problem(e), ExitCodes.BAD_INPUT);
        }
    }

    /** What went wrong with a file, in words (not the library's exception). */
    static String problem(IOException e) {
        if (e instanceof AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof NoSuchFileException) {
            return "no such file or directory";
        }
        if (e instanceof FileSystemException f && f.getReason() != null) {
            return f.getReason();
        }
        String m = e.getMessage();
        return m == null ? "input/output error" : m.lines().findFirst().orElse("input/output error");
    }
}
