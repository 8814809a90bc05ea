package org.counterpoise.ui.cli;

import org.counterpoise.io.project.Project;
import org.counterpoise.io.text.UnitSystem;

/**
 * The unit system the commands show quantities in: the {@code --units} option when given, else the
 * project's {@code display_units} (SI when the file names none). The JSON's SI keys never change.
 */
final class DisplayUnitSystem {
    /** The option's help text, the same on every command that has it. */
    static final String HELP = "show quantities in si or us (US customary: lb, lbf, in, in/s, lbf/in, lbf*s/in, g;"
            + " default: the project's display_units, else si); --json keeps its SI keys";

    private DisplayUnitSystem() {
    }

    /**
     * @param option the option's value, or null when not given
     * @param project the project
     * @return the system to show
     */
    static UnitSystem of(UnitSystem option, Project project) {
        return option != null ? option : project.displayUnits();
    }
}
