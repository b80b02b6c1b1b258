package org.strainmath.bridge;

import org.strainmath.internal.Kernels;

/**
 * The block loops of a channel over {@code int} converter codes: for a chunk of codes proven to
 * lie where the bridge's plain quotient is regular, the reading code·scale + offset, the plain
 * inverse and the channel's factor in one loop per form of the equation, with the thermal
 * correction fused in where the channel has one; and the same loops taking the codes' least and
 * greatest inside them (for JVMs whose C2 keeps such reductions vectorised,
 * {@link Kernels#REDUCTIONS_IN_LOOP}), so that an unproven chunk needs no pass before it. Fed by
 * the bridge's {@link BridgeEquation}; the per-sample arithmetic is its, and the thermal output
 * is {@link ThermalOutput.Correction#polynomial}, the scalar path's own expression.
 *
 * <p>An {@code int[]} cannot alias the {@code double} output, so reading the codes at another
 * index than the output does not stop C2 from vectorising these loops. The loops of one form
 * differ by the reductions (the "Within" ones) and by the thermal term only; each is a method of
 * its own so that C2 compiles and vectorises it on its own (docs/kernel-findings.md).
 *
 * <p>Immutable and thread-safe.
 */
final class CodeLoops {

    /** What a fused thermal loop found: a code outside the bounds (the chunk is to be redone). */
    static final int CODES_OUTSIDE = 0;
    /** What a fused thermal loop found: codes within the bounds, every temperature finite. */
    static final int PROVEN = 1;
    /** What a fused thermal loop found: codes within the bounds, a temperature not finite. */
    static final int PROVEN_NON_FINITE_TEMPERATURE = 2;

    private final BridgeEquation eq;

    CodeLoops(BridgeEquation eq) {
        this.eq = eq;
    }

    /**
     * Converts codes[start + shift, end + shift) into strains in dst[start, end) in one loop,
     * plain(code·scale + offset)·factor per sample: for chunks whose codes regularOn has proven
     * inside the reading interval. An {@code int[]} cannot alias the output, so the two
     * indices do not stop C2 from vectorising the loop.
     */
    void codesToStrainPlain(int[] codes, int shift, double scale, double offset, double[] dst,
            int start, int end, double factor) {
        switch (eq.form) {
            case LINEAR:
                codesLinearPlain(codes, shift, scale, offset, dst, start, end, factor);
                break;
            case FIRST_DEGREE:
                codesFirstDegreePlain(codes, shift, scale, offset, dst, start, end, factor);
                break;
            default:
                codesQuadraticPlain(codes, shift, scale, offset, dst, start, end, factor);
                break;
        }
    }

