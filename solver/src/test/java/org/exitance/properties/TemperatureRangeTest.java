package org.exitance.properties;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/** The temperature list of a range (plain arithmetic). */
class TemperatureRangeTest {
    @Test
    void wholeStepsEndAtTheLastTemperature() {
        assertThat(new TemperatureRange(300, 1500, 100).temperaturesK()).hasSize(13).startsWith(300.0).endsWith(1500.0);
    }

    @Test
    void aPartialLastStepStillEndsAtTheLastTemperature() {
        assertThat(new TemperatureRange(300, 1000, 300).temperaturesK()).containsExactly(300.0, 600.0, 900.0, 1000.0);
    }

    @Test
    void oneTemperature() {
        assertThat(new TemperatureRange(77, 77, 10).temperaturesK()).containsExactly(77.0);
    }

    @Test
    void badRangesAreRefused() {
        assertThatThrownBy(() -> new TemperatureRange(0, 100, 10)).hasMessageContaining("above 0 K");
        assertThatThrownBy(() -> new TemperatureRange(500, 400, 10)).hasMessageContaining("must not be below");
        assertThatThrownBy(() -> new TemperatureRange(300, 400, 0)).hasMessageContaining("step must be positive");
        assertThatThrownBy(() -> new TemperatureRange(1, 1e9, 1)).hasMessageContaining("larger step");
    }
}
