package org.exitance.cases;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * The size limit of the files a case reads (the case itself, meshes, CSV tables):
 * {@link Limits#FILE_BYTES}, checked before a file is read into memory.
 */
final class FileLimits {
    private FileLimits() {
    }

    /**
     * @param file     the file to read
     * @param referrer the JSON position that names it, or null for the case file itself
     */
    static void requireReadable(Path file, JsonCursor referrer) throws CaseException {
        long size;
        try {
            size = Files.size(file);
        } catch (IOException e) {
            return; // the reader reports why the file cannot be read
        }
        if (size > Limits.FILE_BYTES.max()) {
            String problem = file.getFileName() + " is " + mebibytes(size) + " MiB; files a case reads may have at most "
                    + mebibytes((long) Limits.FILE_BYTES.max()) + " MiB (see Limits in docs/case-format.md)";
            throw referrer == null ? new CaseException(file, "", problem) : referrer.error(problem);
        }
    }

    private static long mebibytes(long bytes) {
        return (bytes + (1L << 20) - 1) >> 20;
    }
}
