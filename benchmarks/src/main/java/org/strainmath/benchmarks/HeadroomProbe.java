package org.strainmath.benchmarks;

import java.util.Arrays;
import java.util.Locale;

/**
 * The measuring half of the headroom report: run in a fresh JVM by {@link Headroom}, it times one
 * chain's block kernel and prints one throughput per timed run, one per line. By hand it takes
 * the same four arguments, e.g. {@code HeadroomProbe rosette 5000 5 1000} (docs/performance.md).
 *
 * <p>Each chain runs the JMH benchmark named in {@link Headroom.Chain}: its state class, set up
 * by its own {@code setUp} at a block of 4096, and its benchmark method, so that the two measure
 * the same work.
 */
public final class HeadroomProbe {

    static final int BLOCK = 4096;

    private HeadroomProbe() {
    }

    /**
     * Arguments: the chain, the warm-up in milliseconds, the number of timed runs and the length
     * of each in milliseconds. Prints the throughputs (samples or rosettes per second) sorted.
     */
    public static void main(String[] args) {
        Headroom.Chain chain = Headroom.Chain.valueOf(args[0].toUpperCase(Locale.ROOT));
        double[] rates = measure(chain, Long.parseLong(args[1]), Integer.parseInt(args[2]),
                Long.parseLong(args[3]));
        StringBuilder lines = new StringBuilder();
        for (double rate : rates) {
            lines.append(Double.toString(rate)).append('\n');
        }
        System.out.print(lines);
        System.out.flush();
    }

    /** Samples (or rosettes) per second of one core, one value per timed run, sorted. */
    static double[] measure(Headroom.Chain chain, long warmupMillis, int runs, long runMillis) {
        Runnable block = blockOf(chain);
        long warmupEnd = System.nanoTime() + warmupMillis * 1_000_000;
        while (System.nanoTime() < warmupEnd) {
            block.run();
        }
        double[] rates = new double[runs];
        for (int r = 0; r < runs; r++) {
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

    /**
     * One block call of the chain: the JMH benchmark's own state, set up by its own
     * {@code setUp} at a block of 4096, and its benchmark method (a sink keeps the result).
     */
    private static Runnable blockOf(Headroom.Chain chain) {
        switch (chain) {
            case BRIDGE: {
                BridgeInverseBenchmark state = new BridgeInverseBenchmark();
                state.size = BLOCK;
                state.setUp();
                return () -> Sink.keep(state.quarterBlock());
            }
            case CORRECTED: {
                ChannelBenchmark state = new ChannelBenchmark();
                state.size = BLOCK;
                state.setUp();
                return () -> Sink.keep(state.channelBlockWithThermalOutput());
            }
            default: {
                RosetteBenchmark state = new RosetteBenchmark();
                state.size = BLOCK;
                state.setUp();
                return () -> Sink.keep(state.principalAndVonMises());
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
}
