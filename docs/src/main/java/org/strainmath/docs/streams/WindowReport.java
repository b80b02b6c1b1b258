package org.strainmath.docs.streams;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.Arrays;
import java.util.Locale;

/**
 * The report of one history over one window of event time: the value of the topic
 * {@code strain-cycle-windows}, keyed by {@code gateway/history}. The cycles closed in the
 * window by range bin (a half cycle counts 0.5; the residue still open is not in them), those
 * outside the bins, the damage of the window's cycles and the damage so far, and the samples
 * skipped (NaN).
 *
 * <pre>
 *   "SMWR", version 1, history (int length and UTF-8), window start and end (two longs, ms),
 *   the range counts (int count and doubles), outside, damage, total damage (three doubles),
 *   skipped (long), big-endian
 * </pre>
 *
 * @param history     {@link GatewaySetup#ROD} or {@link GatewaySetup#GUSSET}
 * @param startMillis the window's start, ms since 1970 UTC
 * @param endMillis   its end (exclusive)
 * @param rangeCounts cycles per range bin of the setup
 * @param outside     cycles outside the bins
 * @param damage      Palmgren–Miner damage of the window's cycles
 * @param totalDamage damage of all cycles so far
 * @param skipped     samples without strain in the window
 */
public record WindowReport(String history, long startMillis, long endMillis, double[] rangeCounts,
        double outside, double damage, double totalDamage, long skipped) {

    /** The cycles closed in the window. */
    public double cycles() {
        double sum = outside;
        for (double c : rangeCounts) {
            sum += c;
        }
        return sum;
    }

    /** The report in the format of the class comment. */
    public byte[] toBytes() {
        byte[] name = history.getBytes(StandardCharsets.UTF_8);
        ByteBuffer b = ByteBuffer.allocate(5 + 4 + name.length + 16 + 4 + 8 * rangeCounts.length
                + 24 + 8);
        b.put((byte) 'S').put((byte) 'M').put((byte) 'W').put((byte) 'R').put((byte) 1);
        b.putInt(name.length).put(name).putLong(startMillis).putLong(endMillis);
        b.putInt(rangeCounts.length);
        for (double c : rangeCounts) {
            b.putDouble(c);
        }
        b.putDouble(outside).putDouble(damage).putDouble(totalDamage).putLong(skipped);
        return b.array();
    }

    /** Reads what {@link #toBytes} wrote. */
    public static WindowReport parse(byte[] bytes) {
        ByteBuffer b = ByteBuffer.wrap(bytes, 5, bytes.length - 5);
        byte[] name = new byte[b.getInt()];
        b.get(name);
        long start = b.getLong();
        long end = b.getLong();
        double[] counts = new double[b.getInt()];
        for (int i = 0; i < counts.length; i++) {
            counts[i] = b.getDouble();
        }
        return new WindowReport(new String(name, StandardCharsets.UTF_8), start, end, counts,
                b.getDouble(), b.getDouble(), b.getDouble(), b.getLong());
    }

    /** Whether both hold the same report, bit for bit. */
    @Override
    public boolean equals(Object o) {
        return o instanceof WindowReport && Arrays.equals(((WindowReport) o).toBytes(), toBytes());
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(toBytes());
    }

    /**
     * {@code rod 2026-12-03T10:00:00Z +10 min: 1234.5 cycles, D = 1.2e-07 (total 3.4e-06), 0
     * skipped}.
     */
    @Override
    public String toString() {
        return String.format(Locale.ROOT, "%s %s +%d min: %.1f cycles, D = %.3g (total %.3g), %d"
                + " skipped", history, Instant.ofEpochMilli(startMillis),
                (endMillis - startMillis) / 60_000, cycles(), damage, totalDamage, skipped);
    }
}
