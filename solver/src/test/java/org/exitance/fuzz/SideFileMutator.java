package org.exitance.fuzz;

import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/**
 * Mutations of the files a case refers to (CSV tables, STL and OBJ meshes): cut short, a line
 * dropped or doubled, a number replaced by text, a huge value or NaN, the header renamed, and
 * for binary STL a triangle count that claims far more than the file holds.
 */
final class SideFileMutator {
    private static final String[] NUMBERS = {"nan", "NaN", "inf", "-inf", "1e400", "-1", "0", "-0", "1e30", "1e-30",
        "abc", "", "1e308", "4.9e-324", "99999999"};

    private final Random random;
    private final List<String> log;

    SideFileMutator(Random random, List<String> log) {
        this.random = random;
        this.log = log;
    }

    /** A mutated copy of the file's bytes; the file name decides text or binary handling. */
    byte[] mutate(String fileName, byte[] data) {
        boolean binaryStl = fileName.endsWith(".stl") && !new String(data, 0, Math.min(5, data.length),
                StandardCharsets.US_ASCII).equals("solid");
        if (binaryStl) {
            return binary(data);
        }
        String text = new String(data, StandardCharsets.UTF_8);
        List<String> lines = new ArrayList<>(Arrays.asList(text.split("\n", -1)));
        int kind = random.nextInt(6);
        if (kind == 0) {
            int at = random.nextInt(Math.max(1, text.length()));
            log.add(fileName + ": cut short at character " + at);
            return text.substring(0, at).getBytes(StandardCharsets.UTF_8);
        }
        int line = random.nextInt(Math.max(1, lines.size()));
        if (kind == 1) {
            lines.remove(line);
            log.add(fileName + ": dropped line " + (line + 1));
        } else if (kind == 2) {
            lines.add(line, lines.get(line));
            log.add(fileName + ": doubled line " + (line + 1));
        } else if (kind == 3) {
            lines.set(0, lines.get(0).replaceFirst("[a-z_]+", "renamed"));
            log.add(fileName + ": renamed the first word of line 1");
        } else {
            String n = NUMBERS[random.nextInt(NUMBERS.length)];
            String replaced = lines.get(line).replaceFirst("-?\\d+(\\.\\d+)?([eE][-+]?\\d+)?", n);
            lines.set(line, replaced);
            log.add(fileName + ": line " + (line + 1) + ": a number replaced by '" + n + "'");
        }
        return String.join("\n", lines).getBytes(StandardCharsets.UTF_8);
    }

    private byte[] binary(byte[] data) {
        byte[] out = data.clone();
        int kind = random.nextInt(4);
        if (kind == 0 && out.length > 84) {
            int at = random.nextInt(out.length);
            log.add("binary STL: cut short at byte " + at);
            return Arrays.copyOf(out, at);
        }
        if (kind == 1 && out.length >= 84) {
            int[] counts = {0, -1, Integer.MAX_VALUE, 1_000_000_000, 3};
            int c = counts[random.nextInt(counts.length)];
            ByteBuffer.wrap(out, 80, 4).order(ByteOrder.LITTLE_ENDIAN).putInt(c);
            log.add("binary STL: triangle count set to " + c);
            return out;
        }
        if (out.length >= 84 + 50) {
            int tri = random.nextInt((out.length - 84) / 50);
            int at = 84 + 50 * tri + 12 + 4 * random.nextInt(9);
            float[] values = {Float.NaN, Float.POSITIVE_INFINITY, 1e38f, 0f, -1e-38f};
            float v = values[random.nextInt(values.length)];
            ByteBuffer.wrap(out, at, 4).order(ByteOrder.LITTLE_ENDIAN).putFloat(v);
            log.add("binary STL: a vertex coordinate of triangle " + (tri + 1) + " set to " + v);
        }
        return out;
    }
}
