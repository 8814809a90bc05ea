package org.counterpoise.io.text;

import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.runup.RunUp;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.runup.RunUpResult;
import org.counterpoise.core.runup.SpeedRamp;
import org.counterpoise.core.units.Unit;

/** The plain-text run-up report printed by {@code runup FILE}, aligned like the design report. */
public final class RunUpReport {
    private static final int LABEL = 40;
    private static final int COLUMN = 32;

    private RunUpReport() {
    }

    /**
     * @param d the study
     * @return the report in SI, lines ending in '\n'
     */
    public static String render(RunUpReportData d) {
        return render(d, UnitSystem.SI);
    }

    /**
     * @param d the study
     * @param units the unit system the peaks are shown in
     * @return the report, lines ending in '\n'
     */
    public static String render(RunUpReportData d, UnitSystem units) {
        StringBuilder out = new StringBuilder();
        String what = d.runDown() ? "run-down" : "run-up";
        out.append("Counterpoise ").append(what).append(" through resonance: ").append(d.name()).append('\n');
        SpeedRamp ramp = d.comparison().withAbsorber().ramp();

        out.append('\n').append(d.runDown() ? "Run-down" : "Run-up").append('\n');
        double from = d.shaftSpeed(ramp.startSpeed());
        double to = d.shaftSpeed(ramp.speedAt(ramp.duration()));
        row(out, "shaft speed", QuantityFormat.format(from, Unit.REV_PER_MINUTE) + " to "
                + QuantityFormat.format(to, Unit.REV_PER_MINUTE) + " at "
                + QuantityFormat.format(d.shaftRate(), Unit.RPM_PER_SECOND));
        row(out, "duration", QuantityFormat.number(ramp.duration(), 4) + " s");
        row(out, "forcing cycles", QuantityFormat.number(ramp.forcingCycles(), 4));
        row(out, "start", d.runDown() ? "steady running at the top speed" : "at rest");

        out.append('\n');
        header(out, "Peaks during the " + what);
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            columns(out, label(k), transientPeak(d, d.comparison().withAbsorber(), k, Unit.REV_PER_MINUTE, units),
                    transientPeak(d, d.comparison().withoutAbsorber(), k, Unit.REV_PER_MINUTE, units));
        }

        out.append('\n');
        header(out, "Steady state over the same speeds");
        for (ResponseKind k : RunUpReportData.QUANTITIES) {
            columns(out, label(k), steadyPeak(d, d.comparison().steadyWithAbsorber(), k, Unit.REV_PER_MINUTE, units),
                    steadyPeak(d, d.comparison().steadyWithoutAbsorber(), k, Unit.REV_PER_MINUTE, units));
        }

        out.append("\nNotes\n");
        DesignReport.bullet(out, "Time integration of the linear single-mode model at constant shaft acceleration"
                + " (Dormand-Prince 8(5,3), relative tolerance 1e" + Math.round(Math.log10(RunUp.DEFAULT_TOLERANCE))
                + "); an unbalance force includes the tangential term of the angular acceleration. See docs/runup.md.");
        DesignReport.bullet(out, "Speeds are shaft speeds; the steady-state column is what the machine would"
                + " reach if it dwelt at each speed it passes.");
        return out.toString();
    }

    /**
     * @param d the study
     * @param r one run (with or without the absorber)
     * @param k a reported quantity
     * @param speedUnit the unit of the shaft speed
     * @return "value at speed" in SI, or "-" when the run does not have the quantity
     */
    public static String transientPeak(RunUpReportData d, RunUpResult r, ResponseKind k, Unit speedUnit) {
        return transientPeak(d, r, k, speedUnit, UnitSystem.SI);
    }

    /**
     * @param d the study
     * @param peaks the steady-state peaks of one side
     * @param k a reported quantity
     * @param speedUnit the unit of the shaft speed
     * @return "value at speed" in SI, "unbounded (undamped resonance)", or "-"
     */
    public static String steadyPeak(RunUpReportData d, Map<ResponseKind, ResponsePeak> peaks, ResponseKind k,
            Unit speedUnit) {
        return steadyPeak(d, peaks, k, speedUnit, UnitSystem.SI);
    }

    /**
     * @param d the study
     * @param r one run (with or without the absorber)
     * @param k a reported quantity
     * @param speedUnit the unit of the shaft speed
     * @param units the unit system the value is shown in
     * @return "value at speed", or "-" when the run does not have the quantity
     */
    public static String transientPeak(RunUpReportData d, RunUpResult r, ResponseKind k, Unit speedUnit,
            UnitSystem units) {
        return r.peak(k).map(p -> DisplayUnits.format(p.value(), k.dimension(), units) + " at "
                + QuantityFormat.format(d.shaftSpeed(p.speed()), speedUnit)).orElse("-");
    }

    /**
     * @param d the study
     * @param peaks the steady-state peaks of one side
     * @param k a reported quantity
     * @param speedUnit the unit of the shaft speed
     * @param units the unit system the value is shown in
     * @return "value at speed", "unbounded (undamped resonance)", or "-" when the side does not have it
     */
    public static String steadyPeak(RunUpReportData d, Map<ResponseKind, ResponsePeak> peaks, ResponseKind k,
            Unit speedUnit, UnitSystem units) {
        ResponsePeak p = peaks.get(k);
        if (p == null) {
            return "-";
        }
        if (p.unbounded()) {
            return "unbounded (undamped resonance)";
        }
        return DisplayUnits.format(p.value(), k.dimension(), units) + " at "
                + QuantityFormat.format(d.shaftSpeed(p.frequency()), speedUnit);
    }

    /**
     * @param k a reported quantity
     * @return its words in the report (and, with underscores, in the JSON keys)
     */
    public static String label(ResponseKind k) {
        return switch (k) {
            case DISPLACEMENT -> "structure displacement";
            case VELOCITY -> "structure velocity";
            case ACCELERATION -> "structure acceleration";
            case STROKE -> "absorber stroke";
            case SPRING_FORCE -> "absorber spring force";
            default -> k.label();
        };
    }

    private static void row(StringBuilder out, String label, String value) {
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %s%n", label, value));
    }

    private static void header(StringBuilder out, String title) {
        out.append(String.format(Locale.ROOT, "%-" + LABEL + "s %-" + COLUMN + "s %s%n", title, "with absorber",
                "without absorber"));
    }

    private static void columns(StringBuilder out, String label, String with, String without) {
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %-" + COLUMN + "s %s%n", label, with,
                without).stripTrailing()).append('\n');
    }
}
