package org.strainmath.history;

import java.util.Objects;

/**
 * Takes the cycles a rainflow count finds, one call per cycle, in the order they are found:
 * a {@link RangeHistogram}, a {@link RangeMeanMatrix}, a {@link FromToMatrix}, a
 * {@link LevelCrossings} tally, a damage sum of {@code org.strainmath.fatigue}, or code of the
 * caller's own.
 *
 * <pre>
 *   RangeHistogram ranges = RangeHistogram.of(Bins.uniform(0, 2000e-6, 20));
 *   DamageSum damage = life.newDamageSum();
 *   RainflowCounter counter = Rainflow.astm().newCounter(ranges.andThen(damage));
 * </pre>
 *
 * <p>A cycle is given by its two turning points in the order of the history, {@code from} and
 * then {@code to}, in the unit of the history (m/m for strain, Pa for stress), and its
 * {@code count}: 1 for a full (closed) cycle, from → to → from, and 0.5 for a half cycle, the
 * one reversal from → to. Its range is |to − from| and its mean (from + to)/2.
 *
 * <p>A streaming counter calls {@link #accept} from its per-sample path: an implementation
 * should neither allocate nor throw there.
 */
@FunctionalInterface
public interface CycleConsumer {

    /**
     * Takes one cycle.
     *
     * @param from  the first turning point of the cycle
     * @param to    the second turning point
     * @param count 1 for a full cycle, 0.5 for a half cycle
     */
    void accept(double from, double to, double count);

    /**
     * A consumer that passes each cycle to this one and then to {@code next}.
     *
     * @throws NullPointerException if {@code next} is null
     */
    default CycleConsumer andThen(CycleConsumer next) {
        Objects.requireNonNull(next, "next");
        return (from, to, count) -> {
            accept(from, to, count);
            next.accept(from, to, count);
        };
    }
}
