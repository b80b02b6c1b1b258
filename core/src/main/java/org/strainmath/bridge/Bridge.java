package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.Kernels;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;

/**
 * A Wheatstone bridge of four arms, with its exact output for a strain, its exact strain for an
 * output, and block kernels that convert arrays of either.
 *
 * <h2>Arm numbering and the bridge equation</h2>
 * Arms are numbered 1 to 4 as in the textbook form of the bridge equation (Dally &amp; Riley,
 * <i>Experimental Stress Analysis</i>, 4th ed., eq. 6.19; Hoffmann, <i>An Introduction to
 * Measurements using Strain Gages</i>, HBM 1989, eq. 3.1):
 * <pre>
 *          Vo     R1·R3 − R2·R4              R1         R4
 *   r  =  ---  = ----------------------  = -------  −  -------
 *          Vex   (R1 + R2)·(R3 + R4)       R1 + R2    R3 + R4
 *
 *   R1, R2  one divider across the excitation; R4, R3 the other
 *   r       output ratio, V/V (shown as mV/V)
 * </pre>
 * Opposite arms (1 and 3, 2 and 4) add, adjacent arms subtract, and tension in arm 1 gives a
 * positive output. Each arm is a {@link BridgeArm}: R_i(ε) = R0_i·(1 + K_i·m_i·ε), so that
 * every arm is affine in the measured strain ε.
 *
 * <h2>Lead wires</h2>
 * A lead in series with an arm adds a constant Li to it; two excitation leads of together Le,
 * without remote sense, leave the bridge the share Rb/(Rb + Le) of the excitation, Rb the
 * bridge's input resistance. Both stay exact: the equation becomes
 * r = (R1·R3 − R2·R4) / ((R1 + R2)·(R3 + R4) + Le·(R1 + R2 + R3 + R4)) with Ri including Li,
 * which is still of the form below.
 *
 * <h2>Composition</h2>
 * When the bridge is built, the equation is expanded once, exactly (in {@link BigDecimal}), into
 * <pre>
 *   r(ε) = (n0 + n1·ε + n2·ε²) / (1 + d1·ε + d2·ε²)
 * </pre>
 * and the five coefficients are rounded to double. Per sample only this rational function (the
 * forward direction) or the root of its quadratic (the inverse) is evaluated.
 *
 * <h2>Inverse</h2>
 * For a reading r the strain solves A·ε² + B·ε + C = 0 with A = n2 − r·d2, B = n1 − r·d1,
 * C = n0 − r. The physical root is the one on the branch through ε = 0, where the bridge is
 * monotonic; it is taken in the form free of cancellation (Press et al., <i>Numerical
 * Recipes</i>, 3rd ed., §5.6; Higham, <i>Accuracy and Stability of Numerical Algorithms</i>,
 * 2nd ed., §1.8):
 * <pre>
 *   ε = 2·C / (−B − s·√(B² − 4·A·C))        s = sign of dr/dε
 * </pre>
 * which is also right when the equation degenerates to first degree (A = 0: ε = −C/B) and, for
 * an exactly linear bridge (d1 = d2 = n2 = 0), reduces to ε = (r − n0)/n1, which is evaluated
 * as such.
 *
 * <h2>Physical range</h2>
 * A strain is physical while every arm keeps a positive resistance, the bridge stays on its
 * monotonic branch, and |ε| &lt; 10 m/m (1000 %, far beyond any bonded gauge; the bound keeps
 * every product in the kernels finite). A reading outside the open interval of outputs that
 * such strains produce has no physical strain: the kernels return NaN for it (and the value
 * methods throw).
 *
 * <h2>Accuracy</h2>
 * The composed coefficients are correctly rounded. The forward output is within a few ulp of the
 * bridge equation evaluated exactly from the four arm resistances (tested against 50-digit
 * {@code BigDecimal} to 1e-13 relative over ±50 000 µε). The inverse is within a few ulp of the
 * exact root: inverse(forward(ε)) returns ε to 1e-12 relative over ±50 000 µε for gauge factors
 * 1.5 to 4.5.
 *
 * <h2>Example</h2>
 * <pre>
 *   Bridge b = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
 *   b.outputAt(Strain.ofMicrostrain(1000));        // 0.499500 mV/V  = K·ε / (4 + 2·K·ε)
 *   b.strainAt(VoltageRatio.ofMillivoltsPerVolt(0.4995)); // 1000.0 µε
 *   b.linearisedStrainAt(VoltageRatio.ofMillivoltsPerVolt(0.4995)); // 999.0 µε (4·r/K)
 * </pre>
 *
 * <p>Immutable and thread-safe: one configured bridge may serve any number of threads.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class Bridge implements Serializable {

    private static final MathContext EXACT_ENOUGH = new MathContext(60);

    /**
     * The largest strain magnitude the model accepts, 10 m/m (1000 %). No bonded gauge survives a
     * twentieth of it; the bound keeps every per-sample product finite.
     */
    static final double STRAIN_LIMIT = 10.0;

    private static final double[] NO_LEADS = new double[4];

    /** The shape of the rational function r(ε), which decides the kernel. */
    private enum Form {
        /** r = n0 + n1·ε. */
        LINEAR,
        /** r = (n0 + n1·ε) / (1 + d1·ε). */
        FIRST_DEGREE,
        /** The general case. */
        QUADRATIC
    }

    private final String arrangement;
    private final BridgeArm[] arms;
    /** Lead resistance in series with each arm, Ω. */
    private final double[] armLeads;
    /** Total resistance of the two excitation leads, Ω (0 with remote sense). */
    private final double excitationLeads;
    /** Added to the bridge equation by {@link #zeroedByOffset}: V/V. */
    private final double offset;

    private final double n0;
    private final double n1;
    private final double n2;
    private final double d1;
    private final double d2;
    /** dr/dε at ε = 0. */
    private final double slope;
    /** The slope the same arms give without any lead resistance. */
    private final double slopeWithoutLeads;
    /** The output at zero strain the same arms give without any lead resistance. */
    private final double zeroWithoutLeads;
    /** The sign of the slope, which selects the physical root. */
    private final double rootSign;
    private final Form form;
    private final boolean balanced;

    /** Open interval of physical strains. */
    private final double strainLow;
    private final double strainHigh;
    /** Open interval of physical readings. */
    private final double ratioLow;
    private final double ratioHigh;

    private Bridge(String arrangement, BridgeArm[] arms, double[] armLeads, double excitationLeads,
            double offset) {
        this.arrangement = arrangement;
        this.arms = arms;
        this.armLeads = armLeads;
        this.excitationLeads = excitationLeads;
        this.offset = offset;

        BigDecimal[] c = expand(arms, armLeads, excitationLeads);
        this.balanced = c[0].signum() == 0;
        BigDecimal[] bare = expand(arms, new double[4], 0.0);
        this.zeroWithoutLeads = bare[0].divide(bare[3], EXACT_ENOUGH).doubleValue();
        this.slopeWithoutLeads = slopeOf(bare).doubleValue();

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
                    "arms must give an output that changes with strain: " + armList(arms));
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
        double atLow = offset + readingAt(low);
        double atHigh = offset + readingAt(high);
        this.ratioLow = rootSign > 0 ? atLow : atHigh;
        this.ratioHigh = rootSign > 0 ? atHigh : atLow;
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
    private double readingAt(double strain) {
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

    // ---------------------------------------------------------------- factories

    /**
     * The general bridge of four arms, numbered as in the class comment.
     *
     * @throws NullPointerException     if an arm is null
     * @throws IllegalArgumentException if no arm makes the output change with strain
     */
    public static Bridge of(BridgeArm arm1, BridgeArm arm2, BridgeArm arm3, BridgeArm arm4) {
        return new Bridge("bridge", new BridgeArm[] {
            Objects.requireNonNull(arm1, "arm1"), Objects.requireNonNull(arm2, "arm2"),
            Objects.requireNonNull(arm3, "arm3"), Objects.requireNonNull(arm4, "arm4")}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Quarter bridge: one active gauge in arm 1, completion resistors of the gauge's nominal
     * resistance in arms 2, 3 and 4. Bridge factor 1; not linear:
     * r = K·ε / (4 + 2·K·ε), so that the linearised strain 4·r/K reads low by about K·ε/2
     * (0.1 % per 1000 µε at K = 2).
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static Bridge quarter(StrainGauge gauge) {
        BridgeArm completion = completionFor(gauge);
        return new Bridge("quarter bridge", new BridgeArm[] {
            BridgeArm.active(gauge, 1), completion, completion, completion}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Quarter bridge with a dummy gauge: the active gauge in arm 1, an identical unstrained gauge
     * in the adjacent arm 2 (for temperature compensation), completion resistors in arms 3 and
     * 4. Bridge factor 1; the same output as {@link #quarter}.
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static Bridge quarterWithDummy(StrainGauge gauge) {
        BridgeArm completion = completionFor(gauge);
        return new Bridge("quarter bridge with dummy gauge", new BridgeArm[] {
            BridgeArm.active(gauge, 1), BridgeArm.dummy(gauge), completion, completion}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Half bridge for bending: +ε in arm 1 and −ε in the adjacent arm 2 (gauges on opposite
     * faces of a beam), completion resistors in arms 3 and 4. Bridge factor 2; exactly linear,
     * r = K·ε/2; axial strain and temperature cancel.
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static Bridge halfBending(StrainGauge gauge) {
        BridgeArm completion = completionFor(gauge);
        return new Bridge("half bridge, bending", new BridgeArm[] {
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1), completion, completion}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Half bridge for axial strain with a Poisson gauge: +ε in arm 1 and −ν·ε (a gauge across
     * the member) in the adjacent arm 2, completion resistors in arms 3 and 4. Bridge factor
     * 1 + ν; slightly nonlinear.
     *
     * @param poissonRatio ν of the member, in (−1, 0.5)
     * @throws IllegalArgumentException if {@code poissonRatio} is not in (−1, 0.5)
     */
    public static Bridge halfAxialPoisson(StrainGauge gauge, double poissonRatio) {
        checkPoissonRatio(poissonRatio);
        BridgeArm completion = completionFor(gauge);
        return new Bridge("half bridge, axial with Poisson gauge", new BridgeArm[] {
            BridgeArm.active(gauge, 1), poissonArm(gauge, -poissonRatio), completion, completion},
            NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Half bridge of two active gauges in opposite arms: +ε in arms 1 and 3 (two axial gauges on
     * opposite faces, so that bending cancels), completion resistors in arms 2 and 4. Bridge
     * factor 2; nonlinear, r = K·ε / (2 + K·ε).
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static Bridge halfOppositeArms(StrainGauge gauge) {
        BridgeArm completion = completionFor(gauge);
        return new Bridge("half bridge, opposite arms", new BridgeArm[] {
            BridgeArm.active(gauge, 1), completion, BridgeArm.active(gauge, 1), completion}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Full bridge for bending: +ε in arms 1 and 3, −ε in arms 2 and 4 (two gauges on each face
     * of a beam). Bridge factor 4; exactly linear, r = K·ε.
     *
     * @throws NullPointerException if {@code gauge} is null
     */
    public static Bridge fullBending(StrainGauge gauge) {
        return new Bridge("full bridge, bending", new BridgeArm[] {
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1),
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1)}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Full bridge for axial strain with Poisson gauges: +ε in arms 1 and 3 (axial gauges on
     * opposite faces), −ν·ε in arms 2 and 4 (transverse gauges). Bridge factor 2·(1 + ν);
     * nonlinear, r = K·(1 + ν)·ε / (2 + K·(1 − ν)·ε). The usual arrangement of a column load
     * cell.
     *
     * @param poissonRatio ν of the member, in (−1, 0.5)
     * @throws IllegalArgumentException if {@code poissonRatio} is not in (−1, 0.5)
     */
    public static Bridge fullAxialPoisson(StrainGauge gauge, double poissonRatio) {
        checkPoissonRatio(poissonRatio);
        return new Bridge("full bridge, axial with Poisson gauges", new BridgeArm[] {
            BridgeArm.active(gauge, 1), poissonArm(gauge, -poissonRatio),
            BridgeArm.active(gauge, 1), poissonArm(gauge, -poissonRatio)}, NO_LEADS.clone(), 0.0, 0.0);
    }

    /**
     * Full bridge for bending with Poisson gauges: on the tension face an axial gauge (+ε, arm
     * 1) and a transverse gauge (−ν·ε, arm 4); on the compression face an axial gauge (−ε, arm
     * 2) and a transverse gauge (+ν·ε, arm 3). Bridge factor 2·(1 + ν); exactly linear,
     * r = K·(1 + ν)·ε/2.
     *
     * @param poissonRatio ν of the member, in (−1, 0.5)
     * @throws IllegalArgumentException if {@code poissonRatio} is not in (−1, 0.5)
     */
    public static Bridge fullBendingPoisson(StrainGauge gauge, double poissonRatio) {
        checkPoissonRatio(poissonRatio);
        return new Bridge("full bridge, bending with Poisson gauges", new BridgeArm[] {
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1),
            poissonArm(gauge, poissonRatio), poissonArm(gauge, -poissonRatio)}, NO_LEADS.clone(), 0.0, 0.0);
    }

    private static BridgeArm completionFor(StrainGauge gauge) {
        Objects.requireNonNull(gauge, "gauge");
        return BridgeArm.completion(gauge.nominalResistance());
    }

    private static BridgeArm poissonArm(StrainGauge gauge, double multiple) {
        return multiple == 0 ? BridgeArm.dummy(gauge) : BridgeArm.active(gauge, multiple);
    }

    private static void checkPoissonRatio(double poissonRatio) {
        Checks.inOpenInterval(poissonRatio, -1, 0.5, "poissonRatio");
    }

    // ---------------------------------------------------------------- zeroing

    /**
     * This bridge zeroed by a plain offset: {@code initialReading}, the output of the unstrained
     * bridge, is taken to be an offset of the output ratio and subtracted before the bridge
     * equation is inverted (common practice, no source). Replaces any earlier zeroing.
     *
     * <p>The offset is exact only when the unbalance leaves the output change unchanged, as an
     * unbalance in the divider without active gauges does (arms 3 and 4 of a quarter bridge).
     * When the active gauge itself is off its nominal resistance, its divider's sensitivity
     * and nonlinearity change too, and the strain from this method reads low by a relative
     * <pre>
     *   (ε_offset − ε) / ε ≈ −r0·(4·r0 + K·ε)        (quarter bridge, r0 in V/V)
     * </pre>
     * (derived from the bridge equation, common practice, no source): 6e-6 at r0 = 1 mV/V and
     * 1000 µε, 4e-4 at r0 = 10 mV/V. The difference matters only for unbalances of several
     * mV/V; {@link #zeroedInArm} removes it when the arm that causes the unbalance is known.
     *
     * @throws NullPointerException     if {@code initialReading} is null
     * @throws IllegalArgumentException if {@code initialReading} is outside the physical output
     *                                  range of the bridge
     */
    public Bridge zeroedByOffset(VoltageRatio initialReading) {
        Objects.requireNonNull(initialReading, "initialReading");
        double reading = initialReading.toVoltsPerVolt();
        if (!(reading > ratioLow - offset && reading < ratioHigh - offset)) {
            throw new IllegalArgumentException("initialReading must be in the physical output "
                    + "range (" + VoltageRatio.ofVoltsPerVolt(ratioLow - offset) + ", "
                    + VoltageRatio.ofVoltsPerVolt(ratioHigh - offset) + ") of the unzeroed bridge: "
                    + initialReading);
        }
        BigDecimal[] c = expand(arms, armLeads, excitationLeads);
        double shift = new BigDecimal(reading).subtract(c[0].divide(c[3], EXACT_ENOUGH))
                .doubleValue();
        return new Bridge(arrangement, arms, armLeads, excitationLeads, shift);
    }

    /**
     * This bridge zeroed exactly: {@code initialReading}, the output of the unstrained bridge,
     * is attributed to arm {@code arm} being off its nominal resistance, and that arm's
     * unstrained resistance is solved from the bridge equation so that the zeroed bridge reads
     * {@code initialReading} at zero strain. Sensitivity and nonlinearity then follow from the
     * real arm resistances. Replaces an earlier offset zeroing and an earlier zeroing in the
     * same arm; a zeroing in another arm stays in that arm.
     *
     * <p>For arm 1 (arms 2, 3, 4 likewise):
     * <pre>
     *   t = r0 + R4/(R3 + R4),   R1 = t·R2 / (1 − t)
     * </pre>
     *
     * @param arm the arm (1 to 4) whose resistance explains the unbalance, usually the active
     *            gauge of a quarter bridge
     * @throws NullPointerException      if {@code initialReading} is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  if no positive resistance of that arm gives the reading
     */
    public Bridge zeroedInArm(VoltageRatio initialReading, int arm) {
        Objects.requireNonNull(initialReading, "initialReading");
        Objects.checkIndex(arm - 1, 4);
        // At zero strain N and D are affine in the resistance X of the chosen arm (it appears in
        // one product of N and in one sum of D), so r0·D(X) = N(X) is solved exactly for X.
        BigDecimal target = new BigDecimal(initialReading.toVoltsPerVolt());
        BigDecimal[] at0 = zeroStrainTerms(arm - 1, BigDecimal.ZERO);
        BigDecimal[] at1 = zeroStrainTerms(arm - 1, BigDecimal.ONE);
        BigDecimal numerator = target.multiply(at0[1]).subtract(at0[0]);
        BigDecimal denominator = at1[0].subtract(at0[0])
                .subtract(target.multiply(at1[1].subtract(at0[1])));
        double ohms = denominator.signum() == 0 ? Double.NaN
                : numerator.divide(denominator, EXACT_ENOUGH).doubleValue();
        if (!(ohms > 0) || Double.isInfinite(ohms)) {
            throw new IllegalArgumentException("initialReading cannot be explained by arm " + arm
                    + " with a positive resistance: " + initialReading);
        }
        BridgeArm[] changed = arms.clone();
        changed[arm - 1] = arms[arm - 1].withNominalResistance(Resistance.ofOhms(ohms));
        return new Bridge(arrangement, changed, armLeads, excitationLeads, 0.0);
    }

    /**
     * This bridge with the unstrained resistance of arm {@code arm} set to {@code resistance}:
     * a gauge keeps its gauge factor and strain multiple; the leads, the excitation leads and
     * the zero offset are kept. This is how a shunt resistor, or any change of one arm, is
     * modelled exactly: {@code withArmResistance(1, r.inParallelWith(shunt)).zeroOutput()} is
     * the reading with the shunt across the gauge.
     *
     * @throws NullPointerException      if {@code resistance} is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  if the resistance is not positive
     */
    public Bridge withArmResistance(int arm, Resistance resistance) {
        Objects.checkIndex(arm - 1, 4);
        Objects.requireNonNull(resistance, "resistance");
        BridgeArm[] changed = arms.clone();
        changed[arm - 1] = arms[arm - 1].withNominalResistance(resistance);
        return new Bridge(arrangement, changed, armLeads, excitationLeads, offset);
    }

    /** N and D at zero strain, with the nominal resistance of arm {@code index} set to x. */
    private BigDecimal[] zeroStrainTerms(int index, BigDecimal x) {
        BigDecimal[] r = new BigDecimal[4];
        for (int i = 0; i < 4; i++) {
            BigDecimal nominal = i == index ? x : new BigDecimal(arms[i].nominalResistance().toOhms());
            r[i] = nominal.add(new BigDecimal(armLeads[i]));
        }
        BigDecimal s12 = r[0].add(r[1]);
        BigDecimal s34 = r[2].add(r[3]);
        return new BigDecimal[] {r[0].multiply(r[2]).subtract(r[1].multiply(r[3])),
            s12.multiply(s34).add(new BigDecimal(excitationLeads).multiply(s12.add(s34)))};
    }

    // ---------------------------------------------------------------- lead wires

    /**
     * This bridge with the lead resistance {@code lead} in series with arm {@code arm} (1 to 4),
     * in place of any lead set there before. The lead is modelled exactly, as a resistance in
     * the arm that does not change with strain: it lowers the arm's relative change of
     * resistance and may unbalance the bridge. Set the leads before zeroing.
     *
     * @throws NullPointerException      if {@code lead} is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     */
    public Bridge withLeadInArm(int arm, Resistance lead) {
        Objects.checkIndex(arm - 1, 4);
        Objects.requireNonNull(lead, "lead");
        double[] leads = armLeads.clone();
        leads[arm - 1] = lead.toOhms();
        return new Bridge(arrangement, arms, leads, excitationLeads, offset);
    }

    /**
     * This bridge with its active gauge in arm 1 connected by two wires of {@code perLead} each:
     * both leads are in series with the gauge (2·RL in arm 1), the usual two-wire quarter bridge.
     * Small-strain sensitivity, relative to no leads (derived from the bridge equation; Window,
     * <i>Strain Gauge Technology</i>, 2nd ed., ch. 3, gives the first form):
     * <pre>
     *   Rg / (Rg + 2·RL)          with the bridge balanced with the leads in circuit
     *   (Rg / (Rg + RL))²         with the unbalance of the leads left in (zeroed by offset)
     * </pre>
     * which agree to first order in RL/Rg; the leads also unbalance the bridge by about
     * RL/(2·Rg) V/V. Set the leads before zeroing.
     *
     * @throws NullPointerException if {@code perLead} is null
     */
    public Bridge withTwoWireLeads(Resistance perLead) {
        Objects.requireNonNull(perLead, "perLead");
        return withLeadInArm(1, perLead.multipliedBy(2));
    }

    /**
     * This bridge with its active gauge in arm 1 connected by three wires of {@code perLead}
     * each: one lead in series with the gauge (arm 1), one in series with the adjacent
     * completion arm 2, and the third in the signal line, where no current flows. The lead
     * resistances cancel in the balance, and the small-strain sensitivity relative to no leads is
     * exactly (bridge equation; Window, <i>Strain Gauge Technology</i>, 2nd ed., ch. 3)
     * <pre>
     *   Rg / (Rg + RL)
     * </pre>
     * for equal gauge and completion resistances. The same wiring serves a half bridge whose
     * arms 1 and 2 are outside the instrument. Set the leads before zeroing.
     *
     * @throws NullPointerException if {@code perLead} is null
     */
    public Bridge withThreeWireLeads(Resistance perLead) {
        Objects.requireNonNull(perLead, "perLead");
        return withLeadInArm(1, perLead).withLeadInArm(2, perLead);
    }

    /**
     * This bridge powered through two excitation leads of {@code perLead} each, without remote
     * sense: the bridge sees the excitation reduced by
     * <pre>
     *   Rb / (Rb + 2·RL)        Rb = (R1 + R2)·(R3 + R4) / (R1 + R2 + R3 + R4)
     * </pre>
     * and, since Rb changes with strain, the model keeps that change exactly. With remote sense
     * the instrument holds the excitation at the bridge, which is modelled by leaving the
     * excitation leads out ({@code Resistance.ZERO}). Replaces any excitation leads set before.
     *
     * @throws NullPointerException if {@code perLead} is null
     */
    public Bridge withExcitationLeads(Resistance perLead) {
        Objects.requireNonNull(perLead, "perLead");
        return new Bridge(arrangement, arms, armLeads, 2 * perLead.toOhms(), offset);
    }

    /**
     * The lead resistance in series with arm {@code arm} (1 to 4).
     *
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     */
    public Resistance leadInArm(int arm) {
        return Resistance.ofOhms(armLeads[Objects.checkIndex(arm - 1, 4)]);
    }

    /** The resistance of the two excitation leads together (zero with remote sense). */
    public Resistance excitationLeads() {
        return Resistance.ofOhms(excitationLeads);
    }

    /**
     * The desensitisation by the leads: the small-strain sensitivity of this bridge relative to
     * the same arms without lead resistance (1 without leads, below 1 with them). The bridge
     * equations already include it; this figure is for the channel sheet.
     */
    public double leadDesensitisation() {
        return slope / slopeWithoutLeads;
    }

    /**
     * The zero offset the leads cause: the output at zero strain of this wiring minus that of
     * the same arms without leads, before any zeroing.
     */
    public VoltageRatio leadZeroOffset() {
        return VoltageRatio.ofVoltsPerVolt(n0 - offset - zeroWithoutLeads);
    }

    // ---------------------------------------------------------------- properties

    /**
     * Arm {@code number} (1 to 4).
     *
     * @throws IndexOutOfBoundsException if {@code number} is not 1 to 4
     */
    public BridgeArm arm(int number) {
        return arms[Objects.checkIndex(number - 1, 4)];
    }

    /**
     * Whether the nominal arms balance the bridge, R1·R3 = R2·R4 exactly, so that its output at
     * zero strain is zero before any zeroing.
     */
    public boolean isBalanced() {
        return balanced;
    }

    /**
     * Whether the output is exactly proportional to strain (plus a constant), as for the bending
     * arrangements whose two dividers each keep a constant total resistance.
     */
    public boolean isLinear() {
        return form == Form.LINEAR;
    }

    /** The output at zero strain, as the instrument reads it (zero after {@link #zeroedByOffset}). */
    public VoltageRatio zeroOutput() {
        return VoltageRatio.ofVoltsPerVolt(n0);
    }

    /**
     * The small-strain sensitivity dr/dε at zero strain, per 1000 µε: K·N/4 mV/V for N active
     * arms of gauge factor K (0.5 mV/V per 1000 µε for a quarter bridge at K = 2).
     */
    public VoltageRatio sensitivity() {
        return VoltageRatio.ofVoltsPerVolt(slope * 1e-3);
    }

    /**
     * The gauge factor the bridge factor refers to: that of the first active arm.
     */
    public double gaugeFactor() {
        for (BridgeArm arm : arms) {
            if (arm.isActive()) {
                return arm.effectiveGaugeFactor();
            }
        }
        throw new AssertionError("a bridge with a slope has an active arm");
    }

    /**
     * The bridge factor N, the effective number of active arms: the small-strain sensitivity
     * relative to a quarter bridge of the same gauge factor, N = 4·(dr/dε)/K. 1 for a quarter
     * bridge, 2 for a half bridge in bending, 2·(1 + ν) for a full bridge with Poisson gauges.
     * Negative when tension gives a negative output.
     */
    public double bridgeFactor() {
        return 4 * slope / gaugeFactor();
    }

    /** The lower end of the open interval of physical strains (m/m), for tests. */
    double strainLow() {
        return strainLow;
    }

    /** The upper end of the open interval of physical strains (m/m), for tests. */
    double strainHigh() {
        return strainHigh;
    }

    // ---------------------------------------------------------------- excitation

    /**
     * The power dissipated in the resistor or gauge of arm {@code arm} (not in its lead) at zero
     * strain, in watts, with {@code excitation} at the instrument's terminals. The bridge sees
     * Vb = Vex·Rb/(Rb + Le) through the excitation leads; the divider of the arm carries
     * I = Vb/(its two arms with their leads); the arm dissipates P = I²·R0. At balance a
     * quarter-bridge gauge sees Vex/2, so P = Vex²/(4·Rg) (common practice, no source).
     *
     * @throws NullPointerException      if {@code excitation} is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     */
    public double powerInArmWatts(int arm, Voltage excitation) {
        Objects.requireNonNull(excitation, "excitation");
        Objects.checkIndex(arm - 1, 4);
        double volts = excitation.toVolts();
        return volts * volts * powerPerSquareVolt(arm - 1);
    }

    /**
     * The largest excitation that keeps every gauge of this bridge (active and dummy, not the
     * completion resistors) at or below {@code wattsPerGauge} at zero strain. Power grows with
     * the square of the excitation, so Vmax = min over the gauges of √(Pmax / P(1 V)).
     *
     * <p>A power limit protects the gauge and the bond from self-heating drift; the limit is
     * the gauge maker's or the test standard's, not the library's.
     *
     * @throws IllegalArgumentException if {@code wattsPerGauge} is not positive and finite
     */
    public Voltage maximumExcitationForPower(double wattsPerGauge) {
        Checks.positiveFinite(wattsPerGauge, "wattsPerGauge");
        return maximumExcitation(wattsPerGauge, false);
    }

    /**
     * The largest excitation that keeps every gauge at or below the power density
     * {@code wattsPerSquareMillimetre} over its grid area ({@link StrainGauge#withGridArea}), at
     * zero strain. Data sheets and handbooks give such densities for gauges on good and on poor
     * heat sinks; choose the one that fits the substrate.
     *
     * @throws IllegalArgumentException if the density is not positive and finite, or a gauge
     *                                  has no grid area
     */
    public Voltage maximumExcitationForPowerDensity(double wattsPerSquareMillimetre) {
        Checks.positiveFinite(wattsPerSquareMillimetre, "wattsPerSquareMillimetre");
        for (BridgeArm arm : arms) {
            if (arm.gauge().isPresent() && !(arm.gauge().get().gridAreaSquareMillimetres() > 0)) {
                throw new IllegalArgumentException(
                        "gridArea must be given for every gauge of the bridge: " + arm);
            }
        }
        return maximumExcitation(wattsPerSquareMillimetre, true);
    }

    private Voltage maximumExcitation(double limit, boolean perSquareMillimetre) {
        double volts = Double.POSITIVE_INFINITY;
        for (int i = 0; i < 4; i++) {
            if (arms[i].gauge().isPresent()) {
                double watts = perSquareMillimetre
                        ? limit * arms[i].gauge().get().gridAreaSquareMillimetres() : limit;
                volts = Math.min(volts, Math.sqrt(watts / powerPerSquareVolt(i)));
            }
        }
        return Voltage.ofVolts(volts);
    }

    /** The power in arm {@code index} per square volt of excitation, at zero strain. */
    private double powerPerSquareVolt(int index) {
        double[] total = new double[4];
        for (int i = 0; i < 4; i++) {
            total[i] = arms[i].nominalResistance().toOhms() + armLeads[i];
        }
        double s12 = total[0] + total[1];
        double s34 = total[2] + total[3];
        double input = s12 * s34 / (s12 + s34);
        double share = input / (input + excitationLeads);
        double current = share / (index < 2 ? s12 : s34);
        return current * current * arms[index].nominalResistance().toOhms();
    }

    // ---------------------------------------------------------------- value API

    /**
     * The exact output ratio at {@code strain}.
     *
     * @throws NullPointerException     if {@code strain} is null
     * @throws IllegalArgumentException if the strain is outside the physical range (an arm
     *                                  resistance would not be positive)
     */
    public VoltageRatio outputAt(Strain strain) {
        Objects.requireNonNull(strain, "strain");
        double ratio = toRatio(strain.value());
        if (ratio != ratio) {
            throw new IllegalArgumentException("strain must be in the physical range "
                    + strainRangeText() + " of this bridge: " + strain);
        }
        return VoltageRatio.ofVoltsPerVolt(ratio);
    }

    /**
     * The output voltage at {@code strain} with {@code excitation} across the bridge:
     * Vo = r(ε)·Vex.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if the strain is outside the physical range
     */
    public Voltage outputVoltage(Strain strain, Voltage excitation) {
        Objects.requireNonNull(excitation, "excitation");
        return outputAt(strain).times(excitation);
    }

    /**
     * The exact strain for the output ratio {@code ratio}, by the inverse in the class comment.
     *
     * @throws NullPointerException     if {@code ratio} is null
     * @throws IllegalArgumentException if no physical strain gives this output
     */
    public Strain strainAt(VoltageRatio ratio) {
        Objects.requireNonNull(ratio, "ratio");
        double strain = toStrain(ratio.toVoltsPerVolt());
        if (strain != strain) {
            throw new IllegalArgumentException("ratio must be in the physical output range "
                    + rangeText() + " of this bridge: " + ratio);
        }
        return Strain.of(strain);
    }

    /**
     * The linearised strain for {@code ratio}: ε_lin = (r − r0) / (dr/dε at 0), which is
     * 4·(r − r0)/(K·N) for N active arms. This is what an instrument that ignores the bridge
     * nonlinearity displays.
     *
     * @throws NullPointerException if {@code ratio} is null
     */
    public Strain linearisedStrainAt(VoltageRatio ratio) {
        Objects.requireNonNull(ratio, "ratio");
        return Strain.of((ratio.toVoltsPerVolt() - n0) / slope);
    }

    /**
     * The relative error of the linearised strain at the true strain {@code strain}:
     * (ε_lin − ε)/ε, computed without cancellation as
     * <pre>
     *   e(ε) = ε·(p2 − p1·d1 − p1·d2·ε) / (p1·(1 + d1·ε + d2·ε²))
     *   p1 = n1 − n0·d1 = dr/dε at 0,   p2 = n2 − n0·d2
     * </pre>
     * It is −K·ε/(2 + K·ε) for a quarter bridge (−0.0999 % at 1000 µε and K = 2) and zero
     * for a linear bridge.
     *
     * @throws NullPointerException     if {@code strain} is null
     * @throws IllegalArgumentException if the strain is outside the physical range
     */
    public double nonlinearityError(Strain strain) {
        Objects.requireNonNull(strain, "strain");
        double e = strain.value();
        if (!(e > strainLow && e < strainHigh)) {
            throw new IllegalArgumentException("strain must be in the physical range "
                    + strainRangeText() + " of this bridge: " + strain);
        }
        double p2 = n2 - n0 * d2;
        return e * (p2 - slope * d1 - slope * d2 * e) / (slope * (1 + e * (d1 + e * d2)));
    }

    // ---------------------------------------------------------------- kernels

    /**
     * The exact output ratio (V/V) at {@code strain} (m/m); NaN for NaN, an infinite strain or a
     * strain outside the physical range (including |ε| &gt;= 10). The same function as the block
     * method {@link #toRatio(double[], int, double[], int, int)}, bit for bit. Never throws.
     */
    public double toRatio(double strain) {
        return forward(strain, n0, n1, n2, d1, d2, strainLow, strainHigh);
    }

    /**
     * The exact strain (m/m) for the output ratio {@code ratio} (V/V); NaN for NaN, an infinite
     * ratio or a ratio with no physical strain. The same function as the block method
     * {@link #toStrain(double[], int, double[], int, int)}, bit for bit. Never throws.
     */
    public double toStrain(double ratio) {
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

    /** The lower end of the open interval of physical readings (V/V). */
    double ratioLow() {
        return ratioLow;
    }

    /** The upper end of the open interval of physical readings (V/V). */
    double ratioHigh() {
        return ratioHigh;
    }

    /**
     * Converts {@code len} output ratios (V/V) from {@code src[srcOff...]} to strains (m/m) in
     * {@code dst[dstOff...]}. Allocation-free; the same function as {@link #toStrain(double)},
     * bit for bit. {@code src} and {@code dst} may be the same array, with any offsets (in
     * place when they are equal).
     *
     * @return the number of outputs set to NaN (NaN input or no physical strain)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toStrain(double[] src, int srcOff, double[] dst, int dstOff, int len) {
        return toStrain(src, srcOff, dst, dstOff, len, Kernels.REDUCTIONS_IN_LOOP);
    }

    /**
     * {@link #toStrain(double[], int, double[], int, int)} with the way of counting chosen:
     * a min reduction inside the loop ({@code probeInLoop}, for JVMs whose C2 keeps such a loop
     * vectorised) or a pass of its own after it. Both give the same outputs and count; the
     * tests run both on every JDK.
     */
    int toStrain(double[] src, int srcOff, double[] dst, int dstOff, int len,
            boolean probeInLoop) {
        Checks.block(src, srcOff, dst, dstOff, len);
        double[] from = Kernels.sameIndexSource(src, srcOff, dst, dstOff, len);
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
        switch (form) {
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
        switch (form) {
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

    /**
     * Converts codes[start + shift, end + shift) into strains in dst[start, end) in one loop,
     * plain(code·scale + offset)·factor per sample: for chunks whose codes regularOn has proven
     * inside the reading interval. An {@code int[]} cannot alias the output, so the two
     * indices do not stop C2 from vectorising the loop.
     */
    void codesToStrainPlain(int[] codes, int shift, double scale, double offset, double[] dst,
            int start, int end, double factor) {
        switch (form) {
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
     * As {@link #codesToStrainPlain}, less the thermal output of the temperature of each sample,
     * t = celsius[i] (which may be dst itself: each t is read before dst[i] is written), in one
     * loop: plain(code·scale + offset)·factor − q(t). Returns whether every t was finite; if
     * so, the results equal {@code thermal.correct(plain·factor, t)} bit for bit.
     */
    boolean codesToStrainLessThermal(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        switch (form) {
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

    /** What a fused thermal loop found: a code outside the bounds (the chunk is to be redone). */
    static final int CODES_OUTSIDE = 0;
    /** What a fused thermal loop found: codes within the bounds, every temperature finite. */
    static final int PROVEN = 1;
    /** What a fused thermal loop found: codes within the bounds, a temperature not finite. */
    static final int PROVEN_NON_FINITE_TEMPERATURE = 2;

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
        switch (form) {
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

    /**
     * As {@link #codesToStrainPlain}, taking the least and greatest code in the same loop:
     * whether every code lay within [low, high]. If not, the outputs are to be recomputed by
     * the checked path. For JVMs whose C2 keeps the min and max reductions in the vectorised
     * loop ({@link Kernels#REDUCTIONS_IN_LOOP}); it saves the pass over the codes.
     */
    boolean codesToStrainPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        switch (form) {
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
     * Converts the readings dst[start, end) into strains in place: plain(r)·factor, times
     * unity(r) unless {@code proven} (the readings are known to lie inside the interval).
     */
    void readingsToStrain(double[] dst, int start, int end, double low, double high,
            double factor, boolean proven) {
        switch (form) {
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

    // Blocks run in chunks of Kernels.CHUNK samples, so that the NaN count reads what the loop
    // has just written while it is still in cache. One small method per loop, each reading and
    // writing double arrays at one index, so that C2 compiles and vectorises each loop on its
    // own.

    private void inverseLinearBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        for (int i = start; i < end; i++) {
            dst[i] = inverseLinear(from[i], c0, c1, low, high);
        }
    }

    private void inverseFirstDegreeBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        for (int i = start; i < end; i++) {
            dst[i] = inverseFirstDegree(from[i], c0, c1, e1, low, high);
        }
    }

    private void inverseQuadraticBlock(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = inverseQuadratic(from[i], c0, c1, c2, e1, e2, sign, low, high);
        }
    }

    private double inverseLinearProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = inverseLinear(from[i], c0, c1, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    private double inverseFirstDegreeProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = inverseFirstDegree(from[i], c0, c1, e1, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    private double inverseQuadraticProbed(double[] from, double[] dst, int start, int end,
            double low, double high) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        double probe = 0;
        for (int i = start; i < end; i++) {
            double e = inverseQuadratic(from[i], c0, c1, c2, e1, e2, sign, low, high);
            dst[i] = e;
            probe = Math.min(probe, e * 0.0);
        }
        return probe;
    }

    private static int thermalStatus(int min, int max, int low, int high, int finite) {
        if (min < low || max > high) {
            return CODES_OUTSIDE;
        }
        return finite == 1 ? PROVEN : PROVEN_NON_FINITE_TEMPERATURE;
    }

    private void codesLinearPlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        for (int i = start; i < end; i++) {
            dst[i] = plainLinear(codes[i + shift] * scale + offset, c0, c1) * factor;
        }
    }

    private boolean codesLinearPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = plainLinear(code * scale + offset, c0, c1) * factor;
        }
        return min >= low && max <= high;
    }

    private void codesFirstDegreePlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        for (int i = start; i < end; i++) {
            dst[i] = plainFirstDegree(codes[i + shift] * scale + offset, c0, c1, e1) * factor;
        }
    }

    private boolean codesFirstDegreePlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = plainFirstDegree(code * scale + offset, c0, c1, e1) * factor;
        }
        return min >= low && max <= high;
    }

    private void codesQuadraticPlain(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = plainQuadratic(codes[i + shift] * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor;
        }
    }

    private boolean codesQuadraticPlainWithin(int[] codes, int shift, double scale, double offset,
            double[] dst, int start, int end, double factor, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        int min = Integer.MAX_VALUE;
        int max = Integer.MIN_VALUE;
        for (int i = start; i < end; i++) {
            int code = codes[i + shift];
            min = Math.min(min, code);
            max = Math.max(max, code);
            dst[i] = plainQuadratic(code * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor;
        }
        return min >= low && max <= high;
    }

    // The thermal output q(t) is ThermalOutput.Correction.polynomial, the expression that the
    // scalar path evaluates too, so that both give the same bits.

    private boolean codesLinearLessThermal(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = n0;
        final double c1 = n1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = plainLinear(codes[i + shift] * scale + offset, c0, c1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private boolean codesFirstDegreeLessThermal(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = plainFirstDegree(codes[i + shift] * scale + offset, c0, c1, e1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private boolean codesQuadraticLessThermal(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        final double p0 = thermal.coefficient(0);
        final double p1 = thermal.coefficient(1);
        final double p2 = thermal.coefficient(2);
        final double p3 = thermal.coefficient(3);
        final double p4 = thermal.coefficient(4);
        int finite = 1;
        for (int i = start; i < end; i++) {
            double t = celsius[i];
            finite &= Kernels.finiteBit(t);
            dst[i] = plainQuadratic(codes[i + shift] * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return finite == 1;
    }

    private int codesLinearLessThermalWithin(int[] codes, int shift, double scale, double offset,
            double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
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
            dst[i] = plainLinear(code * scale + offset, c0, c1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }

    private int codesFirstDegreeLessThermalWithin(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
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
            dst[i] = plainFirstDegree(code * scale + offset, c0, c1, e1) * factor
                    - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }

    private int codesQuadraticLessThermalWithin(int[] codes, int shift, double scale,
            double offset, double[] celsius, double[] dst, int start, int end, double factor,
            ThermalOutput.Correction thermal, int low, int high) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
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
            dst[i] = plainQuadratic(code * scale + offset, c0, c1, c2, e1, e2, sign)
                    * factor - ThermalOutput.Correction.polynomial(t, p0, p1, p2, p3, p4);
        }
        return thermalStatus(min, max, low, high, finite);
    }

    private void linearPlain(double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        for (int i = start; i < end; i++) {
            dst[i] = plainLinear(dst[i], c0, c1) * factor;
        }
    }

    private void linearChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = n0;
        final double c1 = n1;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = plainLinear(r, c0, c1) * factor * unity(r, low, high);
        }
    }

    private void firstDegreePlain(double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        for (int i = start; i < end; i++) {
            dst[i] = plainFirstDegree(dst[i], c0, c1, e1) * factor;
        }
    }

    private void firstDegreeChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = plainFirstDegree(r, c0, c1, e1) * factor * unity(r, low, high);
        }
    }

    private void quadraticPlain(double[] dst, int start, int end, double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        for (int i = start; i < end; i++) {
            dst[i] = plainQuadratic(dst[i], c0, c1, c2, e1, e2, sign) * factor;
        }
    }

    private void quadraticChecked(double[] dst, int start, int end, double low, double high,
            double factor) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        for (int i = start; i < end; i++) {
            double r = dst[i];
            dst[i] = plainQuadratic(r, c0, c1, c2, e1, e2, sign) * factor * unity(r, low, high);
        }
    }

    /**
     * Converts {@code len} strains (m/m) from {@code src[srcOff...]} to output ratios (V/V) in
     * {@code dst[dstOff...]}. Allocation-free; the same function as {@link #toRatio(double)},
     * bit for bit. {@code src} and {@code dst} may be the same array, with any offsets (in
     * place when they are equal).
     *
     * @return the number of outputs set to NaN (NaN input or a strain outside the physical range)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toRatio(double[] src, int srcOff, double[] dst, int dstOff, int len) {
        Checks.block(src, srcOff, dst, dstOff, len);
        double[] from = Kernels.sameIndexSource(src, srcOff, dst, dstOff, len);
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
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double low = strainLow;
        final double high = strainHigh;
        for (int i = start; i < end; i++) {
            dst[i] = forward(from[i], c0, c1, c2, e1, e2, low, high);
        }
    }

    // The per-sample functions. Domain checks are arithmetic, not branches, so that the loops
    // above stay vectorised (a conditional, or Math.min and Math.max on JDK 25, slow them down
    // severalfold). For the open interval (low, high), both ends finite:
    //   g = (x − low)·(high − x)        > 0 inside, <= 0 outside, NaN for NaN, −∞ for ±∞
    //   g' = g + |g|                    2g inside, 0 outside, NaN for NaN and ±∞
    // and the quotient (p·g')/(q·g') is p/q inside and 0/0 = NaN everywhere else.

    private static double mask(double x, double low, double high) {
        double g = (x - low) * (high - x);
        return g + Math.abs(g);
    }

    private static double forward(double e, double n0, double n1, double n2, double d1,
            double d2, double low, double high) {
        double g = mask(e, low, high);
        return ((n0 + e * (n1 + e * n2)) * g) / ((1.0 + e * (d1 + e * d2)) * g);
    }

    private static double inverseLinear(double r, double n0, double n1, double low,
            double high) {
        double g = mask(r, low, high);
        return ((r - n0) * g) / (n1 * g);
    }

    private static double inverseFirstDegree(double r, double n0, double n1, double d1,
            double low, double high) {
        double g = mask(r, low, high);
        return ((r - n0) * g) / ((n1 - r * d1) * g);
    }

    private static double inverseQuadratic(double r, double n0, double n1, double n2,
            double d1, double d2, double sign, double low, double high) {
        double g = mask(r, low, high);
        double minusC = r - n0;
        double b = n1 - r * d1;
        double a = n2 - r * d2;
        double root = Math.sqrt(b * b + 4.0 * a * minusC);
        return (2.0 * minusC * g) / ((b + sign * root) * g);
    }

    /** 1 exactly for a reading inside (low, high), NaN outside: g/g with g the mask. */
    private static double unity(double r, double low, double high) {
        double g = mask(r, low, high);
        return g / g;
    }

    private static double plainLinear(double r, double n0, double n1) {
        return (r - n0) / n1;
    }

    private static double plainFirstDegree(double r, double n0, double n1, double d1) {
        return (r - n0) / (n1 - r * d1);
    }

    private static double plainQuadratic(double r, double n0, double n1, double n2, double d1,
            double d2, double sign) {
        double minusC = r - n0;
        double b = n1 - r * d1;
        double a = n2 - r * d2;
        double root = Math.sqrt(b * b + 4.0 * a * minusC);
        return 2.0 * minusC / (b + sign * root);
    }

    // ---------------------------------------------------------------- text

    private String rangeText() {
        return "(" + VoltageRatio.ofVoltsPerVolt(ratioLow) + ", "
                + VoltageRatio.ofVoltsPerVolt(ratioHigh) + ")";
    }

    private String strainRangeText() {
        return "(" + Format.withUnit(strainLow * 1e6, "µε") + ", "
                + Format.withUnit(strainHigh * 1e6, "µε") + ")";
    }

    private static String armList(BridgeArm[] arms) {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < 4; i++) {
            text.append(i == 0 ? "" : "; ").append("arm ").append(i + 1).append(": ")
                    .append(arms[i]);
        }
        return text.toString();
    }

    /** The leads as the sheets list them, e.g. {@code arm 1 1.5 Ω, excitation 1.0 Ω}; "" if none. */
    String leadsText() {
        StringBuilder leads = new StringBuilder();
        for (int i = 0; i < 4; i++) {
            if (armLeads[i] != 0) {
                leads.append(leads.length() == 0 ? "" : ", ").append("arm ").append(i + 1)
                        .append(' ').append(Resistance.ofOhms(armLeads[i]));
            }
        }
        if (excitationLeads != 0) {
            leads.append(leads.length() == 0 ? "" : ", ").append("excitation ")
                    .append(Resistance.ofOhms(excitationLeads));
        }
        return leads.toString();
    }

    /** The arrangement and its sensitivity, e.g. {@code quarter bridge, 0.5 mV/V per 1000 µε}. */
    String arrangementText() {
        return arrangement + ", " + sensitivity() + " per 1000 µε";
    }

    /** The arms, e.g. {@code arm 1: active gauge ×1.0 (120.0 Ω, K=2.0); arm 2: ...}. */
    String armsText() {
        return armList(arms);
    }

    /** The offset subtracted by {@link #zeroedByOffset} (V/V); 0 if none. */
    double zeroingOffset() {
        return offset;
    }

    /**
     * The arrangement, its sensitivity and its arms, e.g.
     * {@code quarter bridge, 0.5 mV/V per 1000 µε [arm 1: active gauge ×1.0 (120.0 Ω, K=2.0);
     * arm 2: completion resistor 120.0 Ω; ...]}, with the zero offset when one is set.
     */
    @Override
    public String toString() {
        String zero = offset == 0 ? "" : ", zero offset " + VoltageRatio.ofVoltsPerVolt(offset);
        String leads = leadsText();
        return arrangementText() + zero + " [" + armList(arms)
                + (leads.isEmpty() ? "" : "; leads: " + leads) + "]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(arrangement, arms.clone(), armLeads.clone(), excitationLeads, offset);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("Bridge");
    }

    /**
     * The serial form of a Bridge: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final String arrangement;
        private final BridgeArm[] arms;
        private final double[] armLeads;
        private final double excitationLeads;
        private final double offset;

        Serial(String arrangement, BridgeArm[] arms, double[] armLeads, double excitationLeads, double offset) {
            this.arrangement = arrangement;
            this.arms = arms;
            this.armLeads = armLeads;
            this.excitationLeads = excitationLeads;
            this.offset = offset;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("Bridge", () -> {
                Objects.requireNonNull(arrangement, "arrangement");
                if (arms.length != 4 || armLeads.length != 4) {
                    throw new IllegalArgumentException("arms and armLeads must hold 4 each: "
                            + arms.length + " and " + armLeads.length);
                }
                for (int a = 0; a < 4; a++) {
                    Objects.requireNonNull(arms[a], "arms[" + a + "]");
                    Checks.nonNegativeFinite(armLeads[a], "armLeads[" + a + "]");
                }
                Checks.nonNegativeFinite(excitationLeads, "excitationLeads");
                Checks.finite(offset, "offset");
                return new Bridge(arrangement, arms.clone(), armLeads.clone(), excitationLeads,
                        offset);
            });
        }
    }
}
