package org.strainmath.bridge;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.Kernels;
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
 */
public final class Bridge {

    private static final MathContext EXACT_ENOUGH = new MathContext(60);

    /**
     * The largest strain magnitude the model accepts, 10 m/m (1000 %). No bonded gauge survives a
     * twentieth of it; the bound keeps every per-sample product finite.
     */
    static final double STRAIN_LIMIT = 10.0;

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
    /** Added to the bridge equation by {@link #zeroedByOffset}: V/V. */
    private final double offset;

    private final double n0;
    private final double n1;
    private final double n2;
    private final double d1;
    private final double d2;
    /** dr/dε at ε = 0. */
    private final double slope;
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

    private Bridge(String arrangement, BridgeArm[] arms, double offset) {
        this.arrangement = arrangement;
        this.arms = arms;
        this.offset = offset;

        BigDecimal[] r = new BigDecimal[4];
        BigDecimal[] a = new BigDecimal[4];
        for (int i = 0; i < 4; i++) {
            BridgeArm arm = arms[i];
            r[i] = new BigDecimal(arm.nominalResistance().toOhms());
            a[i] = r[i].multiply(new BigDecimal(arm.effectiveGaugeFactor()))
                    .multiply(new BigDecimal(arm.strainMultiple()));
        }
        BigDecimal s12 = r[0].add(r[1]);
        BigDecimal s34 = r[2].add(r[3]);
        BigDecimal b12 = a[0].add(a[1]);
        BigDecimal b34 = a[2].add(a[3]);
        BigDecimal bigN0 = r[0].multiply(r[2]).subtract(r[1].multiply(r[3]));
        BigDecimal bigN1 = r[0].multiply(a[2]).add(a[0].multiply(r[2]))
                .subtract(r[1].multiply(a[3])).subtract(a[1].multiply(r[3]));
        BigDecimal bigN2 = a[0].multiply(a[2]).subtract(a[1].multiply(a[3]));
        BigDecimal bigD0 = s12.multiply(s34);
        BigDecimal bigD1 = s12.multiply(b34).add(b12.multiply(s34));
        BigDecimal bigD2 = b12.multiply(b34);
        this.balanced = bigN0.signum() == 0;

        // The offset adds to r: (N + offset·D) / D.
        BigDecimal off = new BigDecimal(offset);
        bigN0 = bigN0.add(off.multiply(bigD0));
        bigN1 = bigN1.add(off.multiply(bigD1));
        bigN2 = bigN2.add(off.multiply(bigD2));

        this.n0 = bigN0.divide(bigD0, EXACT_ENOUGH).doubleValue();
        this.n1 = bigN1.divide(bigD0, EXACT_ENOUGH).doubleValue();
        this.n2 = bigN2.divide(bigD0, EXACT_ENOUGH).doubleValue();
        this.d1 = bigD1.divide(bigD0, EXACT_ENOUGH).doubleValue();
        this.d2 = bigD2.divide(bigD0, EXACT_ENOUGH).doubleValue();
        BigDecimal bigSlope = bigN1.multiply(bigD0).subtract(bigN0.multiply(bigD1))
                .divide(bigD0.multiply(bigD0), EXACT_ENOUGH);
        if (bigSlope.signum() == 0) {
            throw new IllegalArgumentException(
                    "arms must give an output that changes with strain: " + armList(arms));
        }
        this.slope = bigSlope.doubleValue();
        this.rootSign = bigSlope.signum();
        if (b12.signum() == 0 && b34.signum() == 0) {
            this.form = Form.LINEAR;
        } else if (bigN2.signum() == 0 && bigD2.signum() == 0) {
            this.form = Form.FIRST_DEGREE;
        } else {
            this.form = Form.QUADRATIC;
        }

        // Physical strains: within the model's limit, every arm resistance positive ...
        double low = -STRAIN_LIMIT;
        double high = STRAIN_LIMIT;
        for (int i = 0; i < 4; i++) {
            double ai = a[i].doubleValue();
            double edge = -1.0 / (arms[i].effectiveGaugeFactor() * arms[i].strainMultiple());
            if (ai > 0) {
                low = Math.max(low, edge);
            } else if (ai < 0) {
                high = Math.min(high, edge);
            }
        }
        // ... and the bridge on its monotonic branch. Each divider Ra/(Ra + Rb) is monotonic with
        // derivative c/(Ra + Rb)², c = Aa·Rb − Ab·Ra constant; when the two dividers pull
        // against each other, dr/dε vanishes where √|c12|·(R3 + R4) = √|c43|·(R1 + R2).
        double c12 = a[0].multiply(r[1]).subtract(a[1].multiply(r[0])).doubleValue();
        double c43 = a[3].multiply(r[2]).subtract(a[2].multiply(r[3])).doubleValue();
        if (c12 * rootSign < 0 || -c43 * rootSign < 0) {
            double q12 = Math.sqrt(Math.abs(c12));
            double q43 = Math.sqrt(Math.abs(c43));
            double denominator = q12 * b34.doubleValue() - q43 * b12.doubleValue();
            double turn = (q43 * s12.doubleValue() - q12 * s34.doubleValue()) / denominator;
            if (turn > 0 && turn < high) {
                high = turn;
            } else if (turn < 0 && turn > low) {
                low = turn;
            }
        }
        this.strainLow = low;
        this.strainHigh = high;
        double atLow = offset + dividerDifferenceAt(low, r, a);
        double atHigh = offset + dividerDifferenceAt(high, r, a);
        this.ratioLow = rootSign > 0 ? atLow : atHigh;
        this.ratioHigh = rootSign > 0 ? atHigh : atLow;
    }

