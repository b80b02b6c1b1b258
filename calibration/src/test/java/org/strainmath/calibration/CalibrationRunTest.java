package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;

/** A calibration run as a value: copies in and out, equality, and its checks. */
class CalibrationRunTest {

    private static final double[] LOADS = {0, 10, 20};
    private static final double[] READINGS = {0.001, 0.201, 0.399};

    @Test
    void aRunKeepsCopiesOfItsPointsAndIsAValue() {
        // Definition: the points as given, copied in and out; the text is the library's own.
        double[] loads = LOADS.clone();
        double[] readings = READINGS.clone();
        CalibrationRun run = CalibrationRun.ascending(loads, readings);
        loads[1] = 99;
        readings[1] = 99;
        assertThat(run.loads()).containsExactly(0, 10, 20);
        assertThat(run.readings()).containsExactly(0.001, 0.201, 0.399);
        run.loads()[0] = 5;
        assertThat(run.loads()[0]).isZero();
        assertThat(run.isAscending()).isTrue();
        assertThat(run.readingAt(10)).isEqualTo(0.201);
        assertThat(run.readingAt(20)).isEqualTo(0.399);
        assertThat(run.readingAt(15)).isNaN();

        CalibrationRun same = CalibrationRun.ascending(LOADS, READINGS);
        CalibrationRun down = CalibrationRun.descending(new double[] {20, 10, 0},
                new double[] {0.399, 0.201, 0.001});
        CalibrationRun other = CalibrationRun.ascending(LOADS, new double[] {0.001, 0.202, 0.399});
        CalibrationRun otherLoads = CalibrationRun.ascending(new double[] {0, 11, 20}, READINGS);
        assertThat(run).isEqualTo(same).hasSameHashCodeAs(same)
                .isNotEqualTo(other).isNotEqualTo(otherLoads).isNotEqualTo(down)
                .isNotEqualTo("a run");
        assertThat(run.hashCode()).isNotEqualTo(other.hashCode())
                .isNotEqualTo(otherLoads.hashCode());
        assertThat(down.isAscending()).isFalse();
        assertThat(down).isNotEqualTo(CalibrationRun.descending(new double[] {20, 10, 0},
                new double[] {0.399, 0.2, 0.001}));
        assertThat(run.toString()).isEqualTo("CalibrationRun[ascending, 3 points, 0.0 to 20.0]");
        assertThat(down.toString()).isEqualTo("CalibrationRun[descending, 3 points, 20.0 to 0.0]");
    }

    @Test
    void theLoadsMustMoveOneWay() {
        assertThatThrownBy(() -> CalibrationRun.ascending(new double[] {0, 10, 10},
                READINGS)).hasMessage("loads must increase within an ascending run: 10.0 then"
                        + " 10.0 at point 2");
        assertThatThrownBy(() -> CalibrationRun.descending(LOADS, READINGS))
                .hasMessage("loads must decrease within a descending run: 0.0 then 10.0 at point 1");
        assertThatThrownBy(() -> CalibrationRun.ascending(new double[] {0}, new double[] {1}))
                .hasMessage("a run needs at least two points: 1");
        assertThat(CalibrationRun.ascending(new double[] {0, 1}, new double[] {0, 1}).loads())
                .hasSize(2);
    }
}
