package org.counterpoise.core.realisation;

import org.counterpoise.core.error.Checks;

/**
 * What the designer fixes for an eddy-current damper; the damper sizing finds the pole area that gives
 * the required coefficient.
 *
 * @param conductor plate material
 * @param fluxDensity magnetic flux density across the gap, T (&gt; 0; permanent-magnet gaps give about 0.3 to 1 T)
 * @param plateThickness conducting plate thickness, m (&gt; 0)
 */
public record EddyCurrentChoice(Conductor conductor, double fluxDensity, double plateThickness) {

    /** A copper plate 5 mm thick in a 0.5 T gap (a design choice, common practice for a first size). */
    public static final EddyCurrentChoice DEFAULT = new EddyCurrentChoice(Conductor.COPPER, 0.5, 0.005);

    /** The thinnest plate accepted, m (0.1 mm). */
    public static final double THINNEST_PLATE = 1e-4;

    /** The thickest plate accepted, m (100 mm). */
    public static final double THICKEST_PLATE = 0.1;

    /** Validates the record. */
    public EddyCurrentChoice {
        Checks.present("hardware.eddy_current.conductor", conductor, "copper or aluminium");
        Checks.inRange("hardware.eddy_current.flux_density", fluxDensity, 1e-3, 2.0);
        Checks.inRange("hardware.eddy_current.plate_thickness", plateThickness, THINNEST_PLATE, THICKEST_PLATE);
    }
}
