package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.RmsFigures;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.robust.MonteCarloOutcome;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.project.Ids;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.ReportRow.Amplitude;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.counterpoise.io.text.ReportValue.Change;
import org.counterpoise.io.text.ReportValue.Changed;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.PeakAt;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Reduction;
import org.counterpoise.io.text.ReportValue.Series;
import org.counterpoise.io.text.ReportValue.Tolerance;
import org.counterpoise.io.text.ReportValue.Unbounded;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * Builds the {@link ReportContent} of a design: the only place that decides what a design report
 * says, in which section, in which words, and which core figure each row shows.
 */
public final class DesignContent {
    private static final String PEAK_SEARCH = "exact peak over the band (docs/peak-search.md)";
    private static final String TOLERANCE_SEARCH = "peak in band searched over frequency factors up to "
            + ValueText.percent(DesignResult.TOLERANCE_SEARCH, 2) + " each side";
    private static final String MEAN_SQUARE = "exact mean square of the response to white noise";

    private final DesignResult result;
    private final DesignStudy study;
    private final List<ReportSection> sections = new ArrayList<>();
    private List<ReportRow> rows;

    private DesignContent(DesignResult result) {
        this.result = result;
        this.study = result.study();
    }

    /**
     * @param r a design
     * @return its report without project identity or Monte Carlo
     */
    public static ReportContent of(DesignResult r) {
        return of(r, ProjectIdentity.EMPTY, Optional.empty());
    }

    /**
     * @param r a design
     * @param identity revision, date, engineer and client or site (each row only when given)
     * @param monteCarlo a tolerance Monte Carlo of the design, when one was run
     * @return the report
     */
    public static ReportContent of(DesignResult r, ProjectIdentity identity, MonteCarloOutcome monteCarlo) {
        return of(r, identity, monteCarlo, UnitSystem.SI);
    }

    /**
     * @param r a design
     * @param identity revision, date, engineer and client or site (each row only when given)
     * @param monteCarlo a tolerance Monte Carlo of the design, when one was run
     * @param units the unit system the report is shown in
     * @return the report
     */
    public static ReportContent of(DesignResult r, ProjectIdentity identity, MonteCarloOutcome monteCarlo,
            UnitSystem units) {
        ReportContent c = of(r, identity, monteCarlo.result(), units);
        if (monteCarlo.notRun().isEmpty()) {
            return c;
        }
        List<ReportSection> sections = new ArrayList<>(c.sections());
        sections.add(new ReportSection(SectionId.MONTE_CARLO, "Tolerance Monte Carlo of the peak in band",
                List.of(MonteCarloRows.notRun(monteCarlo.notRun().get()))));
        return new ReportContent(c.name(), sections, c.warnings(), c.cautions(), c.comparison(), units);
    }

    /**
     * @param reason why the Monte Carlo was not run
     * @return the reason in words, the one place they are written
     */
    public static String notRun(MonteCarloOutcome.NotRun reason) {
        return switch (reason) {
            case NO_TOLERANCES -> "the project gives no tolerances (robustness.tolerances), so every sampled build"
                    + " would be the nominal design";
        };
    }

    /**
     * @param r a design
     * @param identity revision, date, engineer and client or site (each row only when given)
     * @param monteCarlo a tolerance Monte Carlo of the design, when one was run
     * @return the report
     */
    public static ReportContent of(DesignResult r, ProjectIdentity identity, Optional<MonteCarloResult> monteCarlo) {
        return of(r, identity, monteCarlo, UnitSystem.SI);
    }

