package org.strainmath.docs.streams;

import java.nio.ByteBuffer;
import java.util.Optional;

import org.strainmath.fatigue.DamageSum;
import org.strainmath.history.CycleConsumer;
import org.strainmath.history.RainflowCounter;
import org.strainmath.history.RangeHistogram;

/**
 * The running count of one history of one gateway: the library's streaming rainflow counter,
 * the range histogram of the current window, the damage sum, and where the window began. It
 * lives in the state store between records as {@link #toBytes}: the three accumulators' own
 * byte forms, each behind its length, then the window's start (long), the damage at its start
 * (double) and the skipped samples (two longs: all, and at the window's start), big-endian.
 *
 * <p>Mutable; one per history, used by one stream thread at a time.
 */
public final class ChannelTally {

    private final String history;
    private final GatewaySetup setup;
    private final RainflowCounter counter;
    private RangeHistogram window;
    private final DamageSum damage;
    private long windowStart = Long.MIN_VALUE;
    private double damageAtWindowStart;
    private long skippedAtWindowStart;

    private ChannelTally(String history, GatewaySetup setup, byte[] counter, RangeHistogram window,
            DamageSum damage) {
        this.history = history;
        this.setup = setup;
        this.window = window;
        this.damage = damage;
        CycleConsumer both = (from, to, count) -> {
            this.window.accept(from, to, count);
            this.damage.accept(from, to, count);
        };
        this.counter = counter == null ? setup.rainflow().newCounter(both)
                : RainflowCounter.fromBytes(counter, both);
    }

    /** A tally at zero. */
    public static ChannelTally start(String history, GatewaySetup setup) {
        return new ChannelTally(history, setup, null, RangeHistogram.of(setup.ranges()),
                setup.life().newDamageSum());
    }

    /** The tally {@link #toBytes} wrote. */
    public static ChannelTally fromBytes(String history, GatewaySetup setup, byte[] state) {
        ByteBuffer b = ByteBuffer.wrap(state);
        byte[] counter = next(b);
        RangeHistogram window = RangeHistogram.fromBytes(next(b));
        DamageSum damage = DamageSum.fromBytes(setup.life(), next(b));
        ChannelTally t = new ChannelTally(history, setup, counter, window, damage);
        t.windowStart = b.getLong();
        t.damageAtWindowStart = b.getDouble();
        t.skippedAtWindowStart = b.getLong();
        return t;
    }

    private static byte[] next(ByteBuffer b) {
        byte[] part = new byte[b.getInt()];
        b.get(part);
        return part;
    }

    /** The state as bytes (see the class comment). */
    public byte[] toBytes() {
        byte[] c = counter.toBytes();
        byte[] w = window.toBytes();
        byte[] d = damage.toBytes();
        return ByteBuffer.allocate(12 + c.length + w.length + d.length + 24)
                .putInt(c.length).put(c).putInt(w.length).put(w).putInt(d.length).put(d)
                .putLong(windowStart).putDouble(damageAtWindowStart).putLong(skippedAtWindowStart)
                .array();
    }

    /**
     * The report of the window that a block at {@code millis} closes, if it closes one: the
     * block belongs to a later window than the tally's current one. The new window starts at
     * the window boundary at or before {@code millis}; a block is counted in the window it
     * starts in.
     */
    public Optional<WindowReport> closeWindowBefore(long millis) {
        long length = setup.windowMillis();
        long start = Math.floorDiv(millis, length) * length;
        if (windowStart == Long.MIN_VALUE) {
            windowStart = start;
            return Optional.empty();
        }
        if (start <= windowStart) {
            return Optional.empty();
        }
        WindowReport report = new WindowReport(history, windowStart, windowStart + length,
                window.counts(), window.outside(), damage.damage() - damageAtWindowStart,
                damage.damage(), counter.skipped() - skippedAtWindowStart);
        windowStart = start;
        window = RangeHistogram.of(setup.ranges());
        damageAtWindowStart = damage.damage();
        skippedAtWindowStart = counter.skipped();
        return Optional.of(report);
    }

    /** Counts a block of the history's samples (Pa). */
    public void accept(double[] stress, int len) {
        counter.accept(stress, 0, len);
    }
}
