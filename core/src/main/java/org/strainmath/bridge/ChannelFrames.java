package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.SerialForms;

/**
 * A multi-channel input that delivers interleaved frames: frame i holds one code per channel,
 * {@code frames[i·N + c]} for column c of N. Each column has its own configured
 * {@link StrainChannel}; a conversion writes one block of strains per channel.
 *
 * <pre>
 *   ChannelFrames frames = ChannelFrames.of(rodA, rodB, gusset);      // 3 codes per frame
 *   double[][] strain = new double[3][blockFrames];
 *   int bad = frames.toStrain(codes, strain);                          // codes.length = 3·blockFrames
 * </pre>
 *
 * <p>Immutable and thread-safe; conversions allocate nothing.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class ChannelFrames implements Serializable {

    private final StrainChannel[] channels;

    private ChannelFrames(StrainChannel[] channels) {
        this.channels = channels;
    }

    /**
     * Frames of {@code channels.length} codes, column c converted by {@code channels[c]}.
     *
     * @throws NullPointerException     if the array or a channel is null
     * @throws IllegalArgumentException if there is no channel
     */
    public static ChannelFrames of(StrainChannel... channels) {
        Objects.requireNonNull(channels, "channels");
        if (channels.length == 0) {
            throw new IllegalArgumentException("channels must hold at least one channel: 0");
        }
        StrainChannel[] copy = channels.clone();
        for (int c = 0; c < copy.length; c++) {
            Objects.requireNonNull(copy[c], "channels[" + c + "]");
        }
        return new ChannelFrames(copy);
    }

    /** The number of codes in one frame. */
    public int channelsPerFrame() {
        return channels.length;
    }

    /** The channels, column by column. */
    public List<StrainChannel> channels() {
        return List.copyOf(Arrays.asList(channels));
    }

    /**
     * Converts all of {@code frames}, a whole number of frames, into {@code dst[c][0...]}, one
     * row per channel.
     *
     * @return the number of outputs set to NaN, over all channels
     * @throws IllegalArgumentException  if {@code frames.length} is not a whole number of frames
     * @throws IllegalStateException     if a channel needs temperatures
     * @throws NullPointerException      if an array or a row is null
     * @throws IndexOutOfBoundsException if {@code dst} has too few rows or a row is too short
     */
    public int toStrain(int[] frames, double[][] dst) {
        Objects.requireNonNull(frames, "frames");
        int n = channels.length;
        if (frames.length % n != 0) {
            throw new IllegalArgumentException("frames.length must be a whole number of frames of "
                    + n + " channels: " + frames.length);
        }
        return toStrain(frames, 0, frames.length / n, null, 0, dst, 0);
    }

    /**
     * Converts {@code frameCount} frames from {@code frames[framesOff...]} into
     * {@code dst[c][dstOff...]}, with one temperature per frame in °C from
     * {@code celsiusPerFrame[celsiusOff...]} for the channels that correct for thermal output
     * ({@code null} if none does). A temperature that is not finite gives NaN; the
     * temperatures must not overlap a row of {@code dst}.
     *
     * @return the number of outputs set to NaN, over all channels
     * @throws IllegalArgumentException  if {@code celsiusPerFrame} overlaps a row of {@code dst}
     * @throws IllegalStateException     if a channel needs temperatures and none are given
     * @throws NullPointerException      if {@code frames}, {@code dst} or a row is null
     * @throws IndexOutOfBoundsException if a range is outside its array
     */
    public int toStrain(int[] frames, int framesOff, int frameCount, double[] celsiusPerFrame,
            int celsiusOff, double[][] dst, int dstOff) {
        Objects.requireNonNull(frames, "frames");
        Objects.requireNonNull(dst, "dst");
        int n = channels.length;
        Objects.checkFromIndexSize(framesOff, Math.multiplyExact(frameCount, n), frames.length);
        if (dst.length < n) {
            throw new IndexOutOfBoundsException("dst has " + dst.length + " rows for " + n
                    + " channels");
        }
        if (celsiusPerFrame != null) {
            Objects.checkFromIndexSize(celsiusOff, frameCount, celsiusPerFrame.length);
        }
        for (int c = 0; c < n; c++) {
            if (dst[c] == null) {
                // Not Objects.requireNonNull(x, message): that would build the message each call.
                throw new NullPointerException("dst[" + c + "]");
            }
            rowRange(dst[c], c, dstOff, frameCount);
            Checks.disjoint(celsiusPerFrame, celsiusOff, "celsiusPerFrame", dst[c], dstOff,
                    "dst[" + c + "]", frameCount);
            if (channels[c].needsTemperature() && celsiusPerFrame == null) {
                throw new IllegalStateException("channel " + c
                        + " corrects for thermal output: give the temperatures");
            }
        }
        int nan = 0;
        for (int c = 0; c < n; c++) {
            nan += channels[c].convertColumn(frames, framesOff, n, c, celsiusPerFrame, celsiusOff,
                    dst[c], dstOff, frameCount);
        }
        return nan;
    }

    /** {@code ChannelFrames[3 channels per frame]}. */
    @Override
    public String toString() {
        return "ChannelFrames[" + channels.length + " channels per frame]";
    }

    /**
     * Throws unless {@code dst[c][off, off + count)} exists, naming the row; the message is built
     * only when it throws, so that a block call allocates nothing.
     */
    private static void rowRange(double[] row, int c, int off, int count) {
        if (off < 0 || count < 0 || off > row.length - count) {
            throw new IndexOutOfBoundsException("dst[" + c + "] has " + row.length
                    + " values for " + count + " frames from " + off);
        }
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(channels.clone());
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("ChannelFrames");
    }

    /**
     * The serial form of a ChannelFrames: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final StrainChannel[] channels;

        Serial(StrainChannel[] channels) {
            this.channels = channels;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("ChannelFrames", () -> {
                return of(channels.clone());
            });
        }
    }

}
