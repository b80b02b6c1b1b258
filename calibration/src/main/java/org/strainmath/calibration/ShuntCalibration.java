package org.strainmath.calibration;

import java.util.Objects;

import org.strainmath.bridge.Bridge;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.VoltageRatio;

/**
 * Shunt calibration: a known resistor across one arm of a bridge changes that arm's
 * resistance, and the bridge output, exactly as a known strain would. The equivalent strain is
 * found through the bridge's own exact equation (with its leads, excitation leads and zeroing),
 * not through a first-order formula.
 *
 * <pre>
 *   Bridge quarter = Bridge.quarter(StrainGauge.ofOhms(120, 2.0));
 *   ShuntCalibration.across(quarter, 1, Resistance.ofOhms(59_880)).equivalentStrain();  // -1000.0 µε
 *   ShuntCalibration.resistorFor(quarter, 1, Strain.ofMicrostrain(-1000), ShuntPosition.AT_GAUGE);
 * </pre>
 *
 * <p>For a quarter bridge with the shunt across the gauge the result is the closed form
 * (derived from the parallel resistance R·Rs/(R + Rs) = R·(1 + K·ε); common practice)
 * <pre>
 *   ε = −R / (K·(R + Rs))          Rs = −R·(1 + K·ε) / (K·ε)
 * </pre>
 * A shunt across an active gauge in tension position reads as compression; across the adjacent
 * arm, as tension. With {@link ShuntPosition#AT_INSTRUMENT} the shunt is across the arm and its
 * lead together, and the equivalent strain follows the lead exactly.
 *
 * <p><i>Accuracy</i>: the shunted arm is held as a double, so a shunt Rs much larger than the
 * arm's R gives the equivalent strain to about 1e-16·Rs/R relative (1e-11 for Rs = 10⁵·R).
 *
 * <p>Immutable and thread-safe.
 */
public final class ShuntCalibration {

    private final Bridge bridge;
    private final int arm;
    private final Resistance shunt;
    private final ShuntPosition position;
    private final double reading;
    private final double strain;

    private ShuntCalibration(Bridge bridge, int arm, Resistance shunt, ShuntPosition position) {
        this.bridge = bridge;
        this.arm = arm;
        this.shunt = shunt;
        this.position = position;
        this.reading = shuntedReading(bridge, arm, shunt.toOhms(), position);
        this.strain = bridge.toStrain(reading);
        if (Double.isNaN(strain)) {
            throw new IllegalArgumentException("shunt " + shunt + " across arm " + arm
                    + " gives a reading with no physical strain: "
                    + VoltageRatio.ofVoltsPerVolt(reading));
        }
    }

    private static double shuntedReading(Bridge bridge, int arm, double shuntOhms,
            ShuntPosition position) {
        double r = bridge.arm(arm).nominalResistance().toOhms();
        if (position == ShuntPosition.AT_GAUGE) {
            double parallel = r * shuntOhms / (r + shuntOhms);
            return bridge.withArmResistance(arm, Resistance.ofOhms(parallel)).zeroOutput()
                    .toVoltsPerVolt();
        }
        double lead = bridge.leadInArm(arm).toOhms();
        double total = (r + lead) * shuntOhms / (r + lead + shuntOhms);
        return bridge.withLeadInArm(arm, Resistance.ZERO)
                .withArmResistance(arm, Resistance.ofOhms(total)).zeroOutput().toVoltsPerVolt();
    }

    /**
     * The shunt {@code shunt} across arm {@code arm} (1 to 4) of {@code bridge}, at the gauge.
     *
     * @throws NullPointerException      if an argument is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  if the shunt is not positive, or the shunted bridge has
     *                                   no physical strain
     */
    public static ShuntCalibration across(Bridge bridge, int arm, Resistance shunt) {
        return across(bridge, arm, shunt, ShuntPosition.AT_GAUGE);
    }

    /**
     * The shunt {@code shunt} across arm {@code arm} of {@code bridge}, at {@code position}.
     *
     * @throws NullPointerException      if an argument is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  as {@link #across(Bridge, int, Resistance)}
     */
    public static ShuntCalibration across(Bridge bridge, int arm, Resistance shunt,
            ShuntPosition position) {
        Objects.requireNonNull(bridge, "bridge");
        Objects.checkIndex(arm - 1, 4);
        Objects.requireNonNull(shunt, "shunt");
        Objects.requireNonNull(position, "position");
        if (!(shunt.toOhms() > 0) || Double.isInfinite(shunt.toOhms())) {
            throw new IllegalArgumentException("shunt must be > 0 and finite: " + shunt);
        }
        return new ShuntCalibration(bridge, arm, shunt, position);
    }

