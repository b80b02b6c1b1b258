package org.strainmath.benchmarks;

import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The headroom report for a data-logging gateway: given a channel count, a sample rate and the
 * chain each channel runs, it measures this machine's single-core throughput for that chain in
 * several fresh JVMs and prints the share of one core the load takes, how many channels of that
 * chain one core sustains at the rate, the spread between the JVMs, and the JVM, the CPU and the
 * date.
 *
 * <pre>
 *   java -cp benchmarks/target/benchmarks.jar org.strainmath.benchmarks.Headroom \
 *       --channels 64 --rate 2000 --chain corrected [--jvms 3]
 * </pre>
 * Chains: {@code bridge} (a quarter bridge, output ratios to strain), {@code corrected}
 * (24-bit codes to strain with leads, transverse and thermal-output corrections) and
 * {@code rosette} (three readings per rosette to ε1, ε2 and von Mises; a channel is a rosette).
 *
 * <p>Each fresh JVM (the same Java as the report's, default options) runs {@link HeadroomProbe}:
 * a warm-up, then timed runs of the JMH benchmark the chain names, on its own state at a block
 * of 4096. A JIT compiles a kernel differently from one JVM to the
 * next, so the report takes the median of the JVMs' medians and shows how far they lie apart. It
 * is a quick estimate for planning; the JMH benchmarks of this module stay the reference figures
 * (docs/performance.md compares the two).
 */
public final class Headroom {

    /** The chains a channel can run, each with the JMH benchmark it runs. */
    enum Chain {
        BRIDGE("quarter-bridge output ratios to strain", "samples", "channels",
                "BridgeInverseBenchmark.quarterBlock"),
        CORRECTED("24-bit codes to strain with leads, transverse and thermal corrections",
                "samples", "channels", "ChannelBenchmark.channelBlockWithThermalOutput"),
        ROSETTE("three grids to principal strains and von Mises", "rosettes", "rosettes",
                "RosetteBenchmark.principalAndVonMises");

        final String description;
        final String unit;
        final String channels;
        final String benchmark;

        Chain(String description, String unit, String channels, String benchmark) {
            this.description = description;
            this.unit = unit;
            this.channels = channels;
            this.benchmark = benchmark;
        }
    }

    /** How long each fresh JVM measures. */
    static final class Timing {
        final long warmupMillis;
        final int runs;
        final long runMillis;

        Timing(long warmupMillis, int runs, long runMillis) {
            this.warmupMillis = warmupMillis;
            this.runs = runs;
            this.runMillis = runMillis;
        }
    }

    static final Timing FULL = new Timing(2000, 7, 300);

    private Headroom() {
    }

    public static void main(String[] args) {
        try {
            run(args, System.out, FULL);
        } catch (IllegalArgumentException e) {
            System.err.println("headroom: " + e.getMessage());
            System.err.println(usage());
            System.exit(2);
        }
    }

    static String usage() {
        return "usage: Headroom --channels N --rate HZ [--chain bridge|corrected|rosette] [--jvms N]";
    }

    /** Parses {@code args}, measures in fresh JVMs with {@code timing} and prints the report. */
    static void run(String[] args, PrintStream out, Timing timing) {
        int channels = -1;
        double rate = -1;
        int jvms = 3;
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
                case "--jvms":
                    jvms = parseInt(value, "--jvms");
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
        if (channels < 1 || !(rate > 0) || Double.isInfinite(rate)) {
            throw new IllegalArgumentException("--channels and --rate are needed, both positive");
        }
        if (jvms < 1 || jvms > 20) {
            throw new IllegalArgumentException("--jvms must be 1 to 20: " + jvms);
        }
        double[][] rates = new double[jvms][];
        for (int j = 0; j < jvms; j++) {
            rates[j] = measureInFreshJvm(chain, timing);
        }
        out.print(report(chain, channels, rate, rates));
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

    /**
     * Runs {@link HeadroomProbe} in a new JVM of this Java with this class path and returns its
     * sorted throughputs.
     */
    static double[] measureInFreshJvm(Chain chain, Timing timing) {
        Path java = Path.of(System.getProperty("java.home"), "bin", "java");
        List<String> command = List.of(java.toString(), "-cp", System.getProperty("java.class.path"),
                HeadroomProbe.class.getName(), chain.name(), Long.toString(timing.warmupMillis),
                Integer.toString(timing.runs), Long.toString(timing.runMillis));
        try {
            Process process = new ProcessBuilder(command).redirectErrorStream(true).start();
            String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            int status = process.waitFor();
            if (status != 0) {
                throw new IllegalStateException("the measuring JVM exited with " + status + ": "
                        + output.strip());
            }
            List<Double> rates = new ArrayList<>();
            for (String line : output.split("\n")) {
                if (!line.isBlank()) {
                    rates.add(Double.parseDouble(line.strip()));
                }
            }
            return rates.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot start " + java, e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while measuring", e);
        } catch (NumberFormatException e) {
            throw new IllegalStateException("the measuring JVM printed no throughput: " + e.getMessage(), e);
        }
    }

    /**
     * The report for a load of {@code channels} × {@code rate}, from the sorted throughputs of
     * each fresh JVM ({@code rates[jvm][run]}).
     */
    static String report(Chain chain, int channels, double rate, double[][] rates) {
        double[] medians = new double[rates.length];
        double lowestRun = Double.POSITIVE_INFINITY;
        double highestRun = 0;
        for (int j = 0; j < rates.length; j++) {
            medians[j] = median(rates[j]);
            lowestRun = Math.min(lowestRun, rates[j][0]);
            highestRun = Math.max(highestRun, rates[j][rates[j].length - 1]);
        }
        double[] sorted = medians.clone();
        Arrays.sort(sorted);
        double median = median(sorted);
        double slowest = sorted[0];
        double fastest = sorted[sorted.length - 1];
        double load = channels * rate;
        String unit = chain.unit;
        StringBuilder text = new StringBuilder();
        text.append(String.format(Locale.ROOT, "strainmath headroom report, %s%n", LocalDate.now()));
        text.append(String.format(Locale.ROOT, "  JVM        %s %s (%s)%n",
                System.getProperty("java.vm.name"), System.getProperty("java.version"),
                System.getProperty("java.vendor")));
        text.append(String.format(Locale.ROOT, "  CPU        %s, %d cores visible%n", cpu(),
                Runtime.getRuntime().availableProcessors()));
        text.append(String.format(Locale.ROOT, "  chain      %s: %s, blocks of %d %s%n",
                chain.name().toLowerCase(Locale.ROOT), chain.description, HeadroomProbe.BLOCK, unit));
        text.append(String.format(Locale.ROOT, "  load       %d %s × %sHz = %s%s/s%n", channels,
                chain.channels, readable(rate), readable(load), unit));
        text.append(String.format(Locale.ROOT, "  one core   %s%s/s, median of %d fresh JVMs × %d runs%n",
                readable(median), unit, rates.length, rates[0].length));
        StringBuilder perJvm = new StringBuilder();
        for (double m : medians) {
            perJvm.append(perJvm.length() == 0 ? "" : ", ").append(readable(m).strip());
        }
        text.append(String.format(Locale.ROOT, "  per JVM    %s (between JVMs %s %% apart; single runs %s to %s)%n",
                perJvm, percent(100 * (fastest - slowest) / median), readable(lowestRun).strip(),
                readable(highestRun).strip()));
        text.append(String.format(Locale.ROOT,
                "  share      %s %% of one core (%s %% in the fastest JVM, %s %% in the slowest)%n",
                percent(100 * load / median), percent(100 * load / fastest), percent(100 * load / slowest)));
        text.append(String.format(Locale.ROOT,
                "  sustains   %s %s of this chain at %sHz on one core (%s in the slowest JVM)%n",
                count(median / rate), chain.channels, readable(rate), count(slowest / rate)));
        if (fastest > UNEVEN * slowest) {
            text.append(String.format(Locale.ROOT,
                    "  uneven     the fastest JVM ran %s × the slowest (the JIT compiled the chain another"
                    + " way, or the machine was busy): plan with the slowest%n", number(fastest / slowest)));
        }
        text.append(String.format(Locale.ROOT, "  reference  JMH %s, size 4096 (docs/performance.md)%n",
                chain.benchmark));
        text.append(String.format(Locale.ROOT,
                "  (a planning estimate on this machine: leave room for moving data, logging and the network)%n"));
        return text.toString();
    }

    /**
     * Fastest over slowest JVM beyond which the report says to plan with the slowest: runs of one
     * compiled form differ by well under this here, two compiled forms by about 2 × (the rosette
     * chain, docs/performance.md).
     */
    static final double UNEVEN = 1.25;

    private static double median(double[] sorted) {
        int n = sorted.length;
        return n % 2 == 1 ? sorted[n / 2] : 0.5 * (sorted[n / 2 - 1] + sorted[n / 2]);
    }

    /** Four significant digits, no trailing zeros, no exponent. */
    static String number(double x) {
        return plain(x, 4);
    }

    /** Two significant digits, no exponent: shares and spreads in per cent are not better known. */
    static String percent(double x) {
        return plain(x, 2);
    }

    private static String plain(double x, int digits) {
        return new BigDecimal(x).round(new MathContext(digits)).stripTrailingZeros().toPlainString();
    }

    /**
     * Four significant digits with an SI prefix and the space before the unit: {@code "2 k"},
     * {@code "301.5 M"}, {@code "1.677 G"}, {@code "950 "}; the unit follows directly.
     */
    static String readable(double x) {
        String[] prefixes = {"", "k", "M", "G", "T"};
        int p = 0;
        double scaled = x;
        while (Math.abs(scaled) >= 999.95 && p < prefixes.length - 1) {
            scaled /= 1000;
            p++;
        }
        return number(scaled) + " " + prefixes[p];
    }

    /** A whole count, rounded down, with an SI prefix beyond 100 000. */
    static String count(double x) {
        double whole = Math.floor(x);
        return whole < 100_000 ? Long.toString((long) whole) : readable(whole).strip();
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
