package org.exitance.model;

import java.util.Locale;

/**
 * The check made before a large array is allocated (a view-factor matrix of N² entries, the
 * radiosity operators of every band, the Newton sensitivities): its estimated size against the
 * memory the JVM may still allocate, {@code Runtime.maxMemory() − (totalMemory() − freeMemory())}.
 * When the estimate does not fit, {@link Exceeded} says how much is needed, how much there is, and
 * how to raise the limit (the launcher passes {@code EXITANCE_JAVA_OPTS} to the JVM), so that no
 * {@code OutOfMemoryError} reaches the user.
 */
public final class MemoryBudget {
    /** Bytes of one double. */
    public static final long DOUBLE_BYTES = Double.BYTES;

    private MemoryBudget() {
    }

    /** The work does not fit in the memory the JVM may still allocate. */
    public static final class Exceeded extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final long neededBytes;
        private final long availableBytes;

        Exceeded(String what, long neededBytes, long availableBytes, long maxBytes) {
            super(what + " need about " + size(neededBytes) + " of memory, but the JVM can allocate only "
                    + size(availableBytes) + " more (its heap limit is " + size(maxBytes) + "); raise the limit,"
                    + " e.g. EXITANCE_JAVA_OPTS=-Xmx" + suggestedHeapGb(neededBytes, maxBytes - availableBytes)
                    + "g, or make the model smaller (fewer facets, surfaces or bands)");
            this.neededBytes = neededBytes;
            this.availableBytes = availableBytes;
        }

        public long neededBytes() {
            return neededBytes;
        }

        public long availableBytes() {
            return availableBytes;
        }
    }

    /** Bytes of n × n doubles, without overflow (saturates at Long.MAX_VALUE). */
    public static long squareMatrixBytes(long n) {
        return saturatedProduct(saturatedProduct(n, n), DOUBLE_BYTES);
    }

    /** a × b, or Long.MAX_VALUE when the product overflows (a, b ≥ 0). */
    public static long saturatedProduct(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return hi != 0 || lo < 0 ? Long.MAX_VALUE : lo;
    }

    /** a + b, or Long.MAX_VALUE when the sum overflows (a, b ≥ 0). */
    public static long saturatedSum(long a, long b) {
        long s = a + b;
        return s < 0 ? Long.MAX_VALUE : s;
    }

    /** Bytes the JVM may still allocate now. */
    public static long available() {
        Runtime r = Runtime.getRuntime();
        return r.maxMemory() - (r.totalMemory() - r.freeMemory());
    }

    /**
     * Requires that {@code neededBytes} fit in what the JVM may still allocate; when they do not
     * at first sight, garbage is collected once and the question asked again.
     *
     * @param what what needs the memory, as the subject of the message ("the view factors of 20000
     *             facets")
     * @throws Exceeded when the estimate does not fit
     */
    public static void require(String what, long neededBytes) {
        if (neededBytes <= available()) {
            return;
        }
        System.gc();
        require(what, neededBytes, available(), Runtime.getRuntime().maxMemory());
    }

    /**
     * The same check against given figures (tests use it to try a model under a small heap
     * without allocating it).
     *
     * @param availableBytes bytes that may still be allocated
     * @param maxBytes       the heap limit
     */
    public static void require(String what, long neededBytes, long availableBytes, long maxBytes) {
        if (neededBytes > availableBytes) {
            throw new Exceeded(what, neededBytes, availableBytes, maxBytes);
        }
    }

    /** A heap to suggest: what is in use and what is needed, with a quarter to spare, in whole GB. */
    static long suggestedHeapGb(long neededBytes, long usedBytes) {
        double gb = (1.25 * neededBytes + Math.max(0, usedBytes)) / 1e9;
        return Math.max(2, (long) Math.ceil(Math.min(gb, 1e9)));
    }

    /** A size in MB below a gigabyte, in GB above, with three significant digits. */
    static String size(long bytes) {
        if (bytes == Long.MAX_VALUE) {
            return "more than 9e18 bytes";
        }
        double mb = bytes / 1e6;
        return mb < 1000 ? String.format(Locale.ROOT, "%.3g MB", mb) : String.format(Locale.ROOT, "%.3g GB", mb / 1000);
    }
}
