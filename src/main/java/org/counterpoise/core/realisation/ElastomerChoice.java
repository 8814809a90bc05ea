package org.counterpoise.core.realisation;

import org.counterpoise.core.error.Checks;

/**
 * What the designer knows of the elastomer compound, for an elastomer absorber.
 *
 * @param dynamicToStaticRatio dynamic stiffness at the working frequency over static stiffness (&gt;= 1;
 *     common practice: about 1.1 to 1.3 for soft natural rubber, up to 2 or more for hard or highly
 *     damped compounds; it rises with frequency and falls with temperature)
 * @param compoundLossFactor the loss factor of the compound the workshop will use, at the working
 *     frequency and temperature (&gt; 0), compared with the loss factor the design needs
 */
public record ElastomerChoice(double dynamicToStaticRatio, double compoundLossFactor) {

    /** A medium-hardness natural rubber: ratio 1.4, loss factor 0.1 (common practice, from memory). */
    public static final ElastomerChoice DEFAULT = new ElastomerChoice(1.4, 0.1);

    /** Validates the record. */
    public ElastomerChoice {
        Checks.inRange("hardware.elastomer.dynamic_to_static_ratio", dynamicToStaticRatio, 1.0, 5.0);
        Checks.inRange("hardware.elastomer.loss_factor", compoundLossFactor, 1e-3, 2.0);
    }
}
