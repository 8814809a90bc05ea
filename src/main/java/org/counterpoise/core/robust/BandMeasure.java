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
 * What the robust searches judge one build by: a figure of a structure carrying an absorber over the
 * forcing band, larger is worse. By default the exact peak of the response that matters, SI
 * ({@link #peak}); a design to an acceptance criterion gives the criterion's utilisation instead
 * (value over limit, weighted, against a curve, several orders combined), wired in
 * {@code core.design}, so that this package need not know the criteria.
 */
@FunctionalInterface
public interface BandMeasure {

    /**
     * @param structure a structure (possibly varied from nominal)
     * @param absorber an absorber (possibly varied from nominal)
     * @return the figure, &gt;= 0 (+infinity when unbounded)
     */
    double of(Structure structure, Absorber absorber);

    /**
     * @param excitation the disturbance (kind, amplitude, band)
     * @param response the response that matters
     * @return the exact peak of the response over the band, SI
     */
    static BandMeasure peak(Excitation excitation, ResponseKind response) {
        return (s, a) -> {
            // What SystemResponse.peakOver computes, term for term (the same transfer function, band
            // and scale, so the same bits), without its per-call cache and records: the robust
            // searches call this some ten thousand times per design.
            double omega1 = s.naturalFrequency();
            TransferFunction h = TransferFunctions.of(excitation.kind(), response, s.dampingRatio(), a.tuningOn(s));
            FrequencyBand band = excitation.band();
            return PeakFinder.over(h, band.low() / omega1, band.high() / omega1).magnitude()
                    * ResponseScale.of(s, excitation.kind(), excitation.amplitude(), response);
        };
    }
}
