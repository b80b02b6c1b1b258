package org.strainmath.rosette;

import org.strainmath.internal.Kernels;

/**
 * The block loops of {@link Rosette}, and the per-sample functions they share with the value
 * API. Each loop computes, per sample, three dot products of the composed rows with the
 * readings, C = Σ c_j·r_j, D = Σ d_j·r_j, H = Σ h_j·r_j (in index order, from the first product,
 * as {@code Rosette.dot} does), the principal strains ε1,2 = C ± √(D² + H²), and what is asked
 * from them. Three-gauge rosettes run loops that read the three arrays at one index; other
 * counts, or different offsets, loop over the gauges per sample.
 *
 * <p>The loops follow the findings of {@code docs/kernel-findings.md}: one small loop per method, no
 * branch in a loop, a second square root in a loop of its own (JDK 17 does not vectorise a
 * long body with two), the NaN count in a pass of its own, chunks of {@link Kernels#CHUNK}.
 *
 * <p>Stateless; thread-safe.
 */
final class RosetteKernels {

    private RosetteKernels() {
    }

    /** What the general loop writes. */
    enum Result { STRAINS, ANGLE, STATE, STRESSES, VON_MISES, TRESCA }

    // ---------------------------------------------------------------- per-sample functions

    /** σ1 = E/(1 − ν²)·(ε1 + ν·ε2), plane stress (Hooke's law along the principal axes). */
    static double s1Of(double e1, double e2, double k, double nu) {
        return k * (e1 + nu * e2);
    }

    /** σ2 = E/(1 − ν²)·(ε2 + ν·ε1). */
    static double s2Of(double e1, double e2, double k, double nu) {
        return k * (e2 + nu * e1);
    }

    /** von Mises in plane stress, √(σ1² − σ1·σ2 + σ2²). */
    static double vonMisesOf(double e1, double e2, double k, double nu) {
        double s1 = s1Of(e1, e2, k, nu);
        double s2 = s2Of(e1, e2, k, nu);
        return Math.sqrt(s1 * s1 - s1 * s2 + s2 * s2);
    }

    /**
     * Tresca in plane stress, max(σ1 − σ2, |σ1|, |σ2|) with σ1 ≥ σ2, each maximum written as
     * (u + v + |u − v|)/2 (no {@code Math.max}, which is slow in loops on JDK 25).
     */
    static double trescaOf(double e1, double e2, double k, double nu) {
        double s1 = s1Of(e1, e2, k, nu);
        double s2 = s2Of(e1, e2, k, nu);
        double a = Math.abs(s1);
        double b = Math.abs(s2);
        double larger = 0.5 * (a + b + Math.abs(a - b));
        double difference = s1 - s2;
        return 0.5 * (difference + larger + Math.abs(difference - larger));
    }

    // ---------------------------------------------------------------- block entry points

