package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

/** The headroom report parses its arguments and reports consistent figures. */
class HeadroomTest {

    private static String report(String... args) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        Headroom.run(args, new PrintStream(buffer, true, StandardCharsets.UTF_8), 50, 3, 20);
        return buffer.toString(StandardCharsets.UTF_8);
    }

    @Test
    void everyChainIsMeasuredAndReported() {
        for (String chain : new String[] {"bridge", "corrected", "rosette"}) {
            String text = report("--channels", "8", "--rate", "1000", "--chain", chain);
            assertThat(text).startsWith("strainmath headroom report, ")
                    .contains("  chain      " + chain).contains("8000 ")
                    .contains("% of one core").contains("JMH figures are the reference");
        }
    }

    @Test
    void theShareIsTheLoadOverTheMedianThroughput() {
        // Definition: share = channels × rate / samples per second of one core.
        double[] rates = {1e6, 2e6, 4e6};
        String text = Headroom.report(Headroom.Chain.BRIDGE, 10, 1000, rates);
        assertThat(text).contains("share      0.5 % of one core (0.25 % to 1 % over the runs)")
                .contains("one core sustains about 2000000 channel·Hz")
                .contains("load       10 channels × 1000 Hz = 10000 samples/s");
    }

    @Test
    void badArgumentsAreRefused() {
        assertThatThrownBy(() -> report("--channels", "8")).hasMessage("--channels and --rate are needed, both positive");
        assertThatThrownBy(() -> report("--channels", "x", "--rate", "1")).hasMessage("--channels needs a whole number: x");
        assertThatThrownBy(() -> report("--channels", "1", "--rate", "1", "--chain", "fast"))
                .hasMessage("--chain needs bridge, corrected or rosette: fast");
        assertThatThrownBy(() -> report("--speed")).hasMessage("unknown argument: --speed");
        assertThat(report("-h")).startsWith("usage: Headroom");
    }
}
