package org.counterpoise.io.sheet;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;

/**
 * Everything the parameter sheet prints, as text, built from a design result. Kept apart from the
 * PDF layout so that it can be tested without a PDF, and so that the numbers on the sheet are the
 * numbers of the report.
 *
 * @param projectName project name
 * @param notes the project's notes (who, what, whether the data are invented), may be empty
 * @param date date of issue (ISO)
 * @param revision revision mark
 * @param sections tables of label, value and unit
 * @param assumptions the model's assumptions, one sentence each
 * @param warnings the design's warnings
 * @param cautions the standard cautions
 */
public record SheetContent(String projectName, String notes, String date, String revision, List<Section> sections,
        List<String> assumptions, List<String> warnings, List<String> cautions) {

    /** Title of the section of harmonic peaks at one forcing frequency. */
    public static final String PEAKS_AT_FREQUENCY = "Response at the forcing frequency (before / after)";
    /** Title of the section of harmonic peaks over a band. */
    public static final String PEAKS_IN_BAND = "Worst response in the band (before / after)";
    /** Title of the section of root-mean-square responses to white noise (only for a white-noise disturbance). */
    public static final String RMS = "Rms under white noise";

    /**
     * A table of the sheet.
     *
     * @param title heading
     * @param rows rows
     */
    public record Section(String title, List<Row> rows) {
    }

    /**
     * One line of a table: a number with its unit, or a text (unit empty).
     *
     * @param label what it is
     * @param value the number as printed, or a text
     * @param unit the unit symbol, or empty
     */
    public record Row(String label, String value, String unit) {
    }

    /** The assumptions printed on every sheet. */
    public static final List<String> ASSUMPTIONS = List.of(
            "The structure is represented by one mode: its modal mass, stiffness and viscous damping, seen at the"
                    + " absorber point through the mode-shape value there.",
            "The absorber is a rigid mass on a linear spring and a linear viscous damper acting along the"
                    + " direction of the mode.",
            "The disturbance is harmonic and steady; responses are steady-state amplitudes. Start-up, run-down"
                    + " and shock transients are not analysed (see the run-up stroke and the cautions).",
            "Response figures are exact for this model (peaks from polynomial roots); they are only as good as"
                    + " the measured or estimated structure data.");

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision) {
        return of(r, notes, date, revision, null);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo a tolerance Monte Carlo of the design, or null when none was run
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            org.counterpoise.core.robust.MonteCarloResult monteCarlo) {
        return of(r, notes, date, revision, monteCarlo, ProjectIdentity.EMPTY);
    }

    /**
     * @param r the design result
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param monteCarlo a tolerance Monte Carlo of the design, or null when none was run
     * @param identity the project's engineer and client or site, printed first when given (its
     *     revision and date are the caller's to pass as {@code revision} and {@code date})
     * @return the sheet content
     */
    public static SheetContent of(DesignResult r, String notes, String date, String revision,
            org.counterpoise.core.robust.MonteCarloResult monteCarlo, ProjectIdentity identity) {
        DesignStudy study = r.study();
        Structure s = study.structure();
        Excitation e = study.excitation();
        FrequencyBand band = e.band();
        List<Section> sections = new ArrayList<>();
        List<Row> project = new ArrayList<>();
        if (!identity.engineer().isBlank()) {
            project.add(new Row("Engineer", identity.engineer().strip(), ""));
        }
        if (!identity.client().isBlank()) {
            project.add(new Row("Client or site", identity.client().strip(), ""));
        }
        if (!project.isEmpty()) {
            sections.add(new Section("Project", project));
        }

        List<Row> structure = new ArrayList<>();
        structure.add(quantity("Effective mass m1", s.effectiveMass(), Dimension.MASS));
        structure.add(quantity("Effective stiffness k1", s.effectiveStiffness(), Dimension.STIFFNESS));
        structure.add(quantity("Natural frequency", s.naturalFrequency(), Dimension.FREQUENCY));
        structure.add(number("Damping ratio \u03b6\u2081", s.dampingRatio(), 3));
        structure.add(number("Mode shape at the absorber \u03c6", s.modeShapeAtAbsorber(), 3));
        sections.add(new Section("Structure (at the absorber point)", structure));

        List<Row> disturbance = new ArrayList<>();
        disturbance.add(text("Kind", capitalised(e.kind().label())));
        disturbance.add(quantity("Amplitude", e.amplitude(), e.kind().amplitudeDimension()));
        if (band.isSingle()) {
            disturbance.add(quantity("Forcing frequency", band.low(), Dimension.FREQUENCY));
        } else {
            disturbance.add(new Row("Forcing band", QuantityFormat.number(Unit.HERTZ.fromSi(band.low()), 4) + " to "
                    + QuantityFormat.number(Unit.HERTZ.fromSi(band.high()), 4), "Hz"));
        }
        disturbance.add(text("Response to reduce", capitalised(study.response().label())));
        sections.add(new Section("Disturbance", disturbance));

        List<Row> method = new ArrayList<>();
        method.add(text("Method", study.method().id() + ": " + study.method().description()));
        method.add(text("Source", r.methodSource()));
        method.add(text("Note", r.methodNote()));
        method.add(number("Mass ratio \u03bc", r.tuning().massRatio(), 4));
        method.add(number("Tuning ratio f", r.tuning().tuningRatio(), 4));
        method.add(number("Absorber damping ratio \u03b6a", r.tuning().dampingRatio(), 4));
        sections.add(new Section("Design", method));

        List<Row> build = new ArrayList<>();
        build.add(quantity("Absorber mass m2", r.absorber().mass(), Dimension.MASS));
        build.add(quantity("Spring rate k2", r.absorber().stiffness(), Dimension.STIFFNESS));
        build.add(text("Spring rate tolerated (peak +" + percent(DesignResult.TOLERANCE_ALLOWANCE) + ")",
                DesignReport.tolerance(r.absorberTolerance(), 2)));
        build.add(quantity("Damping coefficient c2", r.absorber().damping(), Dimension.DAMPING_COEFFICIENT));
        build.add(quantity("Absorber natural frequency", r.absorber().naturalFrequency(), Dimension.FREQUENCY));
        if (!Double.isNaN(r.staticDeflection())) {
            build.add(quantity("Static deflection of the spring", r.staticDeflection(), Dimension.LENGTH));
        }
        build.add(quantity("Peak stroke in band", r.strokeInBand().value(), Dimension.LENGTH));
        build.add(quantity("Peak stroke during run-up", r.strokeRunUp().value(), Dimension.LENGTH));
        build.add(quantity("Stroke clearance (x" + QuantityFormat.number(study.strokeMargin(), 2) + " margin)",
                r.clearance(), Dimension.LENGTH));
        build.add(quantity("Peak spring force", r.springForce().value(), Dimension.FORCE));
        build.add(quantity("Peak damper force", r.damperForce().value(), Dimension.FORCE));
        sections.add(new Section("Absorber to build", build));

        List<Row> response = new ArrayList<>();
        for (ResponseKind k : DesignResult.MOTIONS) {
            response.add(compare(capitalised(k.label()), r.motionBefore().get(k), r.motionAfter().get(k),
                    k.dimension()));
        }
        if (!DesignResult.MOTIONS.contains(study.response())) {
            response.add(compare(capitalised(study.response().label()), r.responseBefore(), r.responseAfter(),
                    study.response().dimension()));
        }
        response.add(text("Reduction of the response reduced", r.responseBefore().unbounded()
                ? "from unbounded (undamped resonance) to finite"
                : r.responseAfter().value() == 0.0 ? "complete at the tuned frequency"
                : QuantityFormat.number(r.reductionFactor(), 3) + " times (" + QuantityFormat.number(
                        r.reductionDecibels(), 3) + " dB)"));
        double[] w = r.coupledNaturalFrequencies();
        response.add(new Row("Natural frequencies with absorber", QuantityFormat.number(Unit.HERTZ.fromSi(w[0]), 4)
                + " and " + QuantityFormat.number(Unit.HERTZ.fromSi(w[1]), 4), "Hz"));
        sections.add(new Section(band.isSingle() ? PEAKS_AT_FREQUENCY : PEAKS_IN_BAND, response));
        r.rms().ifPresent(rms -> {
            Dimension d = study.response().dimension();
            // Short labels (they fit the wizard's table); the response is named in the Disturbance section.
            sections.add(new Section(RMS, List.of(
                    new Row("PSD level (one-sided)", QuantityFormat.number(rms.psdLevel(), 4),
                            e.kind() == org.counterpoise.core.model.ExcitationKind.FORCE ? "N^2/Hz" : "(m/s^2)^2/Hz"),
                    quantity("Rms without absorber", rms.before(), d),
                    quantity("Rms with absorber", rms.after(), d),
                    quantity("Rms absorber stroke", rms.stroke(), Dimension.LENGTH))));
        });

        List<Row> robust = new ArrayList<>();
        robust.add(text("Structure natural frequency may be off by", DesignReport.tolerance(r.structureTolerance(), 1)));
        robust.add(text("Absorber natural frequency may be off by", DesignReport.tolerance(r.absorberTolerance(), 1)));
        DetuningAlternative d = r.stiffnessDetuning();
        robust.add(text("Same result by stiffening the structure", alternative(d.raiseFactor(), d.target(), "stiffness")));
        robust.add(text("Same result by softening the structure", alternative(d.lowerFactor(), d.target(), "stiffness")));
        DetuningAlternative md = r.massDetuning();
        robust.add(text("Same result by lightening the structure", alternative(md.raiseFactor(), md.target(), "mass")));
        robust.add(text("Same result by adding mass to the structure", alternative(md.lowerFactor(), md.target(),
                "mass")));
        sections.add(new Section("Robustness (peak in band rising by at most " + percent(DesignResult.TOLERANCE_ALLOWANCE)
                + ") and the alternative", robust));
        if (monteCarlo != null) {
            Dimension rd = study.response().dimension();
            Unit ru = DisplayUnits.of(rd);
            List<Row> mc = new ArrayList<>();
            mc.add(text("Samples (seed)", monteCarlo.samples() + " (seed " + monteCarlo.seed() + ")"));
            mc.add(new Row("Mean peak", QuantityFormat.number(ru.fromSi(monteCarlo.mean()), 4), ru.symbol()));
            mc.add(new Row("P50 / P90", QuantityFormat.number(ru.fromSi(monteCarlo.p50()), 4) + "  /  "
                    + QuantityFormat.number(ru.fromSi(monteCarlo.p90()), 4), ru.symbol()));
            mc.add(new Row("P95 / P99", QuantityFormat.number(ru.fromSi(monteCarlo.p95()), 4) + "  /  "
                    + QuantityFormat.number(ru.fromSi(monteCarlo.p99()), 4), ru.symbol()));
            if (!Double.isNaN(monteCarlo.probabilityExceeding())) {
                mc.add(new Row("Probability above the target", QuantityFormat.number(
                        100 * monteCarlo.probabilityExceeding(), 3), "%"));
            }
            sections.add(new Section("Tolerance Monte Carlo of the peak in band", mc));
        }

        List<String> warnings = r.warnings().stream().map(Warning::text).toList();
        return new SheetContent(study.name(), notes, date, revision, sections, ASSUMPTIONS, warnings,
                Cautions.STANDARD);
    }

    private static String alternative(double factor, double target, String what) {
        if (target == 0.0) {
            return "not possible (the absorber holds the structure still)";
        }
        if (Double.isNaN(factor)) {
            return "not reachable by " + what + " alone";
        }
        double change = 100 * (factor - 1);
        return factor == 1.0 ? "no change needed" : (change > 0 ? "+" : "") + QuantityFormat.number(change, 3)
                + " % " + what;
    }

    private static Row compare(String label, ResponsePeak before, ResponsePeak after, Dimension d) {
        Unit unit = DisplayUnits.of(d);
        return new Row(label, QuantityFormat.number(unit.fromSi(before.value()), 4) + "  /  "
                + QuantityFormat.number(unit.fromSi(after.value()), 4), unit.symbol());
    }

    private static Row quantity(String label, double si, Dimension d) {
        Unit unit = DisplayUnits.of(d);
        return new Row(label, QuantityFormat.number(unit.fromSi(si), QuantityFormat.FIGURES),
                Double.isFinite(si) ? unit.symbol() : "");
    }

    private static Row number(String label, double v, int figures) {
        return new Row(label, QuantityFormat.number(v, figures), "");
    }

    private static Row text(String label, String value) {
        return new Row(label, value, "");
    }

    private static String percent(double fraction) {
        return QuantityFormat.number(100 * fraction, 2) + " %";
    }

    private static String capitalised(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
