package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;

import java.lang.module.ModuleDescriptor;

import org.junit.jupiter.api.Test;

/** Core exports its API packages and nothing else (DESIGN.md, layout). */
class ModuleLayoutTest {

    @Test
    void coreExportsOnlyItsApiPackages() {
        ModuleDescriptor descriptor = Checks.class.getModule().getDescriptor();
        assertThat(descriptor).as("tests run on the module path").isNotNull();
        assertThat(descriptor.name()).isEqualTo("org.strainmath.core");
        assertThat(descriptor.exports()).extracting(ModuleDescriptor.Exports::source)
                .containsExactlyInAnyOrder("org.strainmath.quantity", "org.strainmath.bridge",
                        "org.strainmath.material");
        assertThat(descriptor.packages()).contains("org.strainmath.internal");
        assertThat(descriptor.requires()).extracting(ModuleDescriptor.Requires::name)
                .containsExactly("java.base");
    }
}
