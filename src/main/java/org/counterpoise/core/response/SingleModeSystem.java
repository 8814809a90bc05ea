package org.counterpoise.core.response;

import java.util.Objects;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.counterpoise.core.rational.TransferFunction;
import org.counterpoise.core.system.LinearSystem;

/**
 * One mode of the structure, bare or with one absorber, as a {@link LinearSystem}: the
 * two-degree-of-freedom model of {@link TransferFunctions} (one degree of freedom when bare). The
 * reference frequency is the structure's natural frequency omega1, so the variable is
 * s = i g with g = omega / omega1, and the SI scale is {@link ResponseScale}. A model with several
 * modes or absorbers implements the same interface; this class stays as the fast path and as the
 * cross-check for it.
 */
public final class SingleModeSystem implements LinearSystem<ExcitationKind, ResponseKind> {
    private final Structure structure;
    private final Tuning tuning;

    private SingleModeSystem(Structure structure, Tuning tuning) {
        this.structure = structure;
        this.tuning = tuning;
    }

    /**
     * @param structure the structure
     * @return the structure without an absorber
     */
    public static SingleModeSystem bare(Structure structure) {
        return new SingleModeSystem(structure, null);
    }

    /**
     * @param structure the structure
     * @param tuning the absorber on it (mu, f, zeta_a)
     * @return the structure with the absorber
     */
    public static SingleModeSystem withAbsorber(Structure structure, Tuning tuning) {
        return new SingleModeSystem(structure, Objects.requireNonNull(tuning, "tuning"));
    }

    /** The bare structure when the tuning is absent, as {@link SystemResponse} has always taken it. */
    static SingleModeSystem of(Structure structure, Tuning tuningOrNone) {
        return new SingleModeSystem(structure, tuningOrNone);
    }

    @Override
    public double referenceFrequency() {
        return structure.naturalFrequency();
    }

    @Override
    public TransferFunction transferFunction(ExcitationKind excitation, ResponseKind response) {
        return TransferFunctions.of(excitation, response, structure.dampingRatio(), tuning);
    }

    @Override
    public double responseScale(ExcitationKind excitation, double amplitude, ResponseKind response) {
        return ResponseScale.of(structure, excitation, amplitude, response);
    }

    /** @return the structure */
    public Structure structure() {
        return structure;
    }

    /** @return true when an absorber is fitted */
    public boolean hasAbsorber() {
        return tuning != null;
    }
}
