package org.exitance.spectral;

/** The independent references of {@link Reference} for tests in other packages. */
public final class ReferenceAccess {
    private ReferenceAccess() {
    }

    /** F(0→λT) by quadrature of Planck's law (λT in µm·K); see {@link Reference#fractionBelow}. */
    public static double fractionBelow(double lambdaT) {
        return Reference.fractionBelow(lambdaT);
    }
}
