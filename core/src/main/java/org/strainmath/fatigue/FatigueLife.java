package org.strainmath.fatigue;

import java.util.Objects;

import org.strainmath.history.Cycles;

/**
 * A fatigue-life model of one cycle: the cycles to failure of a cycle between two turning
 * points of a history, for Palmgren–Miner summation. {@link StressLife} (an S–N curve with a
 * mean-stress correction) reads stress histories in Pa; {@link StrainLife} (Coffin–Manson–
 * Basquin) reads strain histories in m/m.
 *
 * <p>Palmgren–Miner's rule: failure is expected when D = Σ nᵢ/Nᵢ reaches 1 (Miner, 1945,
 * <i>Cumulative damage in fatigue</i>, J. Appl. Mech. 12; the linear rule is common practice
 * in the design codes, which set their own limits on D). D is an estimate with a large scatter:
 * the life of nominally equal parts under one history varies by factors of several, and the
 * rule ignores the order of the cycles.
 *
 * <p>Implementations are immutable and thread-safe, and {@link #cyclesToFailure} never throws.
 */
public interface FatigueLife {

    /**
     * The cycles to failure of a cycle between the turning points {@code from} and
     * {@code to}, in the unit of the history the model reads: +∞ for a cycle that does no
     * damage, 0 for one the model gives no life, NaN for an argument that is not finite.
     * Never throws.
     */
    double cyclesToFailure(double from, double to);

    /**
     * The Palmgren–Miner damage D = Σ nᵢ/Nᵢ of {@code cycles}, summed with compensation.
     *
     * @throws NullPointerException if {@code cycles} is null
     */
    default double damage(Cycles cycles) {
        Objects.requireNonNull(cycles, "cycles");
        DamageSum sum = DamageSum.of(this);
        cycles.forEach(sum);
        return sum.damage();
    }

    /** A streaming damage sum of this model, at zero. */
    default DamageSum newDamageSum() {
        return DamageSum.of(this);
    }
}
