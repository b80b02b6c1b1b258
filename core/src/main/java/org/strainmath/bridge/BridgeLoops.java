package org.strainmath.bridge;

import org.strainmath.internal.Kernels;

/**
 * The block loops of a bridge over {@code double} arrays: readings to strain through the masked
 * inverse (with the NaN count after the loop, or, where {@link Kernels#REDUCTIONS_IN_LOOP}
 * allows it, a running min inside it), strain to readings, and a channel's readings to strain
 * (plain where the channel has proven the readings regular, checked otherwise). Fed by the
 * bridge's {@link BridgeEquation}; the per-sample arithmetic is that equation's, so the loops
 * and the scalar methods give the same bits.
 *
 * <p>Blocks run in chunks of {@link Kernels#CHUNK} samples, so that the NaN count reads what
 * the loop has just written while it is still in cache. One small method per loop and per form
 * of the equation, each reading and writing at one index: C2 compiles and vectorises each loop
 * on its own, and a method with a switch over several loops vectorised less reliably
 * (docs/kernel-findings.md). The loops of one form differ by their arithmetic only.
 *
 * <p>Immutable and thread-safe.
 */
final class BridgeLoops {

    private final BridgeEquation eq;

    BridgeLoops(BridgeEquation eq) {
        this.eq = eq;
    }

    /**
     * Converts {@code from[dstOff, dstOff + len)} (readings, V/V, at the output's index) into
     * strains in {@code dst}, chunk by chunk, and returns the count of NaN outputs;
     * {@code probeInLoop} takes the running min inside the loop for long chunks.
     */
    int toStrain(double[] from, double[] dst, int dstOff, int len, boolean probeInLoop) {
        final double ratioLow = eq.ratioLow;
        final double ratioHigh = eq.ratioHigh;
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            if (probeInLoop && stop - start >= Kernels.REDUCTION_MIN_LENGTH) {
                double probe = toStrainProbed(from, dst, start, stop, ratioLow, ratioHigh);
                nan += probe == 0 ? 0 : Kernels.countNaN(dst, start, stop - start);
            } else {
                toStrainWithin(from, dst, start, stop, ratioLow, ratioHigh);
                nan += Kernels.countNaN(dst, start, stop - start);
            }
        }
        return nan;
    }

    /**
     * As {@link #toStrainWithin}, and returns the least of ε·0 over the chunk: 0 when every
     * output is finite, NaN otherwise ({@link Kernels#REDUCTIONS_IN_LOOP}).
     */
    private double toStrainProbed(double[] from, double[] dst, int start, int end, double low,
            double high) {
        switch (eq.form) {
            case LINEAR:
                return inverseLinearProbed(from, dst, start, end, low, high);
            case FIRST_DEGREE:
                return inverseFirstDegreeProbed(from, dst, start, end, low, high);
            default:
                return inverseQuadraticProbed(from, dst, start, end, low, high);
        }
    }

    /**
     * Converts from[start, end) into dst[start, end) with the reading interval (low, high): the
     * loop of {@link #toStrain(double[], int, double[], int, int)}.
     */
    private void toStrainWithin(double[] from, double[] dst, int start, int end, double low,
            double high) {
        switch (eq.form) {
            case LINEAR:
                inverseLinearBlock(from, dst, start, end, low, high);
                break;
            case FIRST_DEGREE:
                inverseFirstDegreeBlock(from, dst, start, end, low, high);
                break;
            default:
                inverseQuadraticBlock(from, dst, start, end, low, high);
                break;
        }
    }

    /**
     * Converts the readings dst[start, end) into strains in place: plain(r)·factor, times
     * unity(r) unless {@code proven} (the readings are known to lie inside the interval).
     */
    void readingsToStrain(double[] dst, int start, int end, double low, double high,
            double factor, boolean proven) {
        switch (eq.form) {
            case LINEAR:
                if (proven) {
                    linearPlain(dst, start, end, factor);
                } else {
                    linearChecked(dst, start, end, low, high, factor);
                }
                break;
            case FIRST_DEGREE:
                if (proven) {
                    firstDegreePlain(dst, start, end, factor);
                } else {
                    firstDegreeChecked(dst, start, end, low, high, factor);
                }
                break;
            default:
                if (proven) {
                    quadraticPlain(dst, start, end, factor);
                } else {
                    quadraticChecked(dst, start, end, low, high, factor);
                }
                break;
        }
    }

    // The masked inverse, readings to strain, one loop per form. NaN comes out for a reading
    // outside the interval, and the count runs in a pass of its own after the loop.

    private void inverseLinearBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.inverseLinear(from[i], c0, c1, low, high);
        }
    }

    private void inverseFirstDegreeBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.inverseFirstDegree(from[i], c0, c1, e1, low, high);
        }
    }

    private void inverseQuadraticBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.inverseQuadratic(from[i], c0, c1, c2, e1, e2, sign, low, high);
        }
    }

    // The same loops with a running min of ε·0, 0 or NaN: JDK 25 keeps such a loop vectorised
    // and then needs no count pass for a clean chunk, JDK 17 does not (Kernels), so both stay.

    private double inverseLinearProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = BridgeEquation.inverseLinear(from[i], c0, c1, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    private double inverseFirstDegreeProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = BridgeEquation.inverseFirstDegree(from[i], c0, c1, e1, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    private double inverseQuadraticProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = BridgeEquation.inverseQuadratic(from[i], c0, c1, c2, e1, e2, sign, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    // A channel's readings to strain in place: Plain for readings the channel has proven inside
    // the interval (one division, no mask), Checked times unity(r), 1 inside and NaN outside.

    private void linearPlain(double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainLinear(dst[i], c0, c1) * factor;
        }
    }

    private void linearChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = BridgeEquation.plainLinear(r, c0, c1) * factor * BridgeEquation.unity(r, low, high);
        }
    }

    private void firstDegreePlain(double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainFirstDegree(dst[i], c0, c1, e1) * factor;
        }
    }

    private void firstDegreeChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = BridgeEquation.plainFirstDegree(r, c0, c1, e1) * factor * BridgeEquation.unity(r, low, high);
        }
    }

    private void quadraticPlain(double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainQuadratic(dst[i], c0, c1, c2, e1, e2, sign) * factor;
        }
    }

    private void quadraticChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = BridgeEquation.plainQuadratic(r, c0, c1, c2, e1, e2, sign) * factor * BridgeEquation.unity(r, low, high);
        }
    }

    /**
     * Converts {@code from[dstOff, dstOff + len)} (strains, at the output's index) into readings
     * in {@code dst}, chunk by chunk, and returns the count of NaN outputs.
     */
    int toRatio(double[] from, double[] dst, int dstOff, int len) {
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            forwardBlock(from, dst, start, stop);
            nan += Kernels.countNaN(dst, start, stop - start);
        }
        return nan;
    }

    private void forwardBlock(double[] from, double[] dst, int start, int end) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double low = eq.strainLow;
        final double high = eq.strainHigh;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.forward(from[i], c0, c1, c2, e1, e2, low, high);
        }
    }
}
