package org.strainmath.history;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Brute-force references for the rainflow tests, written from the definitions and not from the
 * library's code: lists with removal in place of stacks, turning points by local comparison, and
 * Rychlik's definition of the rainflow cycle (Rychlik, I., 1987, "A new definition of the
 * rainflow cycle counting method", Int. J. Fatigue 9(2), 119–121; from memory).
 */
final class RainflowReference {

    private RainflowReference() {
    }

    /** One counted cycle: {from, to, count}. */
    static List<double[]> cycles(Cycles c) {
        List<double[]> list = new ArrayList<>();
        for (int i = 0; i < c.size(); i++) {
            list.add(new double[] {c.from(i), c.to(i), c.count(i)});
        }
        return list;
    }

    /**
     * Turning points through the gate, by the definition (common practice, no source): the
     * first sample; then each extreme that the history leaves by more than the gate before it
     * passes it again; then the extreme still open at the end. Written as a scan over "the
     * extreme since the last turning point" and "the direction", with the start kept apart.
     */
    static List<Double> turningPoints(double[] x, double gate) {
        List<Double> out = new ArrayList<>();
        double[] finite = Arrays.stream(x).filter(Double::isFinite).toArray();
        if (finite.length == 0) {
            return out;
        }
        out.add(finite[0]);
        int direction = 0;
        double extreme = finite[0];
        for (int i = 1; i < finite.length; i++) {
            double v = finite[i];
            if (direction == 0) {
                if (Math.abs(v - finite[0]) > gate) {
                    direction = v > finite[0] ? 1 : -1;
                    extreme = v;
                }
            } else if ((v - extreme) * direction > 0) {
                extreme = v;
            } else if ((extreme - v) * direction > gate) {
                out.add(extreme);
                direction = -direction;
                extreme = v;
            }
        }
        if (direction != 0) {
            out.add(extreme);
        }
        return out;
    }

