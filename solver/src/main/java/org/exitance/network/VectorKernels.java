package org.exitance.network;

/**
 * Whether the inner loops run on the JDK's vector API (incubator module
 * {@code jdk.incubator.vector}, added by the launcher and by the tests): when the module is in the
 * JVM and the system property {@code exitance.vector} is not {@code false}. Kernels that use the
 * API are loaded by name, so nothing links against the module when it is absent.
 */
final class VectorKernels {
    /** True when the vector kernels are in use. */
    static final boolean ON = !"false".equals(System.getProperty("exitance.vector"))
            && ModuleLayer.boot().findModule("jdk.incubator.vector").isPresent();

    private VectorKernels() {
    }

    /**
     * The vector kernel of that class (a public or package-private no-argument constructor), or
     * {@code fallback} when the vector API is off or the class cannot be made.
     */
    static <T> T load(String className, Class<T> type, T fallback) {
        if (!ON) {
            return fallback;
        }
        try {
            return type.cast(Class.forName(className).getDeclaredConstructor().newInstance());
        } catch (ReflectiveOperationException | LinkageError | ClassCastException e) {
            return fallback;
        }
    }
}
