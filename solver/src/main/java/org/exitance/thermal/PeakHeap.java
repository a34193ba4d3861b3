package org.exitance.thermal;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;

/**
 * The JVM's peak heap use over a stretch of work, from the memory pools' peak counters
 * (java.lang.management): reset at the start, read at the end. The figure is the whole JVM's.
 */
final class PeakHeap {
    private PeakHeap() {
    }

    /** Resets the peak counters of the heap pools. */
    static void reset() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.isValid()) {
                pool.resetPeakUsage();
            }
        }
    }

    /** The sum of the heap pools' peak use since the last reset (bytes). */
    static long bytes() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.isValid()) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
