package org.counterpoise.core.criteria;

import java.util.List;

/**
 * The direction of vibration in a building and its base curve of r.m.s. acceleration (one-third
 * octave band or sine), 1 to 80 Hz: ISO 10137:2007 Annex C, the curves of ISO 2631-2:1989 Annex A
 * and BS 6472:1992. The standards' text was not available: the values are from memory in
 * reference/acceptance-criteria.md section 4.1. Corroborated for the vertical curve only: its
 * constant-velocity part above 8 Hz, 0.005 / (2 pi 8) = 99.5 um/s, is the 4000 micro-inch/s
 * (102 um/s) that E. E. Ungar gives as the perception threshold the VC curves are drawn against
 * (Acentech, "Virtually vibration-free facility"), and a public implementation of the "ISO
 * baseline" of AISC Design Guide 11 Fig. 2-1 has the same shape (f^-1/2, flat 4 to 8 Hz, rising
 * with f). Verify before using them as hard limits.
 */
public enum BuildingAxis {
    /** z (foot-to-head): 0.01 f^-1/2 m/s^2 from 1 to 4 Hz, 0.005 from 4 to 8 Hz, 0.005 f/8 from 8 to 80 Hz. */
    VERTICAL("vertical", new LimitCurve(List.of(new LimitCurve.Point(1, 0.01), new LimitCurve.Point(4, 0.005),
            new LimitCurve.Point(8, 0.005), new LimitCurve.Point(80, 0.05)))),
    /** x, y: 0.0036 m/s^2 from 1 to 2 Hz, 0.0018 f from 2 to 80 Hz. */
    HORIZONTAL("horizontal", new LimitCurve(List.of(new LimitCurve.Point(1, 0.0036),
            new LimitCurve.Point(2, 0.0036), new LimitCurve.Point(80, 0.144))));

    /** Source of the base curves. */
    public static final String SOURCE = "ISO 10137:2007 Annex C (base curves of ISO 2631-2:1989 Annex A;"
            + " from memory: verify before use as a hard limit)";

    private final String id;
    private final LimitCurve baseCurve;

    BuildingAxis(String id, LimitCurve baseCurve) {
        this.id = id;
        this.baseCurve = baseCurve;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return the base curve, r.m.s. acceleration m/s^2 over Hz */
    public LimitCurve baseCurve() {
        return baseCurve;
    }
}
