package org.exitance.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Where a command writes its main output: standard output, or a file that is never overwritten
 * unless the user said {@code --force}. A file is written to a temporary sibling and moved into
 * place, so an interrupted run leaves no half-written file.
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

    /** Writes text produced by {@code body} to stdout (file == null) or to the file. */
    static void write(Path file, boolean force, PrintStream stdout, java.util.function.Consumer<PrintStream> body) {
        if (file == null) {
            body.accept(stdout);
            stdout.flush();
            return;
        }
        if (Files.exists(file) && !force) {
            throw new UserError(file + ": exists; not overwritten (add --force to replace it)", ExitCodes.BAD_INPUT);
        }
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
            throw new UserError(file + ": cannot write: " + e.getMessage(), ExitCodes.BAD_INPUT);
        }
    }
}
