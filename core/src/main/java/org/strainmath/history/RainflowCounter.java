package org.strainmath.history;

import java.nio.ByteBuffer;
import java.util.Arrays;
import java.util.Objects;

import org.strainmath.internal.StateBytes;

/**
 * A streaming rainflow counter for a gateway: takes samples one at a time or in blocks, passes
 * each cycle to its {@link CycleConsumer} as soon as it is counted, and keeps only the residue
 * (the turning points no cycle has taken yet) and a reversal detector. The cycles are those
 * {@link Rainflow#count} gives for the same samples, whatever the split into blocks; the
 * residue's cycles follow on {@link #residueTo}.
 *
 * <pre>
 *   RangeHistogram ranges = RangeHistogram.of(Bins.uniform(0, 1000e-6, 20));
 *   RainflowCounter counter = Rainflow.astm().withGate(5e-6).newCounter(ranges);
 *   int skipped = counter.accept(strain, 0, n);   // per block: NaN samples are skipped
 *   byte[] saved = counter.toBytes();              // before the process stops
 *   RainflowCounter again = RainflowCounter.fromBytes(saved, ranges);
 * </pre>
 *
 * <p><b>Memory and speed.</b> Per sample, a few comparisons; per turning point, a push and the
 * comparisons of the count. The residue is the only storage that grows: with the residue as
 * half cycles its ranges decrease strictly from the oldest point to the newest, otherwise they
 * rise and then fall, so it holds a few dozen points for a real signal whatever the length of
 * the history. Its array grows by doubling when it must and never shrinks, so that in steady
 * state neither {@link #accept} nor {@link #residueTo} allocates.
 *
 * <p><b>Saved state.</b> {@link #toBytes} writes the configuration, the counts of samples, the
 * reversal detector and the residue, big-endian: tag {@code SMRC}, version 1, the residue
 * treatment (a byte: 0 half cycles, 1 repeated, 2 discarded), the gate (double), the finite
 * samples, the skipped samples and the turning points (three longs), the detector's phase (a
 * byte: 0 no sample, 1 before the first move past the gate, 2 rising, 3 falling) and its open
 * extreme (double), then the residue (an int count and doubles, oldest first). That is
 * 51 + 8·n bytes for a residue of n points. {@link #fromBytes} checks each field and the shape
 * of the residue. The consumer's own state (a histogram, a damage sum) is saved by the
 * consumer.
 *
 * <p>Mutable: not thread-safe; give each channel its own counter. Per-sample calls never throw.
 */
public final class RainflowCounter {

    private static final String TAG = "SMRC";
    private static final Rainflow.Residue[] RESIDUES = Rainflow.Residue.values();

    private final Rainflow rainflow;
    private final boolean threePoint;
    private final CycleConsumer consumer;
    private final Reversals reversals;
    /** A one-sample block for {@link #accept(double)}, so that both share the block loop. */
    private final double[] one = new double[1];
    /**
     * The turning points of a stretch of a block (at most one per sample), pushed after the
     * detector's loop: 8 KiB, so that a block of 4096 samples takes four stretches.
     */
    private final double[] turning = new double[1024];
    /** The detector of the repeated residue's round, reused. */
    private final Reversals round;
    /** The residue: stack[base, top), oldest first. base > 0 only in the three-point form. */
    private double[] stack;
    private int base;
    private int top;
    private long samples;
    private long skipped;
    private long turningPoints;
    /** Room for residueTo: a copy of the residue, and the repeated residue's own count. */
    private double[] saved = new double[0];
    private double[] ring = new double[0];

    RainflowCounter(Rainflow rainflow, CycleConsumer consumer) {
        this.rainflow = rainflow;
        this.threePoint = rainflow.residue() == Rainflow.Residue.HALF_CYCLES;
        this.consumer = consumer;
        this.reversals = new Reversals(rainflow.gate());
        this.round = new Reversals(rainflow.gate());
        this.stack = new double[32];
    }

