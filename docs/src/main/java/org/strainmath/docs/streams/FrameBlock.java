package org.strainmath.docs.streams;

import java.nio.BufferUnderflowException;
import java.nio.ByteBuffer;
import java.util.Objects;

/**
 * A block of interleaved converter codes from one gateway, as the gateway publishes it: the
 * record value of the topic {@code strain-frames}, keyed by the gateway's name.
 *
 * <pre>
 *   offset  0: "SMFB" (4 ASCII bytes), format version 1 (1 byte)
 *   offset  5: sequence number of the block (long), time of its first frame (long, ms since
 *              1970 UTC), frames per second (int), channels per frame (int), frames (int)
 *   offset 33: the codes, frame after frame, channel after channel (int each), big-endian
 * </pre>
 * A format of this example's own; a real fleet has its gateways' format, read in the same place.
 *
 * @param sequence     the block's number in the gateway's stream, from 0
 * @param firstMillis  the time of the first frame, ms since 1970 UTC
 * @param rate         frames per second
 * @param channels     codes per frame
 * @param codes        the codes, {@code channels} per frame
 */
public record FrameBlock(long sequence, long firstMillis, int rate, int channels, int[] codes) {

    private static final int HEADER = 33;

    /**
     * Validates the block.
     *
     * @throws IllegalArgumentException if a count is not positive or the codes are not whole
     *                                  frames
     */
    public FrameBlock {
        Objects.requireNonNull(codes, "codes");
        if (rate < 1 || channels < 1 || sequence < 0) {
            throw new IllegalArgumentException("rate, channels and sequence must be positive: "
                    + rate + ", " + channels + ", " + sequence);
        }
        if (codes.length % channels != 0) {
            throw new IllegalArgumentException("codes must be whole frames of " + channels
                    + " channels: " + codes.length + " codes");
        }
    }

    /** The number of frames. */
    public int frames() {
        return codes.length / channels;
    }

    /** The block in the format of the class comment. */
    public byte[] toBytes() {
        ByteBuffer b = ByteBuffer.allocate(HEADER + 4 * codes.length);
        b.put((byte) 'S').put((byte) 'M').put((byte) 'F').put((byte) 'B').put((byte) 1);
        b.putLong(sequence).putLong(firstMillis).putInt(rate).putInt(channels).putInt(frames());
        for (int c : codes) {
            b.putInt(c);
        }
        return b.array();
    }

    /**
     * Reads a block.
     *
     * @throws IllegalArgumentException with the reason, if {@code bytes} is not such a block
     */
    public static FrameBlock parse(byte[] bytes) {
        if (bytes == null || bytes.length < HEADER) {
            throw new IllegalArgumentException("a frame block needs a header of " + HEADER
                    + " bytes: " + (bytes == null ? "no value" : bytes.length + " bytes"));
        }
        ByteBuffer b = ByteBuffer.wrap(bytes);
        if (b.get() != 'S' || b.get() != 'M' || b.get() != 'F' || b.get() != 'B') {
            throw new IllegalArgumentException("a frame block begins with SMFB");
        }
        int version = b.get();
        if (version != 1) {
            throw new IllegalArgumentException("frame block version must be 1: " + version);
        }
        try {
            long sequence = b.getLong();
            long first = b.getLong();
            int rate = b.getInt();
            int channels = b.getInt();
            int frames = b.getInt();
            long expected = HEADER + 4L * channels * frames;
            if (channels < 1 || frames < 0 || expected != bytes.length) {
                throw new IllegalArgumentException("a frame block of " + frames + " frames of "
                        + channels + " channels has " + expected + " bytes: " + bytes.length);
            }
            int[] codes = new int[channels * frames];
            for (int i = 0; i < codes.length; i++) {
                codes[i] = b.getInt();
            }
            return new FrameBlock(sequence, first, rate, channels, codes);
        } catch (BufferUnderflowException e) {
            throw new IllegalArgumentException("a frame block ends early", e);
        }
    }
}
