package org.strainmath.internal;

import java.nio.BufferUnderflowException;
import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.util.Objects;

/**
 * The compact byte form of the streaming accumulators of {@code org.strainmath.history} and
 * {@code org.strainmath.fatigue}: a four-letter tag that names the type, a format version,
 * then the type's fields in a fixed order, big-endian ({@link ByteBuffer}'s default). Readers
 * check the tag, the version and the length, and every value they restore.
 *
 * <pre>
 *   offset 0: tag, 4 ASCII bytes ("SMRC" a rainflow counter, "SMRH" a range histogram, ...)
 *   offset 4: version, 1 byte (1)
 *   offset 5: the fields
 * </pre>
 *
 * <p>Stateless; thread-safe.
 */
public final class StateBytes {

    /** The format version written, and the only one read. */
    public static final byte VERSION = 1;

    private StateBytes() {
    }

    /** A buffer of {@code fieldBytes} after the header, with the header written. */
    public static ByteBuffer writer(String tag, int fieldBytes) {
        ByteBuffer b = ByteBuffer.allocate(5 + fieldBytes);
        b.put(tag.getBytes(StandardCharsets.US_ASCII));
        b.put(VERSION);
        return b;
    }

    /**
     * A buffer over {@code state} positioned after its header.
     *
     * @throws NullPointerException     if {@code state} is null
     * @throws IllegalArgumentException if the tag or the version is not the expected one
     */
    public static ByteBuffer reader(byte[] state, String tag) {
        Objects.requireNonNull(state, "state");
        byte[] expected = tag.getBytes(StandardCharsets.US_ASCII);
        if (state.length < 5) {
            throw new IllegalArgumentException("state must begin with the tag " + tag
                    + " and a version: " + state.length + " bytes");
        }
        for (int i = 0; i < 4; i++) {
            if (state[i] != expected[i]) {
                throw new IllegalArgumentException("state must begin with the tag " + tag + ": "
                        + new String(state, 0, 4, StandardCharsets.ISO_8859_1));
            }
        }
        if (state[4] != VERSION) {
            throw new IllegalArgumentException("state must be of format version " + VERSION
                    + ": " + state[4]);
        }
        return ByteBuffer.wrap(state, 5, state.length - 5);
    }

    /**
     * Checks that the reader consumed the whole state.
     *
     * @throws IllegalArgumentException if bytes are left over
     */
    public static void end(ByteBuffer b) {
        if (b.hasRemaining()) {
            throw new IllegalArgumentException("state must end after its fields: "
                    + b.remaining() + " bytes left over");
        }
    }

    /** The size in bytes of {@link #putDoubles} of {@code n} values. */
    public static int doublesSize(int n) {
        return 4 + 8 * n;
    }

    /** Writes the length of {@code a} and its values. */
    public static void putDoubles(ByteBuffer b, double[] a) {
        b.putInt(a.length);
        for (double x : a) {
            b.putDouble(x);
        }
    }

    /**
     * Reads what {@link #putDoubles} wrote, each value finite and at least {@code least}
     * (−∞ for any finite value).
     *
     * @throws IllegalArgumentException if the length or a value is invalid, or the state ends
     *                                  early
     */
    public static double[] getDoubles(ByteBuffer b, double least, String name) {
        int n = getInt(b, name + " length");
        if (n < 0 || n > b.remaining() / 8) {
            throw new IllegalArgumentException("state must hold " + name + ": length " + n
                    + " with " + b.remaining() + " bytes left");
        }
        double[] a = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = getDouble(b, least, name);
        }
        return a;
    }

    /**
     * Reads a finite double of at least {@code least}.
     *
     * @throws IllegalArgumentException if it is not, or the state ends early
     */
    public static double getDouble(ByteBuffer b, double least, String name) {
        double x;
        try {
            x = b.getDouble();
        } catch (BufferUnderflowException e) {
            throw early(name);
        }
        if (!(x >= least) || x == Double.POSITIVE_INFINITY) {
            throw new IllegalArgumentException("state must hold a finite " + name
                    + (least == Double.NEGATIVE_INFINITY ? "" : " >= " + least) + ": " + x);
        }
        return x;
    }

    /**
     * Reads an int.
     *
     * @throws IllegalArgumentException if the state ends early
     */
    public static int getInt(ByteBuffer b, String name) {
        try {
            return b.getInt();
        } catch (BufferUnderflowException e) {
            throw early(name);
        }
    }

    /**
     * Reads a long of at least 0.
     *
     * @throws IllegalArgumentException if it is negative, or the state ends early
     */
    public static long getCount(ByteBuffer b, String name) {
        long x;
        try {
            x = b.getLong();
        } catch (BufferUnderflowException e) {
            throw early(name);
        }
        if (x < 0) {
            throw new IllegalArgumentException("state must hold a " + name + " >= 0: " + x);
        }
        return x;
    }

    /**
     * Reads a byte in [0, {@code limit}).
     *
     * @throws IllegalArgumentException if it is outside, or the state ends early
     */
    public static int getCode(ByteBuffer b, int limit, String name) {
        int x;
        try {
            x = b.get();
        } catch (BufferUnderflowException e) {
            throw early(name);
        }
        if (x < 0 || x >= limit) {
            throw new IllegalArgumentException("state must hold a " + name + " in [0, " + limit
                    + "): " + x);
        }
        return x;
    }

    private static IllegalArgumentException early(String name) {
        return new IllegalArgumentException("state must hold " + name + ": it ends early");
    }
}
