package org.counterpoise.io.text;

import java.util.Locale;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStroke;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.error.WarningParameter;
import org.counterpoise.core.error.WarningParameter.PeakBand;
import org.counterpoise.core.units.Dimension;

/**
 * The one place a {@link Warning} becomes English words. Every front end (text report, JSON,
 * PDF sheet, wizard) renders warnings through {@link #of}; the core only chooses the kind and its
 * SI values. Frequencies are printed in Hz.
 */
public final class WarningText {

    private WarningText() {
    }

    /**
     * @param w the warning
     * @return its sentence in SI
     */
    public static String of(Warning w) {
        return of(w, UnitSystem.SI);
    }

    /**
     * @param w the warning
     * @param units the unit system lengths are stated in
     * @return its sentence, never with NaN or Infinity (the core refuses non-finite values)
     */
    public static String of(Warning w, UnitSystem units) {
        return switch (w.kind()) {
            case DAMPED_STRUCTURE -> String.format(Locale.ROOT, "The %s closed form assumes an undamped structure;"
                    + " with the structure's damping ratio of %.3g the tuning is close to, but not exactly, the"
                    + " optimum.", w.token(WarningParameter.METHOD_ID),
                    w.number(WarningParameter.STRUCTURE_DAMPING_RATIO));
            case OPTIMUM_NOT_VERIFIED -> "The robust-design search stopped at its evaluation limit; the design is the"
                    + " best found.";
            case SINGLE_FREQUENCY_EXACT -> "The disturbance has one frequency: the exact-peak design minimises the"
                    + " peak " + over(PeakBand.valueOf(w.token(WarningParameter.PEAK_BAND))) + "; for the least"
                    + " response at that one frequency choose undamped-single-speed.";
            case TARGET_NOT_MET -> String.format(Locale.ROOT, "No absorber up to a mass ratio of %.3g meets the target;"
                    + " the design shown is the best at that mass ratio.", w.number(WarningParameter.MAX_MASS_RATIO));
            case CRITERION_NOT_MET -> String.format(Locale.ROOT, "No absorber up to a mass ratio of %.3g meets the"
                    + " criterion: the best at that mass ratio, shown, reaches %.3g times the limit %s, missing it by"
                    + " %.2f dB.", w.number(WarningParameter.MAX_MASS_RATIO), w.number(WarningParameter.UTILISATION),
                    judged(w.token(WarningParameter.METHOD_ID)),
                    20 * Math.log10(w.number(WarningParameter.UTILISATION)));
            case CRITERION_NOT_MET_UNBOUNDED -> String.format(Locale.ROOT, "No absorber up to a mass ratio of %.3g"
                    + " meets the criterion: the response it judges has no finite bound in the band; the design"
                    + " shown is the best at that mass ratio.", w.number(WarningParameter.MAX_MASS_RATIO));
            case NO_ABSORBER_NEEDED -> String.format(Locale.ROOT, "The structure already meets the criterion without"
                    + " an absorber (%.3g times the limit, a margin of %.2f dB): no absorber is needed. The design"
                    + " shown is the lightest considered, at a mass ratio of %.3g, for comparison.",
                    w.number(WarningParameter.UTILISATION), -20 * Math.log10(w.number(WarningParameter.UTILISATION)),
                    w.number(WarningParameter.MASS_RATIO));
            case RESONANT_UNDAMPED -> "The bare structure is undamped and resonant within the forcing band, so its"
                    + " response there is unbounded; the reduction cannot be given as a number.";
            case WORSE_WITH_ABSORBER -> "With this absorber the response that matters is larger than without it: the"
                    + " disturbance lies away from the structure's resonance.";
            case HEAVY_ABSORBER -> String.format(Locale.ROOT, "A mass ratio of %.3g is unusually large; check that"
                    + " the structure can carry the added mass.", w.number(WarningParameter.MASS_RATIO));
            case LIGHT_ABSORBER -> String.format(Locale.ROOT, "A mass ratio of %.3g is very small: the design is"
                    + " sharply tuned and sensitive to mistuning, and the stroke is large.",
                    w.number(WarningParameter.MASS_RATIO));
            case SINGLE_FREQUENCY -> "The disturbance has one frequency: an absorber tuned to that frequency with"
                    + " little damping reduces the response there far more than a design for all frequencies;"
                    + " consider undamped-single-speed, and weigh its start-up hazard.";
            case UNDAMPED_IN_BAND -> "An undamped absorber works at one frequency only; it was tuned to the centre of"
                    + " the band and the response elsewhere in the band may be large.";
            case START_UP_RESONANCE -> String.format(Locale.ROOT, "Start-up hazard: the structure with the absorber"
                    + " has natural frequencies at %.4g Hz and %.4g Hz (undamped values); the machine passes through"
                    + " the lower one each time it starts and stops. Pass through it quickly.",
                    hertz(w.number(WarningParameter.LOWER_NATURAL_FREQUENCY)),
                    hertz(w.number(WarningParameter.UPPER_NATURAL_FREQUENCY)));
            case SUPPORT_NOT_RIGID -> String.format(Locale.ROOT, "The machine criterion's class is for a rigid support,"
                    + " but the structure's natural frequency (%.4g Hz) is not 25 %% above the forcing (%.4g Hz):"
                    + " by ISO 10816-3:2009, 4.3 the support is flexible. Check which class applies; the flexible"
                    + " class has higher zone limits.", hertz(w.number(WarningParameter.STRUCTURE_NATURAL_FREQUENCY)),
                    hertz(w.number(WarningParameter.FORCING_FREQUENCY)));
            case UNBOUNDED_TRANSIT_STROKE -> "With no absorber damping the stroke grows without bound at a resonance"
                    + " passed during run-up; stroke stops are essential and the clearance given covers running in"
                    + " the band only.";
            case NO_DAMPING -> "The absorber has no damping: any drift of the forcing frequency away from the tuned"
                    + " value moves the structure towards a resonance.";
            case STRUCTURE_TOLERANCE_NARROW -> narrow("the structure's natural frequency", w);
            case ABSORBER_TOLERANCE_NARROW -> narrow("the absorber's natural frequency", w);
            case DAMPING_BELOW_PRACTICAL -> String.format(Locale.ROOT, "The absorber damping ratio of %.3g is below"
                    + " the %.3g that a practical damper gives (common practice, no source): the damping actually"
                    + " built will be higher and the design will not perform as computed; choose a design with"
                    + " more damping (robust-worst-case) or fix the damping at what the damper gives.",
                    w.number(WarningParameter.ABSORBER_DAMPING_RATIO),
                    w.number(WarningParameter.PRACTICAL_DAMPING_RATIO));
            case RUN_UP_STROKE_LARGE -> String.format(Locale.ROOT, "The absorber stroke during run-up, %s (%s), is"
                    + " %.3g times the stroke in the band, %s: leave the clearance for it, or pass the start-up"
                    + " resonance faster.", length(w.number(WarningParameter.RUN_UP_STROKE), units),
                    runUpBasis(w), w.number(WarningParameter.RUN_UP_STROKE) / w.number(WarningParameter.IN_BAND_STROKE),
                    length(w.number(WarningParameter.IN_BAND_STROKE), units));
            case RUN_UP_OVER_STROKE_LIMIT -> String.format(Locale.ROOT, "The absorber stroke during run-up, %s (%s),"
                    + " exceeds the stroke limit of %s: the absorber will strike its stops at start and stop.",
                    length(w.number(WarningParameter.RUN_UP_STROKE), units), runUpBasis(w),
                    length(w.number(WarningParameter.STROKE_LIMIT), units));
            case DAMPER_STROKE_OVER_CLEARANCE -> String.format(Locale.ROOT, "The damper sees a stroke of up to %s"
                    + " in service, more than the clearance of %s it is made to allow: widen the clearance and the"
                    + " damper's stroke, or slow the run-up.", length(w.number(WarningParameter.DAMPER_STROKE), units),
                    length(w.number(WarningParameter.CLEARANCE), units));
            case EDDY_CURRENT_PLATE_THICK -> String.format(Locale.ROOT, "The eddy-current damper's plate, %s thick,"
                    + " is thicker than the skin depth of %s at the highest forcing frequency: the damping it gives"
                    + " falls short of the thin-plate formula; use a thinner plate and a larger pole area.",
                    length(w.number(WarningParameter.PLATE_THICKNESS), units),
                    length(w.number(WarningParameter.SKIN_DEPTH), units));
            case MASS_TOLERANCE_TOO_LOOSE -> String.format(Locale.ROOT, "A mass tolerance of +/-%s alone moves the"
                    + " absorber's frequency by as much as its tolerance of +/-%s allows, leaving nothing for the"
                    + " spring rate: hold the mass closer, or tune the absorber on site with the trim plates.",
                    ValueText.percent(w.number(WarningParameter.MASS_TOLERANCE), 2),
                    ValueText.percent(w.number(WarningParameter.FREQUENCY_TOLERANCE), 2));
            case SPRING_OVERSTRESSED -> spring(w, "the spring's stress at its largest load (or at solid length) is",
                    "the permissible stress: it would take a set and the tuning would drift");
            case SPRING_FATIGUE -> spring(w, "the spring's stress amplitude is", "its fatigue strength at its mean"
                    + " stress: it would break in service and the mass would fall");
            case SPRING_BUCKLES -> spring(w, "the spring's working deflection is", "its buckling deflection: guide it"
                    + " on a rod or in a sleeve");
            case SPRING_SURGE -> spring(w, "three times the highest forcing frequency is", "the spring's first surge"
                    + " frequency: its coils would resonate");
            case SPRING_GOES_SOLID -> spring(w, "the spring's working compression is", "the compression it has before"
                    + " its coils close: it would strike solid");
            case ELASTOMER_LOSS_FACTOR_MISSED -> String.format(Locale.ROOT, "The elastomer compound's loss factor"
                    + " of %.3g is %s the %.3g the element needs: its peak response is %.3g times what the design"
                    + " allows (its promised peak plus %s); choose a compound with a loss factor nearer %.3g at the"
                    + " working frequency and temperature, or add a damper.",
                    w.number(WarningParameter.COMPOUND_LOSS_FACTOR),
                    w.number(WarningParameter.COMPOUND_LOSS_FACTOR) < w.number(WarningParameter.LOSS_FACTOR_NEEDED)
                            ? "below" : "above", w.number(WarningParameter.LOSS_FACTOR_NEEDED),
                    w.number(WarningParameter.UTILISATION), ValueText.percent(DesignResult.TOLERANCE_ALLOWANCE, 2),
                    w.number(WarningParameter.LOSS_FACTOR_NEEDED));
            case SPRING_RATE_NOT_MET -> String.format(Locale.ROOT, "No helical springs of stock wire give the rate the"
                    + " design needs: the closest, shown, are %s %s; choose an elastomer element or another absorber.",
                    ValueText.percent(Math.abs(w.number(WarningParameter.RATE_DEVIATION)), 2),
                    w.number(WarningParameter.RATE_DEVIATION) < 0 ? "too soft" : "too stiff");
            case SPRING_COUNT_MADE_EVEN -> String.format(Locale.ROOT, "The absorber's weight is smaller than its"
                    + " dynamic spring force, so its springs stand in opposed preloaded pairs and their number must"
                    + " be even: %d springs were sized instead of the %d asked for (hardware.spring_count).",
                    Math.round(w.number(WarningParameter.SPRING_COUNT)),
                    Math.round(w.number(WarningParameter.SPRING_COUNT)) - 1);
        };
    }

