package org.counterpoise.core.robust;

import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.SystemResponse;

/**
 * The worst response over the forcing band of an absorber on a structure that are both off their
 * nominal tuning, in SI. The structure's natural frequency is scaled by a factor (its stiffness by
 * the square; mass and damping ratio kept); the absorber's natural frequency by another (its spring
 * rate by the square; mass and damper kept, so its damping ratio moves as 1/factor). Physical
 * peaks are compared, so a stiffer structure's smaller static deflection counts too.
 *
 * @param structure the structure as designed for
 * @param excitation the disturbance
 * @param response the response that matters
 */
public record Mistuning(Structure structure, Excitation excitation, ResponseKind response) {

    /**
     * @param absorber the absorber as designed
     * @param structureFactor structure natural frequency over nominal
     * @param absorberFactor absorber natural frequency over nominal
     * @return the exact peak of the response over the band, SI
     */
    public double peak(Absorber absorber, double structureFactor, double absorberFactor) {
        Structure s = structureFactor == 1.0 ? structure : structure.withFrequencyScaledBy(structureFactor);
        Absorber a = absorberFactor == 1.0 ? absorber
                : new Absorber(absorber.mass(), absorber.stiffness() * absorberFactor * absorberFactor,
                        absorber.damping());
        return peak(s, a);
    }

    /**
     * @param s a structure (possibly varied)
     * @param a an absorber (possibly varied)
     * @return the exact peak of the response over the band, SI
     */
    public double peak(Structure s, Absorber a) {
        return new SystemResponse(s, a.tuningOn(s), excitation.kind(), excitation.amplitude())
                .peakOver(response, excitation.band()).value();
    }
}
