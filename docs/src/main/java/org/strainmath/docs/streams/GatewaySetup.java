package org.strainmath.docs.streams;

import java.io.Serializable;
import java.util.Objects;

import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.ChannelFrames;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.fatigue.SnCurve;
import org.strainmath.fatigue.StressLife;
import org.strainmath.history.Bins;
import org.strainmath.history.Rainflow;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Stress;
import org.strainmath.rosette.Rosette;

/**
 * What one gateway measures and how its histories are counted: the channels of its frames, the
 * channel of a rod in tension (its stress is E·ε) and the three grids of a rosette (its history
 * is the signed principal stress of larger magnitude), the rainflow settings, the range bins,
 * the fatigue model and the window of the reports. Built from the library's configuration
 * objects, all serializable, so that a setup can come from a configuration topic or a file as
 * bytes (a record: reading it runs the checks below).
 *
 * @param frames          the channels, in the order of the codes in a frame
 * @param rodChannel      the channel of the rod
 * @param rodModulus      the rod's Young's modulus, Pa
 * @param rosetteChannels the channels of the rosette's grids a, b, c
 * @param rosette         the rosette, with its material
 * @param rainflow        the count of both histories (its gate in Pa)
 * @param ranges          the stress-range bins of the window reports, Pa
 * @param life            the fatigue model of the damage sums
 * @param windowMillis    the length of a report window, ms of event time
 */
public record GatewaySetup(ChannelFrames frames, int rodChannel, double rodModulus,
        int[] rosetteChannels, Rosette rosette, Rainflow rainflow, Bins ranges, StressLife life,
        long windowMillis) implements Serializable {

    /** The name of the rod's history in keys and reports. */
    public static final String ROD = "rod";
    /** The name of the rosette's history in keys and reports. */
    public static final String GUSSET = "gusset";

    /**
     * Checks the setup.
     *
     * @throws NullPointerException     if a part is null
     * @throws IllegalArgumentException if a channel number is outside the frames, or the window
     *                                  is not positive
     */
    public GatewaySetup {
        Objects.requireNonNull(frames, "frames");
        Objects.requireNonNull(rosette, "rosette");
        Objects.requireNonNull(rainflow, "rainflow");
        Objects.requireNonNull(ranges, "ranges");
        Objects.requireNonNull(life, "life");
        rosetteChannels = Objects.requireNonNull(rosetteChannels, "rosetteChannels").clone();
        int n = frames.channelsPerFrame();
        if (rodChannel < 0 || rodChannel >= n || rosetteChannels.length != 3) {
            throw new IllegalArgumentException("rodChannel and rosetteChannels must name channels"
                    + " of the " + n + " in a frame: " + rodChannel + ", "
                    + rosetteChannels.length + " grids");
        }
        for (int c : rosetteChannels) {
            if (c < 0 || c >= n) {
                throw new IllegalArgumentException("rosetteChannels must lie in [0, " + n + "): "
                        + c);
            }
        }
        if (!(rodModulus > 0) || windowMillis < 1 || rosette.material().isEmpty()) {
            throw new IllegalArgumentException("rodModulus and windowMillis must be positive and"
                    + " the rosette must have a material: " + rodModulus + ", " + windowMillis);
        }
    }

    /** The rosette's channels, a copy. */
    @Override
    public int[] rosetteChannels() {
        return rosetteChannels.clone();
    }

    /** The channels of {@link #footbridgeHanger()}: the rod's, then the rosette's three grids. */
    static StrainChannel[] footbridgeChannels() {
        AdcInput adc = AdcInput.ratiometric(24, 128);
        StrainChannel rod = StrainChannel.of(
                Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.1), 0.3), adc);
        StrainChannel grid = StrainChannel.of(Bridge.quarter(StrainGauge.ofOhms(350, 2.08))
                .withThreeWireLeads(Resistance.ofOhms(1.2)), adc);
        return new StrainChannel[] {rod, grid, grid, grid};
    }

    /**
     * The invented setup of the examples: the footbridge hanger of the demo, with the rod's
     * full bridge (axial and Poisson gauges, 350 Ω, K = 2.1) on channel 0 and the gusset's
     * rectangular rosette of quarter bridges (350 Ω, K = 2.08, three-wire leads of 1.2 Ω) on
     * channels 1 to 3, all read by 24-bit converters at a gain of 128; steel of E = 200 GPa,
     * ν = 0.3; a gate of 1 MPa; 20 bins of 5 MPa; a demo S–N curve (invented: 50 MPa at 2·10⁶
     * cycles, m = 3, then m = 5 from 5·10⁶, no damage below its range at 10⁸); windows of ten
     * minutes.
     */
    public static GatewaySetup footbridgeHanger() {
        StrainChannel[] channels = footbridgeChannels();
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3);
        SnCurve curve = SnCurve.ofRange(Stress.ofMegapascals(50), 2e6, 3).withKnee(5e6, 5)
                .withCutOffAt(1e8);
        return new GatewaySetup(ChannelFrames.of(channels), 0, 200e9,
                new int[] {1, 2, 3}, Rosette.rectangular().withMaterial(steel),
                Rainflow.astm().withGate(1e6), Bins.uniform(0, 100e6, 20), StressLife.of(curve),
                600_000);
    }
}