    private static String spring(Warning w, String what, String against) {
        return String.format(Locale.ROOT, "No helical spring design passes every check: %s %.3g times %s."
                + " Choose another wire or spring count, or an elastomer element.", what,
                w.number(WarningParameter.UTILISATION), against);
    }

    private static String narrow(String what, Warning w) {
        return String.format(Locale.ROOT, "The design keeps its peak in band within %s of nominal only while %s"
                + " %s, narrower than the tolerance range of +/-%s (stated, or the default when"
                + " none is stated): %s", ValueText.percent(DesignResult.TOLERANCE_ALLOWANCE, 2), what,
                tolerated(w.number(WarningParameter.TOLERATED_LOW), w.number(WarningParameter.TOLERATED_HIGH)),
                ValueText.percent(w.number(WarningParameter.STATED_RANGE), 2),
                DesignMethod.byId(w.token(WarningParameter.METHOD_ID)).filter(DesignMethod::robust).isPresent()
                        ? "this design already has the least worst case over the ranges for its mass (see the comparison"
                                + " of methods), so plan to tune the absorber on site to the measured frequency, tighten"
                                + " the tolerance, or use a heavier absorber."
                        : "as built it may perform much worse than computed; robust-worst-case holds over the range.");
    }

    /**
     * The tolerated range in words. It always holds nominal (low &lt;= 0 &lt;= high); an end at the
     * search limit was not closed there, so that side is said as "any change up to the limit".
     */
    private static String tolerated(double low, double high) {
        String searched = ValueText.percent(DesignResult.TOLERANCE_SEARCH, 2);
        boolean lowOpen = Math.abs(low) >= DesignResult.TOLERANCE_SEARCH - 1e-12;
        boolean highOpen = Math.abs(high) >= DesignResult.TOLERANCE_SEARCH - 1e-12;
        if (lowOpen && !highOpen) {
            return "is at most " + ValueText.percent(high, 2) + " above nominal (any fall, to the " + searched
                    + " searched, is tolerated)";
        }
        if (highOpen && !lowOpen) {
            return "is at most " + ValueText.percent(-low, 2) + " below nominal (any rise, to the " + searched
                    + " searched, is tolerated)";
        }
        return "stays within " + signed(low) + " to " + signed(high);
    }

