package org.strainmath.fatigue;

import java.nio.ByteBuffer;
import java.util.Objects;

import org.strainmath.history.CycleConsumer;
import org.strainmath.internal.Format;
import org.strainmath.internal.StateBytes;

/**
 * A running Palmgren–Miner sum, D = Σ nᵢ/Nᵢ, over the cycles a rainflow count passes to it,
 * with Nᵢ from a {@link FatigueLife}. The sum is compensated (Neumaier's variant of Kahan
 * summation), so that 10⁹ cycles of small damage keep their last digits.
 *
 * <pre>
 *   DamageSum damage = life.newDamageSum();
 *   RainflowCounter counter = Rainflow.astm().newCounter(damage);
 *   counter.accept(stress, 0, n);
 *   damage.damage();          // D so far (closed cycles; add counter.residueTo(...) for the rest)
 * </pre>
 *
 * <p>D is an estimate with a large scatter (see {@link FatigueLife}): read it against the limit
 * and the partial factors of the design code that applies, and leave the judgement of a
 * structure to a qualified engineer.
 *
 * <p>Byte form ({@link #toBytes}): tag {@code SMDS}, version, the damage sum and its
 * compensation term, the cycles and the cycles that did no damage (four doubles), big-endian;
 * the model is configuration and is given again to {@link #fromBytes}.
 *
 * <p>Mutable: a streaming accumulator, not thread-safe. {@link #accept} neither allocates nor
 * throws.
 */
public final class DamageSum implements CycleConsumer {

    private static final String TAG = "SMDS";

    private final FatigueLife life;
    private double sum;
    private double compensation;
    private double cycles;
    private double harmless;

    private DamageSum(FatigueLife life) {
        this.life = life;
    }

    /**
     * A sum at zero over the model {@code life}.
     *
     * @throws NullPointerException if {@code life} is null
     */
    public static DamageSum of(FatigueLife life) {
        return new DamageSum(Objects.requireNonNull(life, "life"));
    }

    /** Adds the damage {@code count}/N of one cycle. */
    @Override
    public void accept(double from, double to, double count) {
        double n = life.cyclesToFailure(from, to);
        cycles += count;
        if (n == Double.POSITIVE_INFINITY) {
            harmless += count;
            return;
        }
        add(count / n);
    }

    private void add(double x) {
        double t = sum + x;
        if (t - t != 0) {
            // an infinite term (a cycle with no life) or NaN: no rounding error to keep
            sum = t;
            return;
        }
        compensation += Math.abs(sum) >= Math.abs(x) ? (sum - t) + x : (x - t) + sum;
        sum = t;
    }

    /**
     * Adds the sum of {@code other}, over the same model (two channels' parts of one history,
     * two windows).
     *
     * @throws NullPointerException     if {@code other} is null
     * @throws IllegalArgumentException if the models differ
     */
    public void addAll(DamageSum other) {
        Objects.requireNonNull(other, "other");
        if (!other.life.equals(life)) {
            throw new IllegalArgumentException("other must sum over " + life + ": "
                    + other.life);
        }
        add(other.sum);
        add(other.compensation);
        cycles += other.cycles;
        harmless += other.harmless;
    }

    /** The damage D so far. */
    public double damage() {
        return sum + compensation;
    }

    /** The cycles summed (a half cycle counts 0.5). */
    public double cycles() {
        return cycles;
    }

    /** The cycles that did no damage (below the curve's cut-off, or SWT with no tension). */
    public double harmlessCycles() {
        return harmless;
    }

    /** The model. */
    public FatigueLife life() {
        return life;
    }

    /** The compact byte form (see the class comment). */
    public byte[] toBytes() {
        ByteBuffer b = StateBytes.writer(TAG, 32);
        b.putDouble(sum);
        b.putDouble(compensation);
        b.putDouble(cycles);
        b.putDouble(harmless);
        return b.array();
    }

    /**
     * The sum {@link #toBytes} wrote, over {@code life}.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code state} is not such a form
     */
    public static DamageSum fromBytes(FatigueLife life, byte[] state) {
        DamageSum d = of(life);
        ByteBuffer b = StateBytes.reader(state, TAG);
        d.sum = StateBytes.getDouble(b, 0, "damage");
        d.compensation = StateBytes.getDouble(b, Double.NEGATIVE_INFINITY, "compensation");
        d.cycles = StateBytes.getDouble(b, 0, "cycles");
        d.harmless = StateBytes.getDouble(b, 0, "harmless cycles");
        StateBytes.end(b);
        return d;
    }

    /**
     * {@code DamageSum[D = 0.0123 over 1520.5 cycles (an estimate: fatigue lives scatter
     * widely)]}.
     */
    @Override
    public String toString() {
        return "DamageSum[D = " + Format.number(damage()) + " over " + Format.number(cycles)
                + " cycles (an estimate: fatigue lives scatter widely)]";
    }
}
