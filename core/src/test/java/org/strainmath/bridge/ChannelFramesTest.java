package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Temperature;

/** Interleaved frames against each column converted on its own (same functions, bit for bit). */
class ChannelFramesTest {

    private static final AdcInput ADC = AdcInput.ratiometric(24, 128);
    private static final StrainChannel QUARTER = StrainChannel.of(
            Bridge.quarter(StrainGauge.ofOhms(350, 2.1)).withThreeWireLeads(Resistance.ofOhms(1)), ADC);
    private static final StrainChannel FULL = StrainChannel.of(
            Bridge.fullAxialPoisson(StrainGauge.ofOhms(350, 2.0), 0.3), ADC).zeroedByOffsetAt(500);
    private static final StrainChannel HOT = QUARTER.withThermalOutput(
            ThermalOutput.ofCelsius(-20, 1.2, -0.03), Temperature.ofCelsius(20));

    @Test
    void eachColumnConvertsAsItsOwnChannel() {
        ChannelFrames frames = ChannelFrames.of(QUARTER, FULL, QUARTER, FULL, QUARTER, FULL, QUARTER, FULL);
        int n = frames.channelsPerFrame();
        int count = 3000;
        SplittableRandom random = new SplittableRandom(8);
        int[] codes = new int[n * count];
        for (int i = 0; i < codes.length; i++) {
            codes[i] = random.nextInt(-(1 << 23), 1 << 23);
        }
        codes[5 * n + 3] = (1 << 23) - 1;   // a rail in column 3
        double[][] strain = new double[n][count];
        int nan = frames.toStrain(codes, strain);
        int expectedNaN = 0;
        for (int c = 0; c < n; c++) {
            int[] column = new int[count];
            for (int i = 0; i < count; i++) {
                column[i] = codes[i * n + c];
            }
            double[] expected = new double[count];
            expectedNaN += frames.channels().get(c).toStrain(column, 0, expected, 0, count);
            assertThat(strain[c]).as("column %d", c).isEqualTo(expected);
        }
        assertThat(nan).isEqualTo(expectedNaN).isGreaterThanOrEqualTo(1);
    }

    @Test
    void temperaturesPerFrameServeTheThermalChannels() {
        ChannelFrames frames = ChannelFrames.of(HOT, FULL);
        int[] codes = {100_000, 200_000, -300_000, 400_000, 500_000, -600_000};
        double[] celsius = {25, 60, 90};
        double[][] strain = new double[2][4];
        assertThat(frames.toStrain(codes, 0, 3, celsius, 0, strain, 1)).isZero();
        for (int i = 0; i < 3; i++) {
            assertThat(strain[0][1 + i]).isEqualTo(HOT.toStrain(codes[2 * i], celsius[i]));
            assertThat(strain[1][1 + i]).isEqualTo(FULL.toStrain(codes[2 * i + 1]));
        }
        assertThat(strain[0][0]).isZero();
    }

    @Test
    void badShapesAreRejectedWithBothNumbers() {
        ChannelFrames frames = ChannelFrames.of(QUARTER, FULL, QUARTER);
        assertThatThrownBy(() -> frames.toStrain(new int[1003], new double[3][400]))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("frames.length must be a whole number of frames of 3 channels: 1003");
        assertThatThrownBy(() -> frames.toStrain(new int[9], new double[2][3]))
                .isInstanceOf(IndexOutOfBoundsException.class)
                .hasMessage("dst has 2 rows for 3 channels");
        assertThatThrownBy(() -> frames.toStrain(new int[9], new double[3][2]))
                .isInstanceOf(IndexOutOfBoundsException.class)
                .hasMessage("dst[0] has 2 values for 3 frames from 0");
        assertThatThrownBy(() -> frames.toStrain(new int[9], 0, 3, null, 0,
                new double[][] {new double[5], new double[4], new double[5]}, 2))
                .isInstanceOf(IndexOutOfBoundsException.class)
                .hasMessage("dst[1] has 4 values for 3 frames from 2");
        assertThatThrownBy(() -> frames.toStrain(new int[9], new double[][] {new double[3], null, new double[3]}))
                .isInstanceOf(NullPointerException.class).hasMessage("dst[1]");
        assertThatThrownBy(() -> ChannelFrames.of(HOT).toStrain(new int[4], new double[1][4]))
                .isInstanceOf(IllegalStateException.class)
                .hasMessage("channel 0 corrects for thermal output: give the temperatures");
        assertThatThrownBy(ChannelFrames::of).isInstanceOf(IllegalArgumentException.class)
                .hasMessage("channels must hold at least one channel: 0");
        assertThatThrownBy(() -> ChannelFrames.of(QUARTER, null))
                .isInstanceOf(NullPointerException.class).hasMessage("channels[1]");
        assertThat(frames).hasToString("ChannelFrames[3 channels per frame]");
    }
}
