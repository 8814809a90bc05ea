package org.counterpoise.io.text;

import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/** The units reports show each dimension in (workshop-friendly, not bare SI). */
public final class DisplayUnits {
    private DisplayUnits() {
    }

    /**
     * @param dimension a dimension
     * @return the unit reports use for it
     */
    public static Unit of(Dimension dimension) {
        return switch (dimension) {
            case MASS -> Unit.KILOGRAM;
            case FORCE -> Unit.NEWTON;
            case LENGTH -> Unit.MILLIMETRE;
            case STIFFNESS -> Unit.KILONEWTON_PER_METRE;
            case DAMPING_COEFFICIENT -> Unit.NEWTON_SECOND_PER_METRE;
            case FREQUENCY -> Unit.HERTZ;
            case VELOCITY -> Unit.MILLIMETRE_PER_SECOND;
            case ACCELERATION -> Unit.METRE_PER_SECOND_SQUARED;
            case UNBALANCE -> Unit.GRAM_MILLIMETRE;
            case RATIO -> Unit.RATIO;
            case ANGULAR_ACCELERATION -> Unit.RPM_PER_SECOND;
            case STRESS -> Unit.MEGAPASCAL;
        };
    }

    /**
     * @param siValue SI value
     * @param dimension its dimension
     * @return text in the display unit
     */
    public static String format(double siValue, Dimension dimension) {
        return QuantityFormat.format(siValue, of(dimension));
    }
}
