/**
 * Fatigue damage of counted cycles: S–N curves in stress ranges (Basquin, with a knee, a second
 * slope and a cut-off as the design codes draw them), mean-stress corrections (Goodman, Gerber,
 * Morrow, Smith–Watson–Topper), the Coffin–Manson–Basquin strain–life curve with Morrow's or
 * SWT's correction solved per cycle, and Palmgren–Miner summation, batch
 * ({@link org.strainmath.fatigue.FatigueLife#damage}) or streaming
 * ({@link org.strainmath.fatigue.DamageSum}, fed by a rainflow counter of
 * {@link org.strainmath.history}).
 *
 * <p>Units: stresses in pascals (shown as MPa), strains in m/m, lives in cycles (reversals
 * where a method says so).
 *
 * <p><b>Caution.</b> A damage sum is an estimate with a large scatter: lives of nominally equal
 * parts differ by factors of several, and the linear rule ignores the order of the cycles. The
 * curves, detail categories, partial factors and damage limits come from the design code that
 * applies to the structure; the decisions they feed belong to a qualified engineer under that
 * code. No material or detail data is built in: enter them from the code or the data sheet.
 */
package org.strainmath.fatigue;