    /**
     * Takes one sample; a sample that is not finite is skipped and counted. Never throws;
     * allocation-free in steady state.
     */
    public void accept(double sample) {
        one[0] = sample;
        accept(one, 0, 1);
    }

    /**
     * Takes {@code len} samples of {@code src} from {@code srcOff}, in order; samples that are
     * not finite are skipped. Allocation-free in steady state; the same cycles as sample by
     * sample.
     *
     * @return the number of samples of this block that were skipped
     * @throws NullPointerException      if {@code src} is null
     * @throws IndexOutOfBoundsException if the range is outside {@code src}
     */
    public int accept(double[] src, int srcOff, int len) {
        Objects.requireNonNull(src, "src");
        Objects.checkFromIndexSize(srcOff, len, src.length);
        Reversals r = reversals;
        double[] found = turning;
        int end = srcOff + len;
        for (int i = srcOff; i < end; i += found.length) {
            r.scan(src, i, Math.min(end, i + found.length), 0, found, null, 0);
            for (int k = 0, n = r.written; k < n; k++) {
                push(found[k], consumer);
            }
        }
        int bad = r.takeSkipped();
        samples += len - bad;
        skipped += bad;
        return bad;
    }

    /**
     * Passes the cycles of the residue to {@code out}, as if the history ended here: the last
     * open extreme is read as the final turning point (which may still close cycles), and the
     * points left are counted as the {@link Rainflow.Residue} of the configuration says. The
     * counter's state does not change, so counting goes on afterwards as before; a report of
     * "the count so far" is what the consumer holds plus what this gives.
     *
     * @throws NullPointerException if {@code out} is null
     */
    public void residueTo(CycleConsumer out) {
        Objects.requireNonNull(out, "out");
        int savedBase = base;
        int savedTop = top;
        long savedTurningPoints = turningPoints;
        if (saved.length < stack.length) {
            saved = new double[stack.length];
        }
        System.arraycopy(stack, base, saved, 0, top - base);
        if (reversals.hasPending()) {
            push(reversals.candidate, out);
        }
        switch (rainflow.residue()) {
            case HALF_CYCLES:
                for (int i = base; i + 1 < top; i++) {
                    out.accept(stack[i], stack[i + 1], 0.5);
                }
                break;
            case REPEATED:
                closeRepeated(out);
                break;
            default:
                break;
        }
        // The pushes above may have moved the residue down or grown the array (never shrunk):
        // put the residue back where it was.
        System.arraycopy(saved, 0, stack, savedBase, savedTop - savedBase);
        base = savedBase;
        top = savedTop;
        turningPoints = savedTurningPoints;
    }

    /**
     * ASTM E1049-85 5.4.3 on the residue as one period of a repeating history: begin at its
     * point of largest absolute value, go round to it again through the gate, and count with the
     * three-point rule, every cycle full.
     */
    private void closeRepeated(CycleConsumer out) {
        int n = top - base;
        if (n < 2) {
            return;
        }
        int k = base;
        for (int i = base + 1; i < top; i++) {
            if (Math.abs(stack[i]) > Math.abs(stack[k])) {
                k = i;
            }
        }
        if (ring.length < n + 1) {
            ring = new double[Math.max(n + 1, stack.length + 1)];
        }
        round.reset();
        int m = 0;
        double[] period = one;
        double[] found = turning;
        for (int j = 0; j <= n; j++) {
            period[0] = stack[base + (k - base + j) % n];
            round.scan(period, 0, 1, 0, found, null, 0);
            if (round.written == 1) {
                m = pushFull(ring, m, found[0], out);
            }
        }
        if (round.hasPending()) {
            pushFull(ring, m, round.candidate, out);
        }
    }

    /** One turning point into the repeated residue's count: three-point rule, full cycles. */
    private static int pushFull(double[] s, int m, double p, CycleConsumer out) {
        s[m++] = p;
        while (m >= 3) {
            double x = Math.abs(s[m - 1] - s[m - 2]);
            double y = Math.abs(s[m - 2] - s[m - 3]);
            if (x < y) {
                break;
            }
            out.accept(s[m - 3], s[m - 2], 1.0);
            s[m - 3] = s[m - 1];
            m -= 2;
        }
        return m;
    }

