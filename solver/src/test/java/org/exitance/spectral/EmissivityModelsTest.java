package org.exitance.spectral;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class EmissivityModelsTest {

    static TabulatedEmissivity table(double[] l, double[] e) {
        return new TabulatedEmissivity(l, e);
    }

    @Test
    void grayValidatesAndIsConstant() {
        GrayEmissivity g = new GrayEmissivity(0.37);
        assertThat(g.at(0.1, 300)).isEqualTo(0.37);
        assertThat(g.at(1e6, 3000)).isEqualTo(0.37);
        assertThat(g.isGray()).isTrue();
        assertThat(g.dependsOnTemperature()).isFalse();
        assertThat(g.breakpointsUm()).isEmpty();
        assertThatThrownBy(() -> new GrayEmissivity(1.01)).isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("[0, 1]");
        assertThatThrownBy(() -> new GrayEmissivity(-0.1)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new GrayEmissivity(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void tabulatedInterpolatesLinearlyAndHoldsEndValues() {
        TabulatedEmissivity t = table(new double[] {1, 2, 4}, new double[] {0.2, 0.6, 0.4});
        assertThat(t.at(0.01, 300)).isEqualTo(0.2);
        assertThat(t.at(1, 300)).isEqualTo(0.2);
        assertThat(t.at(1.5, 300)).isCloseTo(0.4, within(1e-15));
        assertThat(t.at(2, 300)).isEqualTo(0.6);
        assertThat(t.at(3, 300)).isCloseTo(0.5, within(1e-15));
        assertThat(t.at(4, 300)).isEqualTo(0.4);
        assertThat(t.at(1e9, 300)).isEqualTo(0.4);
        assertThat(t.at(Double.POSITIVE_INFINITY, 300)).isEqualTo(0.4);
        assertThat(t.breakpointsUm()).containsExactly(1, 2, 4);
        assertThat(t.isGray()).isFalse();
        assertThat(t.dependsOnTemperature()).isFalse();
        assertThat(table(new double[] {1, 2}, new double[] {0.5, 0.5}).isGray()).isTrue();
        assertThat(table(new double[] {3}, new double[] {0.7}).at(100, 1)).isEqualTo(0.7);
    }

    @Test
    void tabulatedIsDefensivelyCopied() {
        double[] l = {1, 2};
        double[] e = {0.1, 0.2};
        TabulatedEmissivity t = table(l, e);
        l[0] = 5;
        e[0] = 0.9;
        t.breakpointsUm()[1] = 99;
        assertThat(t.at(0.5, 300)).isEqualTo(0.1);
        assertThat(t.breakpointsUm()).containsExactly(1, 2);
        assertThat(t).isEqualTo(table(new double[] {1, 2}, new double[] {0.1, 0.2}));
    }

    @Test
    void tabulatedValidationNamesTheIndex() {
        assertThatThrownBy(() -> table(new double[] {}, new double[] {}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("at least one");
        assertThatThrownBy(() -> table(new double[] {1, 2}, new double[] {0.1}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("2 wavelengths but 1");
        assertThatThrownBy(() -> table(new double[] {1, 2, 2}, new double[] {0.1, 0.2, 0.3}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("wavelength[2]")
                .hasMessageContaining("strictly increasing");
        assertThatThrownBy(() -> table(new double[] {0, 1}, new double[] {0.1, 0.2}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("wavelength[0]");
        assertThatThrownBy(() -> table(new double[] {1, Double.POSITIVE_INFINITY}, new double[] {0.1, 0.2}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("wavelength[1]");
        assertThatThrownBy(() -> table(new double[] {1, 2, 3}, new double[] {0.1, 1.2, 0.3}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("emissivity[1]");
        assertThatThrownBy(() -> table(new double[] {1, 2}, new double[] {0.1, Double.NaN}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("emissivity[1]");
        assertThatThrownBy(() -> table(null, new double[] {0.1}))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void temperatureTabulatedInterpolatesInTemperatureOnUnionOfNodes() {
        TabulatedEmissivity cold = table(new double[] {1, 3}, new double[] {0.2, 0.4});
        TabulatedEmissivity hot = table(new double[] {2}, new double[] {0.8});
        TemperatureTabulatedEmissivity m = new TemperatureTabulatedEmissivity(
                new double[] {300, 700}, new TabulatedEmissivity[] {cold, hot});
        assertThat(m.breakpointsUm()).containsExactly(1, 2, 3);
        assertThat(m.dependsOnTemperature()).isTrue();
        assertThat(m.isGray()).isFalse();
        // held outside the temperature range
        assertThat(m.at(2, 100)).isCloseTo(0.3, within(1e-15));
        assertThat(m.at(2, 300)).isCloseTo(0.3, within(1e-15));
        assertThat(m.at(0.5, 5000)).isEqualTo(0.8);
        // linear in T: at 400 K, weight 1/4 on the hot table
        assertThat(m.at(2, 400)).isCloseTo(0.75 * 0.3 + 0.25 * 0.8, within(1e-15));
        assertThat(m.at(10, 500)).isCloseTo(0.5 * 0.4 + 0.5 * 0.8, within(1e-15));
        // at fixed T, linear between union nodes
        double mid = m.at(1.5, 500);
        assertThat(mid).isCloseTo(0.5 * (m.at(1, 500) + m.at(2, 500)), within(1e-15));
    }

    @Test
    void temperatureTabulatedValidation() {
        TabulatedEmissivity t = table(new double[] {1}, new double[] {0.5});
        assertThatThrownBy(() -> new TemperatureTabulatedEmissivity(new double[] {}, new TabulatedEmissivity[] {}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("at least one");
        assertThatThrownBy(() -> new TemperatureTabulatedEmissivity(new double[] {300, 300}, new TabulatedEmissivity[] {t, t}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("temperature[1]")
                .hasMessageContaining("strictly increasing");
        assertThatThrownBy(() -> new TemperatureTabulatedEmissivity(new double[] {-3, 300}, new TabulatedEmissivity[] {t, t}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("temperature[0]");
        assertThatThrownBy(() -> new TemperatureTabulatedEmissivity(new double[] {300, 400}, new TabulatedEmissivity[] {t, null}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("table[1]");
        assertThatThrownBy(() -> new TemperatureTabulatedEmissivity(new double[] {300}, new TabulatedEmissivity[] {t, t}))
                .isInstanceOf(IllegalArgumentException.class).hasMessageContaining("1 temperatures but 2 tables");
        TemperatureTabulatedEmissivity one = new TemperatureTabulatedEmissivity(new double[] {300}, new TabulatedEmissivity[] {t});
        assertThat(one.dependsOnTemperature()).isFalse();
        assertThat(one.isGray()).isTrue();
        assertThatThrownBy(() -> one.at(1, 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