    /**
     * Turning points with no gate by local comparison: plateaus merged, then the first, the
     * last and every strict interior extreme (common practice, no source).
     */
    static List<Double> strictTurningPoints(double[] x) {
        List<Double> merged = new ArrayList<>();
        for (double v : x) {
            if (Double.isFinite(v) && (merged.isEmpty() || merged.get(merged.size() - 1) != v)) {
                merged.add(v);
            }
        }
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < merged.size(); i++) {
            if (i == 0 || i == merged.size() - 1) {
                out.add(merged.get(i));
            } else {
                double d1 = merged.get(i) - merged.get(i - 1);
                double d2 = merged.get(i + 1) - merged.get(i);
                if (d1 * d2 < 0) {
                    out.add(merged.get(i));
                }
            }
        }
        return out;
    }

    /** ASTM E1049-85 5.4.4, steps 1 to 6, literally, on a list of turning points. */
    static List<double[]> astm544(List<Double> turningPoints) {
        List<double[]> counted = new ArrayList<>();
        List<Double> p = new ArrayList<>();
        for (double next : turningPoints) {
            p.add(next);                                           // step 1
            while (p.size() >= 3) {                                // step 2
                int n = p.size();
                double x = Math.abs(p.get(n - 1) - p.get(n - 2));
                double y = Math.abs(p.get(n - 2) - p.get(n - 3));
                if (x < y) {                                       // step 3
                    break;
                }
                if (n - 3 == 0) {                                  // step 5: Y contains S
                    counted.add(new double[] {p.get(0), p.get(1), 0.5});
                    p.remove(0);
                } else {                                           // step 4
                    counted.add(new double[] {p.get(n - 3), p.get(n - 2), 1.0});
                    p.remove(n - 2);
                    p.remove(n - 3);
                }
            }
        }
        for (int i = 0; i + 1 < p.size(); i++) {                   // step 6
            counted.add(new double[] {p.get(i), p.get(i + 1), 0.5});
        }
        return counted;
    }

    /**
     * The four-point form on a list of turning points: an inner range is a full cycle when
     * both neighbouring ranges are at least as large; the first range is never inner. Returns
     * the closed cycles in the order found, then (when {@code withResidue}) the ranges of the
     * residue as half cycles.
     */
    static List<double[]> fourPoint(List<Double> turningPoints, boolean withResidue) {
        List<double[]> counted = new ArrayList<>();
        List<Double> p = new ArrayList<>();
        for (double next : turningPoints) {
            p.add(next);
            while (p.size() >= 4) {
                int n = p.size();
                double x = Math.abs(p.get(n - 1) - p.get(n - 2));
                double y = Math.abs(p.get(n - 2) - p.get(n - 3));
                double z = Math.abs(p.get(n - 3) - p.get(n - 4));
                if (y > x || y > z) {
                    break;
                }
                counted.add(new double[] {p.get(n - 3), p.get(n - 2), 1.0});
                p.remove(n - 2);
                p.remove(n - 3);
            }
        }
        if (withResidue) {
            for (int i = 0; i + 1 < p.size(); i++) {
                counted.add(new double[] {p.get(i), p.get(i + 1), 0.5});
            }
        }
        return counted;
    }

    /**
     * ASTM E1049-85 5.4.3 (repeating histories), literally: the turning points as one period,
     * begun at the one of largest absolute value and closed by it, through the gate again at the
     * join; then the three-point rule, every cycle full.
     */
    static List<double[]> astm543(List<Double> turningPoints, double gate) {
        int n = turningPoints.size();
        List<double[]> counted = new ArrayList<>();
        if (n < 2) {
            return counted;
        }
        int k = 0;
        for (int i = 1; i < n; i++) {
            if (Math.abs(turningPoints.get(i)) > Math.abs(turningPoints.get(k))) {
                k = i;
            }
        }
        double[] period = new double[n + 1];
        for (int j = 0; j <= n; j++) {
            period[j] = turningPoints.get((k + j) % n);
        }
        List<Double> p = new ArrayList<>();
        for (double next : turningPoints(period, gate)) {
            p.add(next);
            while (p.size() >= 3) {
                int m = p.size();
                double x = Math.abs(p.get(m - 1) - p.get(m - 2));
                double y = Math.abs(p.get(m - 2) - p.get(m - 3));
                if (x < y) {
                    break;
                }
                counted.add(new double[] {p.get(m - 3), p.get(m - 2), 1.0});
                p.remove(m - 2);
                p.remove(m - 3);
            }
        }
        return counted;
    }

    /**
     * Rychlik's definition for a repeating history of distinct values (period of turning points
     * begun and closed at its largest value): each local maximum M pairs with the larger of the
     * least values between it and the nearest higher point on either side. One cycle per
     * maximum; returned as {min, max} pairs.
     */
    static List<double[]> rychlikRepeated(List<Double> turningPoints) {
        int n = turningPoints.size();
        int k = 0;
        for (int i = 1; i < n; i++) {
            if (turningPoints.get(i) > turningPoints.get(k)) {
                k = i;
            }
        }
        double[] p = new double[n + 1];
        for (int j = 0; j <= n; j++) {
            p[j] = turningPoints.get((k + j) % n);
        }
        List<double[]> pairs = new ArrayList<>();
        double globalMin = Arrays.stream(p).min().orElseThrow();
        pairs.add(new double[] {globalMin, p[0]});
        for (int t = 1; t < n; t++) {
            boolean isMax = p[t] > p[t - 1] && p[t] > p[t + 1];
            if (!isMax) {
                continue;
            }
            double leftMin = p[t];
            for (int s = t - 1; s >= 0 && p[s] <= p[t]; s--) {
                leftMin = Math.min(leftMin, p[s]);
            }
            double rightMin = p[t];
            for (int s = t + 1; s <= n && p[s] <= p[t]; s++) {
                rightMin = Math.min(rightMin, p[s]);
            }
            pairs.add(new double[] {Math.max(leftMin, rightMin), p[t]});
        }
        return pairs;
    }

    /** {min, max, count} of each cycle, sorted, to compare counts found in another order. */
    static List<double[]> sortedPairs(List<double[]> cycles) {
        List<double[]> out = new ArrayList<>();
        for (double[] c : cycles) {
            out.add(new double[] {Math.min(c[0], c[1]), Math.max(c[0], c[1]),
                c.length > 2 ? c[2] : 1.0});
        }
        out.sort((a, b) -> a[0] != b[0] ? Double.compare(a[0], b[0])
                : a[1] != b[1] ? Double.compare(a[1], b[1]) : Double.compare(a[2], b[2]));
        return out;
    }

    /**
     * A seeded history of {@code n} samples of one of three kinds: 0 a random walk with noise
     * (distinct values), 1 small integers (ties and plateaus), 2 a sine with noise and an
     * occasional NaN or infinity.
     */
    static double[] history(SplittableRandom random, int n, int kind) {
        double[] x = new double[n];
        double level = 0;
        for (int i = 0; i < n; i++) {
            switch (kind) {
                case 1:
                    x[i] = random.nextInt(-4, 5);
                    break;
                case 2:
                    x[i] = 100 * Math.sin(i * 0.07) + 20 * random.nextDouble();
                    int r = random.nextInt(40);
                    if (r == 0) {
                        x[i] = Double.NaN;
                    } else if (r == 1) {
                        x[i] = random.nextBoolean() ? Double.POSITIVE_INFINITY
                                : Double.NEGATIVE_INFINITY;
                    }
                    break;
                default:
                    level += random.nextDouble() - 0.5;
                    x[i] = level + 0.3 * random.nextDouble();
            }
        }
        return x;
    }

    static double[] toArray(List<Double> values) {
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }
}