    /** One confirmed turning point into the residue, and the cycles it closes to {@code out}. */
    private void push(double p, CycleConsumer out) {
        turningPoints++;
        if (top == stack.length) {
            makeRoom();
        }
        double[] s = stack;
        s[top++] = p;
        if (threePoint) {
            // ASTM E1049-85 5.4.4, steps 2 to 5; S is stack[base].
            while (top - base >= 3) {
                double x = Math.abs(s[top - 1] - s[top - 2]);
                double y = Math.abs(s[top - 2] - s[top - 3]);
                if (x < y) {
                    return;
                }
                if (top - 3 == base) {
                    out.accept(s[base], s[base + 1], 0.5);
                    base++;
                } else {
                    out.accept(s[top - 3], s[top - 2], 1.0);
                    s[top - 3] = s[top - 1];
                    top -= 2;
                }
            }
        } else {
            // The four-point form: Y is a cycle when neither neighbour range is smaller; the
            // oldest range stays in the residue.
            while (top >= 4) {
                double x = Math.abs(s[top - 1] - s[top - 2]);
                double y = Math.abs(s[top - 2] - s[top - 3]);
                double z = Math.abs(s[top - 3] - s[top - 4]);
                if (x < y || z < y) {
                    return;
                }
                out.accept(s[top - 3], s[top - 2], 1.0);
                s[top - 3] = s[top - 1];
                top -= 2;
            }
        }
    }

    /** Room for one more point: move the residue down if half the array is free, else grow. */
    private void makeRoom() {
        if (base >= stack.length / 2) {
            System.arraycopy(stack, base, stack, 0, top - base);
            top -= base;
            base = 0;
        } else {
            stack = Arrays.copyOf(stack, 2 * stack.length);
        }
    }

    /** Forgets every sample: the counter starts again as new (its consumer is not touched). */
    public void reset() {
        reversals.reset();
        base = 0;
        top = 0;
        samples = 0;
        skipped = 0;
        turningPoints = 0;
    }

    /** The configuration of this counter. */
    public Rainflow rainflow() {
        return rainflow;
    }

    /** The finite samples taken. */
    public long samples() {
        return samples;
    }

    /** The samples skipped because they were not finite. */
    public long skipped() {
        return skipped;
    }

    /** The turning points confirmed so far (the open extreme not included). */
    public long turningPoints() {
        return turningPoints;
    }

    /** The turning points in the residue now (the open extreme not included). */
    public int residueSize() {
        return top - base;
    }

    /** The residue's turning points, oldest first, a copy (the open extreme not included). */
    public double[] residue() {
        return Arrays.copyOfRange(stack, base, top);
    }

    /** The compact byte form of the counter's state (see the class comment). */
    public byte[] toBytes() {
        int n = top - base;
        ByteBuffer b = StateBytes.writer(TAG, 1 + 8 + 3 * 8 + 1 + 8 + StateBytes.doublesSize(n));
        b.put((byte) rainflow.residue().ordinal());
        b.putDouble(rainflow.gate());
        b.putLong(samples);
        b.putLong(skipped);
        b.putLong(turningPoints);
        b.put((byte) reversals.phase);
        b.putDouble(reversals.candidate);
        StateBytes.putDoubles(b, Arrays.copyOfRange(stack, base, top));
        return b.array();
    }

