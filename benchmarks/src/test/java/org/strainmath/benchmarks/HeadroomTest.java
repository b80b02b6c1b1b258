package org.strainmath.benchmarks;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The headroom report parses its arguments, measures in fresh JVMs and reports consistent figures. */
class HeadroomTest {

    private static final Headroom.Timing QUICK = new Headroom.Timing(50, 3, 20);

    private static String report(String... args) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        Headroom.run(args, new PrintStream(buffer, true, StandardCharsets.UTF_8), QUICK);
        return buffer.toString(StandardCharsets.UTF_8);
    }

    @Test
    void everyChainIsMeasuredInFreshJvmsAndReported() {
        for (String chain : new String[] {"bridge", "corrected", "rosette"}) {
            String text = report("--channels", "8", "--rate", "1000", "--chain", chain, "--jvms", "2");
            String unit = chain.equals("rosette") ? "rosettes" : "channels";
            assertThat(text).startsWith("strainmath headroom report, ")
                    .contains("  chain      " + chain + ": ")
                    .contains("load       8 " + unit + " × 1 kHz = 8 k")
                    .contains("median of 2 fresh JVMs × 3 runs")
                    .contains("% of one core").contains(unit + " of this chain at 1 kHz on one core")
                    .contains("reference  JMH ").doesNotContain("E+").doesNotContain("NaN");
        }
    }

    @Test
    void aFreshJvmReportsOneSortedThroughputPerRun() {
        double[] rates = Headroom.measureInFreshJvm(Headroom.Chain.BRIDGE, QUICK);
        assertThat(rates).hasSize(3).isSorted();
        assertThat(rates[0]).isPositive().isFinite();
    }

    @Test
    void theShareAndTheSustainedCountFollowFromTheMedianOfTheJvms() {
        // Definition: share = channels × rate / samples per second of one core; channels sustained
        // = that throughput / rate, rounded down. Medians by hand: 2 M, 3 M and 4 M samples/s.
        double[][] rates = {{1e6, 2e6, 3e6}, {2.5e6, 3e6, 3.5e6}, {3e6, 4e6, 5e6}};
        String text = Headroom.report(Headroom.Chain.BRIDGE, 30, 1000, rates);
        assertThat(text).contains("load       30 channels × 1 kHz = 30 ksamples/s")
                .contains("one core   3 Msamples/s, median of 3 fresh JVMs × 3 runs")
                .contains("per JVM    2 M, 3 M, 4 M (between JVMs 67 % apart; single runs 1 M to 5 M)")
                .contains("share      1 % of one core (0.75 % in the fastest JVM, 1.5 % in the slowest)")
                .contains("sustains   3000 channels of this chain at 1 kHz on one core (2000 in the slowest JVM)")
                .contains("uneven     the fastest JVM ran 2 × the slowest")
                .contains("reference  JMH BridgeInverseBenchmark.quarterBlock");
        // By hand: 1.2 M over 1 M is within the 1.25 × beyond which the report warns.
        double[][] even = {{1e6, 1e6, 1e6}, {1.1e6, 1.1e6, 1.1e6}, {1.2e6, 1.2e6, 1.2e6}};
        assertThat(Headroom.report(Headroom.Chain.BRIDGE, 30, 1000, even)).doesNotContain("uneven");
    }

    @Test
    void aRosetteChainCountsRosettes() {
        double[][] rates = {{1.677e9, 1.677e9, 1.677e9}, {301.5e6, 301.5e6, 301.5e6}};
        String text = Headroom.report(Headroom.Chain.ROSETTE, 4, 50, rates);
        assertThat(text).contains("load       4 rosettes × 50 Hz = 200 rosettes/s")
                .contains("per JVM    1.677 G, 301.5 M")
                .contains("sustains   19.79 M rosettes of this chain at 50 Hz on one core (6.03 M in the slowest JVM)")
                .contains("uneven     the fastest JVM ran 5.562 × the slowest");
    }

    @ParameterizedTest
    @CsvSource({"301500000, '301.5 M'", "1.677E9, '1.677 G'", "2000, '2 k'", "950, '950 '", "999.96, '1 k'",
        "0.25, '0.25 '", "128000, '128 k'"})
    void numbersReadWithAnSiPrefix(double value, String expected) {
        // By hand: four significant digits, the prefix of the power of 1000 below the value; no prefix
        // leaves the space before the unit.
        assertThat(Headroom.readable(value)).isEqualTo(expected);
    }

    @Test
    void sharesAndSpreadsKeepTwoDigits() {
        // By hand: two significant digits, plain, no exponent.
        assertThat(Headroom.percent(0.00052013)).isEqualTo("0.00052");
        assertThat(Headroom.percent(7.034)).isEqualTo("7");
        assertThat(Headroom.percent(66.667)).isEqualTo("67");
        assertThat(Headroom.number(1.53849e9)).isEqualTo("1538000000");
    }

    @Test
    void badArgumentsAreRefused() {
        assertThatThrownBy(() -> report("--channels", "8")).hasMessage("--channels and --rate are needed, both positive");
        assertThatThrownBy(() -> report("--channels", "x", "--rate", "1")).hasMessage("--channels needs a whole number: x");
        assertThatThrownBy(() -> report("--channels", "1", "--rate", "1", "--chain", "fast"))
                .hasMessage("--chain needs bridge, corrected or rosette: fast");
        assertThatThrownBy(() -> report("--channels", "1", "--rate", "1", "--jvms", "0"))
                .hasMessage("--jvms must be 1 to 20: 0");
        assertThatThrownBy(() -> report("--speed")).hasMessage("unknown argument: --speed");
        assertThat(report("-h")).startsWith("usage: Headroom");
    }
}
