package org.strainmath.bridge;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.math.BigInteger;
import java.nio.ByteOrder;
import java.util.SplittableRandom;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Packed samples against java.math.BigInteger's reading of the same bytes. */
class PackedCodesTest {

    static Stream<Arguments> layouts() {
        return Stream.of(2, 3, 4).flatMap(n -> Stream.of(ByteOrder.BIG_ENDIAN,
                ByteOrder.LITTLE_ENDIAN).flatMap(o -> Stream.of(true, false)
                .filter(signed -> signed || n < 4).map(signed -> Arguments.of(n, o, signed))));
    }

    @ParameterizedTest(name = "{0} bytes, {1}, signed {2}")
    @MethodSource("layouts")
    void everySampleIsWhatBigIntegerReadsFromItsBytes(int n, ByteOrder order, boolean signed) {
        // Oracle: BigInteger(byte[]) reads big-endian two's complement, BigInteger(1, byte[])
        // big-endian unsigned (JDK), on seeded random bytes and the extremes.
        SplittableRandom random = new SplittableRandom(n * 10L + (signed ? 1 : 0));
        int len = 1000;
        byte[] src = new byte[7 + n * len];
        random.nextBytes(src);
        for (int k = 0; k < n; k++) {
            src[7 + k] = (byte) 0xFF;          // the first sample all ones
            src[7 + n + k] = 0;                // the second all zeros
        }
        src[7 + 2 * n + (order == ByteOrder.BIG_ENDIAN ? 0 : n - 1)] = (byte) 0x80;
        int[] dst = new int[len + 3];
        PackedCodes.of(n, order, signed).unpack(src, 7, dst, 2, len);
        for (int i = 0; i < len; i++) {
            byte[] be = new byte[n];
            for (int k = 0; k < n; k++) {
                be[k] = src[7 + i * n + (order == ByteOrder.BIG_ENDIAN ? k : n - 1 - k)];
            }
            int expected = (signed ? new BigInteger(be) : new BigInteger(1, be)).intValueExact();
            assertThat(dst[2 + i]).as("sample %d", i).isEqualTo(expected);
        }
        assertThat(dst[2]).isEqualTo(signed ? -1 : (1 << (8 * n)) - 1);
        assertThat(dst[3]).isZero();
        assertThat(dst[0]).isZero();
        assertThat(dst[len + 2]).isZero();
    }

    @Test
    void anUnsignedReadingOfASignedCodeIsWhatTheChannelRefuses() {
        // −1 µε-ish: the 24-bit code −1, as FF FF FF; read unsigned it is 16 777 215, outside a
        // 24-bit two's-complement converter's range, so the channel gives NaN (the docs' warning).
        byte[] sample = {(byte) 0xFF, (byte) 0xFF, (byte) 0xFF};
        int[] signed = new int[1];
        int[] unsigned = new int[1];
        PackedCodes.of(3, ByteOrder.BIG_ENDIAN, true).unpack(sample, 0, signed, 0, 1);
        PackedCodes.of(3, ByteOrder.BIG_ENDIAN, false).unpack(sample, 0, unsigned, 0, 1);
        StrainChannel channel = StrainChannel.of(Bridge.quarter(StrainGauge.ofOhms(350, 2.1)),
                AdcInput.ratiometric(24, 128));
        assertThat(signed[0]).isEqualTo(-1);
        assertThat(unsigned[0]).isEqualTo(16_777_215);
        assertThat(channel.toStrain(signed[0])).isFinite();
        assertThat(channel.toStrain(unsigned[0])).isNaN();
        // An offset-binary converter reads the unsigned code, as it should.
        StrainChannel offsetBinary = StrainChannel.of(Bridge.quarter(StrainGauge.ofOhms(350, 2.1)),
                AdcInput.ratiometric(24, 128).withCoding(AdcInput.Coding.OFFSET_BINARY));
        assertThat(offsetBinary.toStrain(unsigned[0] - 1)).isFinite();
    }

    @Test
    void badLayoutsAndRangesAreRefused() {
        assertThatThrownBy(() -> PackedCodes.of(1, ByteOrder.BIG_ENDIAN, true))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessage("bytesPerSample must be 2, 3 or 4: 1");
        assertThatThrownBy(() -> PackedCodes.of(4, ByteOrder.BIG_ENDIAN, false))
                .hasMessage("bytesPerSample must be 2 or 3 for unsigned samples, which must fit an"
                        + " int code: 4");
        assertThatThrownBy(() -> PackedCodes.of(3, null, true))
                .isInstanceOf(NullPointerException.class).hasMessage("order");
        PackedCodes p = PackedCodes.of(3, ByteOrder.LITTLE_ENDIAN, true);
        assertThatThrownBy(() -> p.unpack(new byte[8], 0, new int[3], 0, 3))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThatThrownBy(() -> p.unpack(new byte[9], 0, new int[2], 0, 3))
                .isInstanceOf(IndexOutOfBoundsException.class);
        assertThat(p).hasToString("PackedCodes[3 bytes, little-endian, signed]")
                .isEqualTo(PackedCodes.of(3, ByteOrder.LITTLE_ENDIAN, true));
    }
}
