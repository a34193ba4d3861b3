package org.exitance.geometry.hierarchy;

import java.util.concurrent.atomic.AtomicLong;
import org.exitance.geometry.GeometryException;

/**
 * Bytes the operator may hold, checked before each allocation of block entries so that a model
 * too large for the heap ends with one message instead of an OutOfMemoryError. The limit is the
 * JVM's heap not yet in use when the build starts, less a reserve of 1/8 of the maximum heap for
 * the solver's vectors and scratch arrays.
 */
final class MemoryBudget {

    private final long limit;
    private final AtomicLong used = new AtomicLong();

    MemoryBudget(long limitBytes) {
        this.limit = limitBytes;
    }

    /** @return the budget of this JVM: free heap (max − used) less 1/8 of the max heap */
    static MemoryBudget ofHeap() {
        Runtime rt = Runtime.getRuntime();
        long inUse = rt.totalMemory() - rt.freeMemory();
        return new MemoryBudget(Math.max(0, rt.maxMemory() - inUse - rt.maxMemory() / 8));
    }

    long limit() {
        return limit;
    }

    long used() {
        return used.get();
    }

    /**
     * Reserves bytes.
     *
     * @throws GeometryException when the reservation would pass the limit
     */
    void take(long bytes) {
        long now = used.addAndGet(bytes);
        if (now > limit) {
            throw tooLarge(now);
        }
    }

    /** Returns bytes reserved before (a block that was stored another way). */
    void give(long bytes) {
        used.addAndGet(-bytes);
    }

    GeometryException tooLarge(long needed) {
        return new GeometryException(String.format("the compressed view-factor operator needs more than %.0f MB,"
                + " but only %.0f MB of heap are free for it: raise the heap (-Xmx) or use fewer facets",
                needed / 1e6, limit / 1e6));
    }
}
