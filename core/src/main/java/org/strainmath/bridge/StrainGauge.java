package org.strainmath.bridge;

import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serializable;
import java.util.Objects;

import org.strainmath.internal.Checks;
import org.strainmath.internal.Format;
import org.strainmath.internal.SerialForms;
import org.strainmath.quantity.Resistance;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Temperature;

/**
 * A metallic strain gauge as its data sheet describes it: nominal (unstrained) resistance, gauge
 * factor and, optionally, transverse sensitivity and active grid area.
 *
 * <p>The gauge obeys the gauge-factor relation (ASTM E251, "gauge factor"; Dally &amp; Riley,
 * <i>Experimental Stress Analysis</i>, 4th ed., eq. 6.5, number from memory):
 * <pre>
 *   ΔR / R = K · ε
 *
 *   R   nominal resistance, Ω
 *   ΔR  change of resistance, Ω
 *   K   gauge factor, dimensionless (about 2 for the usual copper–nickel and nickel–chromium
 *       alloy grids)
 *   ε   strain along the grid, m/m, positive in tension
 * </pre>
 * The relation is taken as exact at all strains in this library: the resistance at strain ε is
 * R·(1 + K·ε), which stays positive for ε &gt; −1/K. The bridge equations use K only; the
 * transverse sensitivity Kt (with the ν0 of the gauge-factor calibration) and the instrument's
 * gauge-factor setting enter through the corrections below.
 *
 * <pre>
 *   StrainGauge g = StrainGauge.ofOhms(120, 2.0);
 *   g.resistanceChangeInOhms(Strain.ofMicrostrain(250));   // 0.06 (Ω)
 * </pre>
 *
 * <p>Immutable and thread-safe; equal to another gauge with the same data.
 * Serializable, for a stream engine that ships configurations to other processes: the
 * stream holds the defining values only, checked again as the factories check them.
 */
public final class StrainGauge implements Serializable {

    @SuppressWarnings("serial") // never serialized: the serial form holds the defining values
    private final Resistance nominalResistance;
    private final double gaugeFactor;
    private final double transverseSensitivity;
    private final double calibrationPoissonRatio;
    private final double gridArea;
    /** Relative change of the gauge factor per kelvin (from %/100 K). */
    private final double gaugeFactorDrift;
    /** Temperature at which the gauge factor is given, °C. */
    private final double gaugeFactorCelsius;

    /**
     * The Poisson ratio of the calibration beam on which gauge factors are commonly measured,
     * 0.285 (ASTM E251; common practice).
     */
    public static final double DEFAULT_CALIBRATION_POISSON_RATIO = 0.285;

    private StrainGauge(Resistance nominalResistance, double gaugeFactor,
            double transverseSensitivity, double calibrationPoissonRatio, double gridArea,
            double gaugeFactorDrift, double gaugeFactorCelsius) {
        this.nominalResistance = nominalResistance;
        this.gaugeFactor = gaugeFactor;
        this.transverseSensitivity = transverseSensitivity;
        this.calibrationPoissonRatio = calibrationPoissonRatio;
        this.gridArea = gridArea;
        this.gaugeFactorDrift = gaugeFactorDrift;
        this.gaugeFactorCelsius = gaugeFactorCelsius;
    }

    private static final double DEFAULT_GAUGE_FACTOR_CELSIUS = 20.0;

    /**
     * A gauge of {@code nominalResistance} and {@code gaugeFactor}, with no transverse
     * sensitivity.
     *
     * @throws NullPointerException     if {@code nominalResistance} is null
     * @throws IllegalArgumentException if the resistance is zero, or the gauge factor is not
     *                                  positive and finite
     */
    public static StrainGauge of(Resistance nominalResistance, double gaugeFactor) {
        Objects.requireNonNull(nominalResistance, "nominalResistance");
        Checks.positiveFinite(nominalResistance.toOhms(), "nominalResistance");
        Checks.positiveFinite(gaugeFactor, "gaugeFactor");
        return new StrainGauge(nominalResistance, gaugeFactor, 0.0,
                DEFAULT_CALIBRATION_POISSON_RATIO, 0.0, 0.0, DEFAULT_GAUGE_FACTOR_CELSIUS);
    }

    /**
     * A gauge of {@code ohms} Ω and {@code gaugeFactor}: the short form for a JShell prompt.
     *
     * @throws IllegalArgumentException if either is not positive and finite
     */
    public static StrainGauge ofOhms(double ohms, double gaugeFactor) {
        Checks.positiveFinite(ohms, "ohms");
        return of(Resistance.ofOhms(ohms), gaugeFactor);
    }

