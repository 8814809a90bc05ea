package org.counterpoise.ui.gui.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.Size;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.statistics.StatisticsReport;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.Revision;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.SignOff;
import org.counterpoise.io.project.Signature;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.cli.Cli;
import org.counterpoise.ui.gui.action.FileActions;

/**
 * Random sequences of the edits the wizard's views make (the same {@link ProjectEdits} factories,
 * applied to a {@link DesignDocument} without any window), then the wizard's save rule. A project
 * the wizard agrees to save must reopen equal and be accepted by every command (design,
 * robustness, sheet: exit 0); a project it refuses must be refused by the design command too, so
 * the wizard never refuses what the tool can do nor writes what the tool cannot read. Undo of the
 * whole sequence gives back the starting project, and Redo the final one.
 */
class DesignDocumentPropertyTest {

    @Property(tries = 25)
    @StatisticsReport(onFailureOnly = false)
    void everySavedProjectReopensEqualAndEveryCommandAcceptsIt(@ForAll("edits") @Size(min = 1, max = 10) List<Edit> edits)
            throws Exception {
        // Most sequences must end in a project that saves, or the property would test little.
        Statistics.coverage(c -> c.check("saved").percentage(p -> p > 40));
        Project start = FileActions.untitled();
        DesignDocument doc = new DesignDocument(start);
        for (Edit e : edits) {
            doc.apply(e);
            doc.seal();
            Project p = doc.project();
            // The rule the robustness step relies on: its target is always in the response's quantity.
            if (p.robustness() != null && p.robustness().target() != null) {
                assertEquals(p.absorber().response().dimension(), p.robustness().target().unit().dimension());
            }
        }
        Project edited = doc.project();
        Path dir = Files.createTempDirectory("counterpoise-property");
        Path file = dir.resolve("edited project.json");
        String json;
        try {
            json = ProjectCheck.reopenable(edited);
        } catch (InvalidInputException refused) {
            // The wizard refuses to save it, with a plain message; the command refuses it as well.
            assertFalse(refused.getMessage().contains("Exception"), refused.getMessage());
            Files.writeString(file, ProjectWriter.toJson(edited));
            assertEquals(Cli.BAD_INPUT, run("design", file.toString()), "design agrees with the refusal: "
                    + refused.getMessage());
            Statistics.collect("refused by the wizard and by design");
            return;
        }
        ProjectWriter.writeAtomically(file, json);
        Statistics.collect("saved");
        Statistics.label("saved disturbance").collect(edited.disturbance().spectrum() != null ? "white noise" : "harmonic",
                edited.disturbance().runUpRate() != null ? "run-up rate" : "no run-up rate");
        assertEquals(edited, ProjectReader.read(file).project(), "reopens equal");
        System.setProperty("counterpoise.test.project", json);
        assertEquals(0, run("design", file.toString()));
        assertEquals(0, run("robustness", file.toString()));
        assertEquals(0, run("sheet", file.toString(), "-o", dir.resolve("sheet.pdf").toString()));
        assertTrue(Files.size(dir.resolve("sheet.pdf")) > 1000);
        // Undo everything, then redo everything.
        while (doc.undo()) {
            assertTrue(doc.project() != null);
        }
        assertEquals(new DesignDocument(start).project(), doc.project());
        while (doc.redo()) {
            assertTrue(doc.project() != null);
        }
        assertEquals(edited, doc.project());
    }

