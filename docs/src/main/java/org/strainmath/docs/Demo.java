package org.strainmath.docs;

import java.io.PrintStream;
import java.util.Locale;

import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;

/**
 * The demo of the README, on an invented scenario: the hanger rods of a small footbridge are
 * checked during a proof load. Each rod carries a full bridge of four 350 Ω gauges (two axial,
 * two transverse Poisson gauges; steel, ν = 0.30), and one gusset plate carries a single
 * 120 Ω quarter-bridge gauge. A logger reads each bridge in mV/V at 5 V excitation.
 *
 * <p>All numbers here are made up for the demo; they come from no real structure.
 */
public final class Demo {

    private Demo() {
    }

    public static void main(String[] args) {
        run(System.out);
    }

    /** Prints the demo report to {@code out}. */
    public static void run(PrintStream out) {
        StrainGauge rodGauge = StrainGauge.ofOhms(350, 2.10);
        StrainGauge gussetGauge = StrainGauge.ofOhms(120, 2.05);
        Bridge rod = Bridge.fullAxialPoisson(rodGauge, 0.30);
        Bridge gusset = Bridge.quarter(gussetGauge);

        out.println("strainmath demo: proof load of a footbridge hanger (invented scenario)");
        out.println();
        out.println("rod bridge:    " + rod);
        out.println("gusset bridge: " + gusset);
        out.println();

        // Before the load: the unstrained bridges are not perfectly balanced.
        VoltageRatio rodZero = VoltageRatio.ofMillivoltsPerVolt(0.0412);
        VoltageRatio gussetZero = VoltageRatio.ofMillivoltsPerVolt(-0.3150);
        Bridge rodZeroed = rod.zeroedByOffset(rodZero);
        Bridge gussetZeroed = gusset.zeroedInArm(gussetZero, 1);
        out.println("zero readings: rod " + rodZero + ", gusset " + gussetZero
                + " (gusset gauge at " + gussetZeroed.arm(1).nominalResistance() + ")");
        out.println();

        // Load steps as the logger records them, in mV/V; it marks a dropped sample as NaN.
        double[] rodReadings = {0.0412, 0.3125, 0.5830, 0.8521, Double.NaN, 1.3880};
        double[] gussetReadings = {-0.3150, 0.2081, 0.7315, 1.2552, 1.7791, 2.3033};
        double[] rodStrain = new double[rodReadings.length];
        double[] gussetStrain = new double[gussetReadings.length];
        for (int i = 0; i < rodReadings.length; i++) {
            rodStrain[i] = rodReadings[i] / 1e3;          // mV/V to V/V
            gussetStrain[i] = gussetReadings[i] / 1e3;
        }
        int rodBad = rodZeroed.toStrain(rodStrain, 0, rodStrain, 0, rodStrain.length);
        int gussetBad = gussetZeroed.toStrain(gussetStrain, 0, gussetStrain, 0, gussetStrain.length);

        out.println("step  rod mV/V  rod µε    gusset mV/V  gusset µε  gusset linearised µε");
        for (int i = 0; i < rodReadings.length; i++) {
            double linear = gussetZeroed
                    .linearisedStrainAt(VoltageRatio.ofMillivoltsPerVolt(gussetReadings[i]))
                    .toMicrostrain();
            out.println(String.format(Locale.ROOT, "%4d  %8.4f  %8s  %11.4f  %9s  %20s", i,
                    rodReadings[i], micro(rodStrain[i]), gussetReadings[i],
                    micro(gussetStrain[i]), micro(linear / 1e6)));
        }
        out.println("samples with no physical strain: rod " + rodBad + ", gusset " + gussetBad);
        out.println();

        // The rods are in uniaxial stress: the axial strain with its Poisson contraction gives
        // the rod stress through Hooke's law. Steel constants of the demo, invented.
        IsotropicMaterial steel = IsotropicMaterial.of(Stress.ofGigapascals(200), 0.30);
        int last = rodStrain.length - 1;
        PlaneStrain rodState = new PlaneStrain(rodStrain[last], -0.30 * rodStrain[last], 0);
        out.println("rod stress at step " + last + ": "
                + steel.stressInPlaneStress(rodState).normalX() + " (demo steel, invented: E = "
                + String.format(Locale.ROOT, "%.0f GPa", steel.youngsModulus().toGigapascals())
                + ", ν = " + steel.poissonsRatio() + ")");
        out.println();

        Strain peak = Strain.ofMicrostrain(2000);
        out.println("quarter-bridge nonlinearity at " + peak + ": "
                + String.format(Locale.ROOT, "%.3f %%", 100 * gusset.nonlinearityError(peak)));
        out.println("rod output at " + peak + " and 5 V: "
                + rod.outputVoltage(peak, Voltage.ofVolts(5)));
        out.println();
        out.println("Results are only as good as the installation, the gauge data and the"
                + " calibration;");
        out.println("they are no substitute for an assessment by a qualified engineer.");
    }

    /** A strain in µε to 0.1 µε; rounding residues below 0.05 µε print as 0.0, not -0.0. */
    private static String micro(double strain) {
        double micro = strain * 1e6;
        return Double.isNaN(micro) ? "NaN"
                : String.format(Locale.ROOT, "%.1f", Math.abs(micro) < 0.05 ? 0.0 : micro);
    }
}
