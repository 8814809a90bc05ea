package org.counterpoise.core.realisation;

/**
 * An eddy-current damper sized to the required coefficient, SI.
 *
 * @param choice conductor, flux density and plate thickness as chosen
 * @param poleArea the magnet pole area the plate must cover, m^2
 * @param edgeFactor the factor (&lt; 1) for the return path of the currents in a finite plate
 * @param coefficient the damping coefficient it gives, N*s/m
 * @param source the formula's author, year, work and equation
 */
public record EddyCurrentDamper(EddyCurrentChoice choice, double poleArea, double edgeFactor, double coefficient,
        String source) {
}
