package org.counterpoise.io.text;

import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * The units outputs show each dimension in, per {@link UnitSystem} (workshop-friendly, not bare SI).
 * The one table of display units: the text reports, the tables of the sheet and the wizard, the chart
 * axes and the first unit of {@link UnitChoices} all come from here.
 */
public final class DisplayUnits {
    private DisplayUnits() {
    }

    /**
     * @param dimension a dimension
     * @param system the unit system outputs are shown in
     * @return the unit outputs use for it in that system
     */
    public static Unit of(Dimension dimension, UnitSystem system) {
        return system == UnitSystem.US_CUSTOMARY ? us(dimension) : si(dimension);
    }

    /**
     * The SI display unit: for front ends that do not yet offer the US customary system. No output
     * path of a project shown in US customary units reaches this (UsCustomaryReportTest).
     * @param dimension a dimension
     * @return the unit SI outputs use for it
     */
    public static Unit of(Dimension dimension) {
        return of(dimension, UnitSystem.SI);
    }

    private static Unit si(Dimension dimension) {
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
            case STRESS -> Unit.NEWTON_PER_SQUARE_MILLIMETRE;
            case FLUX_DENSITY -> Unit.TESLA;
            case TIME -> Unit.HOUR;
        };
    }

    /**
     * US customary: lengths in inches (the unit a workshop builds to; {@link Unit#MIL} is offered for
     * typing vibration amplitudes), acceleration in g, spring stresses in ksi (common practice).
     */
    private static Unit us(Dimension dimension) {
        return switch (dimension) {
            case MASS -> Unit.POUND;
            case FORCE -> Unit.POUND_FORCE;
            case LENGTH -> Unit.INCH;
            case STIFFNESS -> Unit.POUND_FORCE_PER_INCH;
            case DAMPING_COEFFICIENT -> Unit.POUND_FORCE_SECOND_PER_INCH;
            case FREQUENCY -> Unit.HERTZ;
            case VELOCITY -> Unit.INCH_PER_SECOND;
            case ACCELERATION -> Unit.STANDARD_GRAVITY;
            case UNBALANCE -> Unit.OUNCE_INCH;
            case RATIO -> Unit.RATIO;
            case ANGULAR_ACCELERATION -> Unit.RPM_PER_SECOND;
            case STRESS -> Unit.KSI;
            case FLUX_DENSITY -> Unit.TESLA;
            case TIME -> Unit.HOUR;
        };
    }

    /**
     * @param siValue SI value
     * @param dimension its dimension
     * @param system the unit system
     * @return text in the display unit
     */
    public static String format(double siValue, Dimension dimension, UnitSystem system) {
        return QuantityFormat.format(siValue, of(dimension, system));
    }

    /**
     * @param siValue SI value
     * @param dimension its dimension
     * @return text in the SI display unit
     */
    public static String format(double siValue, Dimension dimension) {
        return format(siValue, dimension, UnitSystem.SI);
    }
}
