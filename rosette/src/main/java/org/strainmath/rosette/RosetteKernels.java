package org.strainmath.rosette;

import org.strainmath.internal.Kernels;

/**
 * The block loops of {@link Rosette}. Each computes, per sample, three dot products of the
 * composed rows with the readings, X = Σ x_j·r_j, Y = Σ y_j·r_j, Z = Σ z_j·r_j (in index order,
 * from the first product, as {@code Rosette.dot} does), and one result from them. Three-gauge
 * rosettes run a loop that reads the three arrays directly; other counts loop over the gauges
 * per sample.
 *
 * <p>The loops follow the findings of {@code DEVELOPERS.md}: one small loop per method, no
 * branch in a loop, the NaN count in a pass of its own, chunks of {@link Kernels#CHUNK}
 * samples, and one index for inputs and outputs where the offsets agree.
 *
 * <p>Stateless; thread-safe.
 */
final class RosetteKernels {

    private RosetteKernels() {
    }

    /** The kinds of result: X ± √(Y² + Z²), the angle, the state, von Mises, Tresca. */
    private enum Result { CENTRE_AND_RADIUS, ANGLE, STATE, VON_MISES, TRESCA }

    static int centreAndRadius(double[][] r, int srcOff, double[] x, double[] y, double[] z,
            double[] plus, double[] minus, int dstOff, int len) {
        return run(Result.CENTRE_AND_RADIUS, r, srcOff, x, y, z, plus, minus, null, dstOff, len);
    }

    static int angle(double[][] r, int srcOff, double[] x, double[] y, double[] z,
            double[] out, int dstOff, int len) {
        return run(Result.ANGLE, r, srcOff, x, y, z, out, null, null, dstOff, len);
    }

    static int state(double[][] r, int srcOff, double[] x, double[] y, double[] z,
            double[] exx, double[] eyy, double[] gxy, int dstOff, int len) {
        return run(Result.STATE, r, srcOff, x, y, z, exx, eyy, gxy, dstOff, len);
    }

    static int vonMises(double[][] r, int srcOff, double[] x, double[] y, double[] z,
            double[] out, int dstOff, int len) {
        return run(Result.VON_MISES, r, srcOff, x, y, z, out, null, null, dstOff, len);
    }

    static int tresca(double[][] r, int srcOff, double[] x, double[] y, double[] z,
            double[] out, int dstOff, int len) {
        return run(Result.TRESCA, r, srcOff, x, y, z, out, null, null, dstOff, len);
    }

