package org.strainmath.calibration;

import java.util.Objects;

import org.strainmath.quantity.Resistance;

/**
 * Preferred-number series of resistor values (IEC 60063): the values of one decade, repeated
 * in every decade. E96 holds the 1 % values and E192 the 0.5 % and finer ones.
 *
 * <p>The tables are from memory. Each value is 10^(i/n) rounded to three significant digits
 * (the construction rule of the series), which reproduces every E96 value and every E192 value
 * but one: the standard lists 920 where the rule gives 919 (from memory). The tests check the
 * tables against that rule.
 */
public enum ResistorSeries {

    /** 96 values per decade (1 % tolerance). */
    E96(new int[] {100, 102, 105, 107, 110, 113, 115, 118, 121, 124, 127, 130, 133, 137, 140,
        143, 147, 150, 154, 158, 162, 165, 169, 174, 178, 182, 187, 191, 196, 200, 205, 210, 215,
        221, 226, 232, 237, 243, 249, 255, 261, 267, 274, 280, 287, 294, 301, 309, 316, 324, 332,
        340, 348, 357, 365, 374, 383, 392, 402, 412, 422, 432, 442, 453, 464, 475, 487, 499, 511,
        523, 536, 549, 562, 576, 590, 604, 619, 634, 649, 665, 681, 698, 715, 732, 750, 768, 787,
        806, 825, 845, 866, 887, 909, 931, 953, 976}),

    /** 192 values per decade (0.5 %, 0.25 % and 0.1 % tolerances). */
    E192(new int[] {100, 101, 102, 104, 105, 106, 107, 109, 110, 111, 113, 114, 115, 117, 118,
        120, 121, 123, 124, 126, 127, 129, 130, 132, 133, 135, 137, 138, 140, 142, 143, 145, 147,
        149, 150, 152, 154, 156, 158, 160, 162, 164, 165, 167, 169, 172, 174, 176, 178, 180, 182,
        184, 187, 189, 191, 193, 196, 198, 200, 203, 205, 208, 210, 213, 215, 218, 221, 223, 226,
        229, 232, 234, 237, 240, 243, 246, 249, 252, 255, 258, 261, 264, 267, 271, 274, 277, 280,
        284, 287, 291, 294, 298, 301, 305, 309, 312, 316, 320, 324, 328, 332, 336, 340, 344, 348,
        352, 357, 361, 365, 370, 374, 379, 383, 388, 392, 397, 402, 407, 412, 417, 422, 427, 432,
        437, 442, 448, 453, 459, 464, 470, 475, 481, 487, 493, 499, 505, 511, 517, 523, 530, 536,
        542, 549, 556, 562, 569, 576, 583, 590, 597, 604, 612, 619, 626, 634, 642, 649, 657, 665,
        673, 681, 690, 698, 706, 715, 723, 732, 741, 750, 759, 768, 777, 787, 796, 806, 816, 825,
        835, 845, 856, 866, 876, 887, 898, 909, 920, 931, 942, 953, 965, 976, 988});

    private final int[] decade;

    ResistorSeries(int[] decade) {
        this.decade = decade;
    }

    /** The values of one decade, 100 to 988 (a new array). */
    public int[] decadeValues() {
        return decade.clone();
    }

    /**
     * The value of this series nearest to {@code resistance} in ratio (the series are spaced
     * evenly in ratio), the lower one on a tie.
     *
     * @throws NullPointerException     if {@code resistance} is null
     * @throws IllegalArgumentException if the resistance is not positive
     */
    public Resistance nearest(Resistance resistance) {
        double ohms = Objects.requireNonNull(resistance, "resistance").toOhms();
        if (!(ohms > 0)) {
            throw new IllegalArgumentException("resistance must be > 0: " + resistance);
        }
        int exponent = (int) Math.floor(Math.log10(ohms)) - 2;
        double best = Double.NaN;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int shift = -1; shift <= 1; shift++) {
            double scale = Math.pow(10, exponent + shift);
            for (int value : decade) {
                double candidate = value * scale;
                double distance = Math.abs(Math.log(candidate / ohms));
                if (distance < bestDistance) {
                    best = candidate;
                    bestDistance = distance;
                }
            }
        }
        // Rounded to the series' three digits, without the binary residue of the scaling.
        return Resistance.ofOhms(Double.parseDouble(String.format(java.util.Locale.ROOT, "%.3g", best)));
    }
}