    static int strains(double[][] r, int srcOff, double[] c, double[] d, double[] h,
            double[] e1, double[] e2, int dstOff, int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0) {
                strainsThree(r[0], r[1], r[2], c, d, h, e1, e2, start, end);
            } else {
                general(Result.STRAINS, r, shift, c, d, h, 0, 0, e1, e2, null, start, end);
            }
            nan += Kernels.countNaNRows(e1, e2, start, end - start);
        }
        return nan;
    }

    static int strainsAndVonMises(double[][] r, int srcOff, double[] c, double[] d,
            double[] h, double k, double nu, double[] e1, double[] e2, double[] vm, int dstOff,
            int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0) {
                strainsThree(r[0], r[1], r[2], c, d, h, e1, e2, start, end);
            } else {
                general(Result.STRAINS, r, shift, c, d, h, 0, 0, e1, e2, null, start, end);
            }
            vonMisesOfPrincipal(e1, e2, k, nu, vm, start, end);
            // A NaN in ε1 or ε2 makes σvm NaN: counting σvm counts the rows.
            nan += Kernels.countNaN(vm, start, end - start);
        }
        return nan;
    }

    static int angle(double[][] r, int srcOff, double[] c, double[] d, double[] h,
            double[] out, int dstOff, int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0) {
                angleThree(r[0], r[1], r[2], c, d, h, out, start, end);
            } else {
                general(Result.ANGLE, r, shift, c, d, h, 0, 0, out, null, null, start, end);
            }
            nan += Kernels.countNaN(out, start, end - start);
        }
        return nan;
    }

    static int state(double[][] r, int srcOff, double[] c, double[] d, double[] h,
            double[] exx, double[] eyy, double[] gxy, int dstOff, int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0) {
                stateThree(r[0], r[1], r[2], c, d, h, exx, eyy, gxy, start, end);
            } else {
                general(Result.STATE, r, shift, c, d, h, 0, 0, exx, eyy, gxy, start, end);
            }
            nan += Kernels.countNaNRows(exx, eyy, gxy, start, end - start);
        }
        return nan;
    }

    /** σ1, σ2 (STRESSES), von Mises or Tresca: a result of the principal strains. */
    static int stresses(Result result, double[][] r, int srcOff, double[] c, double[] d,
            double[] h, double k, double nu, double[] o1, double[] o2, int dstOff, int len) {
        int nan = 0;
        int shift = srcOff - dstOff;
        for (int done = 0; done < len; done += Kernels.CHUNK) {
            int start = dstOff + done;
            int end = start + Math.min(Kernels.CHUNK, len - done);
            if (r.length == 3 && shift == 0 && result == Result.STRESSES) {
                stressesThree(r[0], r[1], r[2], c, d, h, k, nu, o1, o2, start, end);
            } else if (r.length == 3 && shift == 0 && result == Result.VON_MISES) {
                vonMisesThree(r[0], r[1], r[2], c, d, h, k, nu, o1, start, end);
            } else if (r.length == 3 && shift == 0) {
                trescaThree(r[0], r[1], r[2], c, d, h, k, nu, o1, start, end);
            } else {
                general(result, r, shift, c, d, h, k, nu, o1, o2, null, start, end);
            }
            nan += o2 == null ? Kernels.countNaN(o1, start, end - start)
                    : Kernels.countNaNRows(o1, o2, start, end - start);
        }
        return nan;
    }

    // ---------------------------------------------------------------- three-gauge loops

    private static void strainsThree(double[] a, double[] b, double[] cc, double[] c,
            double[] d, double[] h, double[] e1, double[] e2, int start, int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            double centre = c0 * ra + c1 * rb + c2 * rc;
            double dd = d0 * ra + d1 * rb + d2 * rc;
            double hh = h0 * ra + h1 * rb + h2 * rc;
            double radius = Math.sqrt(dd * dd + hh * hh);
            e1[i] = centre + radius;
            e2[i] = centre - radius;
        }
    }

    private static void vonMisesOfPrincipal(double[] e1, double[] e2, double k, double nu,
            double[] vm, int start, int end) {
        for (int i = start; i < end; i++) {
            vm[i] = vonMisesOf(e1[i], e2[i], k, nu);
        }
    }

    private static void angleThree(double[] a, double[] b, double[] cc, double[] c, double[] d,
            double[] h, double[] out, int start, int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            out[i] = Rosette.principalAngle(c0 * ra + c1 * rb + c2 * rc,
                    d0 * ra + d1 * rb + d2 * rc, h0 * ra + h1 * rb + h2 * rc);
        }
    }

    private static void stateThree(double[] a, double[] b, double[] cc, double[] c, double[] d,
            double[] h, double[] exx, double[] eyy, double[] gxy, int start, int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            double centre = c0 * ra + c1 * rb + c2 * rc;
            double dd = d0 * ra + d1 * rb + d2 * rc;
            double hh = h0 * ra + h1 * rb + h2 * rc;
            exx[i] = centre + dd;
            eyy[i] = centre - dd;
            gxy[i] = 2 * hh;
        }
    }

    private static void stressesThree(double[] a, double[] b, double[] cc, double[] c,
            double[] d, double[] h, double k, double nu, double[] s1, double[] s2, int start,
            int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            double centre = c0 * ra + c1 * rb + c2 * rc;
            double dd = d0 * ra + d1 * rb + d2 * rc;
            double hh = h0 * ra + h1 * rb + h2 * rc;
            double radius = Math.sqrt(dd * dd + hh * hh);
            double p1 = centre + radius;
            double p2 = centre - radius;
            s1[i] = s1Of(p1, p2, k, nu);
            s2[i] = s2Of(p1, p2, k, nu);
        }
    }

    private static void vonMisesThree(double[] a, double[] b, double[] cc, double[] c,
            double[] d, double[] h, double k, double nu, double[] out, int start, int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            double centre = c0 * ra + c1 * rb + c2 * rc;
            double dd = d0 * ra + d1 * rb + d2 * rc;
            double hh = h0 * ra + h1 * rb + h2 * rc;
            double radius = Math.sqrt(dd * dd + hh * hh);
            out[i] = vonMisesOf(centre + radius, centre - radius, k, nu);
        }
    }

    private static void trescaThree(double[] a, double[] b, double[] cc, double[] c,
            double[] d, double[] h, double k, double nu, double[] out, int start, int end) {
        final double c0 = c[0];
        final double c1 = c[1];
        final double c2 = c[2];
        final double d0 = d[0];
        final double d1 = d[1];
        final double d2 = d[2];
        final double h0 = h[0];
        final double h1 = h[1];
        final double h2 = h[2];
        for (int i = start; i < end; i++) {
            double ra = a[i];
            double rb = b[i];
            double rc = cc[i];
            double centre = c0 * ra + c1 * rb + c2 * rc;
            double dd = d0 * ra + d1 * rb + d2 * rc;
            double hh = h0 * ra + h1 * rb + h2 * rc;
            double radius = Math.sqrt(dd * dd + hh * hh);
            out[i] = trescaOf(centre + radius, centre - radius, k, nu);
        }
    }

    // ---------------------------------------------------------------- any gauge count

    /** Any gauge count and any offsets: the dot products per sample, in index order. */
    private static void general(Result result, double[][] r, int shift, double[] c, double[] d,
            double[] h, double k, double nu, double[] o1, double[] o2, double[] o3, int start,
            int end) {
        int n = r.length;
        for (int i = start; i < end; i++) {
            int m = i + shift;
            double r0 = r[0][m];
            double centre = c[0] * r0;
            double dd = d[0] * r0;
            double hh = h[0] * r0;
            for (int j = 1; j < n; j++) {
                double rj = r[j][m];
                centre += c[j] * rj;
                dd += d[j] * rj;
                hh += h[j] * rj;
            }
            double radius = Math.sqrt(dd * dd + hh * hh);
            double p1 = centre + radius;
            double p2 = centre - radius;
            switch (result) {
                case STRAINS:
                    o1[i] = p1;
                    o2[i] = p2;
                    break;
                case ANGLE:
                    o1[i] = Rosette.principalAngle(centre, dd, hh);
                    break;
                case STATE:
                    o1[i] = centre + dd;
                    o2[i] = centre - dd;
                    o3[i] = 2 * hh;
                    break;
                case STRESSES:
                    o1[i] = s1Of(p1, p2, k, nu);
                    o2[i] = s2Of(p1, p2, k, nu);
                    break;
                case VON_MISES:
                    o1[i] = vonMisesOf(p1, p2, k, nu);
                    break;
                default:
                    o1[i] = trescaOf(p1, p2, k, nu);
                    break;
            }
        }
    }
}
