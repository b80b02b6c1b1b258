package org.strainmath.docs;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.knowm.xchart.CategoryChart;
import org.knowm.xchart.CategoryChartBuilder;
import org.knowm.xchart.VectorGraphicsEncoder;
import org.knowm.xchart.VectorGraphicsEncoder.VectorGraphicsFormat;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.strainmath.bridge.AdcInput;
import org.strainmath.bridge.Bridge;
import org.strainmath.bridge.StrainChannel;
import org.strainmath.bridge.StrainGauge;
import org.strainmath.calibration.CalibrationFit;
import org.strainmath.history.Bins;
import org.strainmath.history.Rainflow;
import org.strainmath.history.RangeHistogram;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.rosette.Rosette;
import org.strainmath.rosette.RosetteStrains;
import org.strainmath.uncertainty.ChannelBudget;
import org.strainmath.uncertainty.Contribution;
import org.strainmath.uncertainty.UncertaintyResult;

/**
 * Draws the guide's figures from the library itself (never by hand), as SVG, with XChart:
 * the nonlinearity of each bridge arrangement, Mohr's circle of the rosette example, the
 * residuals of NIST's Pontius data against a straight line and the quadratic, and the
 * uncertainty budget of the channel example as bars, the range histogram of the fatigue
 * page's example, and the kernels' throughput against block
 * size from the JMH results committed beside the figures ({@code throughput-jdk*.csv}, which
 * {@code docs/performance.md} says how to measure again).
 *
 * <pre>
 *   mvn -B -q -Pfigures -DskipTests -pl docs -am verify      (writes docs/figures/*.svg)
 * </pre>
 */
public final class Figures {

    private Figures() {
    }

    /**
     * Writes the figures into {@code args[0]} (default {@code docs/figures}); {@code args[1]} is
     * the repository's top folder (default {@code .}), where the Pontius data is read.
     */
    public static void main(String[] args) throws IOException {
        System.setProperty("java.awt.headless", "true");
        Path out = Path.of(args.length > 0 ? args[0] : "docs/figures");
        Path top = Path.of(args.length > 1 ? args[1] : ".");
        Files.createDirectories(out);
        for (Path written : drawAll(out, top)) {
            System.out.println("wrote " + written);
        }
    }

    /** Draws every figure into {@code out} and returns the files written. */
    static List<Path> drawAll(Path out, Path top) throws IOException {
        List<Path> written = new ArrayList<>();
        written.add(save(nonlinearity(), out.resolve("nonlinearity")));
        written.add(save(mohr(), out.resolve("mohr-circle")));
        written.add(save(pontius(top.resolve(
                "calibration/src/test/resources/nist-strd-pontius.txt")), out.resolve("pontius-residuals")));
        written.add(save(budget(), out.resolve("channel-budget")));
        written.add(save(throughput(top.resolve("docs/figures/throughput-jdk17.csv"),
                top.resolve("docs/figures/throughput-jdk25.csv")), out.resolve("throughput")));
        written.add(save(rangeHistogram(), out.resolve("range-histogram")));
        return written;
    }

    /** Writes {@code chart} as {@code base.svg} and returns that file. */
    static Path save(org.knowm.xchart.internal.chartpart.Chart<?, ?> chart, Path base)
            throws IOException {
        VectorGraphicsEncoder.saveVectorGraphic(chart, base.toString(), VectorGraphicsFormat.SVG);
        return Path.of(base + ".svg");
    }