    /**
     * @param r a design
     * @param identity revision, date, engineer and client or site (each row only when given)
     * @param monteCarlo a tolerance Monte Carlo of the design, when one was run
     * @param units the unit system the report is shown in (the warnings are worded in it)
     * @return the report
     */
    public static ReportContent of(DesignResult r, ProjectIdentity identity, Optional<MonteCarloResult> monteCarlo,
            UnitSystem units) {
        DesignContent c = new DesignContent(r);
        c.project(identity);
        c.structure();
        c.disturbance();
        c.design();
        c.absorber();
        c.response();
        r.rms().ifPresent(c::rms);
        c.strokeAndForces();
        c.tolerance();
        c.alternative();
        monteCarlo.ifPresent(c::monteCarlo);
        List<ReportContent.Note> warnings = r.warnings().stream()
                .map(w -> new ReportContent.Note(w.code(), WarningText.of(w, units))).toList();
        return AcceptanceContent.with(new ReportContent(r.study().name(), c.sections, warnings, Cautions.STANDARD,
                Optional.empty(), units), r.acceptance());
    }

    private void project(ProjectIdentity identity) {
        begin();
        identity(ReportKey.REVISION, "revision", identity.revision());
        identity(ReportKey.DATE, "date", identity.date());
        identity(ReportKey.ENGINEER, "engineer", identity.engineer());
        identity(ReportKey.CLIENT, "client or site", identity.client());
        if (!rows.isEmpty()) {
            end(SectionId.PROJECT, "Project");
        }
    }

    private void identity(ReportKey key, String label, String value) {
        if (!value.isBlank()) {
            add(key, label, "", new Words(value.strip().replaceAll("\\s+", " "), List.of()), "project details", "");
        }
    }

    private void structure() {
        Structure s = study.structure();
        begin();
        add(ReportKey.STRUCTURE_MASS, "effective mass", "m1", quantity(s.effectiveMass(), Dimension.MASS));
        add(ReportKey.STRUCTURE_STIFFNESS, "effective stiffness", "k1",
                quantity(s.effectiveStiffness(), Dimension.STIFFNESS));
        add(ReportKey.STRUCTURE_FREQUENCY, "natural frequency", "", quantity(s.naturalFrequency(), Dimension.FREQUENCY));
        add(ReportKey.STRUCTURE_DAMPING_RATIO, "damping ratio", "\u03b6\u2081",
                quantity(s.dampingRatio(), Dimension.RATIO, 3));
        add(ReportKey.MODE_SHAPE, "mode shape at the absorber", "\u03c6",
                quantity(s.modeShapeAtAbsorber(), Dimension.RATIO, 3));
        if (s.modeShapeAtAbsorber() != 1.0) {
            add(ReportKey.MODAL_MASS, "modal mass", "", quantity(s.modalMass(), Dimension.MASS));
        }
        end(SectionId.STRUCTURE, "Structure (effective values at the absorber point)");
    }

    private void disturbance() {
        Excitation e = study.excitation();
        FrequencyBand band = e.band();
        double wn = study.structure().naturalFrequency();
        begin();
        add(ReportKey.EXCITATION, "kind", "", new Words(e.kind().label(), List.of(Ids.of(e.kind()))));
        add(ReportKey.AMPLITUDE, "amplitude", "", quantity(e.amplitude(), e.kind().amplitudeDimension()));
        add(ReportKey.FORCING, band.isSingle() ? "forcing frequency" : "forcing band", "",
                new Pair(quantity(band.low(), Dimension.FREQUENCY), quantity(band.high(), Dimension.FREQUENCY),
                        PairKind.RANGE));
        add(ReportKey.FREQUENCY_RATIO, "forcing / natural frequency", "",
                new Pair(quantity(band.low() / wn, Dimension.RATIO), quantity(band.high() / wn, Dimension.RATIO),
                        PairKind.RANGE));
        end(SectionId.DISTURBANCE, "Disturbance");
    }

