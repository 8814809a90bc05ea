package org.counterpoise.core.design;

import java.util.List;

/**
 * The cautions every report, sheet and wizard result shows. They are the usual duties of care for
 * an added mass on a spring (common practice).
 */
public final class Cautions {
    /** The standard cautions, one sentence each. */
    public static final List<String> STANDARD = List.of(
            "This is a preliminary design aid built on a single-mode linear model; it does not replace"
                    + " engineering judgement.",
            "Verify the structure's natural frequency and damping by measurement or analysis before"
                    + " building, and the tuning by measurement after installation.",
            "Retain the absorber mass fail-safe: a spring or fixing that breaks must not let the mass fall"
                    + " or strike anyone; fit a secondary catch (a captive bolt, a safety cable or a cage) that"
                    + " holds the whole mass on its own.",
            "Give the absorber mass lifting points rated for its weight, and size its retention, the catch"
                    + " and their fixings for the overload of a shock, a seismic event or a broken spring, not only"
                    + " for the working load.",
            "Provide stroke stops at the stated clearance; start-up, run-down, shocks and resonance"
                    + " transits can exceed the steady-state stroke.",
            "Check the absorber spring and its fixings (bolts, welds, brackets) for fatigue at the stated"
                    + " dynamic force over the stated number of load cycles, and inspect them at regular intervals.",
            "Local codes, standards and licensed engineering practice govern the final design, its"
                    + " installation and its inspection.");

    private Cautions() {
    }
}
