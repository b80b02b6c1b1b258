package org.strainmath.rosette;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Near an equal-biaxial state the principal direction is either well defined or flagged, never
 * a random angle. Oracle: the transformation equations (any mechanics-of-materials text): with
 * rectangular readings (a, a + d, a), εx = εy = a and γxy = 2d, so the principal directions lie
 * at ±45° exactly, ε1 at +45° for d > 0 and at −45° for d < 0, and the Mohr radius is |d|.
 */
class NearEqualBiaxialTest {

    private static final Rosette RECTANGULAR = Rosette.rectangular();

    @ParameterizedTest
    @ValueSource(doubles = {1, 1e-3, 1e-6, 1e-8})
    void aSmallShearStillGivesTheExactDirection(double d) {
        // d down to 1e-10 of the centre (1e-8 µε on 100 µε) is above the flag's 1e-12 and the
        // direction comes out exactly: atan2 of a positive shear over a zero difference.
        PrincipalStrains up = RECTANGULAR.reduceMicrostrain(100, 100 + d, 100).principal();
        PrincipalStrains down = RECTANGULAR.reduceMicrostrain(100, 100 - d, 100).principal();
        assertThat(up.angle().orElseThrow().toDegrees()).isCloseTo(45.0, within(1e-9));
        assertThat(down.angle().orElseThrow().toDegrees()).isCloseTo(-45.0, within(1e-9));
        assertThat(up.e1().toMicrostrain() - up.e2().toMicrostrain())
                .isCloseTo(2 * d, within(1e-12 * 100 + 1e-9 * d));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, 1e-11, -1e-11, 1e-13})
    void belowTheFlagsThresholdTheStateIsEqualBiaxial(double d) {
        // A radius of at most 1e-12 of the centre (1e-10 µε here) is below what three readings
        // can resolve in double arithmetic after the reduction's roundings: flagged, no angle.
        PrincipalStrains p = RECTANGULAR.reduceMicrostrain(100, 100 + d, 100).principal();
        assertThat(p.hasDirection()).isFalse();
        assertThat(p.angle()).isEmpty();
        assertThat(p.e1().toMicrostrain()).isCloseTo(100, within(1e-9));
    }
}
