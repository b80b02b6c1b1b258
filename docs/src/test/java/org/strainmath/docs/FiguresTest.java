package org.strainmath.docs;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The figure generator draws every figure of the guide from the library. */
class FiguresTest {

    @Test
    void everyFigureIsDrawnAsSvg(@TempDir Path out) throws Exception {
        System.setProperty("java.awt.headless", "true");
        List<Path> written = Figures.drawAll(out, Path.of("").toAbsolutePath().getParent());
        assertThat(written).extracting(p -> p.getFileName().toString()).containsExactly(
                "nonlinearity.svg", "mohr-circle.svg", "pontius-residuals.svg", "channel-budget.svg",
                "throughput.svg", "range-histogram.svg");
        for (Path svg : written) {
            String text = Files.readString(svg);
            assertThat(text).as("%s", svg).contains("<svg").hasSizeGreaterThan(10_000);
        }
        // Every figure the guide shows is one the generator writes.
        for (String name : new String[] {"nonlinearity", "mohr-circle", "pontius-residuals", "channel-budget",
            "throughput", "range-histogram"}) {
            assertThat(Path.of("figures", name + ".svg")).as("committed figure %s", name).exists();
        }
    }

    @Test
    void theNonlinearityFigureShowsTheQuarterBridgesKnownError() {
        // The quarter bridge's linearised strain is off by about −K·ε/2 relative (common
        // practice, no source): −0.1 % per 1000 µε at K = 2, so −2 % at 20 000 µε.
        double[] y = Figures.nonlinearity().getSeriesMap().get("quarter").getYData();
        assertThat(y[y.length - 1]).isBetween(-2.1, -1.9);
    }

    @Test
    void theRangeHistogramHoldsEveryCycleOfTheExample() {
        // Every cycle of the example's count lies in one bar (the bins cover it), a half cycle
        // counting 0.5: the bars add up to the count's total.
        var series = Figures.rangeHistogram().getSeriesMap().get("cycles");
        double sum = 0;
        for (Number y : series.getYData()) {
            sum += y.doubleValue();
        }
        double total = org.strainmath.history.Rainflow.astm().withGate(10e-6)
                .count(Figures.bracketHistory()).total();
        assertThat(sum).isEqualTo(total).isGreaterThan(100);
        assertThat(series.getXData()).hasSize(24);
    }

    @Test
    void theThroughputFigureHasEveryKernelAtEveryMeasuredSize() throws Exception {
        // From the committed JMH results: four benchmarks, one series each per JDK, each with the
        // block sizes of the sweep (docs/performance.md), samples/s = blocks/s × size.
        Path top = Path.of("").toAbsolutePath().getParent();
        var chart = Figures.throughput(top.resolve("docs/figures/throughput-jdk17.csv"),
                top.resolve("docs/figures/throughput-jdk25.csv"));
        assertThat(chart.getSeriesMap()).hasSize(8);
        for (var series : chart.getSeriesMap().values()) {
            assertThat(series.getXData()).as(series.getName()).hasSizeGreaterThanOrEqualTo(6);
            for (double y : series.getYData()) {
                assertThat(y).as(series.getName()).isPositive();
            }
        }
        assertThat(chart.getSeriesMap()).containsKey("ChannelBenchmark.channelBlock, JDK 25");
    }
}
