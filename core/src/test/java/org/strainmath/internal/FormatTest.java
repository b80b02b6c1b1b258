package org.strainmath.internal;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class FormatTest {

    // Expected texts written by hand from the rule in Format's class comment.
    @ParameterizedTest
    @CsvSource({
        "250, 250.0",
        "-208.33333333, -208.333",
        "0.06, 0.06",
        "1025, 1025.0",
        "6894.757293168361, 6894.76",
        "1.5e-12, 1.5e-12",
        "-2.5e-5, -2.5e-5",
        "1e-4, 0.0001",
        "123456789, 123457000.0",
        "1e9, 1.0e9",
        "3.0e12, 3.0e12",
        "0, 0.0",
        "-0.0, -0.0",
        "NaN, NaN",
        "Infinity, Infinity"})
    void numbersReadAsAPersonWritesThem(double x, String expected) {
        assertThat(Format.number(x)).isEqualTo(expected);
    }

    @ParameterizedTest
    @CsvSource({"250, µε, 250.0 µε", "0.4995, mV/V, 0.4995 mV/V"})
    void unitFollowsAfterASpace(double x, String unit, String expected) {
        assertThat(Format.withUnit(x, unit)).isEqualTo(expected);
    }
}