    private void design() {
        String method = result.methodSource();
        begin();
        add(ReportKey.METHOD, "method", "", new Words(study.method().id() + " (" + study.method().description() + ")",
                List.of(study.method().id())));
        add(ReportKey.METHOD_SOURCE, "source", "", new Words(method, List.of()));
        add(ReportKey.METHOD_NOTE, "note", "", new Words(result.methodNote(), List.of()));
        ResponseKind k = study.response();
        add(ReportKey.RESPONSE, "response reduced", "",
                new Words(k.label(), List.of(Ids.of(k), k.dimension().siSymbol())));
        add(ReportKey.MASS_RATIO, "mass ratio", "\u03bc", quantity(result.tuning().massRatio(), Dimension.RATIO));
        add(ReportKey.TUNING_RATIO, "tuning ratio", "f", quantity(result.tuning().tuningRatio(), Dimension.RATIO),
                method, "");
        add(ReportKey.ABSORBER_DAMPING_RATIO, "absorber damping ratio", "\u03b6a",
                quantity(result.tuning().dampingRatio(), Dimension.RATIO), method, "");
        end(SectionId.DESIGN, "Design");
    }

    private void absorber() {
        begin();
        add(ReportKey.ABSORBER_MASS, "absorber mass", "m2", quantity(result.absorber().mass(), Dimension.MASS));
        add(ReportKey.ABSORBER_STIFFNESS, "spring rate", "k2",
                quantity(result.absorber().stiffness(), Dimension.STIFFNESS));
        add(ReportKey.ABSORBER_DAMPING, "damping coefficient", "c2",
                quantity(result.absorber().damping(), Dimension.DAMPING_COEFFICIENT));
        add(ReportKey.ABSORBER_FREQUENCY, "absorber natural frequency", "",
                quantity(result.absorber().naturalFrequency(), Dimension.FREQUENCY));
        add(ReportKey.STATIC_DEFLECTION, "static deflection of the spring", "", quantity(result.staticDeflection().orElse(Double.NaN), Dimension.LENGTH));
        List<Double> coupled = new ArrayList<>();
        for (double w : result.coupledNaturalFrequencies()) {
            coupled.add(w);
        }
        add(ReportKey.COUPLED_FREQUENCIES, "undamped frequencies with absorber", "",
                new Series(coupled, Dimension.FREQUENCY), "undamped two-mass system",
                "the machine passes through the lower one when it starts and stops");
        end(SectionId.ABSORBER, "Absorber to build");
    }

    private void response() {
        begin();
        for (ResponseKind k : DesignResult.MOTIONS) {
            add(motionKey(k), k.label(), "", beforeAfter(result.motionBefore().get(k), result.motionAfter().get(k),
                    k.dimension()), PEAK_SEARCH, "");
        }
        ResponseKind k = study.response();
        if (!DesignResult.MOTIONS.contains(k)) {
            add(ReportKey.RESPONSE_PEAKS, k.label(), "", beforeAfter(result.responseBefore(), result.responseAfter(),
                    k.dimension()), PEAK_SEARCH, "");
        }
        add(ReportKey.REDUCTION, "reduction of " + k.label().replace("structure ", ""), "",
                new Reduction(peak(result.responseBefore(), k.dimension()), peak(result.responseAfter(), k.dimension()),
                        result.reductionFactor(), result.reductionDecibels()), PEAK_SEARCH, "");
        rows.replaceAll(r -> stated(r, Amplitude.DISPLAY));
        rows.add(0, ReportContent.conventionRow(AmplitudeConvention.PEAK));
        end(SectionId.RESPONSE, study.excitation().band().isSingle() ? "Structure response at the forcing frequency"
                : "Structure response, worst case in the band");
    }

