package org.counterpoise.ui.gui.wizard;

import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.io.text.ReportSection;

/** Interim: the report's hardware sections (io.text.HardwareContent) replace this when they land. */
final class HardwareSections {
    private HardwareSections() {
    }

    static List<ReportSection> of(Realisation r, DesignResult d) {
        return List.of();
    }
}
