package org.counterpoise.core.design;

import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.response.RandomResponse;
import org.counterpoise.core.response.ResponseKind;

/**
 * The response of a design to white noise (a {@link org.counterpoise.core.model.Spectrum} of
 * kind white noise), in root mean square. SI units; +infinity when the mean square diverges
 * (an undamped bare structure).
 *
 * @param psdLevel the one-sided PSD of the disturbance, N^2/Hz or (m/s^2)^2/Hz
 * @param before rms of the response that matters, bare structure
 * @param after rms of the response that matters, with the absorber
 * @param stroke rms absorber stroke, m
 */
public record RmsFigures(double psdLevel, double before, double after, double stroke) {

    /**
     * @param r a design whose disturbance is white noise
     * @return its rms figures
     */
    static RmsFigures of(DesignResult r) {
        Excitation e = r.study().excitation();
        double g0 = e.spectrum().psdLevel().orElseThrow();
        return new RmsFigures(g0,
                RandomResponse.rms(r.study().structure(), null, e.kind(), g0, r.study().response()),
                RandomResponse.rms(r.study().structure(), r.tuning(), e.kind(), g0, r.study().response()),
                RandomResponse.rms(r.study().structure(), r.tuning(), e.kind(), g0, ResponseKind.STROKE));
    }
}
