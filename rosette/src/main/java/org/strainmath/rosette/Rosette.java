package org.strainmath.rosette;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.internal.Checks;
import org.strainmath.internal.SerialForms;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;

/**
 * A strain rosette: gauges at known angles on one point of a surface, reduced to the plane
 * strain state, the principal strains and, with a material, the stresses.
 *
 * <pre>
 *   Rosette rosette = Rosette.rectangular();                 // gauges a, b, c at 0°, 45°, 90°
 *   rosette.reduceMicrostrain(800, 520, -200).principal();   // PrincipalStrains[...]
 *   rosette.withMaterial(steel).stressesOfMicrostrain(800, 520, -200).vonMises();
 * </pre>
 *
 * <p><b>One reduction for every geometry.</b> A gauge at angle θ from the reference axis x
 * reads the normal strain along its grid (the strain transformation equation), plus its
 * transverse sensitivity Kt times the strain across it, over the factor of its gauge-factor
 * calibration (ASTM E251; the transverse model of {@link StrainGauge}):
 * <pre>
 *   ε(θ) = C + D·cos 2θ + H·sin 2θ      C = (εx + εy)/2,  D = (εx − εy)/2,  H = γxy/2
 *   reading = [(1 + Kt)·C + (1 − Kt)·(D·cos 2θ + H·sin 2θ)] / (1 − ν0·Kt)
 * </pre>
 * The n readings give n such equations in (C, D, H). When the rosette is built, the matrix of
 * the equations is inverted once (least squares, (AᵀA)⁻¹Aᵀ, computed in 50-digit decimal
 * arithmetic, so that it is exact to the last bit of its double entries) into one 3×n matrix
 * from readings to (C, D, H); per sample only that product runs. For three gauges without
 * transverse sensitivity it reproduces the textbook closed forms of the rectangular and delta
 * rosettes (e.g. Dally and Riley, <i>Experimental Stress Analysis</i>, ch. on strain analysis
 * methods); with transverse sensitivity it is the coupled correction of all grids at once, which
 * reduces to the published forms for those two rosettes. More than three gauges are fitted by
 * least squares and their residuals reported; a tee rosette (two gauges along the principal
 * axes, known beforehand) adds the condition that the shear strain in its axes is zero.
 *
 * <p><b>Angles</b>: counter-clockwise from the reference axis, which is gauge a unless moved
 * ({@link #withReferenceAxisAt}); gauges numbered clockwise are entered with
 * {@link #withClockwiseNumbering()}. The principal angle runs from the reference axis to ε1, in
 * (−90°, 90°]; a state whose Mohr radius is below 1e-12 of its centre is equal-biaxial and has
 * none.
 *
 * <p><i>Accuracy</i>: the composed matrix is exact to its doubles; a reduction then costs a few
 * ulp of the largest reading, amplified by the conditioning of the geometry (1 for the
 * rectangular and delta rosettes, large for gauges a few degrees apart).
 *
 * <p>Immutable and thread-safe.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class Rosette implements Serializable {
    /** Below this ratio of Mohr radius to centre a state is taken as equal-biaxial. */
    static final double EQUAL_BIAXIAL = 1e-12;

    private final String kind;

    private final double[] nominal;        // radians, as numbered

    private final double[] measured;       // radians, or null

    private final boolean clockwise;

    private final double reference;        // radians, reference axis from gauge a's frame

    private final StrainGauge[] grids;     // one per gauge, or null

    private final IsotropicMaterial material;  // or null

    private final boolean tee;

    // Composed: (C, D, H) = rows · readings; E/(1 − ν²) and ν when there is a material.
    private final double[] rowC;

    private final double[] rowD;

    private final double[] rowH;

    private final double stiffness;

    private final double poisson;

    private final double[][] model;        // n × 3: readings = model · (C, D, H)

    private Rosette(String kind, double[] nominal, double[] measured, boolean clockwise,
            double reference, StrainGauge[] grids, IsotropicMaterial material, boolean tee) {
        this.kind = kind;
        this.nominal = nominal;
        this.measured = measured;
        this.clockwise = clockwise;
        this.reference = reference;
        this.grids = grids;
        this.material = material;
        this.tee = tee;

        RosetteReduction reduction = new RosetteReduction(effectiveAngles(), grids, tee);
        this.model = reduction.model;
        this.rowC = reduction.rowC;
        this.rowD = reduction.rowD;
        this.rowH = reduction.rowH;
        if (material == null) {
            stiffness = Double.NaN;
            poisson = Double.NaN;
        } else {
            poisson = material.poissonsRatio();
            stiffness = material.youngsModulus().toPascals() / ((1 - poisson) * (1 + poisson));
        }
    }

    // ---------------------------------------------------------------- factories

    /**
     * The rectangular rosette: gauges a, b, c at 0°, 45° and 90°.
     */
    public static Rosette rectangular() {
        return new Rosette("rectangular", radians(0, 45, 90), null, false, 0, null, null, false);
    }

    /**
     * The delta rosette: gauges a, b, c at 0°, 60° and 120°.
     */
    public static Rosette delta() {
        return new Rosette("delta", radians(0, 60, 120), null, false, 0, null, null, false);
    }

    /**
     * The tee rosette: gauges a and b at 0° and 90°, laid along principal axes that are known
     * beforehand (by symmetry, or a pure axial load); the reduction takes the shear strain in
     * those axes as zero, which is only true when they really are principal.
     */
    public static Rosette tee() {
        return new Rosette("tee", radians(0, 90), null, false, 0, null, null, true);
    }

    /**
     * A rosette of {@code angles.length} ≥ 3 gauges at the given angles (counter-clockwise from
     * gauge a's reference axis); more than three are fitted by least squares.
     *
     * @throws NullPointerException     if an angle is null
     * @throws IllegalArgumentException if there are fewer than three gauges, or two of them
     *                                  are 0° or 180° apart
     */
    public static Rosette ofAngles(Angle... angles) {
        Objects.requireNonNull(angles, "angles");
        double[] theta = new double[angles.length];
        for (int j = 0; j < angles.length; j++) {
            theta[j] = Objects.requireNonNull(angles[j], "angles[" + j + "]").toRadians();
        }
        if (theta.length < 3) {
            throw new IllegalArgumentException("angles must give at least three gauges: "
                    + anglesText(theta));
        }
        return new Rosette("general", theta, null, false, 0, null, null, false);
    }

    /**
     * {@link #ofAngles} with the angles in degrees.
     *
     * @throws IllegalArgumentException as {@link #ofAngles}, or if an angle is not finite
     */
    public static Rosette ofDegrees(double... degrees) {
        Objects.requireNonNull(degrees, "degrees");
        if (degrees.length < 3) {
            throw new IllegalArgumentException("degrees must give at least three gauges: "
                    + anglesText(radians(degrees)));
        }
        Angle[] angles = new Angle[degrees.length];
        for (int j = 0; j < degrees.length; j++) {
            angles[j] = Angle.ofDegrees(degrees[j]);
        }
        return ofAngles(angles);
    }

    private static double[] radians(double... degrees) {
        double[] out = new double[degrees.length];
        for (int j = 0; j < degrees.length; j++) {
            out[j] = Math.toRadians(degrees[j]);
        }
        return out;
    }

    // ---------------------------------------------------------------- configuration

    /**
     * A copy whose gauge angles run clockwise (as some rosettes are numbered): each angle θ is
     * taken as −θ in the counter-clockwise convention of the results.
     */
    public Rosette withClockwiseNumbering() {
        return new Rosette(kind, nominal, measured, true, reference, grids, material, tee);
    }

    /**
     * A copy whose results are given in axes x, y with x at {@code fromGaugeA}
     * counter-clockwise from gauge a's axis: every gauge angle becomes θ − {@code fromGaugeA}.
     *
     * @throws NullPointerException if {@code fromGaugeA} is null
     */
    public Rosette withReferenceAxisAt(Angle fromGaugeA) {
        return new Rosette(kind, nominal, measured, clockwise, fromGaugeA.toRadians(), grids,
                material, tee);
    }

    /**
     * A copy with the angles measured on the installed rosette (one per gauge, in the same
     * frame and numbering as the nominal ones), for a misaligned or hand-laid rosette.
     *
     * @throws NullPointerException     if an angle is null
     * @throws IllegalArgumentException if the count differs from the gauges', or two gauges
     *                                  are 0° or 180° apart
     */
    public Rosette withMeasuredAngles(Angle... actual) {
        Objects.requireNonNull(actual, "actual");
        if (actual.length != nominal.length) {
            throw new IllegalArgumentException("actual must give one angle per gauge, "
                    + nominal.length + ": " + actual.length);
        }
        double[] theta = new double[actual.length];
        for (int j = 0; j < actual.length; j++) {
            theta[j] = Objects.requireNonNull(actual[j], "actual[" + j + "]").toRadians();
        }
        return new Rosette(kind, nominal, theta, clockwise, reference, grids, material, tee);
    }

    /**
     * A copy whose grids have the transverse sensitivity Kt and calibration Poisson's ratio ν0
     * of {@code gauges} ({@link StrainGauge#transverseSensitivity()},
     * {@link StrainGauge#calibrationPoissonRatio()}): one gauge for all grids, or one per grid.
     * The correction is folded into the reduction matrix.
     *
     * @throws NullPointerException     if a gauge is null
     * @throws IllegalArgumentException if the count is neither 1 nor the number of gauges
     */
    public Rosette withGaugeData(StrainGauge... gauges) {
        Objects.requireNonNull(gauges, "gauges");
        int n = nominal.length;
        if (gauges.length != 1 && gauges.length != n) {
            throw new IllegalArgumentException("gauges must be one for all grids or one per grid, "
                    + n + ": " + gauges.length);
        }
        StrainGauge[] all = new StrainGauge[n];
        for (int j = 0; j < n; j++) {
            all[j] = Objects.requireNonNull(gauges[gauges.length == 1 ? 0 : j], "gauges[" + j + "]");
        }
        return new Rosette(kind, nominal, measured, clockwise, reference, all, material, tee);
    }

    /**
     * A copy that also converts to stresses, in plane stress, with {@code material}.
     *
     * @throws NullPointerException if {@code material} is null
     */
    public Rosette withMaterial(IsotropicMaterial material) {
        return new Rosette(kind, nominal, measured, clockwise, reference, grids,
                Objects.requireNonNull(material, "material"), tee);
    }

    /**
     * Checks that the channels that read this rosette's grids do not correct for transverse
     * sensitivity a second time, and returns this rosette. A rosette's grids see each other's
     * strains, so their transverse correction belongs here ({@link #withGaugeData}), where all
     * grids are solved together; a channel's correction
     * ({@link StrainChannel#withTransverseCorrection}) assumes one known ratio of transverse to
     * axial strain, which a rosette's grids do not have. Call it once where the channels and the
     * rosette are configured together.
     *
     * @throws NullPointerException     if {@code channels} or a channel is null
     * @throws IllegalArgumentException if this rosette has gauge data with a transverse
     *                                  sensitivity and a channel corrects for it too
     */
    public Rosette checkChannels(StrainChannel... channels) {
        Objects.requireNonNull(channels, "channels");
        boolean here = false;
        if (grids != null) {
            for (StrainGauge g : grids) {
                here |= g.transverseSensitivity() != 0;
            }
        }
        for (int c = 0; c < channels.length; c++) {
            StrainChannel channel = Objects.requireNonNull(channels[c], "channels[" + c + "]");
            if (here && channel.transverseRatio().isPresent()) {
                throw new IllegalArgumentException("channels[" + c + "] must not correct for"
                        + " transverse sensitivity: the rosette's gauge data already does (correct"
                        + " on the rosette only): " + channel.transverseRatio().getAsDouble());
            }
        }
        return this;
    }

    // ---------------------------------------------------------------- properties

    /** The number of gauges. */
    public int gaugeCount() {
        return nominal.length;
    }

    /**
     * The angles of the gauges as the reduction uses them: measured if given, signed by the
     * numbering, relative to the reference axis.
     */
    public List<Angle> angles() {
        List<Angle> out = new ArrayList<>();
        for (double theta : effectiveAngles()) {
            out.add(Angle.ofRadians(theta));
        }
        return Collections.unmodifiableList(out);
    }

    /** The material, if one was given. */
    public Optional<IsotropicMaterial> material() {
        return Optional.ofNullable(material);
    }

    /**
     * The composed reduction: row 0, 1, 2 give εx, εy and γxy from the n readings (a new
     * array, 3 × n).
     */
    public double[][] reductionMatrix() {
        int n = rowC.length;
        double[][] out = new double[3][n];
        for (int j = 0; j < n; j++) {
            out[0][j] = rowC[j] + rowD[j];
            out[1][j] = rowC[j] - rowD[j];
            out[2][j] = 2 * rowH[j];
        }
        return out;
    }

    private double[] effectiveAngles() {
        double[] base = measured != null ? measured : nominal;
        double[] theta = new double[base.length];
        for (int j = 0; j < base.length; j++) {
            theta[j] = (clockwise ? -base[j] : base[j]) - reference;
        }
        return theta;
    }

    static String anglesText(double[] theta) {
        StringBuilder text = new StringBuilder();
        for (int j = 0; j < theta.length; j++) {
            text.append(j == 0 ? "" : ", ").append(Angle.ofRadians(theta[j]));
        }
        return text.toString();
    }

    // ---------------------------------------------------------------- value API

    /**
     * The reduction of one set of readings, one per gauge in the rosette's order (a, b, c...).
     *
     * @throws NullPointerException     if a reading is null
     * @throws IllegalArgumentException if the count differs from the gauges'
     */
    public RosetteStrains reduce(Strain... readings) {
        Objects.requireNonNull(readings, "readings");
        double[] r = new double[readings.length];
        for (int j = 0; j < r.length; j++) {
            r[j] = Objects.requireNonNull(readings[j], "readings[" + j + "]").value();
        }
        return reduceValues(r);
    }

    /**
     * {@link #reduce} with the readings in µε.
     *
     * @throws IllegalArgumentException if the count differs from the gauges', or a reading is
     *                                  not finite
     */
    public RosetteStrains reduceMicrostrain(double... readings) {
        Objects.requireNonNull(readings, "readings");
        double[] r = new double[readings.length];
        for (int j = 0; j < r.length; j++) {
            r[j] = Checks.finite(readings[j], "readings[" + j + "]") * 1e-6;
        }
        return reduceValues(r);
    }

    /**
     * The stresses (plane stress) of one set of readings, with the material of
     * {@link #withMaterial}.
     *
     * @throws IllegalStateException    if the rosette has no material
     * @throws IllegalArgumentException if the count differs from the gauges'
     */
    public RosetteStresses stressesOf(Strain... readings) {
        return reduce(readings).stresses();
    }

    /**
     * {@link #stressesOf} with the readings in µε.
     *
     * @throws IllegalStateException    if the rosette has no material
     * @throws IllegalArgumentException if the count differs from the gauges'
     */
    public RosetteStresses stressesOfMicrostrain(double... readings) {
        return reduceMicrostrain(readings).stresses();
    }

    private RosetteStrains reduceValues(double[] r) {
        if (r.length != rowC.length) {
            throw new IllegalArgumentException("readings must give one strain per gauge, "
                    + rowC.length + ": " + r.length);
        }
        for (int j = 0; j < r.length; j++) {
            Checks.finite(r[j], "readings[" + j + "]");
        }
        double c = dot(rowC, r);
        double d = dot(rowD, r);
        double h = dot(rowH, r);
        PlaneStrain state = new PlaneStrain(c + d, c - d, 2 * h);
        double radius = Math.sqrt(d * d + h * h);
        double angle = principalAngle(c, d, h);
        PrincipalStrains principal = new PrincipalStrains(Strain.of(c + radius),
                Strain.of(c - radius), Double.isNaN(angle) ? Optional.empty()
                        : Optional.of(Angle.ofRadians(angle)));
        double[] residuals = new double[r.length];
        boolean fitted = r.length > 3;
        for (int j = 0; j < r.length; j++) {
            residuals[j] = fitted ? r[j] - (model[j][0] * c + model[j][1] * d + model[j][2] * h) : 0;
        }
        return new RosetteStrains(this, new double[] {c, d, h}, state, principal, residuals);
    }

    /** Σ row[j]·r[j] in index order, starting from the first product (as the kernels do). */
    private static double dot(double[] row, double[] r) {
        double sum = row[0] * r[0];
        for (int j = 1; j < row.length; j++) {
            sum += row[j] * r[j];
        }
        return sum;
    }

    /**
     * θp = ½·atan2(H, D) in (−90°, 90°] (+0.0 turns a −0 shear into +0, so that the angle is
     * never −90°), NaN when the radius √(D² + H²) ≤ 1e-12·|C|.
     */
    static double principalAngle(double c, double d, double h) {
        double theta = 0.5 * StrictMath.atan2(h + 0.0, d);
        double margin = Math.sqrt(d * d + h * h) - EQUAL_BIAXIAL * Math.abs(c);
        double gate = margin + Math.abs(margin);
        return (theta * gate) / gate;
    }

    /** Fails when the rosette has no material. */
    private void requireMaterial() {
        if (material == null) {
            throw new IllegalStateException("the rosette has no material: use withMaterial first");
        }
    }

    /** The stresses of readings r, whose principal strains are e1, e2, state c, d, h. */
    RosetteStresses stresses(double c, double d, double h, double e1, double e2,
            Optional<Angle> angle) {
        requireMaterial();
        return new RosetteStresses(material, stiffness, poisson,
                material.stressInPlaneStress(new PlaneStrain(c + d, c - d, 2 * h)), e1, e2, angle);
    }

    // ---------------------------------------------------------------- kernels

    /**
     * Converts {@code len} sets of readings (one array per gauge, in the rosette's order, from
     * {@code srcOff}) into the principal strains ε1 and ε2 (m/m, from {@code dstOff}):
     * ε1,2 = C ± √(D² + H²), one square root per sample. Allocation-free; the same function as
     * {@link #reduce}, bit for bit. An output may be an input array only at the same offset.
     *
     * @return the number of samples with a NaN output (a NaN reading)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  if the reading arrays are not one per gauge, or the
     *                                   outputs alias wrongly
     */
    public int toPrincipalStrains(double[][] readings, int srcOff, double[] e1, double[] e2,
            int dstOff, int len) {
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, e1, "e1", e2, "e2", null, null);
        return RosetteKernels.strains(readings, srcOff, rowC, rowD, rowH, e1, e2, dstOff, len);
    }

    /**
     * The principal strains and the von Mises stress together, in two short loops per chunk
     * (the strains, then von Mises from them), the fastest way to both. Bit for bit
     * {@link #toPrincipalStrains} and {@link #toVonMises}.
     *
     * @return the number of samples with a NaN output
     * @throws IllegalStateException     if the rosette has no material
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toPrincipalStrainsAndVonMises(double[][] readings, int srcOff, double[] e1,
            double[] e2, double[] vonMises, int dstOff, int len) {
        requireMaterial();
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, e1, "e1", e2, "e2", vonMises, "vonMises");
        return RosetteKernels.strainsAndVonMises(readings, srcOff, rowC, rowD, rowH, stiffness,
                poisson, e1, e2, vonMises, dstOff, len);
    }

    /**
     * Converts readings into the principal angle θp (radians, in (−π/2, π/2], NaN for an
     * equal-biaxial state): one arctangent per sample, so ask for it only when it is needed.
     * Allocation-free; bit for bit the angle of {@link #reduce}.
     *
     * @return the number of NaN outputs (NaN readings and equal-biaxial states)
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toPrincipalAngles(double[][] readings, int srcOff, double[] radians, int dstOff,
            int len) {
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, radians, "radians", null, null, null, null);
        return RosetteKernels.angle(readings, srcOff, rowC, rowD, rowH, radians, dstOff, len);
    }

    /**
     * Converts readings into the strain state εx, εy, γxy (m/m). Allocation-free; bit for bit
     * the state of {@link #reduce}.
     *
     * @return the number of samples with a NaN output
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toStrainState(double[][] readings, int srcOff, double[] exx, double[] eyy,
            double[] gxy, int dstOff, int len) {
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, exx, "exx", eyy, "eyy", gxy, "gxy");
        return RosetteKernels.state(readings, srcOff, rowC, rowD, rowH, exx, eyy, gxy, dstOff,
                len);
    }

    /**
     * Converts readings into the in-plane principal stresses σ1, σ2 (Pa), in plane stress from
     * the principal strains: σ1 = E/(1 − ν²)·(ε1 + ν·ε2), σ2 = E/(1 − ν²)·(ε2 + ν·ε1).
     * Allocation-free; bit for bit {@link RosetteStresses#principal()}.
     *
     * @return the number of samples with a NaN output
     * @throws IllegalStateException     if the rosette has no material
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toPrincipalStresses(double[][] readings, int srcOff, double[] s1, double[] s2,
            int dstOff, int len) {
        requireMaterial();
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, s1, "s1", s2, "s2", null, null);
        return RosetteKernels.stresses(RosetteKernels.Result.STRESSES, readings, srcOff, rowC,
                rowD, rowH, stiffness, poisson, s1, s2, dstOff, len);
    }

    /**
     * Converts readings into the von Mises equivalent stress (Pa) in plane stress,
     * σvm = √(σ1² − σ1σ2 + σ2²): two square roots per sample in one loop (use
     * {@link #toPrincipalStrainsAndVonMises} when the strains are wanted too). Allocation-free;
     * bit for bit {@link RosetteStresses#vonMises()}.
     *
     * @return the number of NaN outputs
     * @throws IllegalStateException     if the rosette has no material
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toVonMises(double[][] readings, int srcOff, double[] vonMises, int dstOff,
            int len) {
        requireMaterial();
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, vonMises, "vonMises", null, null, null, null);
        return RosetteKernels.stresses(RosetteKernels.Result.VON_MISES, readings, srcOff, rowC,
                rowD, rowH, stiffness, poisson, vonMises, null, dstOff, len);
    }

    /**
     * Converts readings into the Tresca equivalent stress (Pa) in plane stress, with σ3 = 0:
     * max(σ1 − σ2, |σ1|, |σ2|). Allocation-free; bit for bit {@link RosetteStresses#tresca()}.
     *
     * @return the number of NaN outputs
     * @throws IllegalStateException     if the rosette has no material
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     * @throws IllegalArgumentException  as {@link #toPrincipalStrains}
     */
    public int toTresca(double[][] readings, int srcOff, double[] tresca, int dstOff, int len) {
        requireMaterial();
        Blocks.block(readings, rowC.length, srcOff, dstOff, len, tresca, "tresca", null, null, null, null);
        return RosetteKernels.stresses(RosetteKernels.Result.TRESCA, readings, srcOff, rowC,
                rowD, rowH, stiffness, poisson, tresca, null, dstOff, len);
    }

    // ---------------------------------------------------------------- object

    /**
     * {@code Rosette[rectangular, gauges at 0.0°, 45.0°, 90.0°]}, with the corrections and the
     * material when set.
     */
    @Override
    public String toString() {
        StringBuilder text = new StringBuilder("Rosette[").append(kind).append(", gauges at ")
                .append(anglesText(effectiveAngles()));
        if (measured != null) {
            text.append(" (measured)");
        }
        if (clockwise) {
            text.append(", numbered clockwise");
        }
        if (grids != null) {
            text.append(", transverse sensitivity corrected");
        }
        if (material != null) {
            text.append(", ").append(material);
        }
        return text.append(']').toString();
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Rosette)) {
            return false;
        }
        Rosette other = (Rosette) o;
        return kind.equals(other.kind) && Arrays.equals(effectiveAngles(), other.effectiveAngles())
                && Arrays.equals(rowC, other.rowC) && Arrays.equals(rowD, other.rowD)
                && Arrays.equals(rowH, other.rowH) && Objects.equals(material, other.material);
    }

    @Override
    public int hashCode() {
        return Objects.hash(kind, Arrays.hashCode(rowC), Arrays.hashCode(rowD),
                Arrays.hashCode(rowH), material);
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(kind, nominal.clone(), measured == null ? null : measured.clone(), clockwise,
                reference, grids == null ? null : grids.clone(), material, tee);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("Rosette");
    }

    /**
     * The serial form of a Rosette: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final String kind;
        private final double[] nominal;
        private final double[] measured;
        private final boolean clockwise;
        private final double reference;
        private final StrainGauge[] grids;
        private final IsotropicMaterial material;
        private final boolean tee;

        Serial(String kind, double[] nominal, double[] measured, boolean clockwise, double reference, StrainGauge[] grids, IsotropicMaterial material, boolean tee) {
            this.kind = kind;
            this.nominal = nominal;
            this.measured = measured;
            this.clockwise = clockwise;
            this.reference = reference;
            this.grids = grids;
            this.material = material;
            this.tee = tee;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("Rosette", () -> {
                Objects.requireNonNull(kind, "kind");
                int n = nominal.length;
                if (n < 2 || (measured != null && measured.length != n)
                        || (grids != null && grids.length != n)) {
                    throw new IllegalArgumentException("nominal, measured and grids must hold one"
                            + " angle or gauge per gauge, at least 2: " + n);
                }
                for (int j = 0; j < n; j++) {
                    Checks.finite(nominal[j], "nominal[" + j + "]");
                    if (measured != null) {
                        Checks.finite(measured[j], "measured[" + j + "]");
                    }
                    if (grids != null) {
                        Objects.requireNonNull(grids[j], "grids[" + j + "]");
                    }
                }
                Checks.finite(reference, "reference");
                return new Rosette(kind, nominal.clone(), measured == null ? null
                        : measured.clone(), clockwise, reference,
                        grids == null ? null : grids.clone(), material, tee);
            });
        }
    }
}
