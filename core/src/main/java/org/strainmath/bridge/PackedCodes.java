package org.strainmath.bridge;

import java.nio.ByteOrder;
import java.util.Objects;

/**
 * Unpacks converter samples as a converter, a bus or a network frame delivers them: 2, 3 or 4
 * bytes per sample, most significant byte first ({@link ByteOrder#BIG_ENDIAN}) or last
 * ({@link ByteOrder#LITTLE_ENDIAN}), into the {@code int} codes that {@link StrainChannel} and
 * {@link ChannelFrames} read.
 *
 * <ul>
 *   <li><b>Signed</b> samples (two's complement, the usual coding of a bridge converter) are
 *       sign-extended: the 24-bit sample {@code FF FF FF} is the code −1.</li>
 *   <li><b>Unsigned</b> samples (offset binary) are taken as they are, 0 to 2ⁿ − 1, for an
 *       {@link AdcInput} with {@link AdcInput.Coding#OFFSET_BINARY}.</li>
 * </ul>
 * Taking the three bytes of a signed 24-bit sample as an unsigned number is the usual slip: the
 * code −1 becomes 16 777 215, far outside a 24-bit two's-complement converter's range, and the
 * channel returns NaN for it (a reading with no physical strain), silently but for the NaN
 * count. Unpack with this class, matching the converter's coding.
 *
 * <pre>
 *   PackedCodes packed = PackedCodes.of(3, ByteOrder.BIG_ENDIAN, true);   // 24-bit, signed
 *   int[] codes = new int[frames * channels];
 *   packed.unpack(buffer, 0, codes, 0, codes.length);
 * </pre>
 * 4-byte samples are signed only: an unsigned 32-bit code does not fit an {@code int}.
 *
 * <p>Immutable and thread-safe; {@link #unpack} allocates nothing.
 */
public final class PackedCodes {

    private final int bytes;
    private final boolean bigEndian;
    private final boolean signed;

    private PackedCodes(int bytes, boolean bigEndian, boolean signed) {
        this.bytes = bytes;
        this.bigEndian = bigEndian;
        this.signed = signed;
    }

    /**
     * Samples of {@code bytesPerSample} bytes in {@code order}, signed (two's complement) or
     * unsigned (offset binary).
     *
     * @throws NullPointerException     if {@code order} is null
     * @throws IllegalArgumentException if {@code bytesPerSample} is not 2, 3 or 4, or 4 bytes are
     *                                  asked unsigned
     */
    public static PackedCodes of(int bytesPerSample, ByteOrder order, boolean signed) {
        Objects.requireNonNull(order, "order");
        if (bytesPerSample < 2 || bytesPerSample > 4) {
            throw new IllegalArgumentException("bytesPerSample must be 2, 3 or 4: "
                    + bytesPerSample);
        }
        if (bytesPerSample == 4 && !signed) {
            throw new IllegalArgumentException("bytesPerSample must be 2 or 3 for unsigned"
                    + " samples, which must fit an int code: " + bytesPerSample);
        }
        return new PackedCodes(bytesPerSample, order == ByteOrder.BIG_ENDIAN, signed);
    }

    /**
     * Unpacks {@code len} samples from {@code src[srcOff...]} ({@code len} × the bytes per
     * sample) into {@code dst[dstOff...]}.
     *
     * @throws NullPointerException      if an array is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public void unpack(byte[] src, int srcOff, int[] dst, int dstOff, int len) {
        Objects.requireNonNull(src, "src");
        Objects.requireNonNull(dst, "dst");
        if (len < 0) {
            throw new IndexOutOfBoundsException("len must be >= 0: " + len);
        }
        Objects.checkFromIndexSize(srcOff, Math.multiplyExact(len, bytes), src.length);
        Objects.checkFromIndexSize(dstOff, len, dst.length);
        // The sample's bits in the low 8·n bits of v; (v << s) >> s sign-extends them (s = 0
        // for 32 bits and for unsigned samples, which stay as they are).
        final int s = signed ? 32 - 8 * bytes : 0;
        int p = srcOff;
        switch (bytes) {
            case 2:
                for (int i = dstOff, end = dstOff + len; i < end; i++, p += 2) {
                    int v = bigEndian
                            ? (src[p] & 0xFF) << 8 | (src[p + 1] & 0xFF)
                            : (src[p + 1] & 0xFF) << 8 | (src[p] & 0xFF);
                    dst[i] = (v << s) >> s;
                }
                break;
            case 3:
                for (int i = dstOff, end = dstOff + len; i < end; i++, p += 3) {
                    int v = bigEndian
                            ? (src[p] & 0xFF) << 16 | (src[p + 1] & 0xFF) << 8 | (src[p + 2] & 0xFF)
                            : (src[p + 2] & 0xFF) << 16 | (src[p + 1] & 0xFF) << 8 | (src[p] & 0xFF);
                    dst[i] = (v << s) >> s;
                }
                break;
            default:
                for (int i = dstOff, end = dstOff + len; i < end; i++, p += 4) {
                    dst[i] = bigEndian
                            ? (src[p] & 0xFF) << 24 | (src[p + 1] & 0xFF) << 16
                                    | (src[p + 2] & 0xFF) << 8 | (src[p + 3] & 0xFF)
                            : (src[p + 3] & 0xFF) << 24 | (src[p + 2] & 0xFF) << 16
                                    | (src[p + 1] & 0xFF) << 8 | (src[p] & 0xFF);
                }
                break;
        }
    }

    /** The bytes per sample. */
    public int bytesPerSample() {
        return bytes;
    }

    /** The byte order. */
    public ByteOrder order() {
        return bigEndian ? ByteOrder.BIG_ENDIAN : ByteOrder.LITTLE_ENDIAN;
    }

    /** Whether samples are signed (two's complement). */
    public boolean isSigned() {
        return signed;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof PackedCodes && ((PackedCodes) o).bytes == bytes
                && ((PackedCodes) o).bigEndian == bigEndian && ((PackedCodes) o).signed == signed;
    }

    @Override
    public int hashCode() {
        return (bytes * 31 + (bigEndian ? 1 : 0)) * 31 + (signed ? 1 : 0);
    }

    /** {@code PackedCodes[3 bytes, big-endian, signed]}. */
    @Override
    public String toString() {
        return "PackedCodes[" + bytes + " bytes, " + (bigEndian ? "big" : "little") + "-endian, "
                + (signed ? "signed" : "unsigned") + "]";
    }
}
