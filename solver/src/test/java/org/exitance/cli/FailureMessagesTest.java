package org.exitance.cli;

import static org.assertj.core.api.Assertions.assertThat;

import org.exitance.model.MemoryBudget;
import org.junit.jupiter.api.Test;

/**
 * Whatever goes wrong becomes one line and an exit code: the JVM's own memory errors (raised
 * directly or from a worker thread) say how to raise the heap, and an internal error names no
 * Java class when it has a message.
 */
class FailureMessagesTest {
    @Test
    void anOutOfMemoryErrorBecomesExitTwoWithTheLaunchersHeapOption() {
        OutOfMemoryError e = new OutOfMemoryError("Java heap space");
        assertThat(ExitanceCommand.exitCode(e)).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(ExitanceCommand.describe(e)).contains("out of memory", "EXITANCE_JAVA_OPTS=-Xmx").doesNotContain("\n");
    }

    @Test
    void anOutOfMemoryErrorOfAWorkerThreadIsFoundInTheCauses() {
        RuntimeException wrapped = new IllegalStateException(new java.util.concurrent.ExecutionException(
                new OutOfMemoryError("Java heap space")));
        assertThat(ExitanceCommand.exitCode(wrapped)).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(ExitanceCommand.describe(wrapped)).contains("EXITANCE_JAVA_OPTS");
    }

    @Test
    void aMemoryEstimateThatDoesNotFitIsExitTwo() {
        RuntimeException e = null;
        try {
            MemoryBudget.require("the radiosity operators of 400 bands over 3000 surfaces", 57_600_000_000L,
                    1_000_000_000L, 2_000_000_000L);
        } catch (MemoryBudget.Exceeded x) {
            e = x;
        }
        assertThat(e).isNotNull();
        assertThat(ExitanceCommand.exitCode(e)).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(ExitanceCommand.describe(e)).contains("57.6 GB", "1.00 GB", "EXITANCE_JAVA_OPTS=-Xmx73g");
    }

    @Test
    void anInternalErrorGivesItsMessageNotItsClass() {
        String line = ExitanceCommand.describe(new IllegalStateException(new IllegalArgumentException("a bad index")));
        assertThat(line).startsWith("internal error: a bad index").doesNotContain("IllegalArgumentException");
        assertThat(ExitanceCommand.exitCode(new IllegalStateException("x"))).isEqualTo(ExitCodes.INTERNAL);
    }
}
