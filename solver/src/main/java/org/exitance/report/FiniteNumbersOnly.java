package org.exitance.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.util.JsonGeneratorDelegate;
import java.io.IOException;
import java.math.BigDecimal;

/**
 * A JSON generator that refuses to write a number that is not finite. JSON has no NaN or
 * Infinity, and a writer that quoted them would hand a script a string where it expects a number.
 * Where a quantity does not apply, the writers write null (and docs/command-line.md says when);
 * any other non-finite number is a bug, and writing it fails with {@link NonFiniteNumberException}
 * naming its JSON path, so that it never reaches the user with exit code 0.
 */
final class FiniteNumbersOnly extends JsonGeneratorDelegate {

    /** A non-finite number was about to be written. */
    static final class NonFiniteNumberException extends IllegalStateException {
        private static final long serialVersionUID = 1L;

        NonFiniteNumberException(String path, double v) {
            super("the output would hold " + v + " at " + path + ", which is not a number JSON can hold");
        }
    }

    FiniteNumbersOnly(JsonGenerator d) {
        super(d, false);
    }

    @Override
    public void writeNumber(double v) throws IOException {
        check(v);
        super.writeNumber(v);
    }

    @Override
    public void writeNumber(float v) throws IOException {
        check(v);
        super.writeNumber(v);
    }

    @Override
    public void writeNumber(BigDecimal v) throws IOException {
        super.writeNumber(v);
    }

    private void check(double v) {
        if (!Double.isFinite(v)) {
            throw new NonFiniteNumberException(path(getOutputContext()), v);
        }
    }

    /** The JSON path of the value being written ({@code $.solver.residual_W}, {@code $.bands[2]}). */
    private static String path(JsonStreamContext ctx) {
        StringBuilder b = new StringBuilder();
        for (JsonStreamContext c = ctx; c != null && !c.inRoot(); c = c.getParent()) {
            if (c.inArray()) {
                b.insert(0, "[" + Math.max(c.getCurrentIndex(), 0) + "]");
            } else if (c.getCurrentName() != null) {
                b.insert(0, "." + c.getCurrentName());
            }
        }
        return "$" + b;
    }
}
