package org.counterpoise.core.optim;

/** How the tunings of several absorbers on one mode are chosen. */
public enum AbsorberSetTuning {
    /**
     * Equal masses, natural frequencies spread uniformly about a centre, one damping ratio for all:
     * three variables (centre, spread, damping), the multiple tuned mass damper of Xu and Igusa
     * 1992 (Earthquake Eng. Struct. Dyn. 21, 1059-1070) and Yamaguchi and Harnpornchai 1993
     * (Earthquake Eng. Struct. Dyn. 22, 51-62).
     */
    UNIFORM,
    /**
     * Equal masses, each absorber with its own tuning and damping: 2n variables (Zuo and Nayfeh
     * 2005, J. Vib. Acoust. 127(1), 77-83, who also free the masses; here they stay equal).
     */
    INDIVIDUAL
}
