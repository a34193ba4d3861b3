package org.exitance.result;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import org.exitance.model.Band;
import org.junit.jupiter.api.Test;

/** Building and deriving results: every part set by name, copies leave the original as it was. */
class SolveResultTest {
    private static final SurfaceResult A = surface("a", 2.0);
    private static final SurfaceResult B = surface("b", -2.0);

    private static SurfaceResult surface(String name, double q) {
        return new SurfaceResult(name, 1.0, "fixed", 300, false, q, q, new double[] {q}, new double[] {0.5}, 0, 0, 0, q,
                new double[] {1.0}, new double[] {1.5});
    }

    private static SolveResult.Builder complete() {
        return SolveResult.builder().title("t").bands(List.of(new Band(0, Double.POSITIVE_INFINITY)))
                .bandOrigin("given").surfaces(List.of(A, B)).energyBalanceW(1e-3).energyScaleW(10)
                .solver(new SolverReport("LU", 0, 0, 0, 0, 0, 0));
    }

    @Test
    void aBalanceClosesWithinItsToleranceOfTheCrossingHeatOrAtTheRoundingFloorOfThePowerInPlay() {
        // 2 W cross the enclosure (surfaces A and B); the imbalance is judged against them ...
        assertThat(complete().energyBalanceW(1e-6).build().energyBalanceCloses()).isTrue();
        assertThat(complete().energyBalanceW(1e-3).build().energyBalanceCloses()).isFalse();
        // ... unless it is within 1e-9 of the power in play, the rounding of the band sums: 1e-5 W
        // of 1e5 W in play closes however little crosses; 1e-3 W of the same does not
        SolveResult floor = complete().energyBalanceW(1e-5).energyScaleW(1e5).build();
        assertThat(floor.relativeEnergyBalance()).isGreaterThan(SolveResult.BALANCE_TOLERANCE);
        assertThat(floor.atRoundingFloor()).isTrue();
        assertThat(floor.energyBalanceCloses()).isTrue();
        assertThat(complete().energyBalanceW(1e-3).energyScaleW(1e5).build().energyBalanceCloses()).isFalse();
    }

    @Test
    void aBuiltResultHoldsWhatWasSetAndDefaultsTheOptionalPartsToEmpty() {
        SolveResult r = complete().build();
        assertThat(r.surfaces()).containsExactly(A, B);
        assertThat(r.environment()).isNull();
        assertThat(r.sources()).isEmpty();
        assertThat(r.windows()).isEmpty();
        assertThat(r.facets()).isEmpty();
        // the heat crossing the enclosure is half of Σ|Q| = (2 + 2)/2 = 2 W: what the sources deliver and
        // the sinks take; the balance is measured against it, not against the power in play (10 W)
        assertThat(r.crossingHeatW()).isEqualTo(2.0);
        assertThat(r.relativeEnergyBalance()).isEqualTo(1e-3 / 2.0);
    }

    @Test
    void aMissingRequiredPartIsNamed() {
        assertThatThrownBy(() -> complete().energyScaleW(1).solver(null).build())
                .isInstanceOf(IllegalStateException.class).hasMessageContaining("solver");
        assertThatThrownBy(() -> SolveResult.builder().title("t").build())
                .isInstanceOf(IllegalStateException.class).hasMessageContaining("bands");
    }

    @Test
    void aDerivedCopyChangesOnlyWhatWasSet() {
        SolveResult r = complete().build();
        SolveResult copy = r.toBuilder().surfaces(List.of(A)).facets(r.surfaces()).build();
        assertThat(copy.surfaces()).containsExactly(A);
        assertThat(copy.facets()).containsExactly(A, B);
        assertThat(copy.bandOrigin()).isEqualTo("given");
        assertThat(r.surfaces()).containsExactly(A, B);
        assertThat(r.facets()).isEmpty();
        assertThat(r.toBuilder().build()).isEqualTo(r);
    }

    @Test
    void listsAreCopiedAtBuild() {
        List<SurfaceResult> given = new ArrayList<>(List.of(A));
        SolveResult r = complete().surfaces(given).build();
        given.add(B);
        assertThat(r.surfaces()).containsExactly(A);
    }
}