    private static int run(Result result, double[][] r, int srcOff, double[] x, double[] y,
            double[] z, double[] o1, double[] o2, double[] o3, int dstOff, int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0) {
                three(result, r[0], r[1], r[2], x, y, z, o1, o2, o3, start, end);
            } else {
                general(result, r, shift, x, y, z, o1, o2, o3, start, end);
            }
            nan += count(o1, o2, o3, start, end - start);
        }
        return nan;
    }

    private static int count(double[] o1, double[] o2, double[] o3, int off, int len) {
        if (o2 == null) {
            return Kernels.countNaN(o1, off, len);
        }
        return Kernels.countNaNRows(o1, o2, o3 == null ? o1 : o3, off, len);
    }

    private static void three(Result result, double[] a, double[] b, double[] c, double[] x,
            double[] y, double[] z, double[] o1, double[] o2, double[] o3, int start, int end) {
        switch (result) {
            case CENTRE_AND_RADIUS:
                centreAndRadiusThree(a, b, c, x, y, z, o1, o2, start, end);
                break;
            case ANGLE:
                angleThree(a, b, c, x, y, z, o1, start, end);
                break;
            case STATE:
                stateThree(a, b, c, x, y, z, o1, o2, o3, start, end);
                break;
            case VON_MISES:
                vonMisesThree(a, b, c, x, y, z, o1, start, end);
                break;
            default:
                trescaThree(a, b, c, x, y, z, o1, start, end);
                break;
        }
    }

    private static void centreAndRadiusThree(double[] a, double[] b, double[] c, double[] x,
            double[] y, double[] z, double[] plus, double[] minus, int start, int end) {
        final double x0 = x[0];
        final double x1 = x[1];
        final double x2 = x[2];
        final double y0 = y[0];
        final double y1 = y[1];
        final double y2 = y[2];
        final double z0 = z[0];
        final double z1 = z[1];
        final double z2 = z[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = c[i];
            double cx = x0 * ra + x1 * rb + x2 * rc;
            double cy = y0 * ra + y1 * rb + y2 * rc;
            double cz = z0 * ra + z1 * rb + z2 * rc;
            double radius = Math.sqrt(cy * cy + cz * cz);
            plus[i] = cx + radius;
            minus[i] = cx - radius;
        }
    }

    private static void angleThree(double[] a, double[] b, double[] c, double[] x, double[] y,
            double[] z, double[] out, int start, int end) {
        final double x0 = x[0];
        final double x1 = x[1];
        final double x2 = x[2];
        final double y0 = y[0];
        final double y1 = y[1];
        final double y2 = y[2];
        final double z0 = z[0];
        final double z1 = z[1];
        final double z2 = z[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = c[i];
            out[i] = Rosette.principalAngle(x0 * ra + x1 * rb + x2 * rc,
                    y0 * ra + y1 * rb + y2 * rc, z0 * ra + z1 * rb + z2 * rc);
        }
    }

    private static void stateThree(double[] a, double[] b, double[] c, double[] x, double[] y,
            double[] z, double[] exx, double[] eyy, double[] gxy, int start, int end) {
        final double x0 = x[0];
        final double x1 = x[1];
        final double x2 = x[2];
        final double y0 = y[0];
        final double y1 = y[1];
        final double y2 = y[2];
        final double z0 = z[0];
        final double z1 = z[1];
        final double z2 = z[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = c[i];
            double cx = x0 * ra + x1 * rb + x2 * rc;
            double cy = y0 * ra + y1 * rb + y2 * rc;
            double cz = z0 * ra + z1 * rb + z2 * rc;
            exx[i] = cx + cy;
            eyy[i] = cx - cy;
            gxy[i] = 2 * cz;
        }
    }

    private static void vonMisesThree(double[] a, double[] b, double[] c, double[] x,
            double[] y, double[] z, double[] out, int start, int end) {
        final double x0 = x[0];
        final double x1 = x[1];
        final double x2 = x[2];
        final double y0 = y[0];
        final double y1 = y[1];
        final double y2 = y[2];
        final double z0 = z[0];
        final double z1 = z[1];
        final double z2 = z[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = c[i];
            double p = x0 * ra + x1 * rb + x2 * rc;
            double q = y0 * ra + y1 * rb + y2 * rc;
            double s = z0 * ra + z1 * rb + z2 * rc;
            out[i] = Math.sqrt(p * p + 3 * (q * q + s * s));
        }
    }

    private static void trescaThree(double[] a, double[] b, double[] c, double[] x, double[] y,
            double[] z, double[] out, int start, int end) {
        final double x0 = x[0];
        final double x1 = x[1];
        final double x2 = x[2];
        final double y0 = y[0];
        final double y1 = y[1];
        final double y2 = y[2];
        final double z0 = z[0];
        final double z1 = z[1];
        final double z2 = z[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = c[i];
            out[i] = trescaOf(x0 * ra + x1 * rb + x2 * rc, y0 * ra + y1 * rb + y2 * rc,
                    z0 * ra + z1 * rb + z2 * rc);
        }
    }

    /**
     * Tresca in plane stress, R + max(R, |P|) with R = √(Q² + S²), the maximum written as
     * (u + v + |u − v|)/2 (no {@code Math.max}, which is slow in loops on JDK 25).
     */
    static double trescaOf(double p, double q, double s) {
        double radius = Math.sqrt(q * q + s * s);
        double centre = Math.abs(p);
        return radius + 0.5 * (radius + centre + Math.abs(radius - centre));
    }

    /** Any gauge count and any offsets: the dot products per sample, in index order. */
    private static void general(Result result, double[][] r, int shift, double[] x,
            double[] y, double[] z, double[] o1, double[] o2, double[] o3, int start, int end) {
        int n = r.length;
        for (int i = start; i < end; i++) {
            int k = i + shift;
            double r0 = r[0][k];
            double cx = x[0] * r0;
            double cy = y[0] * r0;
            double cz = z[0] * r0;
            for (int j = 1; j < n; j++) {
                double rj = r[j][k];
                cx += x[j] * rj;
                cy += y[j] * rj;
                cz += z[j] * rj;
            }
            switch (result) {
                case CENTRE_AND_RADIUS: {
                    double radius = Math.sqrt(cy * cy + cz * cz);
                    o1[i] = cx + radius;
                    o2[i] = cx - radius;
                    break;
                }
                case ANGLE:
                    o1[i] = Rosette.principalAngle(cx, cy, cz);
                    break;
                case STATE:
                    o1[i] = cx + cy;
                    o2[i] = cx - cy;
                    o3[i] = 2 * cz;
                    break;
                case VON_MISES:
                    o1[i] = Math.sqrt(cx * cx + 3 * (cy * cy + cz * cz));
                    break;
                default:
                    o1[i] = trescaOf(cx, cy, cz);
                    break;
            }
        }
    }
}
