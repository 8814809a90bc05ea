package org.counterpoise.ui.gui.field;

import java.util.List;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.UnitChoices;
import org.counterpoise.io.text.UnitSystem;

/** Which unit list a field offers in a unit system: a dimension's standard list follows the system. */
final class SystemUnits {
    private SystemUnits() {
    }

    /**
     * @param choices a field's units
     * @param system the unit system shown
     * @return the dimension's standard list of {@link UnitChoices} in that system when {@code choices}
     *     is that list in either system; any other list (a percent field, a plain number) as it is
     */
    static List<Unit> inSystem(List<Unit> choices, UnitSystem system) {
        if (choices.isEmpty()) {
            return choices;
        }
        var dimension = choices.get(0).dimension();
        for (UnitSystem s : UnitSystem.values()) {
            if (choices.equals(UnitChoices.of(dimension, s))) {
                return UnitChoices.of(dimension, system);
            }
        }
        return choices;
    }
}
