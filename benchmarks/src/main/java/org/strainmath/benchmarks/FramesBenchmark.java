package org.strainmath.benchmarks;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.ChannelFrames;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.quantity.Resistance;

/**
 * Interleaved multi-channel frames (4096 frames per block) converted to one strain block per
 * channel, beside the same channels converting columns that were already separated: the
 * difference is the cost of reading the interleaved layout. Scores are per block of
 * {@code channels × 4096} samples.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 5, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class FramesBenchmark {

    static final int FRAMES = 4096;

    @Param({"1", "8", "64"})
    public int channels;

    ChannelFrames frames;
    StrainChannel[] columns;
    int[] interleaved;
    int[][] separated;
    double[][] out;

    @Setup
    public void setUp() {
        AdcInput adc = AdcInput.ratiometric(24, 128);
        columns = new StrainChannel[channels];
        interleaved = new int[channels * FRAMES];
        separated = new int[channels][FRAMES];
        out = new double[channels][FRAMES];
        for (int c = 0; c < channels; c++) {
            Bridge bridge = c % 2 == 0
                    ? Bridge.quarter(StrainGauge.ofOhms(350, 2.08)).withThreeWireLeads(Resistance.ofOhms(1.2))
                    : Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.05), 0.3);
            columns[c] = StrainChannel.of(bridge, adc);
            double[] strain = Signals.strain(FRAMES, 1000e-6, 100 + c);
            double perCode = adc.ratioPerCode().toVoltsPerVolt();
            for (int i = 0; i < FRAMES; i++) {
                int code = (int) Math.round(bridge.toRatio(strain[i]) / perCode);
                interleaved[i * channels + c] = code;
                separated[c][i] = code;
            }
        }
        frames = ChannelFrames.of(columns);
    }

    @Benchmark
    public int interleavedFrames() {
        return frames.toStrain(interleaved, out);
    }

    @Benchmark
    public int separatedColumns() {
        int nan = 0;
        for (int c = 0; c < channels; c++) {
            nan += columns[c].toStrain(separated[c], 0, out[c], 0, FRAMES);
        }
        return nan;
    }
}
