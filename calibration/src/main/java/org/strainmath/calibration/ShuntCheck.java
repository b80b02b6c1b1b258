package org.strainmath.calibration;

import java.util.Objects;

import org.strainmath.bridge.StrainChannel;
import org.strainmath.internal.Format;
import org.strainmath.quantity.Strain;

/**
 * A shunt check of a channel: the strain the channel read with a known shunt in place, against
 * the strain the shunt should give through that channel (its equivalent strain times the
 * channel's transverse factor and present span correction). The ratio is a span correction,
 * and {@link #correctedChannel()} is the channel with it.
 *
 * <pre>
 *   span factor = expected / measured        span error = measured / expected − 1
 * </pre>
 * A shunt check verifies the converter, the amplifier and the excitation, not the gauge
 * factor or the installation: it tells nothing about how well the gauge follows the part.
 *
 * <p>Immutable and thread-safe.
 */
public final class ShuntCheck {

    private final StrainChannel channel;
    private final ShuntCalibration shunt;
    private final double expected;
    private final double measured;

    private ShuntCheck(StrainChannel channel, ShuntCalibration shunt, double measured) {
        this.channel = channel;
        this.shunt = shunt;
        this.expected = shunt.equivalentStrain().value() * channel.transverseFactor()
                * channel.spanCorrection();
        this.measured = measured;
    }

    /**
     * The check of {@code channel} with {@code shunt} (on the channel's bridge), where the
     * channel read {@code measured} with the shunt in place (after the zero without it).
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code measured} is zero or of the other sign than
     *                                  the expected strain
     */
    public static ShuntCheck of(StrainChannel channel, ShuntCalibration shunt, Strain measured) {
        Objects.requireNonNull(channel, "channel");
        Objects.requireNonNull(shunt, "shunt");
        Objects.requireNonNull(measured, "measured");
        ShuntCheck check = new ShuntCheck(channel, shunt, measured.value());
        if (!(check.measured * check.expected > 0)) {
            throw new IllegalArgumentException("measured must have the sign of the expected "
                    + Strain.of(check.expected) + ": " + measured);
        }
        return check;
    }

    /** The strain the channel should read with the shunt. */
    public Strain expected() {
        return Strain.of(expected);
    }

    /** The strain the channel read. */
    public Strain measured() {
        return Strain.of(measured);
    }

    /** Expected over measured: the factor that corrects the channel's span. */
    public double spanFactor() {
        return expected / measured;
    }

    /** The span error of the channel before the correction, measured/expected − 1, in %. */
    public double spanErrorPercent() {
        return (measured / expected - 1) * 100;
    }

    /** The channel with its span corrected by {@link #spanFactor()} (a new channel). */
    public StrainChannel correctedChannel() {
        return channel.withSpanCorrection(channel.spanCorrection() * spanFactor());
    }

    /** The shunt calibration the check used. */
    public ShuntCalibration shunt() {
        return shunt;
    }

    /** {@code ShuntCheck[expected -1000.0 µε, measured -994.0 µε, span error -0.6 %, factor 1.00604]}. */
    @Override
    public String toString() {
        return "ShuntCheck[expected " + expected() + ", measured " + measured() + ", span error "
                + Format.number(spanErrorPercent()) + " %, factor " + Format.number(spanFactor())
                + "]";
    }
}
