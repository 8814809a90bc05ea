package org.counterpoise.core.criteria;

/**
 * Where people are, and the multiplying factor on the base curve for continuous or intermittent
 * vibration (a rotor runs for hours): ISO 10137:2007 Annex C, as in ISO 2631-2:1989 Annex A and
 * BS 6472:1992. The factors are from memory in reference/acceptance-criteria.md section 4.1: verify
 * before using them as hard limits. Corroborated: the factors 1 (operating theatre), 2 (residential
 * by day), 4 (office) and 8 (workshop), which a public implementation of the VC curves lists beside
 * them as 101, 202, 403 and 803 um/s above 8 Hz. Residential by day is given as 2 to 4; the lower (stricter)
 * end is taken. Residential by night (1.4) and the quiet office (2) are from memory only. Transient
 * vibration (a few events a day) has much larger factors, which a rotor running for hours does not
 * use.
 */
public enum RoomUse {
    CRITICAL_WORK_AREA("critical-work-area", 1.0),
    RESIDENTIAL_NIGHT("residential-night", 1.4),
    RESIDENTIAL_DAY("residential-day", 2.0),
    QUIET_OFFICE("quiet-office", 2.0),
    GENERAL_OFFICE("general-office", 4.0),
    WORKSHOP("workshop", 8.0);

    /** Source of the factors. */
    public static final String SOURCE = "ISO 10137:2007 Annex C, continuous vibration (factors from memory:"
            + " verify before use as a hard limit)";

    private final String id;
    private final double factor;

    RoomUse(String id, double factor) {
        this.id = id;
        this.factor = factor;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return the multiplying factor on the base curve */
    public double factor() {
        return factor;
    }
}