    private void rms(RmsFigures rms) {
        Dimension d = study.response().dimension();
        String diverges = "undamped structure: the mean square diverges";
        begin();
        add(ReportKey.SPECTRUM, "spectrum", "", new Words("white noise", List.of("white-noise")));
        add(ReportKey.PSD_LEVEL, "PSD level (one-sided)", "", new Level(rms.psdLevel(), 4,
                study.excitation().kind() == ExcitationKind.FORCE ? "N^2/Hz" : "(m/s^2)^2/Hz"));
        add(ReportKey.RMS_BEFORE, "without absorber", "", quantity(rms.before(), d, diverges), MEAN_SQUARE, "");
        add(ReportKey.RMS_AFTER, "with absorber", "", quantity(rms.after(), d, diverges), MEAN_SQUARE, "");
        add(ReportKey.RMS_STROKE, "absorber stroke", "", quantity(rms.stroke(), Dimension.LENGTH, diverges),
                MEAN_SQUARE, "");
        rows.replaceAll(r -> r.key() == ReportKey.SPECTRUM || r.key() == ReportKey.PSD_LEVEL ? r
                : stated(r, Amplitude.FIXED_RMS));
        end(SectionId.RMS, "Rms response to the white-noise disturbance");
    }

    private void strokeAndForces() {
        begin();
        add(ReportKey.STROKE, "absorber stroke in band", "", peak(result.strokeInBand(), Dimension.LENGTH), PEAK_SEARCH,
                "");
        add(ReportKey.STROKE_RUN_UP, "absorber stroke during run-up", "",
                new PeakAt(peak(result.strokeRunUp(), Dimension.LENGTH), result.strokeRunUp().frequency()),
                "steady-state peak from rest to the top of the band",
                "start-up, run-down and resonance transits can exceed it (the runup command integrates them)");
        add(ReportKey.CLEARANCE, "clearance to leave (x" + QuantityFormat.number(study.strokeMargin(), 3) + ")", "",
                quantity(result.clearance(), Dimension.LENGTH), "stroke margin times the larger stroke",
                "provide stroke stops at this clearance");
        add(ReportKey.SPRING_FORCE, "spring force in band", "", peak(result.springForce(), Dimension.FORCE),
                PEAK_SEARCH, "check the spring and its fixings for fatigue at this force");
        add(ReportKey.DAMPER_FORCE, "damper force in band", "", peak(result.damperForce(), Dimension.FORCE),
                PEAK_SEARCH, "");
        add(ReportKey.ABSORBER_FORCE, "total absorber force in band", "", peak(result.absorberForce(), Dimension.FORCE),
                PEAK_SEARCH, "");
        // peaks stay peaks: a clearance and a fatigue check need the largest excursion and force
        rows.replaceAll(r -> r.key() == ReportKey.CLEARANCE ? r : stated(r, Amplitude.FIXED_PEAK));
        end(SectionId.STROKE_AND_FORCES, "Stroke and forces");
    }

    private void tolerance() {
        begin();
        add(ReportKey.TOLERANCE_ALLOWANCE, "allowed rise of the peak in band", "",
                new Percent(DesignResult.TOLERANCE_ALLOWANCE, 2), "a design choice", "");
        add(ReportKey.TOLERATED_STRUCTURE_FREQUENCY, "structure frequency may be off by", "",
                new Tolerance(result.structureTolerance(), 1), TOLERANCE_SEARCH, "");
        add(ReportKey.TOLERATED_ABSORBER_FREQUENCY, "absorber frequency may be off by", "",
                new Tolerance(result.absorberTolerance(), 1), TOLERANCE_SEARCH, "");
        add(ReportKey.TOLERATED_SPRING_RATE, "absorber spring rate may be off by", "",
                new Tolerance(result.absorberTolerance(), 2), TOLERANCE_SEARCH, "");
        rows.addAll(ToleranceRangeRows.of(study.robustness().ranges()));
        end(SectionId.TOLERANCE, "Tolerance to mistuning");
    }

