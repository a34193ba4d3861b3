package org.exitance.cli;

import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

/** Bridges picocli's PrintWriter to the PrintStream the writers take (UTF-8). */
final class WriterOutputStream extends OutputStream {
    private final PrintWriter writer;
    private final java.io.ByteArrayOutputStream buffer = new java.io.ByteArrayOutputStream();

    WriterOutputStream(PrintWriter writer) {
        this.writer = writer;
    }

    @Override
    public void write(int b) {
        buffer.write(b);
    }

    @Override
    public void write(byte[] b, int off, int len) {
        buffer.write(b, off, len);
    }

    @Override
    public void flush() {
        writer.write(buffer.toString(StandardCharsets.UTF_8));
        buffer.reset();
        writer.flush();
    }

    @Override
    public void close() {
        flush();
    }
}
