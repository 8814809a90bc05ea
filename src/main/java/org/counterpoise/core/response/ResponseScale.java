package org.counterpoise.core.response;

import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;

/**
 * The SI reference each non-dimensional response is divided by. With the reference length
 * L = F/k1 (force), m_u e / m1 (unbalance), U (base displacement) or A/omega1^2 (base
 * acceleration): displacements, relative displacement and stroke are divided by L, velocity by
 * omega1 L, acceleration by omega1^2 L, and forces by k1 L. m1, k1 are the effective values at the
 * absorber point.
 */
public final class ResponseScale {
    private ResponseScale() {
    }

    /**
     * @param structure the structure
     * @param excitation the excitation kind
     * @param amplitude SI amplitude (N, kg*m, m or m/s^2)
     * @return the reference length L, m
     */
    public static double referenceLength(Structure structure, ExcitationKind excitation, double amplitude) {
        double omega1 = structure.naturalFrequency();
        return switch (excitation) {
            case FORCE -> amplitude / structure.effectiveStiffness();
            case UNBALANCE -> amplitude / structure.effectiveMass();
            case BASE_DISPLACEMENT -> amplitude;
            case BASE_ACCELERATION -> amplitude / (omega1 * omega1);
        };
    }

    /**
     * @param structure the structure
     * @param excitation the excitation kind
     * @param amplitude SI amplitude
     * @param response the response kind
     * @return the SI value of a non-dimensional response of 1
     */
    public static double of(Structure structure, ExcitationKind excitation, double amplitude, ResponseKind response) {
        double length = referenceLength(structure, excitation, amplitude);
        double omega1 = structure.naturalFrequency();
        return switch (response) {
            case DISPLACEMENT, RELATIVE_DISPLACEMENT, STROKE -> length;
            case VELOCITY -> omega1 * length;
            case ACCELERATION -> omega1 * omega1 * length;
            case TRANSMITTED_FORCE, ABSORBER_FORCE, SPRING_FORCE, DAMPER_FORCE ->
                structure.effectiveStiffness() * length;
        };
    }
}