    /**
     * The counter {@link #toBytes} saved, passing its cycles from now on to {@code consumer}.
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if {@code state} is not such a form, or its residue is
     *                                  not one a count can leave
     */
    public static RainflowCounter fromBytes(byte[] state, CycleConsumer consumer) {
        Objects.requireNonNull(state, "state");
        Objects.requireNonNull(consumer, "consumer");
        ByteBuffer b = StateBytes.reader(state, TAG);
        Rainflow.Residue residue = RESIDUES[StateBytes.getCode(b, RESIDUES.length, "residue")];
        double gate = StateBytes.getDouble(b, 0, "gate");
        long samples = StateBytes.getCount(b, "sample count");
        long skipped = StateBytes.getCount(b, "skipped count");
        long turningPoints = StateBytes.getCount(b, "turning-point count");
        int phase = StateBytes.getCode(b, 4, "phase");
        double candidate = StateBytes.getDouble(b, Double.NEGATIVE_INFINITY, "candidate");
        double[] points = StateBytes.getDoubles(b, Double.NEGATIVE_INFINITY, "residue");
        StateBytes.end(b);
        RainflowCounter c = Rainflow.astm().withGate(gate).withResidue(residue)
                .newCounter(consumer);
        checkShape(residue, gate, phase, candidate, points);
        c.samples = samples;
        c.skipped = skipped;
        c.turningPoints = turningPoints;
        c.reversals.phase = phase;
        c.reversals.candidate = candidate;
        if (points.length > 0) {
            c.reversals.confirmed = points[points.length - 1];
        }
        c.stack = Arrays.copyOf(points, Math.max(32, Integer.highestOneBit(
                Math.max(1, points.length)) * 2));
        c.top = points.length;
        return c;
    }

    /** The residue and detector a count can leave behind, or an exception saying how not. */
    private static void checkShape(Rainflow.Residue residue, double gate, int phase,
            double candidate, double[] p) {
        int n = p.length;
        if ((phase == Reversals.EMPTY) != (n == 0)) {
            throw new IllegalArgumentException("state must hold a residue exactly when it has"
                    + " samples: phase " + phase + " with " + n + " points");
        }
        if (phase == Reversals.FLAT && (n != 1 || candidate != p[0])) {
            throw new IllegalArgumentException("state must hold only its first point before the"
                    + " first move: " + n + " points, candidate " + candidate);
        }
        if ((phase == Reversals.RISING && !(candidate - p[n - 1] > gate))
                || (phase == Reversals.FALLING && !(p[n - 1] - candidate > gate))) {
            throw new IllegalArgumentException("state must have its open extreme beyond the gate"
                    + " from the last turning point: " + candidate + " after " + p[n - 1]);
        }
        for (int i = 1; i < n; i++) {
            boolean alternates = i == 1 || (p[i] - p[i - 1]) * (p[i - 1] - p[i - 2]) < 0;
            if (!alternates || !(Math.abs(p[i] - p[i - 1]) > gate)) {
                throw new IllegalArgumentException("state must hold alternating turning points"
                        + " more than the gate apart: residue[" + i + "] = " + p[i]);
            }
        }
        for (int i = 2; i < n; i++) {
            double older = Math.abs(p[i - 1] - p[i - 2]);
            double newer = Math.abs(p[i] - p[i - 1]);
            boolean leftByCount = residue == Rainflow.Residue.HALF_CYCLES ? newer < older
                    : i == 2 || !(newer >= older && Math.abs(p[i - 2] - p[i - 3]) >= older);
            if (!leftByCount) {
                throw new IllegalArgumentException("state must hold a residue its count leaves:"
                        + " residue[" + i + "] = " + p[i] + " closes a cycle");
            }
        }
        if (n > 0 && phase >= Reversals.RISING) {
            boolean rising = phase == Reversals.RISING;
            boolean lastIsValley = n == 1 || p[n - 1] < p[n - 2];
            if (n > 1 && rising != lastIsValley) {
                throw new IllegalArgumentException("state must continue away from its last"
                        + " turning point: phase " + phase + " after residue[" + (n - 1) + "] = "
                        + p[n - 1]);
            }
        }
    }

    /**
     * {@code RainflowCounter[1000000 samples, 3 skipped, 52000 turning points, residue of 14;
     * Rainflow[...]]}.
     */
    @Override
    public String toString() {
        return "RainflowCounter[" + samples + " samples, " + skipped + " skipped, "
                + turningPoints + " turning points, residue of " + (top - base) + "; "
                + rainflow + "]";
    }
}
