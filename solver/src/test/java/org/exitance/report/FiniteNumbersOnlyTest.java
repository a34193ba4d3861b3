package org.exitance.report;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

/** The shared JSON mapper writes numbers or null, never NaN or Infinity, as a token or as a string. */
class FiniteNumbersOnlyTest {
    @Test
    void aFiniteNumberAndNullAreWrittenAsJson() throws Exception {
        ObjectNode n = SolveJsonWriter.MAPPER.createObjectNode();
        n.put("residual_W", 1.5e-9);
        n.putNull("upper_um");
        assertThat(SolveJsonWriter.MAPPER.writeValueAsString(n)).contains("1.5E-9", "null");
    }

    @Test
    void infinityIsRefusedWithItsJsonPath() {
        ObjectNode n = SolveJsonWriter.MAPPER.createObjectNode();
        n.putObject("solver").put("lastTemperatureStep_K", Double.POSITIVE_INFINITY);
        assertThatThrownBy(() -> SolveJsonWriter.MAPPER.writeValueAsString(n))
                .hasStackTraceContaining("$.solver.lastTemperatureStep_K")
                .hasStackTraceContaining("not a number JSON can hold");
    }

    @Test
    void notANumberInsideAnArrayIsRefused() {
        ObjectNode n = SolveJsonWriter.MAPPER.createObjectNode();
        n.putArray("matrix").addArray().add(0.5).add(Double.NaN);
        assertThatThrownBy(() -> SolveJsonWriter.MAPPER.writeValueAsString(n)).hasStackTraceContaining("$.matrix[0]");
    }
}
