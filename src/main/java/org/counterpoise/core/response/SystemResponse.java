package org.counterpoise.core.response;

import java.util.EnumMap;
import java.util.Map;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.Peak;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.BandPeak;

/**
 * The physical (SI) response of a structure, with or without an absorber, to one disturbance.
 * A thin layer over the {@link SingleModeSystem} (a {@code core.system.LinearSystem}) and the
 * band-peak objective ({@link BandPeak}): no algebra of its own. Immutable; transfer functions are
 * built once per response kind.
 */
public final class SystemResponse {
    private final Structure structure;
    private final Tuning tuning;
    private final SingleModeSystem system;
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
        this.system = SingleModeSystem.of(structure, tuning);
        this.excitation = excitation;
        this.amplitude = amplitude;
    }

    /**
     * @param kind response kind
     * @return its non-dimensional transfer function
     */
    public synchronized TransferFunction transferFunction(ResponseKind kind) {
        return cache.computeIfAbsent(kind, k -> system.transferFunction(excitation, k));
    }

    /**
     * @param kind response kind
     * @return SI value of a non-dimensional response of 1
     */
    public double scale(ResponseKind kind) {
        return system.responseScale(excitation, amplitude, kind);
    }

    /**
     * @param kind response kind
     * @param omega forcing frequency, rad/s
     * @return the SI amplitude of the response at omega (+infinity at an undamped resonance)
     */
    public double amplitudeAt(ResponseKind kind, double omega) {
        return scale(kind) * transferFunction(kind).magnitude(omega / system.referenceFrequency());
    }

    /**
     * @param kind response kind
     * @param omega forcing frequency, rad/s
     * @return phase of the response relative to the drive, rad
     */
    public double phaseAt(ResponseKind kind, double omega) {
        double[] h = transferFunction(kind).value(omega / system.referenceFrequency());
        return Math.atan2(h[1], h[0]);
    }

    /**
     * @param kind response kind
     * @param band forcing band
     * @return the exact largest SI amplitude over the closed band, and where
     */
    public ResponsePeak peakOver(ResponseKind kind, FrequencyBand band) {
        return peakOf(kind, BandPeak.over(band));
    }

    /**
     * @param kind response kind
     * @param omegaLow low end, rad/s (&gt;= 0)
     * @param omegaHigh high end, rad/s (may be +infinity)
     * @return the exact largest SI amplitude over [omegaLow, omegaHigh]
     */
    public ResponsePeak peakBetween(ResponseKind kind, double omegaLow, double omegaHigh) {
        return peakOf(kind, new BandPeak(omegaLow, omegaHigh));
    }

    private ResponsePeak peakOf(ResponseKind kind, BandPeak band) {
        double omega1 = system.referenceFrequency();
        Peak peak = band.peakOf(transferFunction(kind), omega1);
        return new ResponsePeak(peak.frequencyRatio() * omega1, peak.magnitude() * scale(kind));
    }

    /** @return the linear system behind these responses */
    public SingleModeSystem system() {
        return system;
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
