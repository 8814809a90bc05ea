package org.counterpoise.core.response;

import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.rational.PeakFinder;
import org.counterpoise.core.rational.Peak;
import java.util.EnumMap;
import java.util.Map;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;

/**
 * The physical (SI) response of a structure, with or without an absorber, to one disturbance.
 * A thin layer over {@link TransferFunctions} and {@link ResponseScale}: no algebra of its own.
 * Immutable; transfer functions are built once per response kind.
 */
public final class SystemResponse {
    private final Structure structure;
    private final Tuning tuning;
    private final ExcitationKind excitation;
    private final double amplitude;
    private final Map<ResponseKind, TransferFunction> cache = new EnumMap<>(ResponseKind.class);

    /**
     * @param structure the structure
     * @param tuning the absorber on it, or null for the bare structure
     * @param excitation what drives it
     * @param amplitude SI amplitude of the drive
     */
    public SystemResponse(Structure structure, Tuning tuning, ExcitationKind excitation, double amplitude) {
        this.structure = structure;
        this.tuning = tuning;
        this.excitation = excitation;
        this.amplitude = amplitude;
    }

    /**
     * @param kind response kind
     * @return its non-dimensional transfer function
     */
    public synchronized TransferFunction transferFunction(ResponseKind kind) {
        return cache.computeIfAbsent(kind,
                k -> TransferFunctions.of(excitation, k, structure.dampingRatio(), tuning));
    }

    /**
     * @param kind response kind
     * @return SI value of a non-dimensional response of 1
     */
    public double scale(ResponseKind kind) {
        return ResponseScale.of(structure, excitation, amplitude, kind);
    }

    /**
     * @param kind response kind
     * @param omega forcing frequency, rad/s
     * @return the SI amplitude of the response at omega (+infinity at an undamped resonance)
     */
    public double amplitudeAt(ResponseKind kind, double omega) {
        return scale(kind) * transferFunction(kind).magnitude(omega / structure.naturalFrequency());
    }

    /**
     * @param kind response kind
     * @param omega forcing frequency, rad/s
     * @return phase of the response relative to the drive, rad
     */
    public double phaseAt(ResponseKind kind, double omega) {
        double[] h = transferFunction(kind).value(omega / structure.naturalFrequency());
        return Math.atan2(h[1], h[0]);
    }

    /**
     * @param kind response kind
     * @param band forcing band
     * @return the exact largest SI amplitude over the closed band, and where
     */
    public ResponsePeak peakOver(ResponseKind kind, FrequencyBand band) {
        return peakBetween(kind, band.low(), band.high());
    }

    /**
     * @param kind response kind
     * @param omegaLow low end, rad/s (&gt;= 0)
     * @param omegaHigh high end, rad/s (may be +infinity)
     * @return the exact largest SI amplitude over [omegaLow, omegaHigh]
     */
    public ResponsePeak peakBetween(ResponseKind kind, double omegaLow, double omegaHigh) {
        double omega1 = structure.naturalFrequency();
        Peak peak = PeakFinder.over(transferFunction(kind), omegaLow / omega1, omegaHigh / omega1);
        return new ResponsePeak(peak.frequencyRatio() * omega1, peak.magnitude() * scale(kind));
    }

    /** @return the structure */
    public Structure structure() {
        return structure;
    }

    /** @return the absorber's tuning, or null */
    public Tuning tuning() {
        return tuning;
    }

    /** @return the excitation kind */
    public ExcitationKind excitation() {
        return excitation;
    }

    /** @return the SI drive amplitude */
    public double amplitude() {
        return amplitude;
    }
}
