package org.counterpoise.io.text;

import java.util.List;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * The units offered for typing each dimension, the display unit of {@link DisplayUnits} first.
 * One list per dimension for every input field, so a field of a kind always offers the same
 * units in the same order.
 */
public final class UnitChoices {
    private UnitChoices() {
    }

    /**
     * @param dimension a dimension
     * @return the units a user may pick for it, {@link DisplayUnits#of} first (a ratio offers only
     *     the plain number)
     */
    public static List<Unit> of(Dimension dimension) {
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
            case STRESS -> List.of(Unit.MEGAPASCAL, Unit.PASCAL);
        };
    }
}
