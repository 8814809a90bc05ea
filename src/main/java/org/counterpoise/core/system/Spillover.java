package org.counterpoise.core.system;

import java.util.ArrayList;
import java.util.List;

/**
 * Spillover: what absorbers fitted for one mode do to every mode of the structure. For each mode r
 * the peak of the receptance |H_pq| is taken over its own neighbourhood, the frequencies between the
 * geometric means of its natural frequency and its neighbours' (from zero below the first mode, to
 * infinity above the last), without and with the absorbers; exact peaks of the rational transfer
 * functions of {@link ModalSystem}, located by {@link ModalPeak} (the factored route, which holds for
 * three or more light absorbers, where the polynomial search on the expanded |H|^2 loses digits). An absorber tuned to mode 1 splits it and
 * usually lowers the response near mode 2 slightly, but a mass added where mode 2 moves more can
 * also shift mode 2 down into the band: that is what the figures show.
 *
 * @param modes one entry per mode, in ascending natural frequency
 */
public record Spillover(List<ModePeak> modes) {

    /** Copies the list. */
    public Spillover {
        modes = List.copyOf(modes);
    }

    /**
     * The peak near one mode.
     *
     * @param mode index of the mode, from 0
     * @param low low end of its neighbourhood, rad/s (0 for the first mode)
     * @param high high end, rad/s (+infinity for the last mode)
     * @param before peak |H_pq| there without absorbers, m/N (+infinity when unbounded: an undamped mode)
     * @param after peak |H_pq| there with the absorbers, m/N
     */
    public record ModePeak(int mode, double low, double high, double before, double after) {
    }

    /**
     * @param system the structure with its absorbers
     * @param forcePoint where the force acts
     * @param responsePoint where the displacement is taken
     * @return the peak near every mode before and after
     */
    public static Spillover of(ModalSystem system, String forcePoint, String responsePoint) {
        List<Mode> modes = system.structure().modes();
        List<ModePeak> out = new ArrayList<>();
        for (int r = 0; r < modes.size(); r++) {
            double wr = modes.get(r).naturalFrequency();
            double low = r == 0 ? 0.0 : Math.sqrt(wr * modes.get(r - 1).naturalFrequency());
            double high = r + 1 == modes.size() ? Double.POSITIVE_INFINITY
                    : Math.sqrt(wr * modes.get(r + 1).naturalFrequency());
            out.add(new ModePeak(r, low, high, ModalPeak.over(system.bare(), forcePoint, responsePoint, low, high),
                    ModalPeak.over(system, forcePoint, responsePoint, low, high)));
        }
        return new Spillover(out);
    }
}
