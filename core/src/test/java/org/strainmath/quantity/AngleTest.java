package org.strainmath.quantity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

class AngleTest {

    @Test
    void degreesAndRadians() {
        // π/180 rad per degree (SI Brochure, 9th ed., table 4).
        assertThat(Angle.ofDegrees(180).toRadians()).isEqualTo(Math.PI);
        assertThat(Angle.ofDegrees(45).toRadians()).isCloseTo(Math.PI / 4, within(1e-16));
        assertThat(Angle.ofRadians(Math.PI / 2).toDegrees()).isEqualTo(90.0);
        assertThat(Angle.ofDegrees(30).plus(Angle.ofDegrees(15)).toDegrees()).isCloseTo(45, within(1e-13));
        assertThat(Angle.ofDegrees(30).minus(Angle.ofDegrees(45)).toDegrees()).isCloseTo(-15, within(1e-13));
        assertThat(Angle.ofDegrees(30).negated()).isEqualTo(Angle.ofDegrees(-30));
        assertThat(Angle.ofDegrees(45)).hasToString("45.0°");
        assertThat(Angle.ofDegrees(-25.2873)).hasToString("-25.2873°");
        assertThat(Angle.ZERO).isEqualTo(Angle.ofRadians(-0.0)).hasSameHashCodeAs(Angle.ofRadians(-0.0))
                .isNotEqualTo("0°");
        assertThat(Angle.ofDegrees(10)).isLessThan(Angle.ofDegrees(20));
    }

    @Test
    void nonFiniteAnglesAreRefused() {
        assertThatThrownBy(() -> Angle.ofDegrees(Double.NaN)).hasMessage("degrees must be finite: NaN");
        assertThatThrownBy(() -> Angle.ofRadians(Double.POSITIVE_INFINITY))
                .hasMessage("radians must be finite: Infinity");
    }
}
