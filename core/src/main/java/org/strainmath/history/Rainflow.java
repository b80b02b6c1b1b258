package org.strainmath.history;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;

/**
 * Rainflow cycle counting of a history of strain or stress, as ASTM E1049-85 (reapproved 2017),
 * <i>Standard Practices for Cycle Counting in Fatigue Analysis</i>, section 5.4, describes it:
 * the configuration of a count (a hysteresis gate and what to do with the residue), with a
 * batch count over an array and a streaming counter for a gateway that gives the same cycles
 * for any split of the history into blocks.
 *
 * <pre>
 *   Rainflow rainflow = Rainflow.astm().withGate(5e-6);        // reversals of 5 µε or less are noise
 *   Cycles cycles = rainflow.count(strain);                     // batch
 *   RainflowCounter counter = rainflow.newCounter(histogram);   // streaming
 *   counter.accept(block, 0, block.length);
 * </pre>
 *
 * <p>The count, ASTM E1049-85 5.4.4 (the three-point method; S is the starting point, X the
 * range under consideration, Y the previous range adjacent to X):
 * <pre>
 *   1. read the next turning point; at the end of the data go to 6
 *   2. with fewer than three points go to 1; form X and Y from the three most recent points
 *      not discarded
 *   3. if X &lt; Y go to 1
 *   4. if Y contains S go to 5; else count Y as one cycle, discard its two points, go to 2
 *   5. count Y as one half cycle, discard its first point, move S to its second point, go to 2
 *   6. count each range not yet counted as one half cycle
 * </pre>
 * The turning points come from the history through a hysteresis gate (see
 * {@link TurningPointFilter}): a reversal is kept only if the history then moves more than the
 * gate away from it, so noise of less than the gate makes no cycles. The first sample of the
 * history is its first turning point and the last extreme its last. Samples that are not finite
 * (NaN from a kernel for a reading with no physical strain, or an infinity) are skipped and
 * counted.
 *
 * <p>The residue (the points left at step 6) is treated as {@link Residue} says: as half
 * cycles (the standard's step 6, the default), closed into full cycles as if the history
 * repeated (5.4.3), or left uncounted.
 *
 * <p>Values are in the unit of the history; the count does not need to know it. Immutable and
 * thread-safe; the counters it makes are not. Serializable, for a stream engine that ships
 * configurations to other processes (a counter's state has a byte form of its own).
 */
public final class Rainflow implements Serializable {

    /** What a count does with the residue, the turning points no closed cycle took. */
    public enum Residue {
        /**
         * ASTM E1049-85 5.4.4 as written: a range that contains the starting point is a half
         * cycle when it is passed (step 5), and every range left at the end is a half cycle
         * (step 6). The default.
         */
        HALF_CYCLES,
        /**
         * The history is one period of a repeating history, as ASTM E1049-85 5.4.3 counts one
         * (the simplified method for repeating histories): every cycle is full. Cycles that
         * close are counted as the history goes (the four-point form of the same rule: a range
         * is a cycle when neither neighbour is smaller); the residue left at the end is then
         * counted as 5.4.3 does, joined end to start and begun at its point of largest absolute
         * value, through the same gate. The cycles equal 5.4.3's of the whole history.
         */
        REPEATED,
        /**
         * Only cycles that close are counted (the four-point form); the residue is left
         * uncounted, for a caller who keeps it and joins it to the next record.
         */
        DISCARDED
    }

    private static final Rainflow ASTM = new Rainflow(0.0, Residue.HALF_CYCLES);

    private final double gate;
    private final Residue residue;

    private Rainflow(double gate, Residue residue) {
        this.gate = gate;
        this.residue = residue;
    }

    /** The count of ASTM E1049-85 5.4.4: no gate (every strict reversal), residue as half cycles. */
    public static Rainflow astm() {
        return ASTM;
    }

    /**
     * A copy with the hysteresis gate {@code gate}, in the unit of the history: reversals of
     * that range or less are dropped as noise. Set it above the noise of the channel (a few
     * times its RMS) and well below the smallest range that matters for damage.
     *
     * @throws IllegalArgumentException if {@code gate} is negative or not finite
     */
    public Rainflow withGate(double gate) {
        return new Rainflow(Checks.nonNegativeFinite(gate, "gate") + 0.0, residue);
    }

    /**
     * A copy that treats the residue as {@code residue} says.
     *
     * @throws NullPointerException if {@code residue} is null
     */
    public Rainflow withResidue(Residue residue) {
        return new Rainflow(gate, Objects.requireNonNull(residue, "residue"));
    }

    /** The hysteresis gate, in the unit of the history. */
    public double gate() {
        return gate;
    }

    /** What the count does with the residue. */
    public Residue residue() {
        return residue;
    }

    /**
     * Counts the whole {@code history}.
     *
     * @throws NullPointerException     if {@code history} is null
     * @throws IllegalArgumentException if it holds no finite sample
     */
    public Cycles count(double[] history) {
        Objects.requireNonNull(history, "history");
        return count(history, 0, history.length);
    }

    /**
     * Counts {@code history[off, off + len)}: the cycles a {@link RainflowCounter} gives for the
     * same samples, followed by those of its residue.
     *
     * @throws NullPointerException      if {@code history} is null
     * @throws IndexOutOfBoundsException if the range is outside the array
     * @throws IllegalArgumentException  if the range holds no finite sample
     */
    public Cycles count(double[] history, int off, int len) {
        Objects.requireNonNull(history, "history");
        Objects.checkFromIndexSize(off, len, history.length);
        Cycles.Collector collector = new Cycles.Collector();
        RainflowCounter counter = new RainflowCounter(this, collector);
        int skipped = counter.accept(history, off, len);
        if (skipped == len) {
            throw new IllegalArgumentException("history must hold a finite sample: " + len
                    + " samples, " + skipped + " not finite");
        }
        counter.residueTo(collector);
        return collector.toCycles(skipped);
    }

    /**
     * A streaming counter of this configuration that passes each cycle to {@code consumer}.
     *
     * @throws NullPointerException if {@code consumer} is null
     */
    public RainflowCounter newCounter(CycleConsumer consumer) {
        return new RainflowCounter(this, Objects.requireNonNull(consumer, "consumer"));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Rainflow && Double.compare(((Rainflow) o).gate, gate) == 0
                && ((Rainflow) o).residue == residue;
    }

    @Override
    public int hashCode() {
        return 31 * Double.hashCode(gate) + residue.hashCode();
    }

    /** {@code Rainflow[ASTM E1049-85 5.4.4, gate 5.0e-6, residue as half cycles]}. */
    @Override
    public String toString() {
        String treatment;
        switch (residue) {
            case REPEATED:
                treatment = "residue closed as a repeating history (5.4.3)";
                break;
            case DISCARDED:
                treatment = "residue not counted";
                break;
            default:
                treatment = "residue as half cycles";
        }
        return "Rainflow[ASTM E1049-85 5.4.4, gate " + Format.number(gate) + ", " + treatment
                + "]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(gate, residue);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("Rainflow");
    }

    /**
     * The serial form of a Rainflow: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double gate;
        private final Residue residue;

        Serial(double gate, Residue residue) {
            this.gate = gate;
            this.residue = residue;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("Rainflow", () -> {
                return astm().withGate(gate).withResidue(residue);
            });
        }
    }
}
