package org.strainmath.bridge;

import java.math.BigDecimal;
import java.math.MathContext;

/**
 * The bridge equation of one set of arms, composed once when a {@link Bridge} is built: the
 * output ratio as a rational function of strain,
 * <pre>
 *   r(ε) = (n0 + n1·ε + n2·ε²) / (1 + d1·ε + d2·ε²)
 * </pre>
 * expanded from the arms, their leads, the excitation leads and the zero offset in 60-digit
 * decimal arithmetic (the equations are in {@link Bridge}'s class comment), with its form, the
 * sign of its slope (which selects the physical root of the inverse), and the open intervals of
 * physical strains and readings. It also holds the per-sample functions that the scalar methods
 * and the block loops ({@link BridgeLoops}, {@link CodeLoops}) share, so that both give the same
 * bits, and the proof that a channel's plain quotient is regular on an interval of readings.
 *
 * <p>Immutable and thread-safe.
 */
final class BridgeEquation {

    static final MathContext EXACT_ENOUGH = new MathContext(60);

    /**
     * The largest strain magnitude the model accepts, 10 m/m (1000 %). No bonded gauge survives a
     * twentieth of it; the bound keeps every per-sample product finite.
     */
    static final double STRAIN_LIMIT = 10.0;

    /** The shape of the rational function r(ε), which decides the kernel. */
    enum Form {
        /** r = n0 + n1·ε. */
        LINEAR,
        /** r = (n0 + n1·ε) / (1 + d1·ε). */
        FIRST_DEGREE,
        /** The general case. */
        QUADRATIC
    }

    final Form form;
    final double n0;
    final double n1;
    final double n2;
    final double d1;
    final double d2;
    /** dr/dε at ε = 0. */
    final double slope;
    /** The sign of the slope, which selects the physical root. */
    final double rootSign;
    /** Whether the nominal arms balance the bridge (N0 = 0 before any zeroing). */
    final boolean balanced;
    /** Open interval of physical strains. */
    final double strainLow;
    final double strainHigh;
    /** Open interval of physical readings. */
    final double ratioLow;
    final double ratioHigh;

    /**
     * The equation of {@code arms} with {@code armLeads} in series (Ω), {@code excitationLeads}
     * (Ω) and the zero {@code offset} (V/V) added to the output.
     *
     * @throws IllegalArgumentException if the output does not change with strain
     */
    BridgeEquation(BridgeArm[] arms, double[] armLeads, double excitationLeads, double offset) {
        BigDecimal[] c = expand(arms, armLeads, excitationLeads);
        this.balanced = c[0].signum() == 0;

        // The offset adds to r: (N + offset·D) / D.
        BigDecimal off = new BigDecimal(offset);
        for (int i = 0; i < 3; i++) {
            c[i] = c[i].add(off.multiply(c[i + 3]));
        }
        BigDecimal d0 = c[3];
        this.n0 = c[0].divide(d0, EXACT_ENOUGH).doubleValue();
        this.n1 = c[1].divide(d0, EXACT_ENOUGH).doubleValue();
        this.n2 = c[2].divide(d0, EXACT_ENOUGH).doubleValue();
        this.d1 = c[4].divide(d0, EXACT_ENOUGH).doubleValue();
        this.d2 = c[5].divide(d0, EXACT_ENOUGH).doubleValue();
        BigDecimal bigSlope = slopeOf(c);
        if (bigSlope.signum() == 0) {
            throw new IllegalArgumentException(
                    "arms must give an output that changes with strain: " + Bridge.armList(arms));
        }
        this.slope = bigSlope.doubleValue();
        this.rootSign = bigSlope.signum();
        if (c[2].signum() == 0 && c[4].signum() == 0 && c[5].signum() == 0) {
            this.form = Form.LINEAR;
        } else if (c[2].signum() == 0 && c[5].signum() == 0) {
            this.form = Form.FIRST_DEGREE;
        } else {
            this.form = Form.QUADRATIC;
        }

        // Physical strains: within the model's limit, every gauge resistance positive ...
        double low = -STRAIN_LIMIT;
        double high = STRAIN_LIMIT;
        for (BridgeArm arm : arms) {
            double k = arm.effectiveGaugeFactor() * arm.strainMultiple();
            if (k > 0) {
                low = Math.max(low, -1.0 / k);
            } else if (k < 0) {
                high = Math.min(high, -1.0 / k);
            }
        }
        // ... and the bridge on its monotonic branch: dr/dε = P(ε)/D(ε)², where
        // P = N'·D − N·D' = (N1·D0 − N0·D1) + 2·(N2·D0 − N0·D2)·ε + (N2·D1 − N1·D2)·ε²
        // (the cubic terms cancel), keeps its sign between the roots of P nearest to zero.
        double p0 = c[1].multiply(c[3]).subtract(c[0].multiply(c[4])).doubleValue();
        double p1 = c[2].multiply(c[3]).subtract(c[0].multiply(c[5])).doubleValue() * 2;
        double p2 = c[2].multiply(c[4]).subtract(c[1].multiply(c[5])).doubleValue();
        for (double root : realRoots(p2, p1, p0)) {
            if (root > 0 && root < high) {
                high = root;
            } else if (root < 0 && root > low) {
                low = root;
            }
        }
        this.strainLow = low;
        this.strainHigh = high;
        double atLow = offset + readingAt(arms, armLeads, excitationLeads, low);
        double atHigh = offset + readingAt(arms, armLeads, excitationLeads, high);
        this.ratioLow = rootSign > 0 ? atLow : atHigh;
        this.ratioHigh = rootSign > 0 ? atHigh : atLow;
    }

