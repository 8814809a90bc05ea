package org.counterpoise.ui.cli;

import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.io.project.Project;

/**
 * The amplitude convention the commands state response values in: the {@code --convention}
 * option when given, else the project's display convention (peak when the file names none).
 */
final class DisplayConvention {
    /** The option's help text, the same on every command that has it. */
    static final String HELP = "state response values as peak, rms or peak-to-peak (default: the project's"
            + " display convention, else peak); stroke and forces stay peaks";

    private DisplayConvention() {
    }

    /**
     * @param option the option's value, or null when not given
     * @param project the project
     * @return the convention to show
     */
    static AmplitudeConvention of(AmplitudeConvention option, Project project) {
        return option != null ? option : project.displayConvention();
    }
}
