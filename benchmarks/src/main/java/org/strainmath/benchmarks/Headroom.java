package org.strainmath.benchmarks;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.Locale;

import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Temperature;
import org.strainmath.rosette.Rosette;

/**
 * The headroom report for a data-logging gateway: given a channel count, a sample rate and the
 * chain each channel runs, it measures this machine's single-core throughput for that chain and
 * prints the share of one core the load takes and the largest channel count × rate one core
 * sustains, with the JVM, the CPU and the date.
 *
 * <pre>
 *   java -cp benchmarks/target/benchmarks.jar org.strainmath.benchmarks.Headroom \
 *       --channels 64 --rate 2000 --chain corrected
 * </pre>
 * Chains: {@code bridge} (a quarter bridge, output ratios to strain), {@code corrected}
 * (24-bit codes to strain with leads, transverse and thermal-output corrections) and
 * {@code rosette} (three readings per rosette to ε1, ε2 and von Mises; a channel is a rosette).
 *
 * <p>The measurement runs the library's block kernels on blocks of 4096 seeded samples: a
 * warm-up, then several timed repetitions, of which it reports the median and the spread (lowest
 * to highest). It is a quick estimate for planning; the JMH benchmarks of this module stay the
 * reference figures (docs/performance.md).
 */
public final class Headroom {

    /** The chains a channel can run. */
    enum Chain { BRIDGE, CORRECTED, ROSETTE }

    static final int BLOCK = 4096;

    private Headroom() {
    }

    public static void main(String[] args) {
        try {
            run(args, System.out, 3000, 9, 300);
        } catch (IllegalArgumentException e) {
            System.err.println("headroom: " + e.getMessage());
            System.err.println(usage());
            System.exit(2);
        }
    }

    static String usage() {
        return "usage: Headroom --channels N --rate HZ [--chain bridge|corrected|rosette]";
    }

    /**
     * Parses {@code args}, measures with {@code warmupMillis} of warm-up and {@code repetitions}
     * timed runs of {@code runMillis} each, and prints the report.
     */
    static void run(String[] args, PrintStream out, long warmupMillis, int repetitions,
            long runMillis) {
        int channels = -1;
        double rate = -1;
        Chain chain = Chain.CORRECTED;
        for (int i = 0; i < args.length; i++) {
            String value = i + 1 < args.length ? args[i + 1] : null;
            switch (args[i]) {
                case "--channels":
                    channels = parseInt(value, "--channels");
                    i++;
                    break;
                case "--rate":
                    rate = parseDouble(value, "--rate");
                    i++;
                    break;
                case "--chain":
                    chain = parseChain(value);
                    i++;
                    break;
                case "-h":
                case "--help":
                    out.println(usage());
                    return;
                default:
                    throw new IllegalArgumentException("unknown argument: " + args[i]);
            }
        }
        if (channels < 1 || !(rate > 0)) {
            throw new IllegalArgumentException("--channels and --rate are needed, both positive");
        }
        double[] samplesPerSecond = measure(chain, warmupMillis, repetitions, runMillis);
        out.print(report(chain, channels, rate, samplesPerSecond));
    }

    private static int parseInt(String value, String name) {
        try {
            return Integer.parseInt(value);
        } catch (NumberFormatException | NullPointerException e) {
            throw new IllegalArgumentException(name + " needs a whole number: " + value);
        }
    }

    private static double parseDouble(String value, String name) {
        try {
            return Double.parseDouble(value);
        } catch (NumberFormatException | NullPointerException e) {
            throw new IllegalArgumentException(name + " needs a number: " + value);
        }
    }

    private static Chain parseChain(String value) {
        if (value == null) {
            throw new IllegalArgumentException("--chain needs bridge, corrected or rosette");
        }
        try {
            return Chain.valueOf(value.toUpperCase(Locale.ROOT));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--chain needs bridge, corrected or rosette: " + value);
        }
    }

    /** Samples (or rosettes) per second of one core, one value per timed repetition, sorted. */
    static double[] measure(Chain chain, long warmupMillis, int repetitions, long runMillis) {
        Runnable block = blockOf(chain);
        long warmupEnd = System.nanoTime() + warmupMillis * 1_000_000;
        while (System.nanoTime() < warmupEnd) {
            block.run();
        }
        double[] rates = new double[repetitions];
        for (int r = 0; r < repetitions; r++) {
            long start = System.nanoTime();
            long end = start + runMillis * 1_000_000;
            long calls = 0;
            long now;
            do {
                block.run();
                calls++;
                now = System.nanoTime();
            } while (now < end);
            rates[r] = calls * (double) BLOCK / ((now - start) * 1e-9);
        }
        Arrays.sort(rates);
        return rates;
    }