    private static int run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.run(args, new PrintWriter(out), new PrintWriter(err));
        if (code != 0 && code != Cli.BAD_INPUT) {
            throw new AssertionError(String.join(" ", args) + " exited " + code + ": " + err + "\nproject:\n"
                    + System.getProperty("counterpoise.test.project"));
        }
        if (code == Cli.BAD_INPUT) {
            System.out.println("refused: " + String.join(" ", args) + ": " + err);
        }
        return code;
    }

    @Provide
    Arbitrary<List<Edit>> edits() {
        return Arbitraries.oneOf(structure(), disturbance(), spectrum(), absorber(), robustness(), identity(),
                hardware(), units()).list();
    }

    /**
     * The disturbance step's spectrum choice on its own: broadband (white noise of a level in a unit
     * of the kind's quantity) or harmonic, the rest of the disturbance as it is.
     */
    private Arbitrary<Edit> spectrum() {
        Arbitrary<Double> level = Arbitraries.doubles().between(1e-3, 1e3).ofScale(6).map(DesignDocumentPropertyTest::round);
        Arbitrary<Boolean> white = Arbitraries.of(true, true, false);
        Arbitrary<Integer> unit = Arbitraries.integers().between(0, 1);
        return Combinators.combine(white, level, unit).as((w, g0, u) -> new Edit("disturbance.spectrum", "disturbance",
                p -> {
                    List<org.counterpoise.core.units.SpectralDensityUnit> units = java.util.Arrays.stream(
                            org.counterpoise.core.units.SpectralDensityUnit.values())
                            .filter(x -> x.of() == p.disturbance().kind().amplitudeDimension()).toList();
                    // The wizard offers no PSD unit for an unbalance or a base displacement: it stays harmonic.
                    org.counterpoise.io.project.SpectrumInput sp = w && !units.isEmpty()
                            ? org.counterpoise.io.project.SpectrumInput.whiteNoise(g0, units.get(u % units.size()))
                            : null;
                    return ProjectEdits.disturbance("disturbance.spectrum", p.disturbance().withSpectrum(sp)).change()
                            .apply(p);
                }));
    }

    private static Arbitrary<QuantityInput> quantity(double lowSi, double highSi, Unit... units) {
        return Combinators.combine(Arbitraries.doubles().between(0, 1).ofScale(4), Arbitraries.of(units)).as((t, u) ->
                new QuantityInput(round(u.fromSi(lowSi * Math.pow(highSi / lowSi, t))), u));
    }

    /** Four significant figures, as people type them. */
    private static double round(double v) {
        return Double.parseDouble(String.format(java.util.Locale.ROOT, "%.4g", v));
    }

    private Arbitrary<Edit> structure() {
        Arbitrary<QuantityInput> mass = quantity(50, 50_000, Unit.KILOGRAM, Unit.TONNE);
        Arbitrary<Integer> form = Arbitraries.integers().between(0, 2);
        Arbitrary<QuantityInput> frequency = quantity(2 * Math.PI * 3, 2 * Math.PI * 60, Unit.HERTZ,
                Unit.REV_PER_MINUTE);
        Arbitrary<DampingInput> damping = Arbitraries.oneOf(
                // Zero structural damping is left out while the sheet's chart of an undamped structure
                // fails (issue 10, "no crash on valid input"; seed -5050358608957306957 found it here).
                Arbitraries.doubles().between(0.002, 0.1).ofScale(4).map(z -> DampingInput.ratio(round(z))),
                Arbitraries.doubles().between(0.005, 0.2).ofScale(4).map(eta -> new DampingInput(DampingInput.Measure.LOSS_FACTOR,
                        round(eta), null)),
                Arbitraries.doubles().between(5, 100).ofScale(4).map(q -> new DampingInput(DampingInput.Measure.Q_FACTOR,
                        round(q), null)));
        Arbitrary<Double> shape = Arbitraries.of(1.0, 0.8, 0.5);
        return Combinators.combine(mass, form, frequency, damping, shape).as((m, f, w, d, phi) -> {
            double k = m.si() * w.si() * w.si();
            QuantityInput stiffness = new QuantityInput(round(Unit.KILONEWTON_PER_METRE.fromSi(k)),
                    Unit.KILONEWTON_PER_METRE);
            QuantityInput deflection = new QuantityInput(round(Unit.MILLIMETRE.fromSi(9.80665 / (w.si() * w.si()))),
                    Unit.MILLIMETRE);
            StructureInput s = new StructureInput(m, null, f == 0 ? stiffness : null, f == 1 ? w : null,
                    f == 2 ? deflection : null, d, phi);
            return ProjectEdits.structure("structure.mass", s);
        });
    }

    private Arbitrary<Edit> disturbance() {
        Arbitrary<ExcitationKind> kind = Arbitraries.of(ExcitationKind.values());
        Arbitrary<Double> low = Arbitraries.doubles().between(300, 3000).ofScale(4).map(DesignDocumentPropertyTest::round);
        Arbitrary<Double> width = Arbitraries.of(0.0, 0.05, 0.2);
        Arbitrary<Boolean> band = Arbitraries.of(true, false);
        Arbitrary<Integer> order = Arbitraries.integers().between(1, 3);
        // The run-up rate is optional: absent, or a rate in any unit the wizard offers.
        Arbitrary<QuantityInput> runUp = Arbitraries.oneOf(Arbitraries.just(null), quantity(0.2, 20,
                org.counterpoise.io.text.UnitChoices.of(org.counterpoise.core.units.Dimension.ANGULAR_ACCELERATION)
                        .toArray(new Unit[0])));
        // Harmonic (no spectrum) twice as often as white noise; the level in any unit of the kind's quantity.
        Arbitrary<Double> psdLevel = Arbitraries.doubles().between(1e-3, 1e3).ofScale(6).map(DesignDocumentPropertyTest::round);
        Arbitrary<Integer> spectrum = Arbitraries.integers().between(0, 2);
        return Combinators.combine(kind, low, width, band, order, runUp, spectrum, psdLevel).as(
                (k, lo, wd, b, h, rate, sp, g0) -> {
            QuantityInput amplitude = switch (k) {
                case FORCE -> new QuantityInput(500, Unit.NEWTON);
                case UNBALANCE -> new QuantityInput(20_000, Unit.GRAM_MILLIMETRE);
                case BASE_DISPLACEMENT -> new QuantityInput(0.1, Unit.MILLIMETRE);
                case BASE_ACCELERATION -> new QuantityInput(0.5, Unit.METRE_PER_SECOND_SQUARED);
            };
            DisturbanceInput d = b ? new DisturbanceInput(k, amplitude, null, lo, round(lo * (1 + wd)),
                    Unit.REV_PER_MINUTE, h)
                    : new DisturbanceInput(k, amplitude, new QuantityInput(lo, Unit.REV_PER_MINUTE), Double.NaN,
                            Double.NaN, null, h);
            List<org.counterpoise.core.units.SpectralDensityUnit> psdUnits = java.util.Arrays.stream(
                    org.counterpoise.core.units.SpectralDensityUnit.values()).filter(u -> u.of() == k.amplitudeDimension())
                    .toList();
            if (sp == 2 && !psdUnits.isEmpty()) {
                d = d.withSpectrum(org.counterpoise.io.project.SpectrumInput.whiteNoise(g0,
                        psdUnits.get(lo.intValue() % psdUnits.size())));
            }
            return ProjectEdits.disturbance("disturbance.kind", d.withRunUpRate(rate));
        });
    }

    private Arbitrary<Edit> absorber() {
        Arbitrary<Double> ratio = Arbitraries.doubles().between(0.01, 0.2).ofScale(4).map(DesignDocumentPropertyTest::round);
        Arbitrary<DesignMethod> method = Arbitraries.of(DesignMethod.EQUAL_PEAK, DesignMethod.EXACT_PEAK, DesignMethod.EXACT_PEAK,
                DesignMethod.UNDAMPED_SINGLE_SPEED, DesignMethod.MINIMUM_VARIANCE, DesignMethod.MINIMUM_VARIANCE);
        Arbitrary<ResponseKind> response = Arbitraries.of(Project.DESIGN_RESPONSES);
        Arbitrary<Boolean> hangs = Arbitraries.of(true, false);
        Arbitrary<Double> margin = Arbitraries.of(1.2, 1.5, 2.0);
        return Combinators.combine(ratio, method, response, hangs, margin).as((mu, m, r, h, s) ->
                ProjectEdits.absorber("absorber.response", new AbsorberInput(OptionalDouble.of(mu), null, m, r, h, s)));
    }

    private Arbitrary<Edit> robustness() {
        Arbitrary<Double> structure = Arbitraries.doubles().between(0, 20).ofScale(4).map(DesignDocumentPropertyTest::round);
        Arbitrary<Double> absorber = Arbitraries.doubles().between(0, 10).ofScale(4).map(DesignDocumentPropertyTest::round);
        Arbitrary<Boolean> withTarget = Arbitraries.of(true, false);
        Arbitrary<Integer> samples = Arbitraries.integers().between(50, 400);
        Arbitrary<RobustnessInput.ToleranceInput> tolerance = Arbitraries.oneOf(Arbitraries.just(null),
                Combinators.combine(Arbitraries.of("uniform", "normal"), Arbitraries.doubles().between(0.5, 15).ofScale(4))
                        .as((d, pc) -> new RobustnessInput.ToleranceInput(d, round(pc), null)));
        return Combinators.combine(structure, absorber, withTarget, samples, tolerance, tolerance).as(
                (s, a, t, n, t1, t2) -> new Edit("robustness.target", "robustness", p -> {
                    // The robustness step offers the target in the units of the response now chosen.
                    QuantityInput target = t ? new QuantityInput(1, org.counterpoise.io.text.DisplayUnits.of(
                            p.absorber().response().dimension())) : null;
                    // The ranges are edited on the goal step, the rest on the robustness step.
                    Project ranged = ProjectEdits.ranges("robustness.structure_mistuning",
                            RobustnessInput.Ranges.ofFrequencies(s, a)).change().apply(p);
                    return ProjectEdits.robustness("robustness.target", new RobustnessInput(RobustnessInput.Ranges.NONE,
                            target, n, 7, t1, null, null, t2, null)).change().apply(ranged);
                }));
    }

    private Arbitrary<Edit> identity() {
        Arbitrary<String> text = Arbitraries.oneOf(Arbitraries.just(""), Arbitraries.strings().ofMaxLength(30),
                Arbitraries.of("Bj\u00f8rk \"quoted\" \\ slash", "line one\nline two", "\u00e9t\u00e9 \u2013 site 4"));
        Arbitrary<String> date = Arbitraries.of("", "2026-12-03", "2024-02-29");
        Arbitrary<List<Revision>> history = Combinators.combine(text, date, text).as((what, d, by) ->
                new Revision("A", d, what, by)).list().ofMaxSize(3);
        Arbitrary<SignOff> signOff = Combinators.combine(text, date, text).as((a, d, b) ->
                new SignOff(new Signature(a, d), Signature.BLANK, new Signature(b, "")));
        return Combinators.combine(text, text, text, text, date, text, history, signOff).as(
                (name, notes, eng, client, d, number, revisions, signed) -> ProjectEdits.identity("project.name",
                        name.strip(), notes, new ProjectIdentity("B", eng, client, d, number, revisions, signed)));
    }

    /** The hardware step's edits: every spring and damper pair its lists offer, and the numbers in range. */
    private Arbitrary<Edit> hardware() {
        Arbitrary<Boolean> elastomer = Arbitraries.of(true, false);
        Arbitrary<DamperKind> helicalDamper = Arbitraries.of(DamperKind.VISCOUS_DASHPOT, DamperKind.EDDY_CURRENT);
        Arbitrary<SpringMaterial> material = Arbitraries.of(SpringMaterial.values());
        // any count: a horizontal absorber's springs stand in opposed pairs, and an odd count for it is
        // sized as the next even one with a warning (SpringSizingTest)
        Arbitrary<Integer> count = Arbitraries.integers().between(0, HardwareChoice.MOST_SPRINGS);
        Arbitrary<EddyCurrentChoice> eddy = Combinators.combine(Arbitraries.of(Conductor.values()),
                Arbitraries.of(0.3, 0.5, 1.0), Arbitraries.of(0.002, 0.005, 0.01)).as(EddyCurrentChoice::new);
        Arbitrary<ElastomerChoice> compound = Combinators.combine(Arbitraries.of(1.1, 1.4, 2.0),
                Arbitraries.of(0.05, 0.1, 0.3)).as(ElastomerChoice::new);
        Arbitrary<Double> hours = Arbitraries.of(1000.0, 50_000.0, 200_000.0);
        Arbitrary<Double> fraction = Arbitraries.of(0.005, 0.01, 0.02);
        return Combinators.combine(elastomer, helicalDamper, material, count, eddy, compound, hours, fraction).as(
                (e, d, m, n, ec, el, h, f) -> ProjectEdits.hardware("hardware.spring", new HardwareChoice(
                        e ? SpringKind.ELASTOMER : SpringKind.HELICAL_COMPRESSION, m, n,
                        e ? DamperKind.ELASTOMER_LOSS : d, ec, el, h, f, f)));
    }

    private Arbitrary<Edit> units() {
        return Arbitraries.of(UnitSystem.values()).map(u -> ProjectEdits.displayUnits("display.units", u));
    }
}