    /**
     * A copy with the transverse sensitivity {@code kt} (Kt) as a fraction (0.012 for the 1.2 % of a
     * data sheet), defined as in ASTM E251: the ratio of the transverse to the axial gauge
     * factor.
     *
     * @throws IllegalArgumentException if {@code kt} is not in (−1, 1)
     */
    public StrainGauge withTransverseSensitivity(double kt) {
        Checks.inOpenInterval(kt, -1, 1, "kt");
        return new StrainGauge(nominalResistance, gaugeFactor, kt + 0.0, calibrationPoissonRatio,
                gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /**
     * A copy with the nominal resistance {@code resistance} and the same gauge factor and
     * transverse sensitivity.
     *
     * @throws NullPointerException     if {@code resistance} is null
     * @throws IllegalArgumentException if {@code resistance} is zero
     */
    public StrainGauge withNominalResistance(Resistance resistance) {
        Objects.requireNonNull(resistance, "resistance");
        Checks.positiveFinite(resistance.toOhms(), "resistance");
        return new StrainGauge(resistance, gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /**
     * A copy with the gauge factor {@code gaugeFactor}.
     *
     * @throws IllegalArgumentException if {@code gaugeFactor} is not positive and finite
     */
    public StrainGauge withGaugeFactor(double gaugeFactor) {
        Checks.positiveFinite(gaugeFactor, "gaugeFactor");
        return new StrainGauge(nominalResistance, gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /**
     * A copy with the active grid area {@code gridArea} in mm² (grid length × grid width from
     * the data sheet), which sets the power the gauge may dissipate for a given power density.
     *
     * @throws IllegalArgumentException if the area is not positive and finite
     */
    public StrainGauge withGridArea(double gridArea) {
        Checks.positiveFinite(gridArea, "gridArea");
        return new StrainGauge(nominalResistance, gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /** The active grid area in mm², or 0 if it was not given. */
    public double gridAreaSquareMillimetres() {
        return gridArea;
    }

    /**
     * A copy whose gauge factor and transverse sensitivity were measured on a calibration beam
     * of Poisson ratio {@code poissonRatio} (the data sheet's ν0; 0.285 unless set).
     *
     * @throws IllegalArgumentException if {@code poissonRatio} is not in (−1, 0.5)
     */
    public StrainGauge withCalibrationPoissonRatio(double poissonRatio) {
        Checks.inOpenInterval(poissonRatio, -1, 0.5, "poissonRatio");
        return new StrainGauge(nominalResistance, gaugeFactor, transverseSensitivity,
                poissonRatio + 0.0, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /** The Poisson ratio ν0 of the gauge-factor calibration. */
    public double calibrationPoissonRatio() {
        return calibrationPoissonRatio;
    }

    /**
     * The strain this gauge indicates (at its own gauge factor) in a field of {@code axial}
     * strain along the grid and {@code transverse} strain across it. The grid responds as
     * ΔR/R = Sa·(εa + Kt·εt); the gauge factor was measured where εt = −ν0·εa, so
     * K = Sa·(1 − ν0·Kt), and (ASTM E251; Dally &amp; Riley, <i>Experimental Stress
     * Analysis</i>, 4th ed., §6.5)
     * <pre>
     *   ε' = (εa + Kt·εt) / (1 − ν0·Kt)
     * </pre>
     *
     * @throws NullPointerException if an argument is null
     */
    public Strain indicatedStrain(Strain axial, Strain transverse) {
        Objects.requireNonNull(axial, "axial");
        Objects.requireNonNull(transverse, "transverse");
        return Strain.of((axial.value() + transverseSensitivity * transverse.value())
                / (1 - calibrationPoissonRatio * transverseSensitivity));
    }

    /**
     * The axial strain corrected for transverse sensitivity, from the strain
     * {@code indicated} by this gauge and the ratio εt/εa of the transverse to the axial strain
     * (−ν in uniaxial stress on a material of Poisson ratio ν), inverting
     * {@link #indicatedStrain}:
     * <pre>
     *   εa = ε' · (1 − ν0·Kt) / (1 + Kt·εt/εa)
     * </pre>
     * The correction vanishes for uniaxial stress on a material whose ν equals ν0.
     *
     * @throws NullPointerException     if {@code indicated} is null
     * @throws IllegalArgumentException if the ratio is not finite or makes the denominator zero
     */
    public Strain correctedForTransverse(Strain indicated, double transverseToAxialRatio) {
        Objects.requireNonNull(indicated, "indicated");
        Checks.finite(transverseToAxialRatio, "transverseToAxialRatio");
        double denominator = 1 + transverseSensitivity * transverseToAxialRatio;
        if (denominator == 0) {
            throw new IllegalArgumentException("transverseToAxialRatio must not be -1/Kt: "
                    + transverseToAxialRatio);
        }
        return Strain.of(indicated.value() * (1 - calibrationPoissonRatio * transverseSensitivity)
                / denominator);
    }

    /**
     * The axial strain corrected for transverse sensitivity from two gauges of this type at
     * right angles, {@code indicatedAlong} along the axis and {@code indicatedAcross} across it
     * (Wu, Experimental Mechanics 2(11), 1962; Dally &amp; Riley, 4th ed., §6.5):
     * <pre>
     *   εa = (1 − ν0·Kt) · (ε'a − Kt·ε't) / (1 − Kt²)
     * </pre>
     * The transverse strain is the same with the two indicated strains swapped.
     *
     * @throws NullPointerException if an argument is null
     */
    public Strain correctedForTransverse(Strain indicatedAlong, Strain indicatedAcross) {
        Objects.requireNonNull(indicatedAlong, "indicatedAlong");
        Objects.requireNonNull(indicatedAcross, "indicatedAcross");
        double kt = transverseSensitivity;
        return Strain.of((1 - calibrationPoissonRatio * kt)
                * (indicatedAlong.value() - kt * indicatedAcross.value()) / (1 - kt * kt));
    }

    /**
     * The strain {@code indicated} by an instrument set to {@code instrumentGaugeFactor},
     * corrected to this gauge's factor: ε = ε_ind · K_instrument / K_gauge (common practice,
     * no source), since the instrument divides the same ΔR/R by its own setting.
     *
     * @throws NullPointerException     if {@code indicated} is null
     * @throws IllegalArgumentException if the instrument gauge factor is not positive and finite
     */
    public Strain correctedForInstrumentGaugeFactor(Strain indicated,
            double instrumentGaugeFactor) {
        Objects.requireNonNull(indicated, "indicated");
        Checks.positiveFinite(instrumentGaugeFactor, "instrumentGaugeFactor");
        return Strain.of(indicated.value() * instrumentGaugeFactor / gaugeFactor);
    }

    /**
     * A copy whose gauge factor, given at {@code reference}, changes with temperature by
     * {@code percentPer100Kelvin} % per 100 K, as data sheets state it:
     * <pre>
     *   K(T) = K · (1 + (c / 100) · (T − Tref) / 100 K)
     * </pre>
     * (common practice, no source). The other settings of the gauge are kept; the gauge
     * factor of a copy changed later with {@link #withGaugeFactor} is taken at the same
     * reference.
     *
     * @throws NullPointerException     if {@code reference} is null
     * @throws IllegalArgumentException if the coefficient is not finite
     */
    public StrainGauge withGaugeFactorTemperatureCoefficient(double percentPer100Kelvin,
            Temperature reference) {
        Checks.finite(percentPer100Kelvin, "percentPer100Kelvin");
        Objects.requireNonNull(reference, "reference");
        return new StrainGauge(nominalResistance, gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, percentPer100Kelvin / 1e4,
                reference.toCelsius());
    }

    /**
     * The gauge factor at {@code temperature}, by the law of
     * {@link #withGaugeFactorTemperatureCoefficient} (the gauge factor itself without one).
     *
     * @throws NullPointerException     if {@code temperature} is null
     * @throws IllegalArgumentException if the law gives no positive gauge factor there
     */
    public double gaugeFactorAt(Temperature temperature) {
        Objects.requireNonNull(temperature, "temperature");
        double k = gaugeFactor * (1 + gaugeFactorDrift * (temperature.toCelsius()
                - gaugeFactorCelsius));
        if (!(k > 0)) {
            throw new IllegalArgumentException(
                    "temperature must keep the gauge factor positive: " + temperature);
        }
        return k;
    }

    /** The relative change of the gauge factor per kelvin (0 unless set). */
    double gaugeFactorDriftPerKelvin() {
        return gaugeFactorDrift;
    }

    /** The temperature in °C at which the gauge factor is given. */
    double gaugeFactorReferenceCelsius() {
        return gaugeFactorCelsius;
    }

    /** The unstrained resistance. */
    public Resistance nominalResistance() {
        return nominalResistance;
    }

    /** The gauge factor K. */
    public double gaugeFactor() {
        return gaugeFactor;
    }

    /** The transverse sensitivity Kt as a fraction (0 unless set). */
    public double transverseSensitivity() {
        return transverseSensitivity;
    }

    /** The relative change of resistance ΔR/R = K·ε at {@code strain}. */
    public double relativeResistanceChange(Strain strain) {
        return gaugeFactor * strain.value();
    }

    /** The change of resistance ΔR = R·K·ε at {@code strain}, in Ω (negative in compression). */
    public double resistanceChangeInOhms(Strain strain) {
        return nominalResistance.toOhms() * relativeResistanceChange(strain);
    }

    /**
     * The resistance R·(1 + K·ε) at {@code strain}.
     *
     * @throws IllegalArgumentException if the strain is at or below −1/K, where the model gives
     *                                  no positive resistance
     */
    public Resistance resistanceAt(Strain strain) {
        double ohms = nominalResistance.toOhms() * (1 + relativeResistanceChange(strain));
        if (!(ohms > 0)) {
            throw new IllegalArgumentException(
                    "strain must be > -1/gaugeFactor = " + Format.withUnit(-1e6 / gaugeFactor, "µε")
                            + ": " + strain);
        }
        return Resistance.ofOhms(ohms);
    }

    /** Equal when nominal resistance, gauge factor and transverse sensitivity are equal. */
    @Override
    public boolean equals(Object o) {
        if (!(o instanceof StrainGauge)) {
            return false;
        }
        StrainGauge other = (StrainGauge) o;
        return nominalResistance.equals(other.nominalResistance)
                && Double.compare(gaugeFactor, other.gaugeFactor) == 0
                && Double.compare(transverseSensitivity, other.transverseSensitivity) == 0
                && Double.compare(calibrationPoissonRatio, other.calibrationPoissonRatio) == 0
                && Double.compare(gridArea, other.gridArea) == 0
                && Double.compare(gaugeFactorDrift, other.gaugeFactorDrift) == 0
                && Double.compare(gaugeFactorCelsius, other.gaugeFactorCelsius) == 0;
    }

    @Override
    public int hashCode() {
        return Objects.hash(nominalResistance, gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /** {@code StrainGauge[120.0 Ω, K=2.0]}, with {@code Kt=1.2 %} when set. */
    @Override
    public String toString() {
        String kt = transverseSensitivity == 0
                ? ""
                : ", Kt=" + Format.withUnit(transverseSensitivity * 100, "%");
        String area = gridArea == 0 ? "" : ", grid " + Format.withUnit(gridArea, "mm²");
        return "StrainGauge[" + nominalResistance + ", K=" + Format.number(gaugeFactor) + kt + area
                + "]";
    }

    // ---------------------------------------------------------------- serial form

    private static final long serialVersionUID = 1L;

    /** Writes the serial form ({@link Serial}): the defining values only. */
    private Object writeReplace() {
        return new Serial(nominalResistance.toOhms(), gaugeFactor, transverseSensitivity,
                calibrationPoissonRatio, gridArea, gaugeFactorDrift, gaugeFactorCelsius);
    }

    /** A stream must hold the serial form, never the fields of this class. */
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw SerialForms.proxyRequired("StrainGauge");
    }

    /**
     * The serial form of a StrainGauge: its defining values, rebuilt on reading through the checks
     * of the factories.
     */
    private static final class Serial implements Serializable {
        private static final long serialVersionUID = 1L;
        private final double ohms;
        private final double gaugeFactor;
        private final double kt;
        private final double poisson;
        private final double gridArea;
        private final double drift;
        private final double celsius;

        Serial(double ohms, double gaugeFactor, double kt, double poisson, double gridArea, double drift, double celsius) {
            this.ohms = ohms;
            this.gaugeFactor = gaugeFactor;
            this.kt = kt;
            this.poisson = poisson;
            this.gridArea = gridArea;
            this.drift = drift;
            this.celsius = celsius;
        }

        private Object readResolve() throws InvalidObjectException {
            return SerialForms.rebuild("StrainGauge", () -> {
                Checks.positiveFinite(ohms, "ohms");
                Checks.positiveFinite(gaugeFactor, "gaugeFactor");
                Checks.inOpenInterval(kt, -1, 1, "kt");
                Checks.inOpenInterval(poisson, -1, 0.5, "poissonRatio");
                Checks.nonNegativeFinite(gridArea, "gridArea");
                Checks.finite(drift, "percentPer100Kelvin");
                Checks.finite(celsius, "reference");
                return new StrainGauge(Resistance.ofOhms(ohms), gaugeFactor, kt, poisson, gridArea,
                        drift, celsius);
            });
        }
    }
}