    /** One block call of the chain on seeded, realistic inputs (a sink keeps it alive). */
    private static Runnable blockOf(Chain chain) {
        double[] strain = Signals.strain(BLOCK, 1500e-6, 0x4EAD);
        double[] out = new double[BLOCK];
        switch (chain) {
            case BRIDGE: {
                Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(350, 2.1));
                double[] ratios = new double[BLOCK];
                bridge.toRatio(strain, 0, ratios, 0, BLOCK);
                return () -> Sink.keep(bridge.toStrain(ratios, 0, out, 0, BLOCK));
            }
            case CORRECTED: {
                StrainGauge gauge = StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.006);
                Bridge bridge = Bridge.quarter(gauge).withThreeWireLeads(Resistance.ofOhms(1.7));
                AdcInput adc = AdcInput.ratiometric(24, 128);
                StrainChannel channel = StrainChannel.of(bridge, adc).withTransverseCorrection(-0.29)
                        .withThermalOutput(ThermalOutput.ofCelsius(-28.4, 2.05, -0.047, 1.6e-4),
                                Temperature.ofCelsius(22));
                int[] codes = new int[BLOCK];
                double[] celsius = new double[BLOCK];
                double perCode = adc.ratioPerCode().toVoltsPerVolt();
                for (int i = 0; i < BLOCK; i++) {
                    codes[i] = (int) Math.round(bridge.toRatio(strain[i]) / perCode);
                    celsius[i] = 22 + 10 * Math.sin(i * 0.001);
                }
                return () -> Sink.keep(channel.toStrain(codes, 0, celsius, 0, out, 0, BLOCK));
            }
            default: {
                Rosette rosette = Rosette.rectangular()
                        .withMaterial(IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3));
                double[][] readings = {strain, Signals.strain(BLOCK, 400e-6, 0x4EAE),
                    Signals.strain(BLOCK, -300e-6, 0x4EAF)};
                double[] e2 = new double[BLOCK];
                double[] vm = new double[BLOCK];
                return () -> Sink.keep(rosette.toPrincipalStrainsAndVonMises(readings, 0, out, e2,
                        vm, 0, BLOCK));
            }
        }
    }

    /** Keeps results reachable so that the JIT cannot drop the work. */
    static final class Sink {
        static volatile long total;

        private Sink() {
        }

        static void keep(int value) {
            total += value;
        }
    }

    static String report(Chain chain, int channels, double rate, double[] rates) {
        double median = rates[rates.length / 2];
        double load = channels * rate;
        String unit = chain == Chain.ROSETTE ? "rosettes" : "samples";
        StringBuilder text = new StringBuilder();
        text.append(String.format(Locale.ROOT, "strainmath headroom report, %s%n", LocalDate.now()));
        text.append(String.format(Locale.ROOT, "  JVM        %s %s (%s)%n",
                System.getProperty("java.vm.name"), System.getProperty("java.version"),
                System.getProperty("java.vendor")));
        text.append(String.format(Locale.ROOT, "  CPU        %s, %d cores visible%n", cpu(),
                Runtime.getRuntime().availableProcessors()));
        text.append(String.format(Locale.ROOT, "  chain      %s, blocks of %d %s%n",
                chain.name().toLowerCase(Locale.ROOT), BLOCK, unit));
        text.append(String.format(Locale.ROOT, "  load       %d %s × %s Hz = %s %s/s%n", channels,
                chain == Chain.ROSETTE ? "rosettes" : "channels", number(rate), number(load), unit));
        text.append(String.format(Locale.ROOT,
                "  one core   %s %s/s (median of %d runs; lowest %s, highest %s)%n",
                number(median), unit, rates.length, number(rates[0]), number(rates[rates.length - 1])));
        text.append(String.format(Locale.ROOT,
                "  share      %s %% of one core (%s %% to %s %% over the runs)%n",
                number(100 * load / median), number(100 * load / rates[rates.length - 1]),
                number(100 * load / rates[0])));
        text.append(String.format(Locale.ROOT,
                "  headroom   one core sustains about %s channel·Hz of this chain%n", number(median)));
        text.append(String.format(Locale.ROOT,
                "  (a planning estimate on this machine; JMH figures are the reference)%n"));
        return text.toString();
    }

    /** Four significant digits, no trailing zeros, plain below 1e9. */
    static String number(double x) {
        java.math.BigDecimal rounded = new java.math.BigDecimal(x)
                .round(new java.math.MathContext(4)).stripTrailingZeros();
        return Math.abs(x) < 1e9 ? rounded.toPlainString() : rounded.toString();
    }

    private static String cpu() {
        try {
            for (String line : Files.readAllLines(Path.of("/proc/cpuinfo"))) {
                if (line.startsWith("model name")) {
                    return line.substring(line.indexOf(':') + 1).trim();
                }
            }
        } catch (IOException | RuntimeException e) {
            // not Linux, or not readable: fall back to the architecture
        }
        return System.getProperty("os.arch");
    }
}
