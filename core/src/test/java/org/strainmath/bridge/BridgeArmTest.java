package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.strainmath.quantity.Resistance;

class BridgeArmTest {

    private static final StrainGauge GAUGE = StrainGauge.ofOhms(120, 2.0);

    @Test
    void kindsAndText() {
        // Definition: the arm's kinds and strain multiples as given; the text is the library's own.
        BridgeArm active = BridgeArm.active(GAUGE, -0.3);
        assertThat(active.isActive()).isTrue();
        assertThat(active.isDummy()).isFalse();
        assertThat(active.isCompletion()).isFalse();
        assertThat(active.strainMultiple()).isEqualTo(-0.3);
        assertThat(active.gauge()).contains(GAUGE);
        assertThat(active).hasToString("active gauge ×-0.3 (120.0 Ω, K=2.0)");

        BridgeArm dummy = BridgeArm.dummy(GAUGE);
        assertThat(dummy.isDummy()).isTrue();
        assertThat(dummy.isActive()).isFalse();
        assertThat(dummy.isCompletion()).isFalse();
        assertThat(dummy.strainMultiple()).isZero();
        assertThat(dummy).hasToString("dummy gauge (120.0 Ω, K=2.0)");

        BridgeArm completion = BridgeArm.completion(Resistance.ofOhms(350));
        assertThat(completion.isCompletion()).isTrue();
        assertThat(completion.gauge()).isEmpty();
        assertThat(completion.nominalResistance().toOhms()).isEqualTo(350.0);
        assertThat(completion).hasToString("completion resistor 350.0 Ω");
    }

    @Test
    void armsWithTheSameKindAndDataAreEqual() {
        assertThat(BridgeArm.active(GAUGE, -0.3)).isEqualTo(BridgeArm.active(GAUGE, -0.3))
                .hasSameHashCodeAs(BridgeArm.active(GAUGE, -0.3))
                .isNotEqualTo(BridgeArm.active(GAUGE, 0.3))
                .isNotEqualTo(BridgeArm.dummy(GAUGE))
                .isNotEqualTo(GAUGE);
        assertThat(BridgeArm.dummy(GAUGE))
                .isNotEqualTo(BridgeArm.completion(GAUGE.nominalResistance()));
        assertThat(BridgeArm.completion(Resistance.ofOhms(120)))
                .isEqualTo(BridgeArm.completion(Resistance.ofOhms(120)));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void strainMultipleMustBeFinite(double bad) {
        assertThatThrownBy(() -> BridgeArm.active(GAUGE, bad))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strainMultiple must be finite: " + bad);
    }

    @Test
    void badArmsAreRejected() {
        assertThatThrownBy(() -> BridgeArm.active(GAUGE, 0))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("strainMultiple must be != 0 (use a dummy gauge): 0.0");
        assertThatThrownBy(() -> BridgeArm.active(null, 1))
                .isInstanceOf(NullPointerException.class).hasMessage("gauge");
        assertThatThrownBy(() -> BridgeArm.dummy(null))
                .isInstanceOf(NullPointerException.class).hasMessage("gauge");
        assertThatThrownBy(() -> BridgeArm.completion(null))
                .isInstanceOf(NullPointerException.class).hasMessage("resistance");
        assertThatThrownBy(() -> BridgeArm.completion(Resistance.ZERO))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("resistance must be > 0 and finite: 0.0");
    }
}
