package org.counterpoise.core.robust;

import org.counterpoise.core.model.Absorber;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponseScale;
import org.counterpoise.core.response.TransferFunctions;

/**
 * The worst response over the forcing band of an absorber on a structure that are both off their
 * nominal tuning, in SI. The structure's natural frequency is scaled by a factor (its stiffness by
 * the square; mass and damping ratio kept); the absorber's natural frequency by another (its spring
 * rate by the square; mass and damper kept, so its damping ratio moves as 1/factor); the
 * absorber's damping coefficient by a third (mass and spring kept). Physical peaks are compared, so
 * a stiffer structure's smaller static deflection counts too.
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
        return peak(absorber, structureFactor, absorberFactor, 1.0);
    }

    /**
     * @param absorber the absorber as designed
     * @param structureFactor structure natural frequency over nominal
     * @param absorberFactor absorber natural frequency over nominal
     * @param dampingFactor absorber damping coefficient over nominal
     * @return the exact peak of the response over the band, SI
     */
    public double peak(Absorber absorber, double structureFactor, double absorberFactor, double dampingFactor) {
        Structure s = structureFactor == 1.0 ? structure : structure.withFrequencyScaledBy(structureFactor);
        Absorber a = absorberFactor == 1.0 && dampingFactor == 1.0 ? absorber
                : new Absorber(absorber.mass(), absorber.stiffness() * absorberFactor * absorberFactor,
                        absorber.damping() * dampingFactor);
        return peak(s, a);
    }

    /**
     * @param s a structure (possibly varied)
     * @param a an absorber (possibly varied)
     * @return the exact peak of the response over the band, SI
     */
    public double peak(Structure s, Absorber a) {
        // What SystemResponse.peakOver computes, term for term (the same transfer function, band
        // and scale, so the same bits), without its per-call cache and records: the robust
        // searches call this some ten thousand times per design.
        double omega1 = s.naturalFrequency();
        TransferFunction h = TransferFunctions.of(excitation.kind(), response, s.dampingRatio(), a.tuningOn(s));
        FrequencyBand band = excitation.band();
        return PeakFinder.over(h, band.low() / omega1, band.high() / omega1).magnitude()
                * ResponseScale.of(s, excitation.kind(), excitation.amplitude(), response);
    }
}
