package org.strainmath.bridge;

/**
 * The named arrangements of {@link Bridge}, with what the textbooks say of each: the strain
 * multiples of arms 1 to 4, the closed-form output ratio and the bridge factor. The closed forms
 * follow from the bridge equation with R_i = R·(1 + K·m_i·ε) (Hoffmann, <i>An Introduction to
 * Measurements using Strain Gages</i>, 1989, ch. 3; Window, <i>Strain Gauge Technology</i>,
 * 2nd ed., ch. 3; the forms as recalled from memory and re-derived by hand).
 */
enum Arrangement {
    QUARTER(false) {
        Bridge build(StrainGauge g, double nu) { return Bridge.quarter(g); }
        double[] multiples(double nu) { return new double[] {1, 0, 0, 0}; }
        double closedForm(double k, double nu, double e) { return k * e / (4 + 2 * k * e); }
        double bridgeFactor(double nu) { return 1; }
    },
    QUARTER_WITH_DUMMY(false) {
        Bridge build(StrainGauge g, double nu) { return Bridge.quarterWithDummy(g); }
        double[] multiples(double nu) { return new double[] {1, 0, 0, 0}; }
        double closedForm(double k, double nu, double e) { return k * e / (4 + 2 * k * e); }
        double bridgeFactor(double nu) { return 1; }
    },
    HALF_BENDING(true) {
        Bridge build(StrainGauge g, double nu) { return Bridge.halfBending(g); }
        double[] multiples(double nu) { return new double[] {1, -1, 0, 0}; }
        double closedForm(double k, double nu, double e) { return k * e / 2; }
        double bridgeFactor(double nu) { return 2; }
    },
    HALF_AXIAL_POISSON(false) {
        Bridge build(StrainGauge g, double nu) { return Bridge.halfAxialPoisson(g, nu); }
        double[] multiples(double nu) { return new double[] {1, -nu, 0, 0}; }
        double closedForm(double k, double nu, double e) {
            return k * (1 + nu) * e / (4 + 2 * k * (1 - nu) * e);
        }
        double bridgeFactor(double nu) { return 1 + nu; }
    },
    HALF_OPPOSITE_ARMS(false) {
        Bridge build(StrainGauge g, double nu) { return Bridge.halfOppositeArms(g); }
        double[] multiples(double nu) { return new double[] {1, 0, 1, 0}; }
        double closedForm(double k, double nu, double e) { return k * e / (2 + k * e); }
        double bridgeFactor(double nu) { return 2; }
    },
    FULL_BENDING(true) {
        Bridge build(StrainGauge g, double nu) { return Bridge.fullBending(g); }
        double[] multiples(double nu) { return new double[] {1, -1, 1, -1}; }
        double closedForm(double k, double nu, double e) { return k * e; }
        double bridgeFactor(double nu) { return 4; }
    },
    FULL_AXIAL_POISSON(false) {
        Bridge build(StrainGauge g, double nu) { return Bridge.fullAxialPoisson(g, nu); }
        double[] multiples(double nu) { return new double[] {1, -nu, 1, -nu}; }
        double closedForm(double k, double nu, double e) {
            return k * (1 + nu) * e / (2 + k * (1 - nu) * e);
        }
        double bridgeFactor(double nu) { return 2 * (1 + nu); }
    },
    FULL_BENDING_POISSON(true) {
        Bridge build(StrainGauge g, double nu) { return Bridge.fullBendingPoisson(g, nu); }
        double[] multiples(double nu) { return new double[] {1, -1, nu, -nu}; }
        double closedForm(double k, double nu, double e) { return k * (1 + nu) * e / 2; }
        double bridgeFactor(double nu) { return 2 * (1 + nu); }
    };

    final boolean linear;

    Arrangement(boolean linear) {
        this.linear = linear;
    }

    abstract Bridge build(StrainGauge gauge, double poissonRatio);

    /** The strain each arm's gauge sees, per unit measured strain. */
    abstract double[] multiples(double poissonRatio);

    abstract double closedForm(double gaugeFactor, double poissonRatio, double strain);

    abstract double bridgeFactor(double poissonRatio);
}
