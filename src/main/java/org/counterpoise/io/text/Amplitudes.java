package org.counterpoise.io.text;

import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PeakAt;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Reduction;

/**
 * Report values of a steady harmonic stated in another amplitude convention: every amplitude goes
 * through {@link AmplitudeConvention#ofHarmonic} (r.m.s. = peak / sqrt 2, peak-to-peak = 2 peak),
 * the one formula; ratios (a reduction factor) and words are unchanged, an unbounded value stays
 * unbounded.
 */
public final class Amplitudes {
    private Amplitudes() {
    }

    /**
     * @param peak a value whose amplitudes are peaks
     * @param convention the convention to state them in
     * @return the same value in that convention
     */
    public static ReportValue stated(ReportValue peak, AmplitudeConvention convention) {
        if (convention == AmplitudeConvention.PEAK) {
            return peak;
        }
        if (peak instanceof Quantity q) {
            return new Quantity(convention.ofHarmonic(q.si()), q.dimension(), q.figures());
        } else if (peak instanceof Pair p) {
            return new Pair(stated(p.first(), convention), stated(p.second(), convention), p.kind());
        } else if (peak instanceof Reduction r) {
            return new Reduction(stated(r.before(), convention), stated(r.after(), convention), r.factor(),
                    r.decibels());
        } else if (peak instanceof PeakAt p) {
            return new PeakAt(stated(p.peak(), convention), p.frequency());
        }
        return peak;
    }
}