    private void alternative() {
        DetuningAlternative d = result.stiffnessDetuning();
        DetuningAlternative m = result.massDetuning();
        double wn = study.structure().naturalFrequency();
        boolean zero = d.target() == 0.0;
        begin();
        add(ReportKey.DETUNING_TARGET, "target (what the absorber achieves)", "",
                quantity(d.target(), study.response().dimension()));
        rows.set(0, stated(rows.get(0), Amplitude.DISPLAY));
        // an unbounded target (the design's own peak is unbounded) is no level to compare a structure with
        boolean unbounded = Double.isInfinite(d.target());
        add(ReportKey.STIFFER, "stiffer", "", unbounded ? new NotApplicable()
                : change(d.raiseFactor().orElse(Double.NaN), Changed.STIFFNESS, wn, zero));
        add(ReportKey.SOFTER, "softer", "", unbounded ? new NotApplicable()
                : change(d.lowerFactor().orElse(Double.NaN), Changed.STIFFNESS, wn, zero));
        add(ReportKey.LIGHTER, "lighter", "", unbounded ? new NotApplicable()
                : change(m.raiseFactor().orElse(Double.NaN), Changed.MASS, wn, zero));
        add(ReportKey.HEAVIER, "heavier", "", unbounded ? new NotApplicable()
                : change(m.lowerFactor().orElse(Double.NaN), Changed.MASS, wn, zero));
        end(SectionId.ALTERNATIVE, "Alternative: change the structure itself instead");
    }

    private void monteCarlo(MonteCarloResult mc) {
        begin();
        rows.addAll(MonteCarloRows.of(mc, study.response().dimension()));
        end(SectionId.MONTE_CARLO, "Tolerance Monte Carlo of the peak in band");
    }

    /**
     * @param factor new over old stiffness or mass, or NaN
     * @param what stiffness (frequency goes as its square root) or mass (as its inverse square root)
     */
    /** The row with its values stated as amplitudes in a convention. */
    static ReportRow stated(ReportRow r, Amplitude a) {
        return new ReportRow(r.key(), r.label(), r.symbol(), r.value(), r.source(), r.caution(), Optional.of(a));
    }

    private static Change change(double factor, Changed what, double wn, boolean targetIsZero) {
        double power = what == Changed.STIFFNESS ? 0.5 : -0.5;
        return new Change(factor, what, wn * Math.pow(factor, power), targetIsZero);
    }

    private static ReportKey motionKey(ResponseKind k) {
        return switch (k) {
            case DISPLACEMENT -> ReportKey.DISPLACEMENT_PEAKS;
            case VELOCITY -> ReportKey.VELOCITY_PEAKS;
            case ACCELERATION -> ReportKey.ACCELERATION_PEAKS;
            default -> throw new IllegalArgumentException("bug: " + k + " is not one of the reported motions");
        };
    }

    private static Pair beforeAfter(ResponsePeak before, ResponsePeak after, Dimension d) {
        return new Pair(peak(before, d), peak(after, d), PairKind.BEFORE_AFTER);
    }

    private static ReportValue peak(ResponsePeak p, Dimension d) {
        return quantity(p.value(), d);
    }

    static ReportValue quantity(double si, Dimension d) {
        return quantity(si, d, QuantityFormat.FIGURES);
    }

    private static ReportValue quantity(double si, Dimension d, int figures) {
        if (Double.isNaN(si)) {
            return new NotApplicable();
        }
        return Double.isInfinite(si) ? new Unbounded(d, "") : new Quantity(si, d, figures);
    }

    private static ReportValue quantity(double si, Dimension d, String whyUnbounded) {
        return Double.isInfinite(si) ? new Unbounded(d, whyUnbounded) : quantity(si, d);
    }

    private void begin() {
        rows = new ArrayList<>();
    }

    private void add(ReportKey key, String label, String symbol, ReportValue value) {
        add(key, label, symbol, value, "", "");
    }

    private void add(ReportKey key, String label, String symbol, ReportValue value, String source, String caution) {
        rows.add(new ReportRow(key, label, symbol, value, source, caution));
    }

    private void end(SectionId id, String title) {
        sections.add(new ReportSection(id, title, rows));
    }
}
