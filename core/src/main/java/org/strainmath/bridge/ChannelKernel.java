package org.strainmath.bridge;

import org.strainmath.internal.Kernels;

/**
 * The block kernel of a {@link StrainChannel}: converter codes to corrected strain, chunk by
 * chunk, from the constants the channel composed when it was built (the converter's scale and
 * offset, the interval of readings that are inside the converter's range and physical for the
 * bridge, the transverse and span factor, the thermal correction and the gauge factor's drift).
 *
 * <p>Per chunk of {@link Kernels#CHUNK} codes, their least and greatest decide the path: inside
 * the proven codes (where the bridge's plain quotient is regular, {@link Bridge#regularOn}),
 * one vectorised loop of {@link CodeLoops} with one division per sample, no mask and no count;
 * otherwise the readings, the checked inverse of {@link BridgeLoops} and a count of the NaN it
 * gave. The thermal correction is fused into the proven loop, or applied after the checked one.
 * Every path gives the bits of the scalar {@link #strain(long, double)}.
 *
 * <p>Immutable and thread-safe.
 */
final class ChannelKernel {

    /**
     * Readings within this share of the reading interval's width from either end are never
     * proven regular, so that the proof keeps a margin from the ends.
     */
    private static final double EDGE = 0x1p-16;

    private final BridgeEquation equation;
    private final BridgeLoops loops;
    private final CodeLoops codeLoops;
    private final double scale;
    private final double offset;
    private final double low;
    private final double high;
    /**
     * The codes [provenLow, provenHigh] whose readings lie inside (low, high) on an interval
     * where the bridge's plain quotient is proven regular (Bridge.regularOn): a chunk of codes
     * within them needs neither the per-sample check nor a count of NaN. Empty (1, 0) if none.
     */
    private final int provenLow;
    private final int provenHigh;
    /** The transverse and span factor, the one factor the loops apply. */
    private final double factor;
    private final ThermalOutput.Correction thermal;      // null unless set
    /** Relative gauge-factor change per kelvin of the active gauges, and its reference, °C. */
    private final double drift;
    private final double driftCelsius;
    /** 0xFFFF for offset-binary 16-bit codes (read unsigned), else −1. */
    private final int shortMask;

    ChannelKernel(Bridge bridge, double scale, double offset, double low, double high,
            double factor, ThermalOutput.Correction thermal, double drift, double driftCelsius,
            boolean offsetBinary) {
        this.equation = bridge.equation();
        this.loops = bridge.loops();
        this.codeLoops = bridge.codeLoops();
        this.scale = scale;
        this.offset = offset;
        this.low = low;
        this.high = high;
        long[] proven = provenCodes(bridge, scale, offset, low, high);
        this.provenLow = (int) proven[0];
        this.provenHigh = (int) proven[1];
        this.factor = factor;
        this.thermal = thermal;
        this.drift = drift;
        this.driftCelsius = driftCelsius;
        this.shortMask = offsetBinary ? 0xFFFF : -1;
    }

    /**
     * The codes, as {low, high} within the int range, whose readings code·scale + offset lie in
     * the reading interval less a margin of EDGE × its width at each end, if the bridge's plain
     * quotient is regular there; {1, 0} otherwise. Rounding is monotonic, so every code between
     * the two found ends gives a reading between their readings.
     */
    private static long[] provenCodes(Bridge bridge, double scale, double offset, double low,
            double high) {
        double margin = (high - low) * EDGE;
        double lo = low + margin;
        double hi = high - margin;
        long[] none = {1, 0};
        if (!(lo < hi) || !bridge.regularOn(lo, hi)) {
            return none;
        }
        double first = scale > 0 ? lo : hi;
        double last = scale > 0 ? hi : lo;
        long a = clampToInt(Math.ceil((first - offset) / scale));
        long b = clampToInt(Math.floor((last - offset) / scale));
        while (a <= b && !within(a * scale + offset, lo, hi)) {
            a++;
        }
        while (a <= b && !within(b * scale + offset, lo, hi)) {
            b--;
        }
        return a <= b ? new long[] {a, b} : none;
    }

    private static boolean within(double r, double lo, double hi) {
        return r >= lo && r <= hi;
    }

    private static long clampToInt(double code) {
        return (long) Math.max(Integer.MIN_VALUE, Math.min(Integer.MAX_VALUE, code));
    }

    /** The corrected strain of {@code code} without temperatures: the scalar path. */
    double strain(long code) {
        return equation.channelStrain(code * scale + offset, low, high, factor);
    }

