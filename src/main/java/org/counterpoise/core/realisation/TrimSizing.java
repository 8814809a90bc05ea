package org.counterpoise.core.realisation;

import org.counterpoise.core.design.DesignResult;

/**
 * The trim plates that let the absorber be tuned on site to the structure's measured frequency.
 *
 * <p>The plates bring the built absorber to the frequency it must have: the design's own frequency
 * when the spring came out off its rate, or the frequency of a new design when the structure is
 * measured outside the range the design holds (the tuning procedure's step 2). A new design's
 * absorber frequency moves about as the structure's, and the structure's natural frequency is
 * uncertain by the project's structure range s (stated, or the default; see {@link #structureSpan}),
 * so the plates are sized to move the absorber frequency omega_a by the same fractions: from
 * omega_a (1 - s) to omega_a (1 + s). At a fixed spring rate k the mass goes as m = k / omega_a^2, so
 * the mass must run from m0 / (1 + s)^2 to m0 / (1 - s)^2. Plates of a fraction p of the absorber
 * mass are supplied: enough fitted as built to take off down to the lightest mass, and enough spare
 * to add up to the heaviest; the built absorber (with its fitted plates) has the design mass m0. The
 * plan states the absorber frequencies the whole plates reach (all fitted, none fitted), at least
 * that span after rounding up to whole plates.
 *
 * <p>One plate changes the absorber frequency by about p / 2 (df/f = -dm / (2 m) for small changes,
 * from omega_a = sqrt(k / m)); so 2 / (100 p) plates per percent of frequency.
 */
public final class TrimSizing {
    /** Round-off allowed before one more plate is called for (a range that needs 3.0000000001 plates needs 3). */
    private static final double ROUND_OFF = 1e-9;

    private TrimSizing() {
    }

    /**
     * @param design the design
     * @param choice the hardware choices (the trim step)
     * @return the trim plan
     */
    public static TrimPlan of(DesignResult design, HardwareChoice choice) {
        double[] span = structureSpan(design);
        return plan(design.absorber().naturalFrequency(), span[0], span[1], design.absorber().mass(),
                choice.trimStepFraction());
    }

    /**
     * @param omegaA the absorber's natural frequency as designed, rad/s
     * @param below how far the plates must lower it, fraction (0 to &lt; 1)
     * @param above how far they must raise it, fraction (&gt;= 0)
     * @param mass the absorber mass as designed, kg
     * @param step one plate as a fraction of the absorber mass
     * @return the trim plan
     */
    static TrimPlan plan(double omegaA, double below, double above, double mass, double step) {
        double plate = step * mass;
        double lightest = mass / ((1 + above) * (1 + above));
        double heaviest = mass / ((1 - below) * (1 - below));
        int fitted = plates((mass - lightest) / plate);
        int spare = plates((heaviest - mass) / plate);
        double reachLow = omegaA * Math.sqrt(mass / (mass + spare * plate));
        double reachHigh = omegaA * Math.sqrt(mass / (mass - fitted * plate));
        double percentPerPlate = 100.0 * step / 2.0;
        return new TrimPlan(reachLow, reachHigh, plate, fitted, fitted + spare, percentPerPlate, 1.0 / percentPerPlate);
    }

    private static int plates(double needed) {
        return (int) Math.ceil(Math.max(0.0, needed - ROUND_OFF));
    }

    /**
     * The structure's frequency uncertainty is what the project states (or the default range) for
     * every design method: it is a fact about how well the structure is known. The mistuning a
     * non-robust design tolerates is not used here: it says how far the structure may be off before
     * the design suffers (often beyond 30 %), not how far it is expected to be off, and a trim sized
     * to it would supply plates for frequencies nobody expects.
     *
     * @param design the design
     * @return {below, above}: how far the structure's frequency may be off, fractions
     */
    static double[] structureSpan(DesignResult design) {
        double stated = design.study().robustness().ranges().structure();
        return new double[] {stated, stated};
    }
}
