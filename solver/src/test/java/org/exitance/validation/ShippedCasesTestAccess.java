package org.exitance.validation;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** The list of shipped cases, for tests in other packages. */
public final class ShippedCasesTestAccess {
    private ShippedCasesTestAccess() {
    }

    public static List<Path> shippedCases() throws IOException {
        return ShippedCasesTest.shippedCases();
    }
}