    /** The output at zero strain of {@code arms} with these leads and no offset, to 60 digits. */
    static BigDecimal exactZeroOutput(BridgeArm[] arms, double[] armLeads,
            double excitationLeads) {
        BigDecimal[] c = expand(arms, armLeads, excitationLeads);
        return c[0].divide(c[3], EXACT_ENOUGH);
    }

    /**
     * The output at zero strain and the slope dr/dε there of {@code arms} with these leads and no
     * offset, {r0, dr/dε}: what zeroing compares readings with.
     */
    static double[] zeroAndSlope(BridgeArm[] arms, double[] armLeads, double excitationLeads) {
        BigDecimal[] c = expand(arms, armLeads, excitationLeads);
        return new double[] {c[0].divide(c[3], EXACT_ENOUGH).doubleValue(),
            slopeOf(c).doubleValue()};
    }

    /**
     * The exact coefficients {N0, N1, N2, D0, D1, D2} of r(ε) = N(ε)/D(ε) for these arms and
     * leads, not normalised. With Ri = R0i + Li + Ai·ε (Li the lead in series with arm i,
     * Ai = R0i·Ki·mi), S12 = R1 + R2, S34 = R3 + R4 and Le the two excitation leads together:
     * <pre>
     *   N = R1·R3 − R2·R4
     *   D = S12·S34 + Le·(S12 + S34)
     * </pre>
     * The second term of D is the excitation lost in the leads: the bridge, of input resistance
     * S12·S34/(S12 + S34), sees Vex reduced by the factor Rb/(Rb + Le).
     */
    private static BigDecimal[] expand(BridgeArm[] arms, double[] armLeads,
            double excitationLeads) {
        BigDecimal[] r = new BigDecimal[4];
        BigDecimal[] a = new BigDecimal[4];
        for (int i = 0; i < 4; i++) {
            BridgeArm arm = arms[i];
            BigDecimal nominal = new BigDecimal(arm.nominalResistance().toOhms());
            r[i] = nominal.add(new BigDecimal(armLeads[i]));
            a[i] = nominal.multiply(new BigDecimal(arm.effectiveGaugeFactor()))
                    .multiply(new BigDecimal(arm.strainMultiple()));
        }
        BigDecimal le = new BigDecimal(excitationLeads);
        BigDecimal s12 = r[0].add(r[1]);
        BigDecimal s34 = r[2].add(r[3]);
        BigDecimal b12 = a[0].add(a[1]);
        BigDecimal b34 = a[2].add(a[3]);
        return new BigDecimal[] {
            r[0].multiply(r[2]).subtract(r[1].multiply(r[3])),
            r[0].multiply(a[2]).add(a[0].multiply(r[2]))
                    .subtract(r[1].multiply(a[3])).subtract(a[1].multiply(r[3])),
            a[0].multiply(a[2]).subtract(a[1].multiply(a[3])),
            s12.multiply(s34).add(le.multiply(s12.add(s34))),
            s12.multiply(b34).add(b12.multiply(s34)).add(le.multiply(b12.add(b34))),
            b12.multiply(b34)};
    }

    /** dr/dε at ε = 0 from the coefficients of {@link #expand}: (N1·D0 − N0·D1)/D0². */
    private static BigDecimal slopeOf(BigDecimal[] c) {
        return c[1].multiply(c[3]).subtract(c[0].multiply(c[4]))
                .divide(c[3].multiply(c[3]), EXACT_ENOUGH);
    }

