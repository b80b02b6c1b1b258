package org.strainmath.docs.streams;

import java.nio.ByteBuffer;
import java.util.Arrays;

/**
 * The stresses of one frame block: the value of the topic {@code strain-stresses}, keyed by the
 * gateway. Per frame, the rod's axial stress and the rosette's principal stresses and von Mises
 * stress (Pa; NaN where a reading had no physical strain).
 *
 * <pre>
 *   "SMSB", version 1, sequence (long), time of the first frame (long, ms), frames (int), then
 *   the four arrays of doubles (rod, σ1, σ2, von Mises), each `frames` long, big-endian
 * </pre>
 *
 * @param sequence    the block's sequence number
 * @param firstMillis the time of its first frame, ms since 1970 UTC
 * @param rod         the rod's stress per frame
 * @param s1          the rosette's σ1 per frame
 * @param s2          the rosette's σ2 per frame
 * @param vonMises    the rosette's von Mises stress per frame
 */
public record StressBlock(long sequence, long firstMillis, double[] rod, double[] s1, double[] s2,
        double[] vonMises) {

    /** The block in the format of the class comment. */
    public byte[] toBytes() {
        int n = rod.length;
        ByteBuffer b = ByteBuffer.allocate(25 + 32 * n);
        b.put((byte) 'S').put((byte) 'M').put((byte) 'S').put((byte) 'B').put((byte) 1);
        b.putLong(sequence).putLong(firstMillis).putInt(n);
        for (double[] a : new double[][] {rod, s1, s2, vonMises}) {
            for (double x : a) {
                b.putDouble(x);
            }
        }
        return b.array();
    }

    /** Reads what {@link #toBytes} wrote. */
    public static StressBlock parse(byte[] bytes) {
        ByteBuffer b = ByteBuffer.wrap(bytes, 5, bytes.length - 5);
        long sequence = b.getLong();
        long first = b.getLong();
        int n = b.getInt();
        double[][] a = new double[4][n];
        for (double[] row : a) {
            for (int i = 0; i < n; i++) {
                row[i] = b.getDouble();
            }
        }
        return new StressBlock(sequence, first, a[0], a[1], a[2], a[3]);
    }

    /** Whether both hold the same numbers, bit for bit. */
    @Override
    public boolean equals(Object o) {
        return o instanceof StressBlock && Arrays.equals(((StressBlock) o).toBytes(), toBytes());
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(toBytes());
    }
}
