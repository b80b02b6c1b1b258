package org.strainmath.rosette;

import java.math.BigDecimal;
import java.math.MathContext;

import org.strainmath.bridge.StrainGauge;

/**
 * The reduction of a rosette, composed once when the {@link Rosette} is built: the model that
 * gives each gauge's reading from (C, D, H) = ((εx + εy)/2, (εx − εy)/2, γxy/2), corrected for
 * each grid's transverse sensitivity, and its least-squares inverse, the three rows that give
 * C, D and H from the readings, in 50-digit decimals (the equations are in {@link Rosette}'s
 * class comment). The rows are what the kernels ({@link RosetteKernels}) multiply by.
 *
 * <p>Immutable and thread-safe.
 */
final class RosetteReduction {


    private static final MathContext DIGITS = new MathContext(50);
    private static final double SAME_DIRECTION = 1e-9;

    /** n × 3: readings = model · (C, D, H). */
    final double[][] model;
    final double[] rowC;
    final double[] rowD;
    final double[] rowH;

    /**
     * The reduction of gauges at {@code theta} (radians from the reference axis, counter-
     * clockwise) with the transverse data of {@code grids} (or none), and the tee's condition.
     *
     * @throws IllegalArgumentException if the directions leave the strain state undetermined
     */
    RosetteReduction(double[] theta, StrainGauge[] grids, boolean tee) {
        int n = theta.length;
        checkDirections(theta);
        BigDecimal[][] exact = new BigDecimal[n][3];
        this.model = new double[n][3];
        for (int j = 0; j < n; j++) {
            double kt = grids == null ? 0 : grids[j].transverseSensitivity();
            double nu0 = grids == null ? 0 : grids[j].calibrationPoissonRatio();
            BigDecimal k = new BigDecimal(kt);
            BigDecimal scale = BigDecimal.ONE.subtract(new BigDecimal(nu0).multiply(k));
            BigDecimal[] cs = cosSinOfTwice(theta[j]);
            BigDecimal across = BigDecimal.ONE.subtract(k);
            exact[j][0] = BigDecimal.ONE.add(k).divide(scale, DIGITS);
            exact[j][1] = across.multiply(cs[0]).divide(scale, DIGITS);
            exact[j][2] = across.multiply(cs[1]).divide(scale, DIGITS);
            for (int c = 0; c < 3; c++) {
                model[j][c] = exact[j][c].doubleValue();
            }
        }
        double[][] rows = reduction(exact, tee ? cosSinOfTwice(theta[0]) : null, theta);
        this.rowC = rows[0];
        this.rowD = rows[1];
        this.rowH = rows[2];
    }


    private static void checkDirections(double[] theta) {
        for (int i = 0; i < theta.length; i++) {
            for (int k = i + 1; k < theta.length; k++) {
                if (Math.abs(StrictMath.sin(theta[i] - theta[k])) < SAME_DIRECTION) {
                    throw new IllegalArgumentException("gauges " + letter(i) + " and "
                            + letter(k) + " lie along one direction (0° or 180° apart), which "
                            + "leaves the strain state undetermined: " + Rosette.anglesText(theta));
                }
            }
        }
    }


    private static String letter(int j) {
        return j < 26 ? String.valueOf((char) ('a' + j)) : "#" + (j + 1);
    }


    /**
     * cos 2θ and sin 2θ, exact (to 50 digits) when 2θ is within 1e-9° of a multiple of 30°, as
     * for the nominal angles of the usual rosettes (so that their matrices are exact: the
     * rectangular one is {@code {{1, 0, 0}, {0, 0, 1}, {-1, 2, -1}}}), else {@link StrictMath}.
     */
    private static BigDecimal[] cosSinOfTwice(double theta) {
        double degrees = Math.toDegrees(2 * theta);
        long k = Math.round(degrees / 30);
        if (Math.abs(degrees - 30.0 * k) < 1e-9) {
            int step = (int) Math.floorMod(k, 12L);
            BigDecimal half = new BigDecimal("0.5");
            BigDecimal root = new BigDecimal(3).sqrt(DIGITS).multiply(half);
            BigDecimal[] cos = {BigDecimal.ONE, root, half, BigDecimal.ZERO, half.negate(),
                root.negate(), BigDecimal.ONE.negate(), root.negate(), half.negate(),
                BigDecimal.ZERO, half, root};
            return new BigDecimal[] {cos[step], cos[Math.floorMod(step - 3, 12)]};
        }
        double twice = 2 * theta;
        return new BigDecimal[] {new BigDecimal(StrictMath.cos(twice)),
            new BigDecimal(StrictMath.sin(twice))};
    }


