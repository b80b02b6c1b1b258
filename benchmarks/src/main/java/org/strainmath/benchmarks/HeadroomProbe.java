package org.strainmath.benchmarks;

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
 * The measuring half of the headroom report: run in a fresh JVM by {@link Headroom}, it times one
 * chain's block kernel and prints one throughput per timed run, one per line. By hand it takes
 * the same four arguments, e.g. {@code HeadroomProbe rosette 5000 5 1000} (docs/performance.md).
 *
 * <p>Each chain is set up exactly as the JMH benchmark named in {@link Headroom.Chain} at a block
 * of 4096 (same configuration, same seeded signal), so that the two can be compared.
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

    /** One block call of the chain on the JMH benchmark's inputs (a sink keeps it alive). */
    private static Runnable blockOf(Headroom.Chain chain) {
        double[] out = new double[BLOCK];
        switch (chain) {
            case BRIDGE: {
                // As BridgeInverseBenchmark.quarterBlock.
                Bridge bridge = Bridge.quarter(StrainGauge.ofOhms(350, 2.1));
                double[] ratios = new double[BLOCK];
                bridge.toRatio(Signals.strain(BLOCK, 1500e-6, 0x5EED), 0, ratios, 0, BLOCK);
                return () -> Sink.keep(bridge.toStrain(ratios, 0, out, 0, BLOCK));
            }
            case CORRECTED: {
                // As ChannelBenchmark.channelBlockWithThermalOutput.
                StrainGauge gauge = StrainGauge.ofOhms(350, 2.08).withTransverseSensitivity(0.006);
                Bridge bridge = Bridge.quarter(gauge).withThreeWireLeads(Resistance.ofOhms(1.7));
                AdcInput adc = AdcInput.ratiometric(24, 128);
                StrainChannel channel = StrainChannel.of(bridge, adc).withTransverseCorrection(-0.29)
                        .zeroedByOffsetAt(-2140)
                        .withThermalOutput(ThermalOutput.ofCelsius(-28.4, 2.05, -0.047, 1.6e-4),
                                Temperature.ofCelsius(22));
                double[] strain = Signals.strain(BLOCK, 1500e-6, 0xC0DE);
                double perCode = adc.ratioPerCode().toVoltsPerVolt();
                int[] codes = new int[BLOCK];
                double[] celsius = new double[BLOCK];
                for (int i = 0; i < BLOCK; i++) {
                    codes[i] = (int) Math.round(bridge.toRatio(strain[i]) / perCode) - 2140;
                    celsius[i] = 22 + 15 * Math.sin(2 * Math.PI * i / BLOCK);
                }
                return () -> Sink.keep(channel.toStrain(codes, 0, celsius, 0, out, 0, BLOCK));
            }
            default: {
                // As RosetteBenchmark.principalAndVonMises.
                Rosette rosette = Rosette.rectangular()
                        .withMaterial(IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30));
                double[][] readings = {Signals.strain(BLOCK, 900e-6, 0xA1),
                    Signals.strain(BLOCK, 300e-6, 0xB2), Signals.strain(BLOCK, -250e-6, 0xC3)};
                double[] e2 = new double[BLOCK];
                double[] vonMises = new double[BLOCK];
                return () -> Sink.keep(rosette.toPrincipalStrainsAndVonMises(readings, 0, out, e2,
                        vonMises, 0, BLOCK));
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
