package org.counterpoise.core.realisation;

import org.counterpoise.core.error.Checks;

/**
 * What the absorber asks of its helical springs, all SI and in total over all springs: the
 * {@link SpringSizing} turns it into a {@link SpringDesign}. Validated on construction; a bad value
 * is reported under the field names below.
 *
 * @param rate the spring rate the design needs, N/m (&gt; 0), field {@code spring.rate}
 * @param staticLoad the steady load on the springs, N (&gt;= 0; 0 when nothing rests on them, as in
 *     a horizontal absorber), field {@code spring.static_load}
 * @param dynamicLoad the amplitude of the spring force, N (&gt;= 0), the worst of the band and the
 *     run-up: the rate times the largest stroke amplitude, field {@code spring.dynamic_load}
 * @param forcingFrequency the highest forcing frequency, rad/s (&gt; 0), field
 *     {@code spring.forcing_frequency}
 * @param serviceCycles load cycles over the service life (&gt;= 0), field {@code spring.service_cycles}
 */
public record SpringDemand(double rate, double staticLoad, double dynamicLoad, double forcingFrequency,
        double serviceCycles) {

    /** Validates every field. */
    public SpringDemand {
        Checks.positive("spring.rate", rate);
        Checks.nonNegative("spring.static_load", staticLoad);
        Checks.nonNegative("spring.dynamic_load", dynamicLoad);
        Checks.positive("spring.forcing_frequency", forcingFrequency);
        Checks.nonNegative("spring.service_cycles", serviceCycles);
    }
}
