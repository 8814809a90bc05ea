package org.counterpoise.io.text;

/**
 * The system of units every output is shown in: the report, the JSON's displayed figures (never its SI
 * keys), the sheet and the wizard. Files keep each value's own unit whichever system is shown.
 */
public enum UnitSystem {
    /** SI with workshop multiples (kg, N, mm, kN/m, N*s/m, Hz, mm/s, m/s^2). */
    SI("si"),
    /** US customary (lb, lbf, in, mil, in/s, lbf/in, lbf*s/in, g, rpm). */
    US_CUSTOMARY("us");

    private final String id;

    UnitSystem(String id) {
        this.id = id;
    }

    /** @return the identifier in project files and on the command line */
    public String id() {
        return id;
    }
}