    /** Nonlinearity error (%) against strain for the arrangements of bridges.md. */
    static XYChart nonlinearity() {
        XYChart chart = new XYChartBuilder().width(720).height(440)
                .title("Nonlinearity of the linearised bridge equation")
                .xAxisTitle("strain (µε)").yAxisTitle("error of the linearised strain (%)").build();
        StrainGauge gauge = StrainGauge.ofOhms(350, 2.0);
        Bridge[] bridges = {Bridge.quarter(gauge), Bridge.halfAxialPoisson(gauge, 0.3),
            Bridge.halfBending(gauge), Bridge.fullAxialPoisson(gauge, 0.3), Bridge.fullBending(gauge)};
        String[] names = {"quarter", "half, axial with Poisson gauge", "half, bending",
            "full, axial with Poisson gauges", "full, bending"};
        int n = 81;
        for (int b = 0; b < bridges.length; b++) {
            double[] x = new double[n];
            double[] y = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = -20_000 + 500.0 * i;
                y[i] = x[i] == 0 ? 0 : 100 * bridges[b].nonlinearityError(Strain.ofMicrostrain(x[i]));
            }
            XYSeries series = chart.addSeries(names[b], x, y);
            series.setMarker(SeriesMarkers.NONE);
        }
        return chart;
    }

    /** Mohr's circle of the rosette example of rosettes.md. */
    static XYChart mohr() {
        RosetteStrains r = Rosette.rectangular().reduceMicrostrain(640, 515, -180);
        PlaneStrain e = r.strain();
        double c = r.mohrCircle().centre().toMicrostrain();
        double radius = r.mohrCircle().radius().toMicrostrain();
        double[][] circle = circle(c, radius);
        double[] x = circle[0];
        double[] y = circle[1];
        XYChart chart = new XYChartBuilder().width(560).height(560)
                .title("Mohr's circle of the rosette example (640, 515, -180 µε)")
                .xAxisTitle("normal strain (µε)").yAxisTitle("half the shear strain (µε)").build();
        // Equal scales on both axes, and the legend inside, so that the circle is round.
        double half = radius * 1.1;
        chart.getStyler().setXAxisMin(c - half).setXAxisMax(c + half).setYAxisMin(-half)
                .setYAxisMax(half);
        chart.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.InsideSE);
        chart.addSeries("circle", x, y).setMarker(SeriesMarkers.NONE);
        chart.addSeries("x and y faces", new double[] {e.exx() * 1e6, e.eyy() * 1e6},
                new double[] {e.gxy() * 0.5e6, -e.gxy() * 0.5e6}).setMarker(SeriesMarkers.CIRCLE);
        chart.addSeries("principal strains", new double[] {c + radius, c - radius},
                new double[] {0, 0}).setMarker(SeriesMarkers.DIAMOND);
        return chart;
    }

    /** Residuals of the Pontius data against a straight line and the quadratic. */
    static XYChart pontius(Path data) throws IOException {
        List<double[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(data)) {
            String t = line.trim();
            if (!t.isEmpty() && !t.startsWith("#")) {
                String[] parts = t.split("\\s+");
                rows.add(new double[] {Double.parseDouble(parts[1]), Double.parseDouble(parts[0])});
            }
        }
        double[] loads = new double[rows.size()];
        double[] readings = new double[rows.size()];
        for (int i = 0; i < loads.length; i++) {
            loads[i] = rows.get(i)[0];
            readings[i] = rows.get(i)[1];
        }
        double[] line = CalibrationFit.of(loads, readings).fit().residuals();
        double[] quadratic = CalibrationFit.of(loads, readings).withDegree(2).fit().residuals();
        XYChart chart = new XYChartBuilder().width(720).height(440)
                .title("NIST StRD Pontius: residuals of two calibration curves")
                .xAxisTitle("load").yAxisTitle("residual deflection").build();
        chart.getStyler().setDefaultSeriesRenderStyle(
                org.knowm.xchart.XYSeries.XYSeriesRenderStyle.Scatter);
        chart.addSeries("straight line", loads, line);
        chart.addSeries("quadratic", loads, quadratic);
        return chart;
    }

    /** The channel budget of uncertainty.md as bars of contribution. */
    static CategoryChart budget() {
        Bridge wired = Bridge.quarter(StrainGauge.ofOhms(350, 2.08))
                .withThreeWireLeads(Resistance.ofOhms(1.7));
        StrainChannel channel = StrainChannel.of(wired, AdcInput.ratiometric(24, 128));
        UncertaintyResult result = ChannelBudget.of(channel, 4_300_000).withGaugeFactorTolerance(1, 2)
                .withGainAccuracy(0.05).withNoise(12).withLeadResistanceUncertainty(5).budget()
                .evaluate(0.95);
        List<String> names = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (Contribution c : result.contributions()) {
            names.add(c.input().name());
            values.add(c.contribution() * 1e6);
        }
        CategoryChart chart = new CategoryChartBuilder().width(720).height(440)
                .title("Uncertainty budget of the channel example")
                .xAxisTitle("input").yAxisTitle("contribution |c·u| (µε)").build();
        chart.getStyler().setLegendVisible(false);
        chart.addSeries("contribution", names, values);
        return chart;
    }

    /**
     * The strain history of the fatigue page's example (a bracket on a test rig, invented; the
     * same recipe as the page's snippet): a slowly modulated load cycle, a vibration and noise.
     */
    static double[] bracketHistory() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(7);
        double[] strain = new double[20_000];
        for (int i = 0; i < strain.length; i++) {
            strain[i] = 400e-6 * Math.sin(i * 0.004) * Math.sin(i * 0.0003)
                    + 120e-6 * Math.sin(i * 0.07) + 3e-6 * random.nextGaussian();
        }
        return strain;
    }

    /** The range histogram of the fatigue page's example, as bars of cycles per 50 µε bin. */
    static CategoryChart rangeHistogram() {
        Bins bins = Bins.uniform(0, 1200e-6, 24);
        RangeHistogram histogram = Rainflow.astm().withGate(10e-6).count(bracketHistory())
                .rangeHistogram(bins);
        List<String> names = new ArrayList<>();
        List<Double> values = new ArrayList<>();
        for (int i = 0; i < bins.count(); i++) {
            names.add(String.format(java.util.Locale.ROOT, "%.0f", bins.centre(i) * 1e6));
            values.add(histogram.count(i));
        }
        CategoryChart chart = new CategoryChartBuilder().width(760).height(440)
                .title("Rainflow ranges of the bracket example (ASTM E1049-85, gate 10 µε)")
                .xAxisTitle("strain range, bin centre (µε)").yAxisTitle("cycles").build();
        chart.getStyler().setLegendVisible(false);
        chart.addSeries("cycles", names, values);
        return chart;
    }

    /**
     * Samples per second against block size, one series per kernel and JDK, from JMH's CSV
     * results ({@code -rf csv}): score (blocks/s) × the {@code size} parameter.
     */
    static XYChart throughput(Path jdk17, Path jdk25) throws IOException {
        XYChart chart = new XYChartBuilder().width(760).height(460)
                .title("Throughput against block size (one core)")
                .xAxisTitle("block size (samples)").yAxisTitle("million samples per second").build();
        chart.getStyler().setXAxisLogarithmic(true);
        chart.getStyler().setLegendPosition(org.knowm.xchart.style.Styler.LegendPosition.OutsideS);
        for (Path csv : new Path[] {jdk17, jdk25}) {
            String jdk = csv.getFileName().toString().contains("17") ? "JDK 17" : "JDK 25";
            java.util.Map<String, List<double[]>> series = new java.util.TreeMap<>();
            List<String> lines = Files.readAllLines(csv);
            for (String line : lines.subList(1, lines.size())) {
                String[] f = line.replace("\"", "").split(",");
                String name = f[0].substring(f[0].lastIndexOf('.', f[0].lastIndexOf('.') - 1) + 1);
                double size = Double.parseDouble(f[f.length - 1]);
                series.computeIfAbsent(name, k -> new ArrayList<>())
                        .add(new double[] {size, Double.parseDouble(f[4]) * size / 1e6});
            }
            for (java.util.Map.Entry<String, List<double[]>> e : series.entrySet()) {
                List<double[]> points = e.getValue();
                points.sort(java.util.Comparator.comparingDouble(v -> v[0]));
                double[] x = points.stream().mapToDouble(v -> v[0]).toArray();
                double[] y = points.stream().mapToDouble(v -> v[1]).toArray();
                chart.addSeries(e.getKey() + ", " + jdk, x, y);
            }
        }
        return chart;
    }

    /** 181 points {x, y} around a Mohr circle of centre {@code c} and radius {@code r}. */
    static double[][] circle(double c, double r) {
        double[] x = new double[181];
        double[] y = new double[181];
        for (int i = 0; i < x.length; i++) {
            double t = 2 * Math.PI * i / (x.length - 1);
            x[i] = c + r * Math.cos(t);
            y[i] = r * Math.sin(t);
        }
        return new double[][] {x, y};
    }
}
