package org.strainmath.calibration;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.module.ModuleDescriptor;
import java.lang.module.ModuleDescriptor.Requires;

import org.junit.jupiter.api.Test;
import org.strainmath.quantity.Strain;

/** The module stands on core, as the layering of the design says, and exports its API package. */
class ModuleLayoutTest {

    @Test
    void moduleReadsCoreTransitivelyAndExportsItsApi() {
        ModuleDescriptor descriptor = ModuleLayoutTest.class.getModule().getDescriptor();
        assertThat(descriptor).as("tests run on the module path").isNotNull();
        assertThat(descriptor.name()).isEqualTo("org.strainmath.calibration");
        assertThat(descriptor.requires())
                .filteredOn(r -> r.name().equals("org.strainmath.core"))
                .singleElement()
                .satisfies(r -> assertThat(r.modifiers()).contains(Requires.Modifier.TRANSITIVE));
        assertThat(descriptor.exports()).extracting(ModuleDescriptor.Exports::source)
                .containsExactlyInAnyOrder("org.strainmath.calibration", "org.strainmath.uncertainty");
    }

    @Test
    void coreQuantitiesAreReadable() {
        // Definition: 250 µε read back as given.
        assertThat(ModuleLayoutTest.class.getModule().canRead(Strain.class.getModule())).isTrue();
        assertThat(Strain.ofMicrostrain(250).toMicrostrain()).isEqualTo(250.0);
    }
}
