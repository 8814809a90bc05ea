package org.counterpoise.core.robust;

/**
 * The tolerances of the five quantities a Monte Carlo run varies.
 *
 * @param structureMass modal mass of the structure
 * @param structureStiffness modal stiffness of the structure
 * @param absorberMass absorber mass
 * @param absorberStiffness absorber spring rate
 * @param absorberDamping absorber damping coefficient
 */
public record ToleranceSet(Tolerance structureMass, Tolerance structureStiffness, Tolerance absorberMass,
        Tolerance absorberStiffness, Tolerance absorberDamping) {

    /** Everything exactly nominal. */
    public static final ToleranceSet NONE = new ToleranceSet(Tolerance.NONE, Tolerance.NONE, Tolerance.NONE,
            Tolerance.NONE, Tolerance.NONE);

    /**
     * @return true when at least one quantity has a spread (a distribution other than none); without
     *     one every sampled build is the nominal one and a Monte Carlo run tells nothing
     */
    public boolean anyGiven() {
        for (Tolerance t : new Tolerance[] {structureMass, structureStiffness, absorberMass, absorberStiffness,
            absorberDamping}) {
            if (t.distribution() != Tolerance.Distribution.NONE) {
                return true;
            }
        }
        return false;
    }
}