    private static String signed(double fraction) {
        return (fraction < 0 ? "-" : "+") + ValueText.percent(Math.abs(fraction), 2);
    }

    private static String runUpBasis(Warning w) {
        return switch (RunUpStroke.Basis.valueOf(w.token(WarningParameter.RUN_UP_BASIS))) {
            case TRANSIENT -> "a run-up from rest at the project's rate, in the time domain";
            case STEADY_STATE -> "steady state from rest to the top of the band; the project states no run-up rate";
            case STEADY_STATE_NOT_INTEGRATED -> "steady state from rest to the top of the band; this run-up is not"
                    + " integrated in time";
        };
    }

    private static String length(double metres, UnitSystem units) {
        return DisplayUnits.format(metres, Dimension.LENGTH, units);
    }

    private static String over(PeakBand band) {
        return switch (band) {
            case ALL_FREQUENCIES -> "over all frequencies, which also covers start-up and mistuning";
            case RUN_UP -> "over the speeds passed on start-up, up to the forcing frequency (the response has no"
                    + " finite peak over all frequencies)";
            case OCTAVE -> "over the octave either side of the forcing frequency (the response has no finite peak"
                    + " over all frequencies or over start-up)";
        };
    }

    private static double hertz(double radiansPerSecond) {
        return radiansPerSecond / (2 * Math.PI);
    }

    /** Where a design to a criterion was judged, by its method's id. */
    private static String judged(String methodId) {
        return switch (DesignMethod.byId(methodId).orElse(DesignMethod.EXACT_PEAK)) {
            case ROBUST_WORST_CASE -> "in the worst case over the tolerances";
            case ROBUST_P95 -> "in 95 % of builds over the tolerances";
            default -> "as designed";
        };
    }
}