    /**
     * As {@link #codesToStrainPlain}, taking the least and greatest code in the same loop:
     * whether every code lay within [low, high]. If not, the outputs are to be recomputed by
     * the checked path. For JVMs whose C2 keeps the min and max reductions in the vectorised
     * loop ({@link Kernels#REDUCTIONS_IN_LOOP}); it saves the pass over the codes.
     */
    boolean codesToStrainPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        switch (eq.form) {
            case LINEAR:
                return codesLinearPlainWithin(codes, shift, scale, offset, dst, start, end,
                        factor, low, high);
            case FIRST_DEGREE:
                return codesFirstDegreePlainWithin(codes, shift, scale, offset, dst, start, end,
                        factor, low, high);
            default:
                return codesQuadraticPlainWithin(codes, shift, scale, offset, dst, start, end,
                        factor, low, high);
        }
    }

    /**
     * As {@link #codesToStrainPlain}, less the thermal output of the temperature of each sample,
     * t = celsius[i] (which may be dst itself: each t is read before dst[i] is written), in one
     * loop: plain(code·scale + offset)·factor − q(t). Returns whether every t was finite; if
     * so, the results equal {@code thermal.correct(plain·factor, t)} bit for bit.
     */
    boolean codesToStrainLessThermal(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        switch (eq.form) {
            case LINEAR:
                return codesLinearLessThermal(codes, shift, scale, offset, celsius, dst, start,
                        end, factor, thermal);
            case FIRST_DEGREE:
                return codesFirstDegreeLessThermal(codes, shift, scale, offset, celsius, dst,
                        start, end, factor, thermal);
            default:
                return codesQuadraticLessThermal(codes, shift, scale, offset, celsius, dst, start,
                        end, factor, thermal);
        }
    }

    /**
     * As {@link #codesToStrainLessThermal}, for codes not yet proven: the loop also takes the
     * least and greatest code ({@link Kernels#REDUCTIONS_IN_LOOP}; on JDK 17 this loop ran at
     * 0.67 × the proof pass and the loop without them). Returns {@link #CODES_OUTSIDE} if a
     * code lies outside [low, high] (the outputs are then to be recomputed by the checked
     * path), else {@link #PROVEN} or {@link #PROVEN_NON_FINITE_TEMPERATURE}. For
     * {@link #PROVEN}, the results equal {@code thermal.correct(plain·factor, t)} bit for bit.
     */
    int codesToStrainLessThermalWithin(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        switch (eq.form) {
            case LINEAR:
                return codesLinearLessThermalWithin(codes, shift, scale, offset, celsius, dst,
                        start, end, factor, thermal, low, high);
            case FIRST_DEGREE:
                return codesFirstDegreeLessThermalWithin(codes, shift, scale, offset, celsius, dst,
                        start, end, factor, thermal, low, high);
            default:
                return codesQuadraticLessThermalWithin(codes, shift, scale, offset, celsius,
                        dst, start, end, factor, thermal, low, high);
        }
    }

    private static int thermalStatus(int min, int max, int low, int high, int finite) {
        if (min < low || max > high) {
            return CODES_OUTSIDE;
        }
        return finite == 1 ? PROVEN : PROVEN_NON_FINITE_TEMPERATURE;
    }

    // Codes proven inside the interval to strain: Plain after a proof pass over the codes
    // (JDK 17), Within taking the codes' least and greatest in the loop itself (JDK 25, where
    // the reductions stay vectorised; on JDK 17 that loop ran at 0.67 × the pass and the plain
    // loop, measured), so both stay.

    private void codesLinearPlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainLinear(codes[i + shift] * scale + offset, c0, c1) * factor;
        }
    }

    private boolean codesLinearPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = BridgeEquation.plainLinear(code * scale + offset, c0, c1) * factor;
        }
        return min >= low && max <= high;
    }

    private void codesFirstDegreePlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainFirstDegree(codes[i + shift] * scale + offset, c0, c1, e1) * factor;
        }
    }

    private boolean codesFirstDegreePlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = BridgeEquation.plainFirstDegree(code * scale + offset, c0, c1, e1) * factor;
        }
        return min >= low && max <= high;
    }

    private void codesQuadraticPlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = BridgeEquation.plainQuadratic(codes[i + shift] * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor;
        }
    }

    private boolean codesQuadraticPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = BridgeEquation.plainQuadratic(code * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor;
        }
        return min >= low && max <= high;
    }

    // The same with the thermal output less, q(t) = ThermalOutput.Correction.polynomial, the
    // scalar path's own expression, so that both give the same bits; LessThermal after a proof
    // pass (JDK 17), LessThermalWithin with the bounds in the loop (JDK 25), as above.

    private boolean codesLinearLessThermal(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainLinear(codes[i + shift] * scale + offset, c0, c1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private boolean codesFirstDegreeLessThermal(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainFirstDegree(codes[i + shift] * scale + offset, c0, c1, e1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private boolean codesQuadraticLessThermal(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainQuadratic(codes[i + shift] * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private int codesLinearLessThermalWithin(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainLinear(code * scale + offset, c0, c1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }

    private int codesFirstDegreeLessThermalWithin(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double e1 = eq.d1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainFirstDegree(code * scale + offset, c0, c1, e1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }

    private int codesQuadraticLessThermalWithin(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = eq.n0;
        final double c1 = eq.n1;
        final double c2 = eq.n2;
        final double e1 = eq.d1;
        final double e2 = eq.d2;
        final double sign = eq.rootSign;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            finite &= Kernels.finiteBit(t);
            dst[i] = BridgeEquation.plainQuadratic(code * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }
}
