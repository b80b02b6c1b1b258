package org.strainmath.audit;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.lang.reflect.Array;
import java.lang.reflect.Constructor;
import java.lang.reflect.Executable;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.Parameter;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.Paths;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Supplier;
import java.util.jar.JarFile;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;

import org.junit.jupiter.api.Test;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.BridgeArm;
import org.strainmath.bridge.ChannelFrames;
import org.strainmath.bridge.LeadWire;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.bridge.ThermalOutput;
import org.strainmath.calibration.CalibrationFit;
import org.strainmath.calibration.CalibrationRun;
import org.strainmath.calibration.FitResult;
import org.strainmath.calibration.ResistorSeries;
import org.strainmath.calibration.ShuntCalibration;
import org.strainmath.calibration.ShuntPosition;
import org.strainmath.calibration.TransducerCalibration;
import org.strainmath.fatigue.DamageSum;
import org.strainmath.fatigue.FatigueLife;
import org.strainmath.fatigue.MeanStressCorrection;
import org.strainmath.fatigue.SnCurve;
import org.strainmath.fatigue.StrainLife;
import org.strainmath.fatigue.StressLife;
import org.strainmath.history.Bins;
import org.strainmath.history.CycleConsumer;
import org.strainmath.history.Cycles;
import org.strainmath.history.FromToMatrix;
import org.strainmath.history.LevelCrossings;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RainflowCounter;
import org.strainmath.history.RangeHistogram;
import org.strainmath.history.RangeMeanMatrix;
import org.strainmath.history.TurningPointFilter;
import org.strainmath.history.TurningPoints;
import org.strainmath.material.ElasticConstant;
import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.OrthotropicLamina;
import org.strainmath.material.PlaneStiffness;
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
import org.strainmath.rosette.RosetteStrains;
import org.strainmath.rosette.RosetteStresses;
import org.strainmath.uncertainty.ChannelBudget;
import org.strainmath.uncertainty.InputQuantity;
import org.strainmath.uncertainty.MeasurementModel;
import org.strainmath.uncertainty.RosetteBudget;
import org.strainmath.uncertainty.UncertaintyBudget;

/**
 * The validation audit of the whole public API of core, rosette and calibration, driven by
 * reflection so that a new public method is audited without anyone listing it.
 *
 * <p>For every public method and constructor with arguments, of every public class outside the
 * {@code internal} package, the audit first finds a call that succeeds (a <em>baseline</em>)
 * from sample values of each parameter type; a method for which none succeeds fails the test
 * until it gets a sample (in {@link #SAMPLES}) or an entry in {@link #BASELINES}. From the
 * baseline it then replaces one argument at a time:
 * <ul>
 *   <li>a reference argument by {@code null}: the call must throw {@link NullPointerException}
 *       whose message names the parameter;</li>
 *   <li>a {@code double} by NaN, +∞ and −∞: the call must throw
 *       {@link IllegalArgumentException} whose message names the parameter, or, for a
 *       per-sample path that returns a {@code double}, return NaN;</li>
 *   <li>an {@code int} offset or length by −1 and an offset by the array's length plus one:
 *       the call must throw {@link IndexOutOfBoundsException} (the JDK's message, from
 *       {@code Objects.checkFromIndexSize}) or an {@link IllegalArgumentException} naming the
 *       parameter;</li>
 *   <li>an array by an empty one, where the baseline's was not empty: the call must throw
 *       {@link IllegalArgumentException} naming the parameter or
 *       {@link IndexOutOfBoundsException}, or return normally (a block of zero samples, or an
 *       optional input), but never anything else.</li>
 * </ul>
 * Arguments that may be null, or a {@code double} that may be infinite, are listed in
 * {@link #ALLOWED} with the reason. Parameter names come from the class files (the build
 * compiles with {@code -parameters}).
 */
class PublicApiAuditTest {

    /** Sample values per type, tried in turn; the first is the most ordinary. */
    private static final Map<Class<?>, List<Supplier<?>>> SAMPLES = new LinkedHashMap<>();

    /** Baselines the search cannot find, by signature ("Class.method(Type,Type)"). */
    private static final Map<String, Supplier<Object[]>> BASELINES = new HashMap<>();

