package org.counterpoise.core.optim;

import java.util.List;

/**
 * Several absorbers on one mode, non-dimensional (reference sheet conventions: mu_j = m_j / m1,
 * f_j = omega_j / omega1, zeta_j = c_j / (2 m_j omega_j), referred to the absorber's OWN frequency).
 *
 * @param massRatios mu_j of each absorber
 * @param tuningRatios f_j of each absorber
 * @param dampingRatios zeta_j of each absorber
 */
public record AbsorberSetDesign(List<Double> massRatios, List<Double> tuningRatios, List<Double> dampingRatios) {

    /** Copies the lists. */
    public AbsorberSetDesign {
        massRatios = List.copyOf(massRatios);
        tuningRatios = List.copyOf(tuningRatios);
        dampingRatios = List.copyOf(dampingRatios);
        if (massRatios.size() != tuningRatios.size() || massRatios.size() != dampingRatios.size()) {
            throw new IllegalArgumentException("bug: one mass, tuning and damping per absorber");
        }
    }

    /** @return the number of absorbers */
    public int count() {
        return massRatios.size();
    }
}
