package org.exitance.cases;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import org.exitance.cli.CliRun;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * View-factor matrices that break summation or reciprocity (Σ_j F_ij = 1 in a closed enclosure,
 * A_i F_ij = A_j F_ji; common practice, any radiation textbook), or do not fit the surfaces.
 */
class ViewFactorErrorsTest {
    @TempDir
    Path dir;

    private static ObjectNode withMatrix(ObjectNode c, double[][] f) {
        ArrayNode m = ((ObjectNode) c.get("viewFactors")).putArray("matrix");
        for (double[] row : f) {
            ArrayNode r = m.addArray();
            for (double x : row) {
                r.add(x);
            }
        }
        return c;
    }

    private static ObjectNode surface(ObjectNode c, int i) {
        return (ObjectNode) c.get("surfaces").get(i);
    }

    @Test
    void rowSummingAboveOneIsRejected() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0.5, 1}, {1, 0}});
        Path file = RepoCases.write(dir, "row-above-one.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0]", "row of 'hot'", "above 1");
    }

    @Test
    void rowSummingAboveOneIsRejectedEvenWithAnEnvironment() {
        // each entry is a valid fraction and reciprocity holds; only the row sums (1.1) are wrong
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0.3, 0.8}, {0.8, 0.3}});
        c.putObject("environment").put("name", "room").put("temperature_K", 300);
        Path file = RepoCases.write(dir, "open-row-above-one.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0]", "above 1");
    }

    @Test
    void rowBelowOneInAClosedEnclosureSuggestsAnEnvironment() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0, 0.9}, {0.9, 0}});
        Path file = RepoCases.write(dir, "row-below-one.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0]", "below 1", "\"environment\"");
    }

    @Test
    void rowBelowOneIsAcceptedWhenAnEnvironmentTakesTheRest() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0, 0.9}, {0.9, 0}});
        c.putObject("environment").put("name", "room").put("temperature_K", 300);
        Path file = RepoCases.write(dir, "row-below-one-open.json", c);
        assertThat(CliRun.of("check", file.toString()).exitCode()).isZero();
    }

    @Test
    void badlyBrokenReciprocityIsRejected() {
        // A_hot F_12 = 1 m², A_cold F_21 = 2 m²: a factor of two apart
        ObjectNode c = RepoCases.plates();
        surface(c, 1).put("area_m2", 2.0);
        Path file = RepoCases.write(dir, "reciprocity.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0][1]", "reciprocity broken between 'hot' and 'cold'");
    }

    @Test
    void matrixWithTooManyRowsIsTheWrongSize() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0, 1}, {1, 0}, {0.5, 0.5}});
        Path file = RepoCases.write(dir, "three-rows.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix", "3 rows for 2 surfaces");
    }

    @Test
    void rowWithTooManyEntriesIsTheWrongSize() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{0, 1, 0}, {1, 0}});
        Path file = RepoCases.write(dir, "three-columns.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0]", "3 entries for 2 surfaces");
    }

    @Test
    void negativeViewFactorIsRejected() {
        ObjectNode c = withMatrix(RepoCases.plates(), new double[][] {{-0.1, 1.1}, {1, 0}});
        Path file = RepoCases.write(dir, "negative-factor.json", c);
        BadInput.rejected(file, "$.viewFactors.matrix[0][0]", "[0, 1]");
    }
}