    /**
     * The shunt resistor that makes arm {@code arm} of {@code bridge} read {@code target}:
     * the root of the exact equivalent strain, found by bisection in log(Rs) to the last bits
     * (the equivalent strain falls monotonically in magnitude as Rs grows).
     *
     * @throws NullPointerException      if an argument is null
     * @throws IndexOutOfBoundsException if {@code arm} is not 1 to 4
     * @throws IllegalArgumentException  if {@code target} is zero, of the sign a shunt across
     *                                   that arm cannot give, or beyond what any shunt gives
     */
    public static Resistance resistorFor(Bridge bridge, int arm, Strain target,
            ShuntPosition position) {
        Objects.requireNonNull(bridge, "bridge");
        Objects.checkIndex(arm - 1, 4);
        Objects.requireNonNull(target, "target");
        Objects.requireNonNull(position, "position");
        double goal = target.value();
        double r = bridge.arm(arm).nominalResistance().toOhms();
        double base = bridge.toStrain(bridge.zeroOutput().toVoltsPerVolt());
        double probe = equivalent(bridge, arm, r * 1e3, position) - base;
        if (goal == 0 || Math.signum(probe) != Math.signum(goal)) {
            throw new IllegalArgumentException("target must have the sign a shunt across arm "
                    + arm + " gives (" + (probe < 0 ? "compressive" : "tensile") + "): " + target);
        }
        double low = Math.log(r * 1e-6);    // large |ε|
        double high = Math.log(r * 1e15);   // ε near zero
        double atLow = equivalent(bridge, arm, Math.exp(low), position);
        if (!(Math.abs(atLow) >= Math.abs(goal))) {
            throw new IllegalArgumentException("target is beyond what a shunt across arm " + arm
                    + " can give: " + target);
        }
        for (int i = 0; i < 200 && high - low > 1e-15 * Math.abs(high); i++) {
            double mid = 0.5 * (low + high);
            if (Math.abs(equivalent(bridge, arm, Math.exp(mid), position)) > Math.abs(goal)) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return Resistance.ofOhms(Math.exp(0.5 * (low + high)));
    }

    private static double equivalent(Bridge bridge, int arm, double shuntOhms,
            ShuntPosition position) {
        double strain = bridge.toStrain(shuntedReading(bridge, arm, shuntOhms, position));
        // No physical strain: a shunt that small is "too much", which is what bisection needs.
        return Double.isNaN(strain) ? Double.POSITIVE_INFINITY : strain;
    }

    /**
     * The resistor of {@code series} nearest to the one {@link #resistorFor} gives, as the
     * calibration it really makes: its equivalent strain is the one to use.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException as {@link #resistorFor}
     */
    public static ShuntCalibration nearestIn(ResistorSeries series, Bridge bridge, int arm,
            Strain target, ShuntPosition position) {
        Objects.requireNonNull(series, "series");
        Resistance exact = resistorFor(bridge, arm, target, position);
        return across(bridge, arm, series.nearest(exact), position);
    }

    /** The equivalent strain of the shunt: the strain that gives the shunted reading. */
    public Strain equivalentStrain() {
        return Strain.of(strain);
    }

    /** The bridge reading with the shunt in place (unstrained bridge). */
    public VoltageRatio shuntedReading() {
        return VoltageRatio.ofVoltsPerVolt(reading);
    }

    /** The reading with the shunt minus the reading without it. */
    public VoltageRatio outputChange() {
        return VoltageRatio.ofVoltsPerVolt(reading - bridge.zeroOutput().toVoltsPerVolt());
    }

    /** The shunt resistor. */
    public Resistance shunt() {
        return shunt;
    }

    /** The shunted arm, 1 to 4. */
    public int arm() {
        return arm;
    }

    /** Where the shunt is connected. */
    public ShuntPosition position() {
        return position;
    }

    /** The bridge. */
    public Bridge bridge() {
        return bridge;
    }

    /** {@code ShuntCalibration[59.88 kΩ across arm 1 at the gauge: -1000.0 µε, -0.500501 mV/V]}. */
    @Override
    public String toString() {
        return "ShuntCalibration[" + shunt + " across arm " + arm
                + (position == ShuntPosition.AT_GAUGE ? " at the gauge" : " at the instrument")
                + ": " + equivalentStrain() + ", " + Format.withUnit(reading * 1e3, "mV/V") + "]";
    }
}
