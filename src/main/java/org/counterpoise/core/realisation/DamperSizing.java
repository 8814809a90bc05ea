package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.error.WarningKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.RealPolynomials;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.response.SystemResponse;
import org.counterpoise.core.units.Dimension;

/**
 * The damper that realises a design's damping coefficient: what it must give (coefficient), what it
 * sees (stroke, relative velocity, force) and, for an eddy-current damper, the magnet pole area.
 *
 * <p>The relative velocity is the exact maximum of |omega X_rel(i omega)| found from the stroke's
 * transfer function multiplied by s ({@link PeakFinder}, real roots of the derivative of the squared
 * magnitude): no sampling. Over the run-up range [0, top of band] it also covers the band.
 *
 * <p>Eddy-current damper: a conducting plate of thickness delta and conductivity sigma moving at
 * velocity v through a magnet gap of flux density B over a pole face of area S feels the force
 * F = alpha sigma delta S B^2 v (Wiederick, Gauthier, Campbell and Rochon 1987, "Magnetic braking:
 * simple theory and experiment", Am. J. Phys. 55(6), 500-503, eq. for the drag force with the
 * return-path factor alpha; the same form as Zuo 2004's C = C0 B^2 t A sigma). The factor alpha
 * &lt; 1 accounts for the eddy currents closing outside the pole face in a plate much larger than
 * the pole; for a rectangular pole face of aspect ratio A
 * alpha = 1 - (1 / (2 pi)) [4 arctan A + A ln(1 + 1/A^2) - (1/A) ln(1 + A^2)], which is 1/2 for a
 * square face (the expression as recalled from the paper, from memory, not checked against the
 * printed page). The sizing takes square poles, so S = c / (alpha sigma delta B^2).
 *
 * <p>The formula is the low-speed, thin-plate limit: the eddy currents' own field is neglected,
 * which holds while the plate is thinner than the skin depth at the forcing frequency,
 * d_s = sqrt(2 / (mu0 sigma omega)) (the classical skin depth, e.g. Jackson 1999, Classical
 * Electrodynamics, 3rd ed., section 5.18, from memory). That is the check
 * {@link CheckKind#EDDY_CURRENT_SKIN_DEPTH}.
 *
 * <p>Elastomer loss: the elastomer spring's loss is the damper; its equivalent viscous coefficient
 * at the running frequency omega is c = eta k / omega (equal energy dissipated per cycle, the usual
 * equivalence of hysteretic and viscous damping; Den Hartog 1956, Mechanical Vibrations, section
 * 2.8, from memory), with eta the chosen compound's loss factor.
 */
public final class DamperSizing {
    /** The pole-face aspect ratio the sizing takes: square poles. */
    public static final double POLE_ASPECT_RATIO = 1.0;

    /** Vacuum permeability mu0, H/m (CODATA 2018: 1.25663706212e-6). */
    static final double VACUUM_PERMEABILITY = 1.25663706212e-6;

    static final String EDDY_SOURCE = "Wiederick, Gauthier, Campbell and Rochon (1987), Magnetic braking: simple"
            + " theory and experiment, Am. J. Phys. 55(6) 500-503: F = alpha sigma delta S B^2 v with the"
            + " return-path factor alpha (1/2 for a square pole face; from memory)";

    static final String STROKE_SOURCE = "common practice: the damper allows the stroke clearance (the design's"
            + " stroke margin times the larger steady-state stroke) before the stops";

    static final String SKIN_DEPTH_SOURCE = "skin depth sqrt(2 / (mu0 sigma omega)) at the highest forcing"
            + " frequency (Jackson 1999, Classical Electrodynamics, 3rd ed., section 5.18; from memory): the"
            + " thin-plate formula holds for plates thinner than it";

    private DamperSizing() {
    }

    /**
     * @param design the design
     * @param choice the hardware choices
     * @param warnings where a failing damper check is reported
     * @return the damper (for elastomer loss, at the design's spring rate)
     */
    public static DamperDesign size(DesignResult design, HardwareChoice choice, List<Warning> warnings) {
        return size(design, choice, BuiltAbsorber.of(design, choice, Optional.empty()), peakVelocity(design), warnings);
    }

    /**
     * The damper of the absorber as built. The strokes, velocity and force are the viscous design's
     * (for an elastomer element they show what its loss must withstand at the design's damping).
     */
    static DamperDesign size(DesignResult design, HardwareChoice choice, BuiltAbsorber built, double velocity,
            List<Warning> warnings) {
        double coefficient = coefficient(design, choice, built.springRate());
        double inBand = design.strokeInBand().value();
        ResponsePeak steadyRunUp = design.strokeRunUp();
        // unbounded (no damping anywhere: the run-up passes a resonance) stays unbounded; it was given as
        // the in-band stroke until 5 Dec 2026, which contradicted the design's own run-up stroke
        double runUp = steadyRunUp.unbounded() ? Double.POSITIVE_INFINITY : steadyRunUp.value();
        List<DesignCheck> checks = new ArrayList<>();
        DesignCheck stroke = strokeCheck(design);
        checks.add(stroke);
        if (!stroke.passes()) {
            warnings.add(Warning.of(WarningKind.DAMPER_STROKE_OVER_CLEARANCE, stroke.demand(), stroke.capacity()));
        }
        Optional<EddyCurrentDamper> eddy = Optional.empty();
        if (choice.damperKind() == DamperKind.EDDY_CURRENT) {
            EddyCurrentChoice e = choice.eddyCurrent();
            eddy = Optional.of(eddyCurrent(e, coefficient));
            DesignCheck skin = new DesignCheck(CheckKind.EDDY_CURRENT_SKIN_DEPTH, e.plateThickness(),
                    skinDepth(e.conductor().conductivity(), design.study().excitation().band().high()),
                    Dimension.LENGTH, SKIN_DEPTH_SOURCE);
            checks.add(skin);
            if (!skin.passes()) {
                warnings.add(Warning.of(WarningKind.EDDY_CURRENT_PLATE_THICK, skin.demand(), skin.capacity()));
            }
        }
        return new DamperDesign(choice.damperKind(), coefficient, inBand, runUp, velocity, coefficient * velocity,
                eddy, checks);
    }

