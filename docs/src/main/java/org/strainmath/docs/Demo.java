package org.strainmath.docs;

import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.calibration.CalibrationFit;
import org.strainmath.calibration.FitResult;
import org.strainmath.fatigue.DamageSum;
import org.strainmath.fatigue.SnCurve;
import org.strainmath.fatigue.StressLife;
import org.strainmath.history.Bins;
import org.strainmath.history.CycleConsumer;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RainflowCounter;
import org.strainmath.history.RangeHistogram;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.PlaneStrain;
import org.strainmath.material.PlaneStress;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;
import org.strainmath.quantity.Temperature;
import org.strainmath.quantity.Voltage;
import org.strainmath.quantity.VoltageRatio;
import org.strainmath.rosette.Rosette;
import org.strainmath.rosette.RosetteStresses;
import org.strainmath.uncertainty.InputQuantity;
import org.strainmath.uncertainty.UncertaintyResult;

/**
 * The demo of the README, on an invented scenario: the hanger rods of a small footbridge are
 * checked during a proof load. Each rod carries a full bridge of four 350 Ω gauges (two axial,
 * two transverse Poisson gauges; steel, ν = 0.30), and one gusset plate carries a single
 * 120 Ω quarter-bridge gauge. A logger reads each bridge in mV/V at 5 V excitation. Near a
 * welded gusset a rectangular rosette of three quarter bridges on three-wire leads is read as
 * 24-bit converter codes beside a temperature channel, and the hanger's tension link (a full
 * bridge transducer) was calibrated on a reference rig before the test. After the proof load,
 * a day of the rod's stress is counted as a gateway would count it, into a range histogram and
 * a fatigue damage sum on a demo S–N curve.
 *
 * <p>All numbers here are made up for the demo; they come from no real structure. The rosette
 * codes, the temperatures and the rig readings are generated from a known truth (also made up)
 * through the library's forward models plus seeded noise, so the report can show how close the
 * reduction comes. The report ends with two figures of its own, drawn with XChart into
 * {@code target/demo-figures} of the working folder.
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
        XYChart mohr = rosette(out, steel);
        out.println();
        XYChart residuals = link(out);
        out.println();
        day(out, rodZeroed, steel);
        out.println();
        Path figures = Path.of("target", "demo-figures");
        save(mohr, figures.resolve("gusset-mohr-circle"));
        save(residuals, figures.resolve("link-residuals"));
        out.println("figures: gusset-mohr-circle.svg, link-residuals.svg in " + figures
                + " (the working folder's)");
        out.println();
        out.println("Results are only as good as the installation, the gauge data and the"
                + " calibration. They do not");
        out.println("replace an assessment, under the codes that apply where the structure"
                + " stands, by a qualified");
        out.println("(where required, licensed) engineer. Excitation and wiring follow the"
                + " instrument's and the");
        out.println("site's electrical rules.");
    }

    /**
     * The gusset rosette: codes generated from a known plane stress at 27 °C (channels zeroed at
     * 15 °C), 256 samples per grid with 300 codes (about 0.5 µε) RMS of noise, reduced to
     * principal stresses and von Mises, with its ratio to a demo allowable.
     */
    private static XYChart rosette(PrintStream out, IsotropicMaterial steel) {
        PlaneStress truth = new PlaneStress(92e6, -21e6, 38e6);          // invented, Pa
        PlaneStrain truthStrain = steel.strainInPlaneStress(truth);
        Bridge grid = Bridge.quarter(StrainGauge.ofOhms(350, 2.08))
                .withThreeWireLeads(Resistance.ofOhms(1.2));
        AdcInput adc = AdcInput.ratiometric(24, 128);
        ThermalOutput curve = ThermalOutput.ofCelsius(-24.0, 2.2, -0.055, 2.0e-4);   // invented
        Temperature zero = Temperature.ofCelsius(15);
        StrainChannel channel = StrainChannel.of(grid, adc).withThermalOutput(curve, zero);
        SplittableRandom noise = new SplittableRandom(2026);
        int n = 256;
        double[] celsius = new double[n];
        for (int i = 0; i < n; i++) {
            celsius[i] = 27.0 + 0.05 * gaussian(noise);      // the temperature channel, °C
        }
        double perCode = adc.ratioPerCode().toVoltsPerVolt();
        double[] mean = new double[3];
        int bad = 0;
        for (int g = 0; g < 3; g++) {
            double e = truthStrain.rotatedBy(Angle.ofDegrees(45 * g)).exx();
            int[] codes = new int[n];
            for (int i = 0; i < n; i++) {
                double apparent = curve.apparentStrainAt(Temperature.ofCelsius(celsius[i]), 2.08)
                        .value() - curve.apparentStrainAt(zero, 2.08).value();
                codes[i] = (int) Math.round(grid.toRatio(e + apparent) / perCode
                        + 300 * gaussian(noise));
            }
            double[] strain = new double[n];
            bad += channel.toStrain(codes, 0, celsius, 0, strain, 0, n);
            for (double x : strain) {
                mean[g] += x / n;
            }
        }
        RosetteStresses measured = Rosette.rectangular().withMaterial(steel)
                .stressesOf(Strain.of(mean[0]), Strain.of(mean[1]), Strain.of(mean[2]));
        Stress allowable = Stress.ofMegapascals(160);                      // demo allowable
        double truthVonMises = Math.sqrt(truth.sxx() * truth.sxx() - truth.sxx() * truth.syy()
                + truth.syy() * truth.syy() + 3 * truth.txy() * truth.txy());
        out.println("gusset rosette (0/45/90°, 3 × 256 codes at 27 °C, zeroed at 15 °C, "
                + bad + " samples without strain):");
        out.println("  grid strains:   " + Strain.of(mean[0]) + ", " + Strain.of(mean[1]) + ", "
                + Strain.of(mean[2]) + " (thermal output removed)");
        out.println("  principal:      " + measured.principal());
        out.println("  von Mises:      " + measured.vonMises() + " (truth of the demo: "
                + Stress.ofPascals(truthVonMises) + ")");
        out.println("  ratio to the demo allowable " + allowable + ": "
                + String.format(Locale.ROOT, "%.2f", measured.vonMisesRatio(allowable))
                + " (a ratio, not a verdict)");
        double c = measured.mohrCircle().centre().toMegapascals();
        double r = measured.mohrCircle().radius().toMegapascals();
        XYChart chart = new XYChartBuilder().width(560).height(560)
                .title("Gusset rosette: Mohr's circle of stress (demo)")
                .xAxisTitle("normal stress (MPa)").yAxisTitle("shear stress (MPa)").build();
        chart.getStyler().setXAxisMin(c - 1.1 * r).setXAxisMax(c + 1.1 * r)
                .setYAxisMin(-1.1 * r).setYAxisMax(1.1 * r);
        double[][] circle = Figures.circle(c, r);
        chart.addSeries("measured", circle[0], circle[1]).setMarker(SeriesMarkers.NONE);
        chart.addSeries("truth of the demo, x and y faces",
                new double[] {truth.sxx() / 1e6, truth.syy() / 1e6},
                new double[] {truth.txy() / 1e6, -truth.txy() / 1e6}).setMarker(SeriesMarkers.CIRCLE);
        return chart;
    }

    /**
     * The tension link: calibrated on a reference rig (six loads, readings from an invented
     * curve plus noise), then read 20 times at the proof load; the load with its expanded
     * uncertainty (GUM, 95 %).
     */
    private static XYChart link(PrintStream out) {
        SplittableRandom noise = new SplittableRandom(74);
        double[] loads = {0, 10, 20, 30, 40, 50};                           // kN
        double[] readings = new double[loads.length];                       // mV/V
        for (int i = 0; i < loads.length; i++) {
            readings[i] = linkReading(loads[i]) + 0.0004 * gaussian(noise);
        }
        FitResult fit = CalibrationFit.of(loads, readings).withDegree(2).fit();
        double[] proof = new double[20];
        for (int i = 0; i < proof.length; i++) {
            proof[i] = linkReading(40.0) + 0.0006 * gaussian(noise);
        }
        UncertaintyResult load = fit.loadBudget(InputQuantity.typeA("link reading", proof))
                .evaluate(0.95);
        out.println("tension link (calibrated 0 to 50 kN on the rig, quadratic, σ = "
                + String.format(Locale.ROOT, "%.2g", fit.residualStandardDeviation())
                + " mV/V):");
        out.println(String.format(Locale.ROOT,
                "  force at the proof load: %s kN ± %s kN (k = %.2f, 95 %%; truth of the demo: 40 kN)",
                load.estimateText(), load.expandedUncertaintyText(),
                load.coverageFactor()));
        XYChart chart = new XYChartBuilder().width(640).height(400)
                .title("Tension link: residuals of the rig calibration (demo)")
                .xAxisTitle("load (kN)").yAxisTitle("residual (mV/V)").build();
        chart.addSeries("quadratic fit", loads, fit.residuals()).setMarker(SeriesMarkers.CIRCLE);
        return chart;
    }

    private static void save(XYChart chart, Path base) {
        System.setProperty("java.awt.headless", "true");
        try {
            Files.createDirectories(base.getParent());
            Figures.save(chart, base);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * An invented day of the hanger rod after the proof load: the logger reads the rod's bridge
     * at 20 Hz for 24 hours, block by block as a gateway does, and a streaming rainflow counter
     * sums the rod stress's cycles into a range histogram and a damage sum on a demo S–N curve.
     * The stress: a dead load of 60 MPa, people crossing (more by day, each a pulse of 4 to
     * 20 MPa over about ten seconds), a wind-driven vibration of the rod at 2.1 Hz in gusts,
     * and 0.2 MPa of noise; three samples are dropped by the logger (NaN).
     */
    private static void day(PrintStream out, Bridge rod, IsotropicMaterial steel) {
        double modulus = steel.youngsModulus().toPascals();
        int rate = 20;
        int blockSize = 2000;
        int samples = 24 * 3600 * rate;
        SplittableRandom random = new SplittableRandom(1707);
        Bins ranges = Bins.uniform(0, 50e6, 5);
        RangeHistogram histogram = RangeHistogram.of(ranges);
        // invented, shaped like a design code's detail curve
        SnCurve curve = SnCurve.ofRange(Stress.ofMegapascals(50), 2e6, 3).withKnee(5e6, 5)
                .withCutOffAt(1e8);
        DamageSum damage = StressLife.of(curve).newDamageSum();
        double[] largest = {0};
        CycleConsumer all = histogram.andThen(damage)
                .andThen((from, to, count) -> largest[0] = Math.max(largest[0], Math.abs(to - from)));
        RainflowCounter counter = Rainflow.astm().withGate(1e6).newCounter(all);
        double[] block = new double[blockSize];
        double pulse = 0;          // the stress of the crossing under way, Pa
        int pulseLeft = 0;
        double gust = 0;
        int noStrain = 0;
        for (int start = 0; start < samples; start += blockSize) {
            for (int i = 0; i < blockSize; i++) {
                int n = start + i;
                double hour = n / (3600.0 * rate);
                double busy = hour > 7 && hour < 21 ? 1.0 / (40 * rate) : 1.0 / (600 * rate);
                if (pulseLeft == 0 && random.nextDouble() < busy) {
                    pulse = (4 + 16 * random.nextDouble()) * 1e6;
                    pulseLeft = 8 * rate + random.nextInt(4 * rate);
                }
                double crossing = pulseLeft > 0 ? pulse * Math.sin(Math.PI * pulseLeft
                        / (12.0 * rate)) : 0;
                pulseLeft = Math.max(0, pulseLeft - 1);
                gust = 0.999 * gust + 0.001 * 3e6 * random.nextDouble();
                double sigma = 60e6 + Math.max(0, crossing)
                        + gust * Math.sin(2 * Math.PI * 2.1 * n / rate)
                        + 0.2e6 * gaussian(random);
                block[i] = rod.toRatio(sigma / modulus);
            }
            if (start == 300 * blockSize) {
                block[10] = Double.NaN;                             // the logger dropped three
                block[11] = Double.NaN;
                block[12] = Double.NaN;
            }
            noStrain += rod.toStrain(block, 0, block, 0, blockSize);
            for (int i = 0; i < blockSize; i++) {
                block[i] *= modulus;                                // uniaxial: σ = E·ε
            }
            counter.accept(block, 0, blockSize);
        }
        counter.residueTo(all);                                     // the day ends
        out.println("a day of the rod (invented): " + samples + " samples at " + rate
                + " Hz in blocks of " + blockSize + ", " + noStrain + " without strain");
        out.println(String.format(Locale.ROOT,
                "  rainflow (ASTM E1049-85, gate 1 MPa): %.1f cycles, the largest of %.1f MPa",
                histogram.total() + histogram.outside(), largest[0] / 1e6));
        StringBuilder bins = new StringBuilder("  stress ranges:");
        for (int i = 0; i < ranges.count(); i++) {
            bins.append(String.format(Locale.ROOT, " %.0f-%.0f MPa %.1f%s", ranges.edge(i) / 1e6,
                    ranges.edge(i + 1) / 1e6, histogram.count(i),
                    i + 1 < ranges.count() ? "," : ""));
        }
        out.println(bins + (histogram.outside() > 0 ? String.format(Locale.ROOT,
                ", above %.1f", histogram.outside()) : ""));
        out.println("  demo S–N curve (invented): " + curve);
        out.println(String.format(Locale.ROOT, "  Palmgren–Miner damage: D = %.3g for the day",
                damage.damage()));
        out.println("  A damage sum is an estimate with a large scatter. The design code that"
                + " applies sets the curve,");
        out.println("  the factors and the limit; a qualified (where required, licensed) engineer"
                + " judges the structure.");
    }

    /** The link's invented true curve: mV/V at a load in kN. */
    private static double linkReading(double kilonewtons) {
        return 0.0385 * kilonewtons - 1.2e-5 * kilonewtons * kilonewtons;
    }

    /** A standard normal deviate by the Box–Muller transform. */
    private static double gaussian(SplittableRandom random) {
        double u = 1.0 - random.nextDouble();
        double v = random.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }

    /** A strain in µε to 0.1 µε; rounding residues below 0.05 µε print as 0.0, not -0.0. */
    private static String micro(double strain) {
        double micro = strain * 1e6;
        return Double.isNaN(micro) ? "NaN"
                : String.format(Locale.ROOT, "%.1f", Math.abs(micro) < 0.05 ? 0.0 : micro);
    }
}
