package org.counterpoise.core.criteria;

import java.util.List;

/**
 * The generic vibration criterion curves for sensitive equipment: one-third-octave band r.m.s.
 * velocity, flat from 1 to 80 Hz. VC-A to VC-E after Ungar and Gordon (1983) and Gordon (1991);
 * VC-F and VC-G and the flat form below 8 Hz after Amick, Gendreau, Busch and Gordon (2005),
 * "Evolving criteria for research facilities: vibration", Proc. SPIE 5933. The values are from
 * memory (a factor of two between curves, VC-A 50 um/s): verify before using them as hard limits.
 */
public enum VibrationCriterionCurve {
    VC_A("vc-a", 50e-6),
    VC_B("vc-b", 25e-6),
    VC_C("vc-c", 12.5e-6),
    VC_D("vc-d", 6.25e-6),
    VC_E("vc-e", 3.12e-6),
    VC_F("vc-f", 1.56e-6),
    VC_G("vc-g", 0.78e-6);

    /** Source of the table. */
    public static final String SOURCE = "Ungar and Gordon (1983); Amick et al. (2005), Proc. SPIE 5933";

    private final String id;
    private final double velocity;

    VibrationCriterionCurve(String id, double velocity) {
        this.id = id;
        this.velocity = velocity;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return the curve, m/s r.m.s. in one-third-octave bands, 1 to 80 Hz */
    public LimitCurve curve() {
        return new LimitCurve(List.of(new LimitCurve.Point(1, velocity), new LimitCurve.Point(80, velocity)));
    }
}
