package org.strainmath.docs.streams;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.strainmath.bridge.StrainChannel;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Stress;

/**
 * Invented frame blocks of the footbridge hangers of the examples ({@link
 * GatewaySetup#footbridgeHanger()}), made from a known, invented stress through the library's
 * forward models: the rod carries 60 MPa of dead load, people crossing (pulses of 4 to 20 MPa over
 * ten seconds) and a vibration at 2.1 Hz; the gusset sees a stress along 30° from its rosette's
 * gauge a of half the rod's, with a vibration of its own. Twenty frames a second; a code at the
 * converter's rail (no strain) now and then. Same seed, same blocks.
 */
public final class InventedFleet {

    private static final int RAIL = (1 << 23) - 1;

    private InventedFleet() {
    }

    /**
     * {@code count} blocks of {@code frames} frames of the gateway seeded {@code seed}, the
     * first at {@code startMillis}.
     */
    public static List<FrameBlock> blocks(long seed, long startMillis, int count, int frames) {
        SplittableRandom random = new SplittableRandom(seed);
        StrainChannel[] channels = GatewaySetup.footbridgeChannels();
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.3);
        double[] perCode = new double[channels.length];
        for (int c = 0; c < channels.length; c++) {
            perCode[c] = channels[c].input().ratioPerCode().toVoltsPerVolt();
        }
        int rate = 20;
        List<FrameBlock> blocks = new ArrayList<>();
        double pulse = 0;
        int left = 0;
        for (int b = 0; b < count; b++) {
            int[] codes = new int[frames * channels.length];
            for (int f = 0; f < frames; f++) {
                long n = (long) b * frames + f;
                if (left == 0 && random.nextInt(30 * rate) == 0) {
                    pulse = (4 + 16 * random.nextDouble()) * 1e6;
                    left = 10 * rate;
                }
                double crossing = left > 0 ? pulse * Math.sin(Math.PI * left / (10.0 * rate)) : 0;
                left = Math.max(0, left - 1);
                double vibration = 2e6 * Math.sin(2 * Math.PI * 2.1 * n / rate);
                double rod = 60e6 + crossing + vibration + 0.2e6 * random.nextGaussian();
                double along = 0.5 * rod + 1e6 * Math.sin(2 * Math.PI * 0.7 * n / rate);
                PlaneStrain gusset = steel.strainInPlaneStress(
                        new PlaneStress(along, 0, 0).rotatedBy(Angle.ofDegrees(-30)));
                double[] strain = {rod / 200e9, gusset.normalStrainAt(Angle.ZERO).value(),
                    gusset.normalStrainAt(Angle.ofDegrees(45)).value(),
                    gusset.normalStrainAt(Angle.ofDegrees(90)).value()};
                for (int c = 0; c < channels.length; c++) {
                    codes[f * channels.length + c] = random.nextInt(5000) == 0 ? RAIL
                            : (int) Math.round(channels[c].bridge().toRatio(strain[c]) / perCode[c]
                                    + 3 * random.nextGaussian());
                }
            }
            blocks.add(new FrameBlock(b, startMillis + (long) b * frames * 1000 / rate, rate,
                    channels.length, codes));
        }
        return blocks;
    }
}
