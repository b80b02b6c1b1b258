package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

class ChecksTest {

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void finiteRejectsNaNAndInfinities(double bad) {
        assertThatThrownBy(() -> Checks.finite(bad, "x"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("x must be finite: " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, 0.0,
        -0.0, -1.0})
    void positiveFiniteRejectsNaNInfinitiesZeroAndNegatives(double bad) {
        assertThatThrownBy(() -> Checks.positiveFinite(bad, "gaugeFactor"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("gaugeFactor must be > 0 and finite: " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1e-300})
    void nonNegativeFiniteRejectsNaNInfinitiesAndNegatives(double bad) {
        assertThatThrownBy(() -> Checks.nonNegativeFinite(bad, "ohms"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("ohms must be >= 0 and finite: " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY, -1.0,
        0.5, 0.75})
    void openIntervalRejectsEndsOutsideAndNaN(double bad) {
        assertThatThrownBy(() -> Checks.inOpenInterval(bad, -1, 0.5, "poissonRatio"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("poissonRatio must be in (-1.0, 0.5): " + bad);
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, -273.16})
    void atLeastFiniteRejectsNaNInfinityAndBelow(double bad) {
        assertThatThrownBy(() -> Checks.atLeastFinite(bad, -273.15, "celsius"))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("celsius must be >= -273.15 and finite: " + bad);
    }

    @Test
    void acceptedValuesPassThroughUnchanged() {
        // Definition: an accepted value is returned as it came.
        assertThat(Checks.finite(-3.5, "x")).isEqualTo(-3.5);
        assertThat(Checks.positiveFinite(Double.MIN_VALUE, "x")).isEqualTo(Double.MIN_VALUE);
        assertThat(Checks.nonNegativeFinite(0.0, "x")).isEqualTo(0.0);
        assertThat(Checks.inOpenInterval(0.49, -1, 0.5, "x")).isEqualTo(0.49);
        assertThat(Checks.atLeastFinite(-273.15, -273.15, "x")).isEqualTo(-273.15);
    }

    @Test
    void blockChecksNullsAndRanges() {
        double[] a = new double[4];
        Checks.block(a, 0, a, 0, 4);
        Checks.block(a, 4, a, 4, 0);
        assertThatThrownBy(() -> Checks.block(null, 0, a, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("src");
        assertThatThrownBy(() -> Checks.block(a, 0, null, 0, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("dst");
        assertThatThrownBy(() -> Checks.block(a, 1, a, 0, 4))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> Checks.block(a, 0, a, -1, 2))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> Checks.block(a, 0, a, 0, -1))
                .isInstanceOf(IndexOutOfBoundsException.class);
    }
}