    /**
     * The rows (C, D, H) = (MᵀM)⁻¹Mᵀ·readings of the model M (n × 3), plus for a tee the
     * condition −D·sin 2θa + H·cos 2θa = 0 as one more equation with a zero reading, in
     * 50-digit decimals.
     */
    private static double[][] reduction(BigDecimal[][] model, BigDecimal[] teeCosSin,
            double[] theta) {
        int n = model.length;
        int m = teeCosSin == null ? n : n + 1;
        BigDecimal[][] a = new BigDecimal[m][];
        for (int j = 0; j < n; j++) {
            a[j] = model[j];
        }
        if (m > n) {
            a[n] = new BigDecimal[] {BigDecimal.ZERO, teeCosSin[1].negate(), teeCosSin[0]};
        }
        BigDecimal[][] normal = new BigDecimal[3][3];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                BigDecimal sum = BigDecimal.ZERO;
                for (int j = 0; j < m; j++) {
                    sum = sum.add(a[j][r].multiply(a[j][c]));
                }
                normal[r][c] = sum;
            }
        }
        BigDecimal[][] inverse = inverse3(normal, theta);
        double[][] rows = new double[3][n];
        for (int r = 0; r < 3; r++) {
            for (int j = 0; j < n; j++) {
                BigDecimal sum = BigDecimal.ZERO;
                for (int c = 0; c < 3; c++) {
                    sum = sum.add(inverse[r][c].multiply(a[j][c]));
                }
                rows[r][j] = sum.round(DIGITS).doubleValue();
            }
        }
        return rows;
    }


    private static BigDecimal[][] inverse3(BigDecimal[][] x, double[] theta) {
        BigDecimal c00 = x[1][1].multiply(x[2][2]).subtract(x[1][2].multiply(x[2][1]));
        BigDecimal c01 = x[0][2].multiply(x[2][1]).subtract(x[0][1].multiply(x[2][2]));
        BigDecimal c02 = x[0][1].multiply(x[1][2]).subtract(x[0][2].multiply(x[1][1]));
        BigDecimal c10 = x[1][2].multiply(x[2][0]).subtract(x[1][0].multiply(x[2][2]));
        BigDecimal c11 = x[0][0].multiply(x[2][2]).subtract(x[0][2].multiply(x[2][0]));
        BigDecimal c12 = x[0][2].multiply(x[1][0]).subtract(x[0][0].multiply(x[1][2]));
        BigDecimal c20 = x[1][0].multiply(x[2][1]).subtract(x[1][1].multiply(x[2][0]));
        BigDecimal c21 = x[0][1].multiply(x[2][0]).subtract(x[0][0].multiply(x[2][1]));
        BigDecimal c22 = x[0][0].multiply(x[1][1]).subtract(x[0][1].multiply(x[1][0]));
        BigDecimal det = x[0][0].multiply(c00).add(x[0][1].multiply(c10)).add(x[0][2].multiply(c20));
        BigDecimal trace = x[0][0].add(x[1][1]).add(x[2][2]);
        if (det.abs().compareTo(trace.pow(3).multiply(new BigDecimal("1e-24"))) <= 0) {
            throw new IllegalArgumentException("the gauge directions leave the strain state "
                    + "undetermined: " + Rosette.anglesText(theta));
        }
        BigDecimal[][] cof = {{c00, c01, c02}, {c10, c11, c12}, {c20, c21, c22}};
        BigDecimal[][] out = new BigDecimal[3][3];
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                out[r][c] = cof[r][c].divide(det, DIGITS);
            }
        }
        return out;
    }
}
