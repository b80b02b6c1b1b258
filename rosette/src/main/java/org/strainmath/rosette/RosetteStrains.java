package org.strainmath.rosette;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;

import org.strainmath.material.IsotropicMaterial;
import org.strainmath.material.MohrStrainCircle;
import org.strainmath.material.PlaneStrain;
import org.strainmath.quantity.Angle;
import org.strainmath.quantity.Strain;

/**
 * The reduction of one set of rosette readings: the plane strain state in the rosette's
 * reference axes, the principal strains and angle, and, for a rosette of more than three gauges,
 * the residual of each reading against the fitted state.
 *
 * <p>Immutable and thread-safe.
 */
public final class RosetteStrains {

    private final Rosette rosette;
    private final double[] centreDifferenceShear;   // C, D, H
    private final PlaneStrain state;
    private final PrincipalStrains principal;
    private final double[] residuals;

    RosetteStrains(Rosette rosette, double[] centreDifferenceShear, PlaneStrain state,
            PrincipalStrains principal, double[] residuals) {
        this.rosette = rosette;
        this.centreDifferenceShear = centreDifferenceShear;
        this.state = state;
        this.principal = principal;
        this.residuals = residuals;
    }

    /** The strain state εx, εy, γxy in the reference axes. */
    public PlaneStrain strain() {
        return state;
    }

    /** The principal strains ε1 ≥ ε2 and the principal angle. */
    public PrincipalStrains principal() {
        return principal;
    }

    /** The largest in-plane engineering shear strain γmax = ε1 − ε2. */
    public Strain maximumShear() {
        return principal.maximumShear();
    }

    /**
     * The normal strain along the direction at {@code angle} from the reference axis.
     *
     * @throws NullPointerException if {@code angle} is null
     */
    public Strain strainAt(Angle angle) {
        return state.normalStrainAt(angle);
    }

    /** Mohr's circle of the strain state. */
    public MohrStrainCircle mohrCircle() {
        return state.mohrCircle();
    }

    /**
     * The strain normal to the surface, in plane stress (a gauge's free surface):
     * εz = −ν/(1 − ν)·(εx + εy).
     *
     * @throws NullPointerException if {@code material} is null
     */
    public Strain outOfPlaneStrain(IsotropicMaterial material) {
        return material.outOfPlaneStrainInPlaneStress(state);
    }

    /**
     * The residuals reading − model, one per gauge: zero for three gauges (and a tee), which
     * fix the state exactly; for more, what the least-squares state leaves unexplained.
     */
    public List<Strain> residuals() {
        List<Strain> out = new ArrayList<>();
        for (double r : residuals) {
            out.add(Strain.of(r));
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The root-mean-square residual √(Σ r² / (n − 3)) over the n − 3 degrees of freedom of an
     * over-determined rosette; zero for three gauges or a tee.
     */
    public Strain residualRms() {
        int freedom = residuals.length - 3;
        if (freedom <= 0) {
            return Strain.ZERO;
        }
        double sum = 0;
        for (double r : residuals) {
            sum += r * r;
        }
        return Strain.of(Math.sqrt(sum / freedom));
    }

    /**
     * The stresses of these readings with the rosette's material.
     *
     * @throws IllegalStateException if the rosette has no material
     */
    public RosetteStresses stresses() {
        double[] cdh = centreDifferenceShear;
        return rosette.stresses(cdh[0], cdh[1], cdh[2], principal.e1().value(),
                principal.e2().value(), principal.angle());
    }

    /**
     * The stresses of these readings with {@code material} (plane stress).
     *
     * @throws NullPointerException if {@code material} is null
     */
    public RosetteStresses stresses(IsotropicMaterial material) {
        Objects.requireNonNull(material, "material");
        double[] cdh = centreDifferenceShear;
        return rosette.withMaterial(material).stresses(cdh[0], cdh[1], cdh[2],
                principal.e1().value(), principal.e2().value(), principal.angle());
    }

    /** {@code RosetteStrains[PlaneStrain[...], PrincipalStrains[...]]}, with the RMS residual if fitted. */
    @Override
    public String toString() {
        return "RosetteStrains[" + state + ", " + principal
                + (residuals.length > 3 ? ", residual RMS " + residualRms() : "") + "]";
    }
}
