package org.strainmath.uncertainty;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.ToDoubleFunction;

import org.strainmath.material.IsotropicMaterial;
import org.strainmath.quantity.Strain;
import org.strainmath.quantity.Stress;
import org.strainmath.rosette.Rosette;
import org.strainmath.rosette.RosetteStresses;

/**
 * Ready-made uncertainty budgets for the stresses of a rosette: one input per gauge reading
 * (m/m, with the uncertainty a {@link ChannelBudget} gives, for instance) and the material's
 * Young's modulus (Pa) and Poisson's ratio with theirs. Each budget's model reduces the readings
 * with the rosette and a material built from the drawn constants, exactly as the rosette does.
 *
 * <pre>
 *   RosetteBudget stresses = RosetteBudget.of(Rosette.rectangular(), a, b, c)
 *           .withMaterial(InputQuantity.normal("E", 205e9, 4e9, 2), InputQuantity.rectangular("ν", 0.29, 0.01));
 *   stresses.vonMises().evaluate(0.95);
 * </pre>
 *
 * <p>Immutable and thread-safe.
 */
public final class RosetteBudget {

    private final Rosette rosette;
    private final List<InputQuantity> readings;
    private final InputQuantity modulus;
    private final InputQuantity poisson;

    private RosetteBudget(Rosette rosette, List<InputQuantity> readings, InputQuantity modulus,
            InputQuantity poisson) {
        this.rosette = rosette;
        this.readings = readings;
        this.modulus = modulus;
        this.poisson = poisson;
    }

    /**
     * The budgets of {@code rosette} for {@code readings}, one per gauge in its order (m/m).
     *
     * @throws NullPointerException     if an argument is null
     * @throws IllegalArgumentException if the count differs from the rosette's gauges
     */
    public static RosetteBudget of(Rosette rosette, InputQuantity... readings) {
        Objects.requireNonNull(rosette, "rosette");
        Objects.requireNonNull(readings, "readings");
        if (readings.length != rosette.gaugeCount()) {
            throw new IllegalArgumentException("readings must be one per gauge, "
                    + rosette.gaugeCount() + ": " + readings.length);
        }
        List<InputQuantity> list = new ArrayList<>();
        for (int i = 0; i < readings.length; i++) {
            list.add(Objects.requireNonNull(readings[i], "readings[" + i + "]"));
        }
        return new RosetteBudget(rosette, List.copyOf(list), null, null);
    }

    /**
     * A copy with the material's Young's modulus (Pa) and Poisson's ratio as inputs.
     *
     * @throws NullPointerException if an argument is null
     */
    public RosetteBudget withMaterial(InputQuantity youngsModulus, InputQuantity poissonsRatio) {
        return new RosetteBudget(rosette, readings, Objects.requireNonNull(youngsModulus,
                "youngsModulus"), Objects.requireNonNull(poissonsRatio, "poissonsRatio"));
    }

    /**
     * The budget of the von Mises stress (Pa).
     *
     * @throws IllegalStateException if no material was given
     */
    public UncertaintyBudget vonMises() {
        return budget(s -> s.vonMises().toPascals());
    }

    /** The budget of the Tresca stress (Pa). */
    public UncertaintyBudget tresca() {
        return budget(s -> s.tresca().toPascals());
    }

    /** The budget of the larger principal stress σ1 (Pa). */
    public UncertaintyBudget largerPrincipalStress() {
        return budget(s -> s.principal().s1().toPascals());
    }

    /** The budget of the smaller principal stress σ2 (Pa). */
    public UncertaintyBudget smallerPrincipalStress() {
        return budget(s -> s.principal().s2().toPascals());
    }

    private UncertaintyBudget budget(ToDoubleFunction<RosetteStresses> result) {
        if (modulus == null) {
            throw new IllegalStateException("the budget needs the material: use withMaterial");
        }
        int n = readings.size();
        List<InputQuantity> inputs = new ArrayList<>(readings);
        inputs.add(modulus);
        inputs.add(poisson);
        MeasurementModel model = x -> {
            Strain[] r = new Strain[n];
            for (int j = 0; j < n; j++) {
                r[j] = Strain.of(x[j]);
            }
            IsotropicMaterial material = IsotropicMaterial.of(Stress.ofPascals(x[n]), x[n + 1]);
            return result.applyAsDouble(rosette.reduce(r).stresses(material));
        };
        return UncertaintyBudget.of(model, inputs.toArray(new InputQuantity[0]));
    }
}
