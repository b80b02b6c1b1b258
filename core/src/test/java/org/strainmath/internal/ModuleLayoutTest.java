package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.module.ModuleDescriptor;

import org.junit.jupiter.api.Test;

/** Core exports its API packages, and its internals only to the library's modules (DESIGN.md, layout). */
class ModuleLayoutTest {

    @Test
    void coreExportsOnlyItsApiPackages() {
        ModuleDescriptor descriptor = Checks.class.getModule().getDescriptor();
        assertThat(descriptor).as("tests run on the module path").isNotNull();
        assertThat(descriptor.name()).isEqualTo("org.strainmath.core");
        assertThat(descriptor.exports()).filteredOn(e -> !e.isQualified())
                .extracting(ModuleDescriptor.Exports::source)
                .containsExactlyInAnyOrder("org.strainmath.quantity", "org.strainmath.bridge",
                        "org.strainmath.material", "org.strainmath.history", "org.strainmath.fatigue");
        // The internals go to the library's own modules only.
        assertThat(descriptor.exports()).filteredOn(ModuleDescriptor.Exports::isQualified)
                .singleElement().satisfies(e -> {
                    assertThat(e.source()).isEqualTo("org.strainmath.internal");
                    assertThat(e.targets()).containsExactlyInAnyOrder("org.strainmath.rosette",
                            "org.strainmath.calibration");
                });
        assertThat(descriptor.packages()).contains("org.strainmath.internal");
        assertThat(descriptor.requires()).extracting(ModuleDescriptor.Requires::name)
                .containsExactly("java.base");
    }
}
