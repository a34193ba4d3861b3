package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * {@code exitance bench} at tiny sizes: it says its models are invented, prints a row per size
 * and band count with the growth exponent, skips a size whose estimate exceeds the heap, and
 * rejects bad options in one line with exit code 2. The solves themselves are checked elsewhere
 * (SolverPathsTest); here a closed box must balance, which the energy balance of each run checks
 * (common practice: net heats of a closed enclosure sum to zero).
 */
class BenchCommandTest {

    @Test
    void tinySizesRunAndSayTheDataAreInvented() {
        CliRun r = CliRun.of("bench", "--sizes", "24,54,5000000", "--bands", "1,2", "--runs", "1", "--quiet");
        assertThat(r.exitCode()).as(r.toString()).isEqualTo(2); // 5,000,000 is above the range
        CliRun ok = CliRun.of("bench", "--sizes", "24,54,900000", "--bands", "1,2", "--runs", "1", "--quiet");
        assertThat(ok.exitCode()).as(ok.toString()).isZero();
        assertThat(ok.out()).contains("INVENTED").contains("synthetic view factors");
        assertThat(ok.out().lines().filter(l -> l.matches("\\s+(24|54)\\s+\\d+\\s+[12]\\s+.*"))).hasSize(4);
        // 900,000 facets would need 8N² = 6.5 TB for F alone
        assertThat(ok.out().lines().filter(l -> l.contains("skipped: memory estimate"))).hasSize(2);
        assertThat(ok.out()).contains("1 band: time grows as N^").contains("2 bands: time grows as N^");
        assertThat(ok.err()).isEmpty();
        ok.out().lines().filter(l -> l.matches("\\s+(24|54)\\s+.*")).forEach(l -> {
            String[] col = l.trim().split("\\s+");
            // a closed box: every net heat sums to zero (its powers are ~1e4 W)
            assertThat(Math.abs(Double.parseDouble(col[col.length - 1]))).as(l).isLessThan(1e-6);
        });
    }

    @ParameterizedTest
    @ValueSource(strings = {"--runs=0", "--bands=0", "--sizes=abc", "--up-to=10", "--solver=fast", "--frobnicate"})
    void badOptionsAreOneLineAndExit2(String option) {
        CliRun r = CliRun.of("bench", option);
        assertThat(r.exitCode()).as(r.toString()).isEqualTo(2);
        assertThat(r.errLines()).hasSize(1);
        assertThat(r.out()).isEmpty();
    }

    @Test
    void sizesAndUpToTogetherAreRefused() {
        CliRun r = CliRun.of("bench", "--sizes", "24", "--up-to", "1000");
        assertThat(r.exitCode()).isEqualTo(2);
        assertThat(r.errLines()).hasSize(1);
    }
}
