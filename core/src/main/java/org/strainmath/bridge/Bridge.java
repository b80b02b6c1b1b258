package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.math.BigDecimal;
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
 * Measurements using Strain Gages</i>, 1989, eq. 3.1; equation numbers from memory):
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

    private static final double[] NO_LEADS = new double[4];

    private final String arrangement;
    private final BridgeArm[] arms;
    /** Lead resistance in series with each arm, Ω. */
    private final double[] armLeads;
    /** Total resistance of the two excitation leads, Ω (0 with remote sense). */
    private final double excitationLeads;
    /** Added to the bridge equation by {@link #zeroedByOffset}: V/V. */
    private final double offset;
    /** The slope the same arms give without any lead resistance. */
    private final double slopeWithoutLeads;
    /** The output at zero strain the same arms give without any lead resistance. */
    private final double zeroWithoutLeads;
    /** The bridge equation: coefficients, form, intervals. */
    private final BridgeEquation equation;
    /** The block loops over doubles and over codes, fed by the equation. */
    private final BridgeLoops loops;
    private final CodeLoops codeLoops;

    private Bridge(String arrangement, BridgeArm[] arms, double[] armLeads, double excitationLeads,
            double offset) {
        this.arrangement = arrangement;
        this.arms = arms;
        this.armLeads = armLeads;
        this.excitationLeads = excitationLeads;
        this.offset = offset;

        this.equation = new BridgeEquation(arms, armLeads, excitationLeads, offset);
        double[] bare = BridgeEquation.zeroAndSlope(arms, NO_LEADS, 0.0);
        this.zeroWithoutLeads = bare[0];
        this.slopeWithoutLeads = bare[1];
        this.loops = new BridgeLoops(equation);
        this.codeLoops = new CodeLoops(equation);
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
        double low = equation.ratioLow - offset;
        double high = equation.ratioHigh - offset;
        if (!(reading > low && reading < high)) {
            throw new IllegalArgumentException("initialReading must be in the physical output "
                    + "range (" + VoltageRatio.ofVoltsPerVolt(low) + ", "
                    + VoltageRatio.ofVoltsPerVolt(high) + ") of the unzeroed bridge: "
                    + initialReading);
        }
        double shift = new BigDecimal(reading).subtract(
                BridgeEquation.exactZeroOutput(arms, armLeads, excitationLeads)).doubleValue();
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
                : numerator.divide(denominator, BridgeEquation.EXACT_ENOUGH).doubleValue();
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
        return equation.slope / slopeWithoutLeads;
    }

    /**
     * The zero offset the leads cause: the output at zero strain of this wiring minus that of
     * the same arms without leads, before any zeroing.
     */
    public VoltageRatio leadZeroOffset() {
        return VoltageRatio.ofVoltsPerVolt(equation.n0 - offset - zeroWithoutLeads);
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
        return equation.balanced;
    }

    /**
     * Whether the output is exactly proportional to strain (plus a constant), as for the bending
     * arrangements whose two dividers each keep a constant total resistance.
     */
    public boolean isLinear() {
        return equation.form == BridgeEquation.Form.LINEAR;
    }

    /**
     * The output at zero strain, as the instrument reads it. A zeroed bridge reads the initial
     * reading it was zeroed at ({@link #zeroedByOffset}, {@link #zeroedInArm}), which is what
     * converts to zero strain; a balanced bridge without zeroing reads 0.
     */
    public VoltageRatio zeroOutput() {
        return VoltageRatio.ofVoltsPerVolt(equation.n0);
    }

    /**
     * The small-strain sensitivity dr/dε at zero strain, per 1000 µε: K·N/4 mV/V for N active
     * arms of gauge factor K (0.5 mV/V per 1000 µε for a quarter bridge at K = 2).
     */
    public VoltageRatio sensitivity() {
        return VoltageRatio.ofVoltsPerVolt(equation.slope * 1e-3);
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
        return 4 * equation.slope / gaugeFactor();
    }

    /** The lower end of the open interval of physical strains (m/m), for tests. */
    double strainLow() {
        return equation.strainLow;
    }

    /** The upper end of the open interval of physical strains (m/m), for tests. */
    double strainHigh() {
        return equation.strainHigh;
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
        return Strain.of((ratio.toVoltsPerVolt() - equation.n0) / equation.slope);
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
        if (!(e > equation.strainLow && e < equation.strainHigh)) {
            throw new IllegalArgumentException("strain must be in the physical range "
                    + strainRangeText() + " of this bridge: " + strain);
        }
        BridgeEquation q = equation;
        double p2 = q.n2 - q.n0 * q.d2;
        return e * (p2 - q.slope * q.d1 - q.slope * q.d2 * e)
                / (q.slope * (1 + e * (q.d1 + e * q.d2)));
    }

    // ---------------------------------------------------------------- kernels

    /**
     * The exact output ratio (V/V) at {@code strain} (m/m); NaN for NaN, an infinite strain or a
     * strain outside the physical range (including |ε| &gt;= 10). The same function as the block
     * method {@link #toRatio(double[], int, double[], int, int)}, bit for bit. Never throws.
     */
    public double toRatio(double strain) {
        return equation.toRatio(strain);
    }

    /**
     * The exact strain (m/m) for the output ratio {@code ratio} (V/V); NaN for NaN, an infinite
     * ratio or a ratio with no physical strain. The same function as the block method
     * {@link #toStrain(double[], int, double[], int, int)}, bit for bit. Never throws.
     */
    public double toStrain(double ratio) {
        return equation.toStrain(ratio);
    }

    /** The strain of a channel's reading r: the plain quotient × factor, NaN outside (low, high). */
    double channelStrain(double r, double low, double high, double factor) {
        return equation.channelStrain(r, low, high, factor);
    }

    /** Whether the plain quotient is regular on [lo, hi] (see {@link BridgeEquation}). */
    boolean regularOn(double lo, double hi) {
        return equation.regularOn(lo, hi);
    }

    /** The bridge equation, for the channels of this package. */
    BridgeEquation equation() {
        return equation;
    }

    /** The loops over double arrays, for the channels of this package. */
    BridgeLoops loops() {
        return loops;
    }

    /** The loops over converter codes, for the channels of this package. */
    CodeLoops codeLoops() {
        return codeLoops;
    }

    /** The lower end of the open interval of physical readings (V/V). */
    double ratioLow() {
        return equation.ratioLow;
    }

    /** The upper end of the open interval of physical readings (V/V). */
    double ratioHigh() {
        return equation.ratioHigh;
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
        return loops.toStrain(Kernels.sameIndexSource(src, srcOff, dst, dstOff, len), dst,
                dstOff, len, probeInLoop);
    }

    // ---------------------------------------------------------------- channel inverses

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
        return loops.toRatio(Kernels.sameIndexSource(src, srcOff, dst, dstOff, len), dst, dstOff,
                len);
    }

    // ---------------------------------------------------------------- text

    private String rangeText() {
        return "(" + VoltageRatio.ofVoltsPerVolt(equation.ratioLow) + ", "
                + VoltageRatio.ofVoltsPerVolt(equation.ratioHigh) + ")";
    }

    private String strainRangeText() {
        return "(" + Format.withUnit(equation.strainLow * 1e6, "µε") + ", "
                + Format.withUnit(equation.strainHigh * 1e6, "µε") + ")";
    }

    static String armList(BridgeArm[] arms) {
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