    /** The real roots of a·x² + b·x + c, by the cancellation-free form; none if a = b = 0. */
    private static double[] realRoots(double a, double b, double c) {
        if (a == 0) {
            return b == 0 ? new double[0] : new double[] {-c / b};
        }
        double discriminant = b * b - 4 * a * c;
        if (!(discriminant >= 0)) {
            return new double[0];
        }
        double q = -0.5 * (b + Math.copySign(Math.sqrt(discriminant), b));
        return q == 0 ? new double[] {0.0} : new double[] {q / a, c / q};
    }

    /**
     * The reading (without the offset) at {@code strain}, an end of the physical range, from
     * the two dividers and the excitation lost in the leads, taking the limit where a divider's
     * gauges vanish together.
     */
    private static double readingAt(BridgeArm[] arms, double[] armLeads,
            double excitationLeads, double strain) {
        BigDecimal e = new BigDecimal(strain);
        BigDecimal[] r = new BigDecimal[4];
        BigDecimal[] rest = new BigDecimal[4];
        for (int i = 0; i < 4; i++) {
            BridgeArm arm = arms[i];
            BigDecimal nominal = new BigDecimal(arm.nominalResistance().toOhms());
            BigDecimal a = nominal.multiply(new BigDecimal(arm.effectiveGaugeFactor()))
                    .multiply(new BigDecimal(arm.strainMultiple()));
            BigDecimal lead = new BigDecimal(armLeads[i]);
            r[i] = nominal.add(a.multiply(e)).max(BigDecimal.ZERO).add(lead);
            rest[i] = nominal.add(lead);
        }
        BigDecimal s12 = r[0].add(r[1]);
        BigDecimal s34 = r[2].add(r[3]);
        BigDecimal divider12 = s12.signum() == 0
                ? rest[0].divide(rest[0].add(rest[1]), EXACT_ENOUGH)
                : r[0].divide(s12, EXACT_ENOUGH);
        BigDecimal divider43 = s34.signum() == 0
                ? rest[3].divide(rest[2].add(rest[3]), EXACT_ENOUGH)
                : r[3].divide(s34, EXACT_ENOUGH);
        BigDecimal reading = divider12.subtract(divider43);
        if (excitationLeads != 0) {
            BigDecimal sum = s12.add(s34);
            BigDecimal input = sum.signum() == 0 ? BigDecimal.ZERO
                    : s12.multiply(s34).divide(sum, EXACT_ENOUGH);
            reading = reading.multiply(input)
                    .divide(input.add(new BigDecimal(excitationLeads)), EXACT_ENOUGH);
        }
        return reading.doubleValue();
    }

    /** The exact output ratio at {@code strain}; NaN outside the physical strains. */
    double toRatio(double strain) {
        return forward(strain, n0, n1, n2, d1, d2, strainLow, strainHigh);
    }

    /** The exact strain for the output ratio {@code ratio}; NaN outside the physical readings. */
    double toStrain(double ratio) {
        switch (form) {
            case LINEAR:
                return inverseLinear(ratio, n0, n1, ratioLow, ratioHigh);
            case FIRST_DEGREE:
                return inverseFirstDegree(ratio, n0, n1, d1, ratioLow, ratioHigh);
            default:
                return inverseQuadratic(ratio, n0, n1, n2, d1, d2, rootSign, ratioLow,
                        ratioHigh);
        }
    }

    // ---------------------------------------------------------------- channel inverses
    //
    // A channel evaluates the inverse without the arithmetic mask, as the plain quotient
    //   ε = (r − n0)/n1,  (r − n0)/(n1 − r·d1)  or  2·(r − n0)/(b + s·√Δ),
    // times the channel's factor, and multiplies it by mask/mask, which is exactly 1 inside the
    // reading interval and NaN outside (0/0). Where a chunk of codes is proven to lie inside an
    // interval on which the quotient is regular (regularOn), the factor 1 is left out: the
    // plain loop then costs one division per sample, and its bits are the same.

    /** The strain of a channel's reading r: the plain quotient × factor, NaN outside (low, high). */
    double channelStrain(double r, double low, double high, double factor) {
        return plain(r) * factor * unity(r, low, high);
    }

    private double plain(double r) {
        switch (form) {
            case LINEAR:
                return plainLinear(r, n0, n1);
            case FIRST_DEGREE:
                return plainFirstDegree(r, n0, n1, d1);
            default:
                return plainQuadratic(r, n0, n1, n2, d1, d2, rootSign);
        }
    }

