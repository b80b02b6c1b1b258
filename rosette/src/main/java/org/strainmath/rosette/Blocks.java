package org.strainmath.rosette;

import java.util.Objects;

/**
 * The argument checks of the rosette's block kernels (scalar arguments go through core's
 * {@code org.strainmath.internal.Checks}).
 *
 * <p>Stateless; thread-safe.
 */
final class Blocks {

    private Blocks() {
    }

    /**
     * Checks {@code readings} (one array per gauge, {@code gauges} of them) from {@code srcOff}
     * and the outputs from {@code dstOff}, {@code len} samples each; every output must be a
     * different array, and may be an input array only at the same offset.
     */
    static void block(double[][] readings, int gauges, int srcOff, int dstOff, int len,
            double[]... outputs) {
        Objects.requireNonNull(readings, "readings");
        if (readings.length != gauges) {
            throw new IllegalArgumentException("readings must hold one array per gauge, "
                    + gauges + ": " + readings.length);
        }
        for (int j = 0; j < gauges; j++) {
            Objects.requireNonNull(readings[j], "readings[" + j + "]");
            Objects.checkFromIndexSize(srcOff, len, readings[j].length);
        }
        for (double[] out : outputs) {
            Objects.checkFromIndexSize(dstOff, len, Objects.requireNonNull(out, "output").length);
            for (double[] in : readings) {
                if (out == in && srcOff != dstOff) {
                    throw new IllegalArgumentException("an output that is also an input array "
                            + "needs dstOff == srcOff: " + dstOff + " != " + srcOff);
                }
            }
        }
        for (int i = 0; i < outputs.length; i++) {
            for (int k = i + 1; k < outputs.length; k++) {
                if (outputs[i] == outputs[k]) {
                    throw new IllegalArgumentException("the outputs must be different arrays");
                }
            }
        }
    }
}