    /**
     * Arguments that are allowed to be null or non-finite, "signature#parameter", with the
     * reason beside each.
     */
    private static final Map<String, String> ALLOWED = new HashMap<>();

    private static final double[] DOUBLES = {0.3, 2.0, 1.0, 100.0, 1e-3, 350.0, 24.0, -1.0};
    private static final int[] INTS = {0, 3, 1, 2, 24, 16, 100};

    private static final IsotropicMaterial STEEL = IsotropicMaterial.of(Stress.ofGigapascals(200),
            0.3).withThermalExpansion(12e-6);

    static {
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.1);
        Bridge quarter = Bridge.quarter(gauge);
        AdcInput adc = AdcInput.ratiometric(24, 128);
        double[] loads = {0, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100, 110, 120, 130, 140, 150};
        double[] readings = new double[16];
        for (int i = 0; i < 16; i++) {
            readings[i] = 0.02 * loads[i] + 1e-4 * (i % 3);
        }
        double[] small = new double[16];
        for (int i = 0; i < 16; i++) {
            small[i] = 1e-4 * (i + 1);
        }
        sample(double[].class, () -> small.clone(), () -> loads.clone(), () -> readings.clone(),
                () -> new double[] {1, 2, 3});
        sample(double[][].class, () -> new double[][] {small.clone(), small.clone(), small.clone()},
                () -> new double[][] {small.clone(), small.clone()});
        sample(int[].class, () -> new int[] {-2000, 0, 1000, 90_000, 5, 6, 7, 8, 9, 10, 11, 12,
            13, 14, 15, 16});
        sample(short[].class, () -> new short[] {-200, 0, 100, 900, 5, 6, 7, 8, 9, 10, 11, 12, 13,
            14, 15, 16});
        sample(boolean.class, () -> true, () -> false);
        sample(long.class, () -> 1000L, () -> 0L, () -> 24L);
        sample(String.class, () -> "x", () -> "y");
        sample(Strain.class, () -> Strain.ofMicrostrain(500), () -> Strain.ofMicrostrain(-300));
        sample(Stress.class, () -> Stress.ofMegapascals(100), () -> Stress.ofGigapascals(200));
        sample(Temperature.class, () -> Temperature.ofCelsius(25), () -> Temperature.ofCelsius(60));
        sample(Resistance.class, () -> Resistance.ofOhms(1.5), () -> Resistance.ofKiloohms(100),
                () -> Resistance.ofOhms(350));
        sample(Angle.class, () -> Angle.ofDegrees(30), () -> Angle.ofDegrees(-10));
        sample(Voltage.class, () -> Voltage.ofVolts(5), () -> Voltage.ofMillivolts(2));
        sample(VoltageRatio.class, () -> VoltageRatio.ofMillivoltsPerVolt(1.0),
                () -> VoltageRatio.ofMillivoltsPerVolt(-0.5));
        sample(StrainGauge.class, () -> gauge);
        sample(Bridge.class, () -> quarter, () -> Bridge.fullAxialPoisson(gauge, 0.3));
        sample(BridgeArm.class, () -> BridgeArm.active(gauge, 1.0));
        sample(AdcInput.class, () -> adc);
        sample(StrainChannel.class, () -> StrainChannel.of(quarter, adc));
        sample(ThermalOutput.class, () -> ThermalOutput.ofCelsius(-28, 2.0, -0.05));
        sample(IsotropicMaterial.class, () -> STEEL);
        sample(PlaneStrain.class, () -> new PlaneStrain(4e-4, -1e-4, 2e-4));
        sample(PlaneStress.class, () -> new PlaneStress(1e8, -3e7, 2e7));
        sample(Rosette.class, () -> Rosette.rectangular().withMaterial(STEEL), Rosette::delta);
        sample(Optional.class, () -> Optional.of(Angle.ofDegrees(10)), Optional::empty);
        sample(InputQuantity.class, () -> InputQuantity.normal("x", 1.0, 0.01, 30),
                () -> InputQuantity.rectangular("y", 2.0, 0.1));
        sample(InputQuantity[].class, () -> new InputQuantity[] {
            InputQuantity.normal("x", 5e-4, 1e-6, 30), InputQuantity.rectangular("y", 2e-4, 1e-6),
            InputQuantity.rectangular("z", -1e-4, 1e-6)});
        sample(MeasurementModel.class, () -> (MeasurementModel) x -> x[0] * x[1]);
        sample(CalibrationRun.class, () -> CalibrationRun.ascending(loads.clone(), readings.clone()));
        sample(Strain[].class, () -> new Strain[] {Strain.ofMicrostrain(500),
            Strain.ofMicrostrain(200), Strain.ofMicrostrain(-100)});
        sample(Angle[].class, () -> new Angle[] {Angle.ZERO, Angle.ofDegrees(45),
            Angle.ofDegrees(90)});
        sample(StrainGauge[].class, () -> new StrainGauge[] {gauge});
        sample(StrainChannel[].class, () -> new StrainChannel[] {StrainChannel.of(quarter, adc),
            StrainChannel.of(quarter, adc)});
        sample(ShuntPosition.class, () -> ShuntPosition.values()[0]);
        sample(ResistorSeries.class, () -> ResistorSeries.values()[0]);
        sample(ShuntCalibration.class, () -> ShuntCalibration.across(quarter, 1,
                Resistance.ofKiloohms(100), ShuntPosition.values()[0]));
        sample(CalibrationFit.class, () -> CalibrationFit.of(loads.clone(), readings.clone()));
        sample(FitResult.class, () -> CalibrationFit.of(loads.clone(), readings.clone()).fit());
        sample(TransducerCalibration.class, () -> TransducerCalibration.of(150)
                .withRun(CalibrationRun.ascending(loads.clone(), readings.clone())));
        sample(ChannelBudget.class, () -> ChannelBudget.of(StrainChannel.of(quarter, adc), 90_000));
        sample(ChannelFrames.class, () -> ChannelFrames.of(StrainChannel.of(quarter, adc),
                StrainChannel.of(quarter, adc)));
        sample(ThermalOutput.Correction.class, () -> ThermalOutput.ofCelsius(-28, 2.0)
                .zeroedAt(Temperature.ofCelsius(22), 2.1));
        sample(LeadWire.class, () -> LeadWire.copper(10, 0.5));
        sample(OrthotropicLamina.class, () -> OrthotropicLamina.of(Stress.ofGigapascals(140),
                Stress.ofGigapascals(10), 0.3, Stress.ofGigapascals(5)));
        sample(PlaneStiffness.class, () -> STEEL.planeStressStiffness());
        sample(UncertaintyBudget.class, () -> UncertaintyBudget.of(x -> x[0] * x[1],
                InputQuantity.normal("x", 1.0, 0.01, 30), InputQuantity.rectangular("y", 2.0, 0.1)));
        sample(RosetteBudget.class, () -> RosetteBudget.of(Rosette.rectangular(),
                InputQuantity.normal("a", 5e-4, 1e-6, 30), InputQuantity.normal("b", 2e-4, 1e-6, 30),
                InputQuantity.normal("c", -1e-4, 1e-6, 30)));
        sample(RosetteStrains.class, () -> Rosette.rectangular().reduceMicrostrain(500, 200, -100));
        sample(RosetteStresses.class, () -> Rosette.rectangular().withMaterial(STEEL)
                .stressesOfMicrostrain(500, 200, -100));
        // Histories and fatigue
        double[] history = {0, 3, -2, 4, -1, 2, -3, 1};
        StressLife life = StressLife.of(SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3));
        sample(long[].class, () -> new long[16]);
        sample(byte[].class, () -> new byte[48]);
        sample(java.nio.ByteOrder.class, () -> java.nio.ByteOrder.BIG_ENDIAN,
                () -> java.nio.ByteOrder.LITTLE_ENDIAN);
        sample(org.strainmath.bridge.PackedCodes.class, () -> org.strainmath.bridge.PackedCodes.of(3,
                java.nio.ByteOrder.BIG_ENDIAN, true));
        sample(Rainflow.class, Rainflow::astm, () -> Rainflow.astm().withGate(0.5));
        sample(CycleConsumer.class, () -> (CycleConsumer) (f, t, c) -> { });
        sample(RainflowCounter.class, () -> {
            RainflowCounter c = Rainflow.astm().newCounter((f, t, n) -> { });
            c.accept(history, 0, history.length);
            return c;
        });
        sample(TurningPointFilter.class, () -> TurningPointFilter.withGate(0));
        sample(Cycles.class, () -> Rainflow.astm().count(history));
        sample(Bins.class, () -> Bins.uniform(0, 10, 10), () -> Bins.uniform(-10, 10, 10));
        sample(RangeHistogram.class, () -> RangeHistogram.of(Bins.uniform(0, 10, 10)));
        sample(RangeMeanMatrix.class, () -> RangeMeanMatrix.of(Bins.uniform(0, 10, 10),
                Bins.uniform(-10, 10, 10)));
        sample(FromToMatrix.class, () -> FromToMatrix.of(Bins.uniform(-10, 10, 10)));
        sample(LevelCrossings.class, () -> LevelCrossings.of(-1, 0, 1));
        sample(SnCurve.class, () -> SnCurve.ofRange(Stress.ofMegapascals(71), 2e6, 3));
        sample(MeanStressCorrection.class, MeanStressCorrection::none,
                () -> MeanStressCorrection.goodman(Stress.ofMegapascals(400)));
        sample(StressLife.class, () -> life);
        sample(FatigueLife.class, () -> life);
        sample(StrainLife.class, () -> StrainLife.of(Stress.ofGigapascals(200),
                Stress.ofMegapascals(1700), -0.09, 0.6, -0.6));
        sample(DamageSum.class, () -> DamageSum.of(life));
        sample(TurningPoints.class, () -> TurningPoints.of(history));
        CycleConsumer none = (f, t, c) -> { };
        baseline("RainflowCounter.fromBytes(byte[],CycleConsumer)", () -> new Object[] {null,
            ((RainflowCounter) sampleOf(RainflowCounter.class, 0)).toBytes(), none});
        baseline("DamageSum.fromBytes(FatigueLife,byte[])", () -> new Object[] {null, life,
            DamageSum.of(life).toBytes()});
        baseline("RangeHistogram.fromBytes(byte[])", () -> new Object[] {null,
            RangeHistogram.of(Bins.uniform(0, 10, 10)).toBytes()});
        baseline("RangeMeanMatrix.fromBytes(byte[])", () -> new Object[] {null,
            ((RangeMeanMatrix) sampleOf(RangeMeanMatrix.class, 0)).toBytes()});
        baseline("FromToMatrix.fromBytes(byte[])", () -> new Object[] {null,
            ((FromToMatrix) sampleOf(FromToMatrix.class, 0)).toBytes()});
        baseline("LevelCrossings.fromBytes(byte[])", () -> new Object[] {null,
            ((LevelCrossings) sampleOf(LevelCrossings.class, 0)).toBytes()});
        baseline("RangeHistogram.equivalentRange(double)", () -> {
            RangeHistogram h = RangeHistogram.of(Bins.uniform(0, 10, 10));
            h.accept(0, 3, 1);
            return new Object[] {h, 3.0};
        });
        baseline("SnCurve.ofBasquin(Stress,double)", () -> new Object[] {null,
            Stress.ofMegapascals(1000), -0.1});
        baseline("StrainLife.of(Stress,Stress,double,double,double)", () -> new Object[] {null,
            Stress.ofGigapascals(200), Stress.ofMegapascals(1700), -0.09, 0.6, -0.6});

        baseline("Bridge.of(BridgeArm,BridgeArm,BridgeArm,BridgeArm)", () -> new Object[] {null,
            BridgeArm.active(gauge, 1.0), BridgeArm.completion(Resistance.ofOhms(350)),
            BridgeArm.completion(Resistance.ofOhms(350)),
            BridgeArm.completion(Resistance.ofOhms(350))});
        baseline("Bridge.maximumExcitationForPowerDensity(double)", () -> new Object[] {
            Bridge.quarter(gauge.withGridArea(6.5)), 0.0015});
        baseline("CalibrationRun.descending(double[],double[])", () -> new Object[] {null,
            reversed(loads), reversed(readings)});
        StrainChannel absolute = StrainChannel.of(quarter, AdcInput.absolute(24, 128,
                Voltage.ofMillivolts(2500), Voltage.ofVolts(5)));
        baseline("ChannelBudget.withExcitationAccuracy(double)", () -> new Object[] {
            ChannelBudget.of(absolute, 90_000), 0.1});
        baseline("ChannelBudget.withTemperature(double,double)", () -> new Object[] {
            ChannelBudget.of(StrainChannel.of(quarter, adc).withThermalOutput(
                    ThermalOutput.ofCelsius(-28, 2.0), Temperature.ofCelsius(22)), 90_000),
            40.0, 0.5});
        baseline("ChannelBudget.withTransverseSensitivityUncertainty(double)", () -> new Object[] {
            ChannelBudget.of(StrainChannel.of(Bridge.quarter(gauge.withTransverseSensitivity(0.01)),
                    adc).withTransverseCorrection(-0.3), 90_000), 0.002});
        baseline("IsotropicMaterial.fromPair(ElasticConstant,double,ElasticConstant,double)",
            () -> new Object[] {null, ElasticConstant.YOUNGS_MODULUS, 200e9,
                ElasticConstant.POISSONS_RATIO, 0.3});
        baseline("PlaneStiffness.of(double,double,double,double,double,double)",
            () -> new Object[] {null, 220e9, 66e9, 0.0, 220e9, 0.0, 77e9});
        baseline("Rosette.stressesOfMicrostrain(double[])", () -> new Object[] {
            Rosette.rectangular().withMaterial(STEEL), new double[] {500, 200, -100}});
        baseline("UncertaintyBudget.withCorrelation(String,String,double)", () -> new Object[] {
            sampleOf(UncertaintyBudget.class, 0), "x", "y", 0.3});
        StrainChannel thermal = StrainChannel.of(quarter, adc).withThermalOutput(
                ThermalOutput.ofCelsius(-28, 2.0, -0.05), Temperature.ofCelsius(22));
        baseline("StrainChannel.toStrain(long,double)", () -> new Object[] {thermal, 90_000L, 40.0});
        baseline("StrainChannel.strainAt(long,Temperature)", () -> new Object[] {thermal, 90_000L,
            Temperature.ofCelsius(40)});

        allow("ChannelFrames.toStrain(int[],int,int,double[],int,double[][],int)#celsiusPerFrame:null",
                "documented: null when no channel corrects for thermal output");
        allow("MeasurementModel.evaluate(double[])#inputs:null",
                "an interface the user implements: the budget always passes its own array");
        for (String value : new String[] {"firstValue", "secondValue"}) {
            for (String bad : new String[] {"NaN", "infinite"}) {
                allow("IsotropicMaterial.fromPair(ElasticConstant,double,ElasticConstant,double)#"
                        + value + ":" + bad, "the message names the elastic constant the value"
                        + " stands for (\"youngsModulus must be > 0...\"), not firstValue");
            }
        }
        allow("InputQuantity.withDegreesOfFreedom(double)#degrees:infinite",
                "infinite degrees of freedom: an exactly known standard uncertainty (GUM G.4)");
        // Result records: the library builds them from its own computation, where NaN and
        // infinity are answers (an exact fit has an infinite F ratio; a Monte Carlo run of a
        // model without a finite output has NaN moments); their constructors do not judge.
        for (String[] record : new String[][] {
            {"AnovaTable.new(double,int,double,int)", "regressionSumOfSquares",
                "residualSumOfSquares"},
            {"Contribution.new(InputQuantity,double,double,double)", "sensitivity", "contribution",
                "share"},
            {"Interval.new(double,double,double)", "estimate", "halfWidth", "probability"},
            {"MonteCarloResult.new(double,double,double,double,double,int)", "estimate",
                "standardUncertainty", "lower", "upper", "probability"}}) {
            for (int k = 1; k < record.length; k++) {
                allow(record[0] + "#" + record[k] + ":NaN", "a result record");
                allow(record[0] + "#" + record[k] + ":infinite", "a result record");
            }
        }
        allow("Bins.indexOf(double)#x:NaN", "documented: -1, outside the bins");
        allow("Bins.indexOf(double)#x:infinite", "documented: -1, outside the bins");
        for (String consumer : new String[] {"CycleConsumer", "DamageSum", "FromToMatrix",
            "LevelCrossings", "RangeHistogram", "RangeMeanMatrix"}) {
            for (String argument : new String[] {"from", "to", "count"}) {
                for (String bad : new String[] {"NaN", "infinite"}) {
                    allow(consumer + ".accept(double,double,double)#" + argument + ":" + bad,
                            "the per-cycle path of a count, fed finite cycles by the counter;"
                            + " documented never to throw");
                }
            }
        }
        for (String stream : new String[] {"RainflowCounter", "TurningPointFilter"}) {
            allow(stream + ".accept(double)#sample:NaN", "documented: skipped and counted");
            allow(stream + ".accept(double)#sample:infinite", "documented: skipped and counted");
        }
        baseline("UncertaintyBudget.withSensitivities(double[])", () -> new Object[] {
            sampleOf(UncertaintyBudget.class, 0), new double[] {2.0, 1.0}});
    }

    private static void allow(String argument, String reason) {
        ALLOWED.put(argument, reason);
    }

    private static void baseline(String signature, Supplier<Object[]> call) {
        BASELINES.put(signature, call);
    }

    private static double[] reversed(double[] a) {
        double[] r = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[a.length - 1 - i];
        }
        return r;
    }

    @SafeVarargs
    private static void sample(Class<?> type, Supplier<?>... values) {
        SAMPLES.put(type, List.of(values));
    }

    @Test
    void everyPublicArgumentIsCheckedOrDocumentedAsFree() {
        List<Executable> api = publicApi();
        assertThat(api).as("the audit found the API").hasSizeGreaterThan(200);
        List<String> problems = new ArrayList<>();
        List<String> noBaseline = new ArrayList<>();
        int audited = 0;
        for (Executable e : api) {
            Object[] baseline = baseline(e);
            if (baseline == null) {
                noBaseline.add(signature(e));
                continue;
            }
            audited++;
            problems.addAll(audit(e, baseline));
        }
        assertThat(noBaseline).as("methods without a baseline call: add a sample or a baseline")
                .isEmpty();
        assertThat(problems).as("arguments that are not checked as documented").isEmpty();
        assertThat(audited).isEqualTo(api.size());
    }

    // ---------------------------------------------------------------- discovery

    private static List<Executable> publicApi() {
        Set<String> names = new TreeSet<>();
        for (Class<?> anchor : List.of(Bridge.class, Rosette.class, CalibrationFit.class)) {
            names.addAll(classNames(anchor));
        }
        List<Executable> api = new ArrayList<>();
        for (String name : names) {
            Class<?> c;
            try {
                c = Class.forName(name);
            } catch (ClassNotFoundException ex) {
                throw new AssertionError(ex);
            }
            if (!isPublicApi(c)) {
                continue;
            }
            for (Executable e : Stream.concat(Arrays.stream(c.getDeclaredMethods()),
                    Arrays.stream(c.getDeclaredConstructors())).collect(Collectors.toList())) {
                if (Modifier.isPublic(e.getModifiers()) && !e.isSynthetic()
                        && e.getParameterCount() > 0 && !isLanguageContract(c, e)) {
                    api.add(e);
                }
            }
        }
        api.sort(Comparator.comparing(PublicApiAuditTest::signature));
        return api;
    }

    private static boolean isPublicApi(Class<?> c) {
        for (Class<?> k = c; k != null; k = k.getDeclaringClass()) {
            if (!Modifier.isPublic(k.getModifiers())) {
                return false;
            }
        }
        return !c.getPackageName().contains(".internal");
    }

    /** equals, compareTo and an enum's valueOf follow the JDK's contracts, not ours. */
    private static boolean isLanguageContract(Class<?> c, Executable e) {
        String n = e.getName();
        return n.equals("equals") || n.equals("compareTo")
                || (c.isEnum() && n.equals("valueOf") && e.getParameterCount() == 1);
    }

    private static Set<String> classNames(Class<?> anchor) {
        Path root;
        try {
            root = Paths.get(anchor.getProtectionDomain().getCodeSource().getLocation().toURI());
        } catch (URISyntaxException ex) {
            throw new AssertionError(ex);
        }
        Set<String> names = new TreeSet<>();
        try {
            if (Files.isDirectory(root)) {
                try (Stream<Path> files = Files.walk(root)) {
                    files.map(p -> root.relativize(p).toString().replace('\\', '/'))
                            .forEach(n -> addClass(names, n));
                }
            } else {
                try (JarFile jar = new JarFile(root.toFile())) {
                    jar.stream().map(ZipEntry::getName).forEach(n -> addClass(names, n));
                }
            }
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
        return names;
    }

    private static void addClass(Set<String> names, String path) {
        if (path.endsWith(".class") && path.startsWith("org/strainmath/")
                && !path.endsWith("package-info.class") && !path.endsWith("module-info.class")) {
            names.add(path.substring(0, path.length() - 6).replace('/', '.'));
        }
    }

    // ---------------------------------------------------------------- baseline

    /** The receiver (for an instance method) followed by the arguments, or null. */
    private static Object[] baseline(Executable e) {
        Supplier<Object[]> given = BASELINES.get(signature(e));
        if (given != null) {
            return given.get();
        }
        for (int v = 0; v < 4; v++) {
            for (int id = 0; id < INTS.length; id++) {
                for (int dd = 0; dd < DOUBLES.length; dd++) {
                    Object[] call = candidate(e, v, INTS[id], DOUBLES[dd]);
                    if (call != null && outcome(e, call) instanceof Returned) {
                        return candidate(e, v, INTS[id], DOUBLES[dd]);
                    }
                }
            }
        }
        return null;
    }

    private static Object[] candidate(Executable e, int variant, int anInt, double aDouble) {
        Object[] call = new Object[e.getParameterCount() + 1];
        if (e instanceof Method && !Modifier.isStatic(e.getModifiers())) {
            call[0] = sampleOf(e.getDeclaringClass(), variant);
            if (call[0] == null) {
                return null;
            }
        }
        Class<?>[] types = e.getParameterTypes();
        for (int i = 0; i < types.length; i++) {
            Class<?> t = types[i];
            if (t == double.class) {
                call[i + 1] = aDouble * (i + 1);
            } else if (t == int.class) {
                call[i + 1] = anInt;
            } else {
                Object s = sampleOf(t, variant);
                if (s == null) {
                    return null;
                }
                call[i + 1] = s;
            }
        }
        return call;
    }

    private static Object sampleOf(Class<?> t, int variant) {
        List<Supplier<?>> values = SAMPLES.get(t);
        if (values != null) {
            return values.get(variant % values.size()).get();
        }
        if (t.isEnum()) {
            Object[] constants = t.getEnumConstants();
            return constants[variant % constants.length];
        }
        return null;
    }

    // ---------------------------------------------------------------- audit

    private static List<String> audit(Executable e, Object[] baseline) {
        List<String> problems = new ArrayList<>();
        Parameter[] params = e.getParameters();
        for (int i = 0; i < params.length; i++) {
            Parameter p = params[i];
            String where = signature(e) + "#" + p.getName();
            Class<?> t = p.getType();
            if (!t.isPrimitive()) {
                if (!ALLOWED.containsKey(where + ":null")) {
                    expectNamed(problems, where, "null", e, with(baseline, i, null),
                            NullPointerException.class, p.getName());
                }
                if (t.isArray() && Array.getLength(baseline[i + 1]) > 0) {
                    Object empty = Array.newInstance(t.getComponentType(), 0);
                    Object outcome = outcome(e, with(baseline, i, empty));
                    if (outcome instanceof Thrown) {
                        Throwable x = ((Thrown) outcome).error;
                        boolean ok = x instanceof IndexOutOfBoundsException
                                || (x instanceof IllegalArgumentException
                                        && names(x, p.getName()));
                        if (!ok) {
                            problems.add(where + " = empty: " + describe(x));
                        }
                    }
                }
            } else if (t == double.class) {
                for (double bad : new double[] {Double.NaN, Double.POSITIVE_INFINITY,
                    Double.NEGATIVE_INFINITY}) {
                    String label = Double.toString(bad);
                    if (ALLOWED.containsKey(where + ":" + (Double.isNaN(bad) ? "NaN" : "infinite"))) {
                        continue;
                    }
                    Object outcome = outcome(e, with(baseline, i, bad));
                    if (outcome instanceof Returned) {
                        Object value = ((Returned) outcome).value;
                        // a per-sample path: no answer (NaN, or the infinity it was given)
                        boolean perSample = value instanceof Double
                                && !Double.isFinite((Double) value);
                        if (!perSample) {
                            problems.add(where + " = " + label + ": accepted, gave " + value);
                        }
                    } else {
                        Throwable x = ((Thrown) outcome).error;
                        if (!(x instanceof IllegalArgumentException && names(x, p.getName()))) {
                            problems.add(where + " = " + label + ": " + describe(x));
                        }
                    }
                }
            } else if (t == int.class && isIndex(p.getName())) {
                List<Integer> bad = new ArrayList<>(List.of(-1));
                if (p.getName().toLowerCase().endsWith("off")) {
                    bad.add(longestArray(baseline) + 1);
                }
                for (int b : bad) {
                    Object outcome = outcome(e, with(baseline, i, b));
                    if (outcome instanceof Returned) {
                        problems.add(where + " = " + b + ": accepted");
                    } else {
                        Throwable x = ((Thrown) outcome).error;
                        boolean ok = x instanceof IndexOutOfBoundsException
                                || (x instanceof IllegalArgumentException
                                        && names(x, p.getName()));
                        if (!ok) {
                            problems.add(where + " = " + b + ": " + describe(x));
                        }
                    }
                }
            }
        }
        return problems;
    }

    private static boolean isIndex(String name) {
        String n = name.toLowerCase();
        return n.endsWith("off") || n.equals("len") || n.endsWith("count");
    }

    private static int longestArray(Object[] call) {
        int longest = 0;
        for (Object a : call) {
            if (a != null && a.getClass().isArray()) {
                longest = Math.max(longest, Array.getLength(a));
            }
        }
        return longest;
    }

    private static void expectNamed(List<String> problems, String where, String label,
            Executable e, Object[] call, Class<? extends Throwable> expected, String name) {
        Object outcome = outcome(e, call);
        if (outcome instanceof Returned) {
            problems.add(where + " = " + label + ": accepted");
            return;
        }
        Throwable x = ((Thrown) outcome).error;
        if (!expected.isInstance(x) || !names(x, name)) {
            problems.add(where + " = " + label + ": " + describe(x));
        }
    }

    /**
     * Whether the message names the parameter as a word of its own (itself, or an element of
     * it: "name[2]"), so that a one-letter name is not found inside another word.
     */
    private static boolean names(Throwable x, String name) {
        return x.getMessage() != null && java.util.regex.Pattern.compile(
                "(^|[^A-Za-z0-9_])" + java.util.regex.Pattern.quote(name) + "($|[^A-Za-z0-9_])")
                .matcher(x.getMessage()).find();
    }

    private static String describe(Throwable x) {
        return x.getClass().getSimpleName() + "(" + x.getMessage() + ")";
    }

    private static Object[] with(Object[] call, int param, Object value) {
        Object[] copy = call.clone();
        for (int i = 1; i < copy.length; i++) {
            copy[i] = fresh(copy[i]);
        }
        copy[param + 1] = value;
        return copy;
    }

    /** A copy of an array argument, so that one call cannot change the next one's inputs. */
    private static Object fresh(Object a) {
        if (a instanceof double[][]) {
            double[][] rows = ((double[][]) a).clone();
            for (int r = 0; r < rows.length; r++) {
                rows[r] = rows[r].clone();
            }
            return rows;
        }
        if (a instanceof double[]) {
            return ((double[]) a).clone();
        }
        if (a instanceof int[]) {
            return ((int[]) a).clone();
        }
        if (a instanceof short[]) {
            return ((short[]) a).clone();
        }
        return a;
    }

    private interface Outcome {
    }

    private static final class Returned implements Outcome {
        final Object value;

        Returned(Object value) {
            this.value = value;
        }
    }

    private static final class Thrown implements Outcome {
        final Throwable error;

        Thrown(Throwable error) {
            this.error = error;
        }
    }

    private static Outcome outcome(Executable e, Object[] call) {
        Object[] args = Arrays.copyOfRange(call, 1, call.length);
        try {
            if (e instanceof Method) {
                return new Returned(((Method) e).invoke(call[0], args));
            }
            return new Returned(((Constructor<?>) e).newInstance(args));
        } catch (InvocationTargetException ex) {
            return new Thrown(ex.getCause());
        } catch (ReflectiveOperationException | IllegalArgumentException ex) {
            return new Thrown(new AssertionError("cannot call " + signature(e), ex));
        }
    }

    private static String signature(Executable e) {
        String name = e instanceof Constructor ? "new" : e.getName();
        return e.getDeclaringClass().getSimpleName() + "." + name + "("
                + Arrays.stream(e.getParameterTypes()).map(Class::getSimpleName)
                        .collect(Collectors.joining(",")) + ")";
    }
}