    /**
     * Whether the plain quotient is finite, and free of NaN, for every reading in [lo, hi], with
     * a wide margin over rounding: its denominator keeps one sign and stays away from zero
     * relative to the size of its terms, and, for the quadratic form, the discriminant stays
     * positive by the same margin. Each of these is affine or quadratic in r, so its ends (and
     * the vertex of the discriminant) bound it on the whole interval.
     */
    boolean regularOn(double lo, double hi) {
        if (!(lo <= hi) || !Double.isFinite(lo) || !Double.isFinite(hi)) {
            return false;
        }
        final double margin = 1e-9;
        switch (form) {
            case LINEAR:
                return true;
            case FIRST_DEGREE:
                return awayFromZero(n1, d1, lo, hi, margin);
            default:
                return awayFromZero(n1 * rootSign, d1 * rootSign, lo, hi, margin)
                        && discriminantPositive(lo, hi, margin);
        }
    }

    /** Whether c − r·k is positive at both ends, by margin × (|c| + |r·k|). */
    private static boolean awayFromZero(double c, double k, double lo, double hi,
            double margin) {
        return c - lo * k > margin * (Math.abs(c) + Math.abs(lo * k))
                && c - hi * k > margin * (Math.abs(c) + Math.abs(hi * k));
    }

    /**
     * Whether Δ(r) = b² + 4·a·(r − n0), a quadratic in r, exceeds margin × the size of its
     * terms on [lo, hi]: checked at both ends and at its vertex when that lies inside.
     */
    private boolean discriminantPositive(double lo, double hi, double margin) {
        double size = Math.max(discriminantTerms(lo), discriminantTerms(hi));
        double curvature = d1 * d1 - 4 * d2;
        double lowest = Math.min(discriminant(lo), discriminant(hi));
        if (curvature > 0) {
            double vertex = (2 * n1 * d1 - 4 * n2 - 4 * d2 * n0) / (2 * curvature);
            if (vertex > lo && vertex < hi) {
                lowest = Math.min(lowest, discriminant(vertex));
            }
        }
        return lowest > margin * size;
    }

    private double discriminant(double r) {
        double b = n1 - r * d1;
        double a = n2 - r * d2;
        return b * b + 4.0 * a * (r - n0);
    }

    private double discriminantTerms(double r) {
        double b = Math.abs(n1) + Math.abs(r * d1);
        return b * b + 4.0 * (Math.abs(n2) + Math.abs(r * d2)) * (Math.abs(r) + Math.abs(n0));
    }

    // The per-sample functions. Domain checks are arithmetic, not branches, so that the loops
    // above stay vectorised (a conditional, or Math.min and Math.max on JDK 25, slow them down
    // severalfold). For the open interval (low, high), both ends finite:
    //   g = (x − low)·(high − x)        > 0 inside, <= 0 outside, NaN for NaN, −∞ for ±∞
    //   g' = g + |g|                    2g inside, 0 outside, NaN for NaN and ±∞
    // and the quotient (p·g')/(q·g') is p/q inside and 0/0 = NaN everywhere else.

    static double mask(double x, double low, double high) {
        double g = (x - low) * (high - x);
        return g + Math.abs(g);
    }

    static double forward(double e, double n0, double n1, double n2, double d1,
            double d2, double low, double high) {
        double g = mask(e, low, high);
        return ((n0 + e * (n1 + e * n2)) * g) / ((1.0 + e * (d1 + e * d2)) * g);
    }

    static double inverseLinear(double r, double n0, double n1, double low,
            double high) {
        double g = mask(r, low, high);
        return ((r - n0) * g) / (n1 * g);
    }

    static double inverseFirstDegree(double r, double n0, double n1, double d1,
            double low, double high) {
        double g = mask(r, low, high);
        return ((r - n0) * g) / ((n1 - r * d1) * g);
    }

    static double inverseQuadratic(double r, double n0, double n1, double n2,
            double d1, double d2, double sign, double low, double high) {
        double g = mask(r, low, high);
        double minusC = r - n0;
        double b = n1 - r * d1;
        double a = n2 - r * d2;
        double root = Math.sqrt(b * b + 4.0 * a * minusC);
        return (2.0 * minusC * g) / ((b + sign * root) * g);
    }

    /** 1 exactly for a reading inside (low, high), NaN outside: g/g with g the mask. */
    static double unity(double r, double low, double high) {
        double g = mask(r, low, high);
        return g / g;
    }

    static double plainLinear(double r, double n0, double n1) {
        return (r - n0) / n1;
    }

    static double plainFirstDegree(double r, double n0, double n1, double d1) {
        return (r - n0) / (n1 - r * d1);
    }

    static double plainQuadratic(double r, double n0, double n1, double n2, double d1,
            double d2, double sign) {
        double minusC = r - n0;
        double b = n1 - r * d1;
        double a = n2 - r * d2;
        double root = Math.sqrt(b * b + 4.0 * a * minusC);
        return 2.0 * minusC / (b + sign * root);
    }
}
