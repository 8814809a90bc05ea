package org.counterpoise.core.robust;

import org.counterpoise.core.error.Checks;
import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;

/**
 * The worst response over the forcing band of an absorber on a structure that are both off their
 * nominal tuning, in SI. The structure's natural frequency is scaled by a factor (its stiffness by
 * the square; mass and damping ratio kept); the absorber's natural frequency by another (its spring
 * rate by the square; mass and damper kept, so its damping ratio moves as 1/factor); the
 * absorber's damping coefficient by a third (mass and spring kept). Physical peaks are compared, so
 * a stiffer structure's smaller static deflection counts too. What is compared is the model's
 * {@link BandMeasure}: the exact peak of the response by default, or a criterion's utilisation.
 *
 * @param structure the structure as designed for
 * @param excitation the disturbance
 * @param response the response that matters
 * @param measure what a build is judged by (every {@code peak} method below returns it)
 */
public record Mistuning(Structure structure, Excitation excitation, ResponseKind response, BandMeasure measure) {

    /** Validates the record. */
    public Mistuning {
        Checks.present("measure", measure, "a band measure");
    }

    /**
     * Judged by the exact peak of the response over the band, SI.
     *
     * @param structure the structure as designed for
     * @param excitation the disturbance
     * @param response the response that matters
     */
    public Mistuning(Structure structure, Excitation excitation, ResponseKind response) {
        this(structure, excitation, response, BandMeasure.peak(excitation, response));
    }

    /**
     * @param absorber the absorber as designed
     * @param structureFactor structure natural frequency over nominal
     * @param absorberFactor absorber natural frequency over nominal
     * @return the measure (by default the exact peak of the response over the band, SI)
     */
    public double peak(Absorber absorber, double structureFactor, double absorberFactor) {
        return peak(absorber, structureFactor, absorberFactor, 1.0);
    }

    /**
     * @param absorber the absorber as designed
     * @param structureFactor structure natural frequency over nominal
     * @param absorberFactor absorber natural frequency over nominal
     * @param dampingFactor absorber damping coefficient over nominal
     * @return the measure (by default the exact peak of the response over the band, SI)
     */
    public double peak(Absorber absorber, double structureFactor, double absorberFactor, double dampingFactor) {
        return peak(structure(structureFactor), absorber(absorber, absorberFactor, dampingFactor));
    }

    /**
     * @param structureFactor structure natural frequency over nominal
     * @return the structure so varied (stiffness by the square; mass and damping ratio kept)
     */
    public Structure structure(double structureFactor) {
        return structureFactor == 1.0 ? structure : structure.withFrequencyScaledBy(structureFactor);
    }

    /**
     * @param absorber the absorber as designed
     * @param absorberFactor absorber natural frequency over nominal
     * @param dampingFactor absorber damping coefficient over nominal
     * @return the absorber so varied (spring rate by the square of the first; mass kept)
     */
    public static Absorber absorber(Absorber absorber, double absorberFactor, double dampingFactor) {
        return absorberFactor == 1.0 && dampingFactor == 1.0 ? absorber
                : new Absorber(absorber.mass(), absorber.stiffness() * absorberFactor * absorberFactor,
                        absorber.damping() * dampingFactor);
    }

    /**
     * @param s a structure (possibly varied)
     * @param a an absorber (possibly varied)
     * @return the measure (by default the exact peak of the response over the band, SI)
     */
    public double peak(Structure s, Absorber a) {
        return measure.of(s, a);
    }
}
