package org.strainmath.history;

import java.nio.ByteBuffer;

import org.strainmath.internal.StateBytes;

/** The byte form of {@link Bins} inside the states of this package's histograms. */
final class BinBytes {

    private BinBytes() {
    }

    static int size(Bins bins) {
        return 1 + StateBytes.doublesSize(bins.count() + 1);
    }

    static void put(ByteBuffer b, Bins bins) {
        b.put((byte) (bins.isUniform() ? 1 : 0));
        StateBytes.putDoubles(b, bins.edgeArray());
    }

    /**
     * Reads bins.
     *
     * @throws IllegalArgumentException if the edges are not valid bin edges
     */
    static Bins get(ByteBuffer b, String name) {
        boolean uniform = StateBytes.getCode(b, 2, name + " kind") == 1;
        double[] edges = StateBytes.getDoubles(b, Double.NEGATIVE_INFINITY, name);
        try {
            return Bins.restore(edges, uniform);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("state must hold valid " + name + ": "
                    + e.getMessage(), e);
        }
    }

    /** Reads {@code n} counts, each finite and not negative. */
    static double[] counts(ByteBuffer b, int n, String name) {
        double[] counts = StateBytes.getDoubles(b, 0, name);
        if (counts.length != n) {
            throw new IllegalArgumentException("state must hold " + n + " " + name + ": "
                    + counts.length);
        }
        return counts;
    }
}