    /** The corrected strain of {@code code} read at {@code celsius} °C: the scalar path. */
    double strain(long code, double celsius) {
        double strain = strain(code);
        if (thermal == null) {
            return strain;
        }
        return gaugeFactorAt(thermal.correct(strain, celsius), celsius, drift, driftCelsius);
    }

    /**
     * ε·K/K(T) = ε / (1 + c·(T − Tref)): the bridge equation depends on K·ε only, so a gauge
     * factor that follows temperature rescales the strain exactly when all active gauges share
     * it.
     */
    static double gaugeFactorAt(double strain, double celsius, double drift,
            double reference) {
        return strain / (1.0 + drift * (celsius - reference));
    }

    /** The 16-bit kernel: codes[codesOff...] into dst[dstOff...], ranges checked by the caller. */
    int convertShorts(short[] codes, int codesOff, double[] dst, int dstOff, int len) {
        final double s = scale;
        final double o = offset;
        final int mask = shortMask;
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            int min = Integer.MAX_VALUE;
            int max = Integer.MIN_VALUE;
            for (int i = start, k = codesOff + done; i < stop; i++, k++) {
                int code = codes[k] & mask;
                min = Math.min(min, code);
                max = Math.max(max, code);
                dst[i] = code * s + o;
            }
            nan += finish(dst, start, stop, null, 0, proven(min, max));
        }
        return nan;
    }

    /**
     * The int[] kernel. Per chunk, the codes' least and greatest values decide the path: inside
     * the proven codes, one vectorised loop with one division per sample and no count; else the
     * readings, the checked inverse and a count of the NaN it gave. {@code proof} says how the
     * least and greatest are found: by a pass before the loop, or by the loop itself, which
     * then hands a chunk with a code outside to the checked path, which overwrites what the
     * loop wrote (see {@link Kernels#REDUCTIONS_IN_LOOP}). All give the same bits; the tests
     * compare every one with the scalar path.
     */
    int convert(int[] codes, int codesOff, double[] celsius, int celsiusOff, double[] dst,
            int dstOff, int len, StrainChannel.Proof proof) {
        final int shift = codesOff - dstOff;
        final boolean withThermal = thermal != null && celsius != null;
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            boolean converted;
            if (proof == StrainChannel.Proof.NONE) {
                converted = false;
            } else if (proof == StrainChannel.Proof.IN_LOOP) {
                if (withThermal) {
                    int counted = fusedWithThermal(codes, shift, celsius, celsiusOff - dstOff,
                            dst, start, stop, true);
                    converted = counted >= 0;
                    nan += Math.max(counted, 0);
                } else {
                    converted = codeLoops.codesToStrainPlainWithin(codes, shift, scale, offset,
                            dst, start, stop, factor, provenLow, provenHigh);
                }
            } else if (proven(codes, start + shift, stop + shift)) {
                if (withThermal) {
                    nan += fusedWithThermal(codes, shift, celsius, celsiusOff - dstOff, dst,
                            start, stop, false);
                } else {
                    codeLoops.codesToStrainPlain(codes, shift, scale, offset, dst, start, stop,
                            factor);
                }
                converted = true;
            } else {
                converted = false;
            }
            if (!converted) {
                codesToReadings(codes, shift, dst, start, stop);
                nan += finish(dst, start, stop, celsius, celsiusOff - dstOff, false);
            }
        }
        return nan;
    }

    /**
     * A chunk with the thermal correction, converted in one loop (the bridge inverse less the
     * thermal output) that reads each temperature at the output's own index (copied into dst
     * first when the offsets differ, since C2 does not vectorise two double arrays read and
     * written at different unknown offsets). With {@code boundsInLoop} the loop also takes the
     * codes' least and greatest and this returns −1 if one lay outside the proven codes (the
     * caller redoes the chunk by the checked path; the temperatures are read from
     * {@code celsius}, which is disjoint from dst); without, the caller has proven the codes.
     * Otherwise it returns the count of NaN outputs. Without a drifting gauge factor, only a
     * temperature that is not finite (the loop reports it) leads to a count, after those
     * samples are set to NaN as the scalar path sets them.
     */
    private int fusedWithThermal(int[] codes, int shift, double[] celsius, int celsiusShift,
            double[] dst, int start, int stop, boolean boundsInLoop) {
        double[] t = celsius;
        if (celsiusShift != 0) {
            System.arraycopy(celsius, start + celsiusShift, dst, start, stop - start);
            t = dst;
        }
        int status;
        if (boundsInLoop) {
            status = codeLoops.codesToStrainLessThermalWithin(codes, shift, scale, offset, t, dst,
                    start, stop, factor, thermal, provenLow, provenHigh);
            if (status == CodeLoops.CODES_OUTSIDE) {
                return -1;
            }
        } else {
            status = codeLoops.codesToStrainLessThermal(codes, shift, scale, offset, t, dst, start,
                    stop, factor, thermal) ? CodeLoops.PROVEN : CodeLoops.PROVEN_NON_FINITE_TEMPERATURE;
        }
        boolean finite = status == CodeLoops.PROVEN;
        if (drift != 0.0) {
            gaugeFactorInPlace(dst, celsius, celsiusShift, start, stop);
        }
        if (!finite) {
            for (int i = start; i < stop; i++) {
                if (!Double.isFinite(celsius[i + celsiusShift])) {
                    dst[i] = Double.NaN;
                }
            }
        }
        // With a drifting gauge factor, 1 + c·(T − Tref) can reach 0 at an absurd but finite
        // temperature, so such a chunk is counted even when every temperature is finite.
        return finite && drift == 0.0 ? 0 : Kernels.countNaN(dst, start, stop - start);
    }

    /** Whether every code of codes[from, to) lies within the proven codes. */
    private boolean proven(int[] codes, int from, int to) {
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = from; i < to; i++) {
            int code = codes[i];
            min = Math.min(min, code);
            max = Math.max(max, code);
        }
        return proven(min, max);
    }

    /** Whether codes from min to max all lie within the proven codes. */
    boolean proven(int min, int max) {
        return min >= provenLow && max <= provenHigh;
    }

    private void codesToReadings(int[] codes, int shift, double[] dst, int start, int stop) {
        final double s = scale;
        final double o = offset;
        for (int i = start; i < stop; i++) {
            dst[i] = codes[i + shift] * s + o;
        }
    }

    /**
     * Converts column {@code column} of {@code frameCount} interleaved frames of
     * {@code channelsPerFrame} codes each, starting at {@code framesOff}, into
     * {@code dst[dstOff...]}; for {@link ChannelFrames}, which has checked the ranges.
     */
    int convertColumn(int[] frames, int framesOff, int channelsPerFrame, int column,
            double[] celsiusPerFrame, int celsiusOff, double[] dst, int dstOff, int frameCount) {
        final double s = scale;
        final double o = offset;
        int nan = 0;
        int k = framesOff + column;
        for (int done = 0; done < frameCount; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, frameCount - done);
            int min = Integer.MAX_VALUE;
            int max = Integer.MIN_VALUE;
            for (int i = start; i < stop; i++, k += channelsPerFrame) {
                int code = frames[k];
                min = Math.min(min, code);
                max = Math.max(max, code);
                dst[i] = code * s + o;
            }
            nan += finish(dst, start, stop, celsiusPerFrame, celsiusOff - dstOff,
                    proven(min, max));
        }
        return nan;
    }

    /**
     * The bridge inverse with the channel's factor, and the thermal correction, of the
     * readings dst[start, stop) in place; returns the count of NaN there.
     */
    private int finish(double[] dst, int start, int stop, double[] celsius, int shift,
            boolean proven) {
        loops.readingsToStrain(dst, start, stop, low, high, factor, proven);
        return corrected(dst, start, stop, celsius, shift, proven);
    }

    /**
     * The thermal correction of dst[start, end) in place, when the channel has one and
     * temperatures are given (celsius[i + shift] for dst[i]); returns the count of NaN there,
     * which is 0 without counting when the strains were proven regular and nothing followed.
     */
    private int corrected(double[] dst, int start, int stop, double[] celsius, int shift,
            boolean proven) {
        if (thermal != null && celsius != null) {
            thermal.correctInPlace(dst, celsius, shift, start, stop);
            if (drift != 0.0) {
                gaugeFactorInPlace(dst, celsius, shift, start, stop);
            }
        } else if (proven) {
            return 0;
        }
        return Kernels.countNaN(dst, start, stop - start);
    }

    private void gaugeFactorInPlace(double[] dst, double[] celsius, int shift, int start,
            int end) {
        final double c = drift;
        final double reference = driftCelsius;
        if (shift == 0) {
            for (int i = start; i < end; i++) {
                dst[i] = gaugeFactorAt(dst[i], celsius[i], c, reference);
            }
        } else {
            for (int i = start; i < end; i++) {
                dst[i] = gaugeFactorAt(dst[i], celsius[i + shift], c, reference);
            }
        }
    }
}
