package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * The units offered for typing each dimension, the display unit of {@link DisplayUnits} first.
 * One list per dimension and system for every input field, so a field of a kind always offers the
 * same units in the same order. A project file accepts every unit of both systems; a field offers its
 * system's units first and the other system's after them, so a value typed in either is kept as typed.
 */
public final class UnitChoices {
    private UnitChoices() {
    }

    /**
     * @param dimension a dimension
     * @return the SI choices ({@link #of(Dimension, UnitSystem)} for SI)
     */
    public static List<Unit> of(Dimension dimension) {
        return of(dimension, UnitSystem.SI);
    }

    /**
     * @param dimension a dimension
     * @param system the unit system shown
     * @return the units a user may pick for it, {@link DisplayUnits#of(Dimension, UnitSystem)} first, then
     *     the rest of that system's, then the other system's (a ratio offers only the plain number)
     */
    public static List<Unit> of(Dimension dimension, UnitSystem system) {
        List<Unit> si = si(dimension);
        List<Unit> us = us(dimension);
        List<Unit> out = new ArrayList<>(system == UnitSystem.US_CUSTOMARY ? us : si);
        for (Unit u : system == UnitSystem.US_CUSTOMARY ? si : us) {
            if (!out.contains(u)) {
                out.add(u);
            }
        }
        return List.copyOf(out);
    }

    /** Today's SI lists, unchanged (their order is what the wizard has always offered). */
    private static List<Unit> si(Dimension dimension) {
        return switch (dimension) {
            case MASS -> List.of(Unit.KILOGRAM, Unit.TONNE, Unit.GRAM);
            case FORCE -> List.of(Unit.NEWTON, Unit.KILONEWTON);
            case LENGTH -> List.of(Unit.MILLIMETRE, Unit.METRE, Unit.MICROMETRE);
            case STIFFNESS -> List.of(Unit.KILONEWTON_PER_METRE, Unit.NEWTON_PER_METRE, Unit.NEWTON_PER_MILLIMETRE,
                    Unit.KILONEWTON_PER_MILLIMETRE);
            case DAMPING_COEFFICIENT -> List.of(Unit.NEWTON_SECOND_PER_METRE, Unit.KILONEWTON_SECOND_PER_METRE);
            case FREQUENCY -> List.of(Unit.HERTZ, Unit.REV_PER_MINUTE, Unit.RADIAN_PER_SECOND);
            case VELOCITY -> List.of(Unit.MILLIMETRE_PER_SECOND, Unit.METRE_PER_SECOND);
            case ACCELERATION -> List.of(Unit.METRE_PER_SECOND_SQUARED, Unit.STANDARD_GRAVITY);
            case UNBALANCE -> List.of(Unit.GRAM_MILLIMETRE, Unit.KILOGRAM_METRE);
            case RATIO -> List.of(Unit.RATIO);
            case ANGULAR_ACCELERATION -> List.of(Unit.RPM_PER_SECOND, Unit.HERTZ_PER_SECOND,
                    Unit.RADIAN_PER_SECOND_SQUARED);
            case STRESS -> List.of(Unit.NEWTON_PER_SQUARE_MILLIMETRE, Unit.MEGAPASCAL, Unit.PASCAL);
            case FLUX_DENSITY -> List.of(Unit.TESLA, Unit.MILLITESLA);
            case TIME -> List.of(Unit.HOUR, Unit.SECOND);
        };
    }

    private static List<Unit> us(Dimension dimension) {
        return switch (dimension) {
            case MASS -> List.of(Unit.POUND);
            case FORCE -> List.of(Unit.POUND_FORCE);
            case LENGTH -> List.of(Unit.INCH, Unit.MIL);
            case STIFFNESS -> List.of(Unit.POUND_FORCE_PER_INCH);
            case DAMPING_COEFFICIENT -> List.of(Unit.POUND_FORCE_SECOND_PER_INCH);
            case FREQUENCY -> List.of(Unit.HERTZ, Unit.REV_PER_MINUTE);
            case VELOCITY -> List.of(Unit.INCH_PER_SECOND);
            case ACCELERATION -> List.of(Unit.STANDARD_GRAVITY);
            case UNBALANCE -> List.of(Unit.OUNCE_INCH);
            case RATIO -> List.of(Unit.RATIO);
            case ANGULAR_ACCELERATION -> List.of(Unit.RPM_PER_SECOND);
            case STRESS -> List.of(Unit.KSI, Unit.PSI);
            case FLUX_DENSITY -> List.of(Unit.TESLA, Unit.MILLITESLA);
            case TIME -> List.of(Unit.HOUR);
        };
    }
}
