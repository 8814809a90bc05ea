package org.counterpoise.core.realisation;

/**
 * The fatigue strength of a helical compression spring as a Goodman line: the line through
 * Zimmerli's endurance point of unpeened spring wire (an amplitude S_sa at a mean S_sm, see
 * {@link SpringMaterial#enduranceAmplitude()}) and the ultimate shear strength S_su = 0.67 Rm on
 * the mean-stress axis. Its intercept on the amplitude axis is the fully reversed endurance limit
 * S_se = S_sa / (1 - S_sm / S_su), and at a mean stress tau_m the amplitude allowed is
 * S_se (1 - tau_m / S_su) (Budynas and Nisbett, Shigley's Mechanical Engineering Design, 9th ed.,
 * section 10-9, Goodman criterion for springs; from memory).
 *
 * <p>The absorber's static load is fixed and only the amplitude grows with the response, so the
 * amplitude is compared at the actual mean stress (a constant-mean load line). Zimmerli's point is
 * for 10^7 cycles and more: an absorber at a rotor order passes 10^7 cycles within hours, and the
 * endurance limit is what it needs; for fewer service cycles the same limit is used, which is
 * conservative. EN 13906-1:2013 gives its own fatigue-strength diagrams (10.3, per wire grade and
 * diameter); they were not available in a checkable form, so this cited Goodman line is used
 * instead and says so in every check.
 */
final class SpringFatigue {

    /** Service cycles from which Zimmerli's point is the endurance limit itself. */
    static final double ENDURANCE_CYCLES = 1e7;

    /**
     * The capacity left when the mean stress reaches the ultimate shear strength (the static check
     * has failed long before): a thousandth of the endurance limit, so the check fails with a finite
     * utilisation rather than a capacity of zero.
     */
    private static final double FLOOR = 1e-3;

    private SpringFatigue() {
    }

    /**
     * @param material the wire
     * @param wireDiameter d, m
     * @return the fully reversed endurance limit S_se, Pa
     */
    static double enduranceLimit(SpringMaterial material, double wireDiameter) {
        double ultimate = material.ultimateShearStrength(wireDiameter);
        return material.enduranceAmplitude() / (1 - material.enduranceMean() / ultimate);
    }

    /**
     * @param material the wire
     * @param wireDiameter d, m
     * @param meanStress the corrected mean shear stress tau_km, Pa (&gt;= 0)
     * @return the corrected stress amplitude allowed at that mean, Pa (&gt; 0)
     */
    static double allowableAmplitude(SpringMaterial material, double wireDiameter, double meanStress) {
        double endurance = enduranceLimit(material, wireDiameter);
        double ultimate = material.ultimateShearStrength(wireDiameter);
        return Math.max(endurance * (1 - meanStress / ultimate), FLOOR * endurance);
    }
}