    /**
     * @param design the design
     * @param choice the hardware choices
     * @param springRate the rate of the spring or element, N/m
     * @return the damping coefficient the damper gives, N*s/m: the design's, or for elastomer loss the
     *     compound's equivalent at the running frequency, eta k / omega
     */
    static double coefficient(DesignResult design, HardwareChoice choice, double springRate) {
        if (choice.damperKind() == DamperKind.ELASTOMER_LOSS) {
            return choice.elastomer().compoundLossFactor() * springRate
                    / runningFrequency(design.study().excitation().band());
        }
        return design.absorber().damping();
    }

    /**
     * @param band the forcing band
     * @return the running (design) frequency: the band's centre, rad/s
     */
    static double runningFrequency(FrequencyBand band) {
        return band.centre();
    }

    /**
     * The exact largest relative velocity amplitude |omega X_rel| over the band and over the run-up
     * range [0, top of band] (which holds the band); the band's alone when the run-up's is unbounded
     * (an undamped absorber, whose damper force is zero anyway).
     *
     * @param design the design
     * @return the peak relative velocity, m/s
     */
    public static double peakVelocity(DesignResult design) {
        SystemResponse fitted = fitted(design);
        double omega1 = fitted.system().referenceFrequency();
        TransferFunction velocity = relativeVelocity(fitted);
        double scale = fitted.scale(ResponseKind.STROKE) * omega1;
        FrequencyBand band = design.study().excitation().band();
        double inBand = PeakFinder.over(velocity, band.low() / omega1, band.high() / omega1).magnitude();
        double runUp = PeakFinder.over(velocity, 0.0, band.high() / omega1).magnitude();
        double peak = Double.isFinite(runUp) ? Math.max(runUp, inBand) : inBand;
        return peak * scale;
    }

    /**
     * @param fitted the structure with the absorber
     * @return the non-dimensional relative velocity s X_rel(s); times omega1 and the stroke's scale it is SI
     */
    static TransferFunction relativeVelocity(SystemResponse fitted) {
        TransferFunction stroke = fitted.transferFunction(ResponseKind.STROKE);
        return TransferFunction.of(RealPolynomials.shift(stroke.numerator(), 1), stroke.denominator());
    }

    static SystemResponse fitted(DesignResult design) {
        return new SystemResponse(design.study().structure(), design.tuning(), design.study().excitation().kind(),
                design.study().excitation().amplitude());
    }

    /**
     * The damper's stroke check: the largest stroke it sees in service (in band, and over the run-up
     * as the design reports it: transient at the project's run-up rate when it states one) against the
     * stroke it must allow, the design's clearance. Without a run-up rate the clearance is the stroke
     * margin (at least 1) times the larger steady-state stroke, so it passes by that margin; a transient
     * run-up that rings beyond the steady clearance fails it.
     *
     * @param design the design
     * @return the check
     */
    static DesignCheck strokeCheck(DesignResult design) {
        double demand = design.strokeInBand().value();
        ResponsePeak runUp = design.runUpStroke().peak();
        if (!runUp.unbounded()) {
            demand = Math.max(demand, runUp.value());
        }
        return new DesignCheck(CheckKind.DAMPER_STROKE, demand, design.clearance(), Dimension.LENGTH, STROKE_SOURCE);
    }

    /**
     * @param choice plate, gap and conductor
     * @param coefficient the coefficient to give, N*s/m
     * @return the eddy-current damper with square poles
     */
    static EddyCurrentDamper eddyCurrent(EddyCurrentChoice choice, double coefficient) {
        double alpha = returnPathFactor(POLE_ASPECT_RATIO);
        double perArea = alpha * choice.conductor().conductivity() * choice.plateThickness()
                * choice.fluxDensity() * choice.fluxDensity();
        return new EddyCurrentDamper(choice, coefficient / perArea, alpha, coefficient, EDDY_SOURCE);
    }

    /**
     * The return-path factor alpha of a rectangular pole face in a large plate (Wiederick et al. 1987,
     * from memory; see the class comment).
     *
     * @param aspect the pole face's aspect ratio A (&gt; 0)
     * @return alpha, between 0 and 1 (1/2 for a square face)
     */
    public static double returnPathFactor(double aspect) {
        double a = aspect;
        return 1.0 - (4 * Math.atan(a) + a * Math.log(1 + 1 / (a * a)) - Math.log(1 + a * a) / a) / (2 * Math.PI);
    }

    /**
     * @param conductivity sigma, S/m
     * @param omega angular frequency, rad/s
     * @return the skin depth sqrt(2 / (mu0 sigma omega)), m
     */
    public static double skinDepth(double conductivity, double omega) {
        return Math.sqrt(2.0 / (VACUUM_PERMEABILITY * conductivity * omega));
    }
}
