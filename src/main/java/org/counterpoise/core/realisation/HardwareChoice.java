package org.counterpoise.core.realisation;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * The designer's hardware choices: which spring and damper realise the design, and what the
 * workshop and the site can hold. All SI; validated on construction.
 *
 * @param springKind helical steel springs or an elastomer element
 * @param springMaterial the wire for helical springs
 * @param springCount helical springs in parallel (0: the spring design chooses the fewest that pass
 *     every check, up to {@link #MOST_SPRINGS})
 * @param damperKind how the damping is realised ({@link DamperKind#ELASTOMER_LOSS} only, and always,
 *     with an elastomer spring)
 * @param eddyCurrent the plate and gap of an eddy-current damper (used with {@link DamperKind#EDDY_CURRENT})
 * @param elastomer the compound of an elastomer element (used with {@link SpringKind#ELASTOMER})
 * @param serviceHours running hours the absorber must last, h (&gt; 0): the fatigue check's cycles are
 *     these hours at the forcing frequency
 * @param massTolerance the tolerance the workshop holds on the absorber mass, as a fraction (+/-)
 * @param trimStepFraction one trim plate's mass as a fraction of the absorber mass (&gt; 0)
 */
public record HardwareChoice(SpringKind springKind, SpringMaterial springMaterial, int springCount,
        DamperKind damperKind, EddyCurrentChoice eddyCurrent, ElastomerChoice elastomer, double serviceHours,
        double massTolerance, double trimStepFraction) {

    /** The most helical springs in parallel the spring design proposes. */
    public static final int MOST_SPRINGS = 8;

    /** The widest mass tolerance accepted, as a fraction (+/- 20 %: beyond it the trim cannot tune). */
    public static final double LARGEST_MASS_TOLERANCE = 0.2;

    /** The smallest trim step accepted, as a fraction of the absorber mass (0.01 %). */
    public static final double SMALLEST_TRIM_STEP = 1e-4;

    /** The largest trim step accepted, as a fraction of the absorber mass (20 %). */
    public static final double LARGEST_TRIM_STEP = 0.2;

    /**
     * Helical springs of grade DH wire (the standard's grade for dynamic duty), a viscous dashpot,
     * 50 000 running hours, mass held to +/- 1 %, trim plates of 1 % of the mass (design choices).
     */
    public static final HardwareChoice DEFAULT = new HardwareChoice(SpringKind.HELICAL_COMPRESSION,
            SpringMaterial.EN10270_1_DH, 0, DamperKind.VISCOUS_DASHPOT, EddyCurrentChoice.DEFAULT,
            ElastomerChoice.DEFAULT, 50_000, 0.01, 0.01);

    /** Validates the record and that the spring and damper kinds go together. */
    public HardwareChoice {
        Checks.present("hardware.spring", springKind, "helical-compression or elastomer");
        Checks.present("hardware.spring_material", springMaterial, "en10270-1-sh, en10270-1-dh or en10270-3-1.4310");
        Checks.present("hardware.damper", damperKind, "viscous-dashpot, eddy-current or elastomer-loss");
        Checks.present("hardware.eddy_current", eddyCurrent, "a conductor, flux density and plate thickness");
        Checks.present("hardware.elastomer", elastomer, "a dynamic-to-static ratio and loss factor");
        Checks.inRange("hardware.spring_count", springCount, 0, MOST_SPRINGS);
        Checks.inRange("hardware.service_hours", serviceHours, 1.0, 1e7);
        Checks.inRange("hardware.mass_tolerance", massTolerance, 0.0, LARGEST_MASS_TOLERANCE);
        Checks.inRange("hardware.trim_step", trimStepFraction, SMALLEST_TRIM_STEP, LARGEST_TRIM_STEP);
        boolean elastomerSpring = springKind == SpringKind.ELASTOMER;
        boolean elastomerLoss = damperKind == DamperKind.ELASTOMER_LOSS;
        if (elastomerSpring != elastomerLoss) {
            throw new InvalidInputException("hardware.damper", damperKind.id() + " with a " + springKind.id()
                    + " spring", "elastomer-loss with an elastomer spring, and viscous-dashpot or eddy-current"
                    + " with helical springs");
        }
    }
}