    /**
     * R1/(R1 + R2) − R4/(R3 + R4) at {@code strain}, an end of the physical range, taking the
     * limit where a divider's resistances vanish together.
     */
    private static double dividerDifferenceAt(double strain, BigDecimal[] r, BigDecimal[] a) {
        BigDecimal e = new BigDecimal(strain);
        return divider(e, r[0], a[0], r[1], a[1]) - divider(e, r[3], a[3], r[2], a[2]);
    }

    private static double divider(BigDecimal strain, BigDecimal rTop, BigDecimal aTop,
            BigDecimal rBottom, BigDecimal aBottom) {
        BigDecimal top = rTop.add(aTop.multiply(strain)).max(BigDecimal.ZERO);
        BigDecimal sum = top.add(rBottom.add(aBottom.multiply(strain)).max(BigDecimal.ZERO));
        if (sum.signum() == 0) {
            top = rTop;
            sum = rTop.add(rBottom);
        }
        return top.divide(sum, EXACT_ENOUGH).doubleValue();
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
            Objects.requireNonNull(arm3, "arm3"), Objects.requireNonNull(arm4, "arm4")}, 0.0);
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
            BridgeArm.active(gauge, 1), completion, completion, completion}, 0.0);
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
            BridgeArm.active(gauge, 1), BridgeArm.dummy(gauge), completion, completion}, 0.0);
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
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1), completion, completion}, 0.0);
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
            0.0);
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
            BridgeArm.active(gauge, 1), completion, BridgeArm.active(gauge, 1), completion}, 0.0);
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
            BridgeArm.active(gauge, 1), BridgeArm.active(gauge, -1)}, 0.0);
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
            BridgeArm.active(gauge, 1), poissonArm(gauge, -poissonRatio)}, 0.0);
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
            poissonArm(gauge, poissonRatio), poissonArm(gauge, -poissonRatio)}, 0.0);
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
        double shift = new BigDecimal(reading).subtract(unshiftedZeroOutput()).doubleValue();
        return new Bridge(arrangement, arms, shift);
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
        double reading = initialReading.toVoltsPerVolt();
        BigDecimal r1 = resistanceOf(0);
        BigDecimal r2 = resistanceOf(1);
        BigDecimal r3 = resistanceOf(2);
        BigDecimal r4 = resistanceOf(3);
        BigDecimal target = new BigDecimal(reading);
        BigDecimal solved;
        if (arm <= 2) {
            // R1/(R1 + R2) must equal t.
            BigDecimal t = target.add(r4.divide(r3.add(r4), EXACT_ENOUGH));
            checkFraction(t, initialReading, arm);
            solved = arm == 1
                    ? t.multiply(r2).divide(BigDecimal.ONE.subtract(t), EXACT_ENOUGH)
                    : r1.multiply(BigDecimal.ONE.subtract(t)).divide(t, EXACT_ENOUGH);
        } else {
            // R4/(R3 + R4) must equal u.
            BigDecimal u = r1.divide(r1.add(r2), EXACT_ENOUGH).subtract(target);
            checkFraction(u, initialReading, arm);
            solved = arm == 4
                    ? u.multiply(r3).divide(BigDecimal.ONE.subtract(u), EXACT_ENOUGH)
                    : r4.multiply(BigDecimal.ONE.subtract(u)).divide(u, EXACT_ENOUGH);
        }
        double ohms = solved.doubleValue();
        if (!(ohms > 0) || Double.isInfinite(ohms)) {
            throw new IllegalArgumentException("initialReading cannot be explained by arm " + arm
                    + " (it would need " + ohms + " Ω): " + initialReading);
        }
        BridgeArm[] changed = arms.clone();
        changed[arm - 1] = arms[arm - 1].withNominalResistance(Resistance.ofOhms(ohms));
        return new Bridge(arrangement, changed, 0.0);
    }

    private static void checkFraction(BigDecimal fraction, VoltageRatio reading, int arm) {
        if (fraction.signum() <= 0 || fraction.compareTo(BigDecimal.ONE) >= 0) {
            throw new IllegalArgumentException("initialReading cannot be explained by arm " + arm
                    + " with a positive resistance: " + reading);
        }
    }

    private BigDecimal resistanceOf(int index) {
        return new BigDecimal(arms[index].nominalResistance().toOhms());
    }

    private BigDecimal unshiftedZeroOutput() {
        BigDecimal r1 = resistanceOf(0);
        BigDecimal r2 = resistanceOf(1);
        BigDecimal r3 = resistanceOf(2);
        BigDecimal r4 = resistanceOf(3);
        return r1.multiply(r3).subtract(r2.multiply(r4))
                .divide(r1.add(r2).multiply(r3.add(r4)), EXACT_ENOUGH);
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
                return inverseQuadratic(ratio, n0, n1, n2, d1, d2, rootSign, ratioLow, ratioHigh);
        }
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
        Checks.block(src, srcOff, dst, dstOff, len);
        double[] from = Kernels.sameIndexSource(src, srcOff, dst, dstOff, len);
        int nan = 0;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int stop = start + Math.min(Kernels.CHUNK, len - done);
            switch (form) {
                case LINEAR:
                    inverseLinearBlock(from, dst, start, stop);
                    break;
                case FIRST_DEGREE:
                    inverseFirstDegreeBlock(from, dst, start, stop);
                    break;
                default:
                    inverseQuadraticBlock(from, dst, start, stop);
                    break;
            }
            nan += Kernels.countNaN(dst, start, stop - start);
        }
        return nan;
    }

    // Blocks run in chunks of Kernels.CHUNK samples, so that the NaN count reads what the loop
    // has just written while it is still in cache. One small method per loop, each reading and
    // writing at one index, so that C2 compiles and vectorises each loop on its own.

    private void inverseLinearBlock(double[] from, double[] dst, int start, int end) {
        final double c0 = n0;
        final double c1 = n1;
        final double low = ratioLow;
        final double high = ratioHigh;
        for (int i = start; i < end; i++) {
            dst[i] = inverseLinear(from[i], c0, c1, low, high);
        }
    }

    private void inverseFirstDegreeBlock(double[] from, double[] dst, int start, int end) {
        final double c0 = n0;
        final double c1 = n1;
        final double e1 = d1;
        final double low = ratioLow;
        final double high = ratioHigh;
        for (int i = start; i < end; i++) {
            dst[i] = inverseFirstDegree(from[i], c0, c1, e1, low, high);
        }
    }

    private void inverseQuadraticBlock(double[] from, double[] dst, int start, int end) {
        final double c0 = n0;
        final double c1 = n1;
        final double c2 = n2;
        final double e1 = d1;
        final double e2 = d2;
        final double sign = rootSign;
        final double low = ratioLow;
        final double high = ratioHigh;
        for (int i = start; i < end; i++) {
            dst[i] = inverseQuadratic(from[i], c0, c1, c2, e1, e2, sign, low, high);
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

    /**
     * The arrangement, its sensitivity and its arms, e.g.
     * {@code quarter bridge, 0.5 mV/V per 1000 µε [arm 1: active gauge ×1.0 (120.0 Ω, K=2.0);
     * arm 2: completion resistor 120.0 Ω; ...]}, with the zero offset when one is set.
     */
    @Override
    public String toString() {
        String zero = offset == 0 ? "" : ", zero offset " + VoltageRatio.ofVoltsPerVolt(offset);
        return arrangement + ", " + sensitivity() + " per 1000 µε" + zero + " [" + armList(arms)
                + "]";
    }
}
