package org.counterpoise.io.text;

import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.progress.ProgressListener;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.RmsFigures;
import org.counterpoise.core.design.RobustnessAnalysis;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.robust.MonteCarloResult;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.export.RobustnessJson;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.sheet.SheetContent;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.text.ReportValue.Change;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Factor;
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
import org.counterpoise.testing.Scenarios;
import org.junit.jupiter.api.Named;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The one report model against the core result it is built from, and its renderers against each
 * other: every row's numbers are the core figures named in {@link #core} (an independent mapping
 * written here, field by field), and the same row shows the same value in the text report, the
 * design JSON and the sheet's tables. Cases: every preset, each preset with an undamped structure
 * (unbounded peaks), and an invented white-noise scenario (rms rows), with project identity and a
 * Monte Carlo where the project has tolerances.
 */
class ReportContentTest {
    /** The Monte Carlo rows are on the design's sheet, and in the robustness study; not in the design report. */
    private static final Set<ReportKey> MONTE_CARLO_ROWS = Set.of(ReportKey.MONTE_CARLO_SAMPLES,
            ReportKey.MONTE_CARLO_SEED, ReportKey.MONTE_CARLO_MEAN, ReportKey.MONTE_CARLO_P50_P90,
            ReportKey.MONTE_CARLO_P95_P99, ReportKey.MONTE_CARLO_RANGE, ReportKey.MONTE_CARLO_EXCEEDING);
    private static final ProjectIdentity IDENTITY = new ProjectIdentity("C", "R. Aberg", "Plant  4", "2026-11-30");

    /**
     * The verdict's rows: the JSON nests them in the object "acceptance" and their figures are the
     * verdict's own; AcceptanceReportTest checks them against hand-made and real verdicts.
     */
    private static final Set<ReportKey> VERDICT_ROWS = Stream.of(ReportKey.values())
            .filter(k -> k.name().startsWith("ACCEPTANCE")).collect(Collectors.toSet());

    static Stream<Named<DesignResult>> designs() throws IOException {
        List<Named<DesignResult>> out = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("presets"))) {
            for (Path preset : files.filter(p -> p.toString().endsWith(".json")).sorted().toList()) {
                String name = preset.getFileName().toString();
                out.add(Named.of(name, Designer.design(ProjectReader.read(preset).project().toStudy())));
                String undamped = Files.readString(preset).replaceAll("\"(ratio|loss_factor)\": [0-9.]+", "\"ratio\": 0");
                try {
                    out.add(Named.of(name + " undamped", Designer.design(
                            ProjectReader.read(new StringReader(undamped)).project().toStudy())));
                } catch (InvalidInputException refused) {
                    // a method that needs structure damping refuses the variant; the others cover it
                }
            }
        }
        out.add(Named.of("white noise", Designer.design(whiteNoiseProject().toStudy())));
        return out.stream();
    }

    /** An invented scenario: the first preset's structure under a white-noise force, minimum-variance design. */
    private static Project whiteNoiseProject() {
        return Scenarios.whiteNoiseProject();
    }

    /**
     * The core figures each numeric row shows, in the order of its value, written here from the
     * design result's own fields (not through the report code).
     */
    private static Map<ReportKey, List<Double>> core(DesignResult r, Optional<MonteCarloResult> mc) {
        Structure s = r.study().structure();
        var e = r.study().excitation();
        double wn = s.naturalFrequency();
        Map<ReportKey, List<Double>> m = new EnumMap<>(ReportKey.class);
        m.put(ReportKey.STRUCTURE_MASS, List.of(s.effectiveMass()));
        m.put(ReportKey.STRUCTURE_STIFFNESS, List.of(s.effectiveStiffness()));
        m.put(ReportKey.STRUCTURE_FREQUENCY, List.of(wn));
        m.put(ReportKey.STRUCTURE_DAMPING_RATIO, List.of(s.dampingRatio()));
        m.put(ReportKey.MODE_SHAPE, List.of(s.modeShapeAtAbsorber()));
        m.put(ReportKey.MODAL_MASS, List.of(s.modalMass()));
        m.put(ReportKey.AMPLITUDE, List.of(e.amplitude()));
        m.put(ReportKey.FORCING, List.of(e.band().low(), e.band().high()));
        m.put(ReportKey.FREQUENCY_RATIO, List.of(e.band().low() / wn, e.band().high() / wn));
        m.put(ReportKey.MASS_RATIO, List.of(r.tuning().massRatio()));
        m.put(ReportKey.TUNING_RATIO, List.of(r.tuning().tuningRatio()));
        m.put(ReportKey.ABSORBER_DAMPING_RATIO, List.of(r.tuning().dampingRatio()));
        m.put(ReportKey.ABSORBER_MASS, List.of(r.absorber().mass()));
        m.put(ReportKey.ABSORBER_STIFFNESS, List.of(r.absorber().stiffness()));
        m.put(ReportKey.ABSORBER_DAMPING, List.of(r.absorber().damping()));
        m.put(ReportKey.ABSORBER_FREQUENCY, List.of(r.absorber().naturalFrequency()));
        m.put(ReportKey.STATIC_DEFLECTION, List.of(r.staticDeflection().orElse(Double.NaN)));
        double[] w = r.coupledNaturalFrequencies();
        m.put(ReportKey.COUPLED_FREQUENCIES, List.of(w[0], w[1]));
        m.put(ReportKey.DISPLACEMENT_PEAKS, peaks(r, ResponseKind.DISPLACEMENT));
        m.put(ReportKey.VELOCITY_PEAKS, peaks(r, ResponseKind.VELOCITY));
        m.put(ReportKey.ACCELERATION_PEAKS, peaks(r, ResponseKind.ACCELERATION));
        m.put(ReportKey.RESPONSE_PEAKS, List.of(r.responseBefore().value(), r.responseAfter().value()));
        m.put(ReportKey.REDUCTION, List.of(r.responseBefore().value(), r.responseAfter().value(),
                r.responseBefore().value() / r.responseAfter().value()));
        m.put(ReportKey.STROKE, List.of(r.strokeInBand().value()));
        m.put(ReportKey.STROKE_RUN_UP, List.of(r.strokeRunUp().value()));
        m.put(ReportKey.CLEARANCE, List.of(r.clearance()));
        m.put(ReportKey.SPRING_FORCE, List.of(r.springForce().value()));
        m.put(ReportKey.DAMPER_FORCE, List.of(r.damperForce().value()));
        m.put(ReportKey.ABSORBER_FORCE, List.of(r.absorberForce().value()));
        r.rms().ifPresent(rms -> rms(m, rms));
        m.put(ReportKey.TOLERANCE_ALLOWANCE, List.of(DesignResult.TOLERANCE_ALLOWANCE));
        ranges(m, r.study().robustness());
        m.put(ReportKey.TOLERATED_STRUCTURE_FREQUENCY, List.of(r.structureTolerance().low().orElse(Double.NaN),
                r.structureTolerance().high().orElse(Double.NaN)));
        m.put(ReportKey.TOLERATED_ABSORBER_FREQUENCY, List.of(r.absorberTolerance().low().orElse(Double.NaN), r.absorberTolerance().high().orElse(Double.NaN)));
        m.put(ReportKey.TOLERATED_SPRING_RATE, List.of(r.absorberTolerance().low().orElse(Double.NaN), r.absorberTolerance().high().orElse(Double.NaN)));
        m.put(ReportKey.DETUNING_TARGET, List.of(r.stiffnessDetuning().target()));
        m.put(ReportKey.STIFFER, List.of(r.stiffnessDetuning().raiseFactor().orElse(Double.NaN)));
        m.put(ReportKey.SOFTER, List.of(r.stiffnessDetuning().lowerFactor().orElse(Double.NaN)));
        m.put(ReportKey.LIGHTER, List.of(r.massDetuning().raiseFactor().orElse(Double.NaN)));
        m.put(ReportKey.HEAVIER, List.of(r.massDetuning().lowerFactor().orElse(Double.NaN)));
        mc.ifPresent(c -> monteCarlo(m, c));
        return m;
    }

    private static void monteCarlo(Map<ReportKey, List<Double>> m, MonteCarloResult c) {
        m.put(ReportKey.MONTE_CARLO_SAMPLES, List.of((double) c.samples()));
        m.put(ReportKey.MONTE_CARLO_SEED, List.of((double) c.seed()));
        m.put(ReportKey.MONTE_CARLO_MEAN, List.of(c.mean()));
        m.put(ReportKey.MONTE_CARLO_P50_P90, List.of(c.p50(), c.p90()));
        m.put(ReportKey.MONTE_CARLO_P95_P99, List.of(c.p95(), c.p99()));
        m.put(ReportKey.MONTE_CARLO_RANGE, List.of(c.min(), c.max()));
        m.put(ReportKey.MONTE_CARLO_EXCEEDING, List.of(c.probabilityExceeding().orElse(Double.NaN)));
    }

    /** The core figures of a robustness study's rows, from its result's own fields. */
    private static Map<ReportKey, List<Double>> core(DesignResult design, RobustnessResult r) {
        Map<ReportKey, List<Double>> m = new EnumMap<>(ReportKey.class);
        ranges(m, r.settings());
        m.put(ReportKey.TARGET, List.of(r.settings().target().orElse(Double.NaN)));
        m.put(ReportKey.NOMINAL_PEAK, List.of(design.responseAfter().value()));
        m.put(ReportKey.WORST_CASE_PEAK, List.of(r.worstCase().peak()));
        m.put(ReportKey.WORST_CASE_AT, List.of(r.worstCase().structureFactor(), r.worstCase().absorberFactor()));
        m.put(ReportKey.ROBUST_TUNING_RATIO, List.of(r.robust().tuning().tuningRatio()));
        m.put(ReportKey.ROBUST_ABSORBER_DAMPING_RATIO, List.of(r.robust().tuning().dampingRatio()));
        m.put(ReportKey.ROBUST_ABSORBER_STIFFNESS, List.of(r.robustAbsorber().stiffness()));
        m.put(ReportKey.ROBUST_ABSORBER_DAMPING, List.of(r.robustAbsorber().damping()));
        m.put(ReportKey.ROBUST_WORST_CASES, List.of(r.robust().worstCase().peak(), r.robust().nominalPeak()));
        m.put(ReportKey.TOLERATED_FOR_TARGET, List.of(
                r.toleratedForTarget().map(t -> t.low().orElse(Double.NaN)).orElse(Double.NaN),
                r.toleratedForTarget().map(t -> t.high().orElse(Double.NaN)).orElse(Double.NaN)));
        r.monteCarlo().result().ifPresent(c -> monteCarlo(m, c));
        return m;
    }

    /** The ranges the design holds over, from the settings' own fields. */
    private static void ranges(Map<ReportKey, List<Double>> m, RobustnessSettings s) {
        m.put(ReportKey.STRUCTURE_MISTUNING, List.of(s.structureRange()));
        m.put(ReportKey.ABSORBER_MISTUNING, List.of(s.absorberRange()));
        m.put(ReportKey.ABSORBER_DAMPING_RANGE, List.of(s.dampingRange()));
    }

    static Stream<Named<DesignResult>> presetDesigns() throws IOException {
        return designs().filter(n -> n.getName().endsWith(".json"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("presetDesigns")
    void robustnessRowsShowTheCoreFiguresInTextAndJson(DesignResult design) {
        RobustnessSettings s = design.study().robustness();
        RobustnessResult r = RobustnessAnalysis.run(design, new RobustnessSettings(s.structureRange(),
                s.absorberRange(), s.target(), s.tolerances(), 400, s.seed()));
        ReportContent content = RobustnessContent.of(design, r);
        Map<ReportKey, List<Double>> core = core(design, r);
        String text = RobustnessReport.render(design, r);
        JsonObject json = JsonParser.parseString(RobustnessJson.toJson(design, r)).getAsJsonObject();
        for (ReportRow row : content.sections().stream().flatMap(x -> x.rows().stream()).toList()) {
            List<Figure> figures = figures(row.value());
            if (!figures.isEmpty()) {
                List<Double> expected = core.get(row.key());
                assertEquals(expected.size(), figures.size(), row.key().toString());
                for (int i = 0; i < expected.size(); i++) {
                    assertEquals(0, Double.compare(expected.get(i), figures.get(i).value()), row.key() + "[" + i + "]");
                    String path = row.key().jsonKeys().get(i);
                    JsonObject holder = path.contains(".") ? json.getAsJsonObject(path.substring(0, path.indexOf('.')))
                            : json;
                    JsonElement e = holder.get(path.substring(path.indexOf('.') + 1));
                    assertJsonNumber(figures.get(i), e, path);
                }
            }
            if (row.shown()) {
                String label = row.symbol().isEmpty() ? row.label() : row.label() + " " + ValueText.ascii(row.symbol());
                assertTrue(text.lines().anyMatch(l -> l.startsWith("  " + label + " ")
                        && l.endsWith(" " + ValueText.inline(row.value()))), "robustness report lacks " + label);
            }
        }
    }

    private static void rms(Map<ReportKey, List<Double>> m, RmsFigures rms) {
        m.put(ReportKey.PSD_LEVEL, List.of(rms.psdLevel()));
        m.put(ReportKey.RMS_BEFORE, List.of(rms.before()));
        m.put(ReportKey.RMS_AFTER, List.of(rms.after()));
        m.put(ReportKey.RMS_STROKE, List.of(rms.stroke()));
    }

    private static List<Double> peaks(DesignResult r, ResponseKind k) {
        return List.of(r.motionBefore().get(k).value(), r.motionAfter().get(k).value());
    }

    /** The numbers a value holds, in order, each with the dimension the JSON converts it by. */
    private record Figure(double value, Dimension dimension) {
    }

    private static List<Figure> figures(ReportValue v) {
        List<Figure> out = new ArrayList<>();
        if (v instanceof Quantity q) {
            out.add(new Figure(q.si(), q.dimension()));
        } else if (v instanceof Unbounded u) {
            out.add(new Figure(Double.POSITIVE_INFINITY, u.dimension()));
        } else if (v instanceof NotApplicable) {
            out.add(new Figure(Double.NaN, Dimension.RATIO));
        } else if (v instanceof Level l) {
            out.add(new Figure(l.value(), Dimension.RATIO));
        } else if (v instanceof Percent p) {
            out.add(new Figure(p.fraction(), Dimension.RATIO));
        } else if (v instanceof ReportValue.PlusMinus p) {
            out.add(new Figure(p.fraction(), Dimension.RATIO));
        } else if (v instanceof Pair p) {
            out.addAll(figures(p.first()));
            out.addAll(figures(p.second()));
        } else if (v instanceof Series s) {
            s.si().forEach(x -> out.add(new Figure(x, s.dimension())));
        } else if (v instanceof Tolerance t) {
            out.add(new Figure(t.range().low().orElse(Double.NaN), Dimension.RATIO));
            out.add(new Figure(t.range().high().orElse(Double.NaN), Dimension.RATIO));
        } else if (v instanceof Reduction r) {
            out.addAll(figures(r.before()));
            out.addAll(figures(r.after()));
            out.add(new Figure(r.factor(), Dimension.RATIO));
        } else if (v instanceof Change c) {
            out.add(new Figure(c.factor(), Dimension.RATIO));
        } else if (v instanceof Factor f) {
            out.add(new Figure(f.factor(), Dimension.RATIO));
        } else if (v instanceof Count c) {
            out.add(new Figure(c.value(), Dimension.RATIO));
        } else if (v instanceof PeakAt p) {
            out.addAll(figures(p.peak()));
        }
        return out;
    }

    private static Optional<MonteCarloResult> monteCarlo(DesignResult r) {
        return DesignDossier.of(r.study()).monteCarlo(ProgressListener.NONE).result();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("designs")
    void everyRowShowsTheCoreFigureItCameFrom(DesignResult r) {
        Optional<MonteCarloResult> mc = monteCarlo(r);
        ReportContent content = DesignContent.of(r, IDENTITY, mc);
        Map<ReportKey, List<Double>> core = core(r, mc);
        Set<ReportKey> seen = new HashSet<>();
        for (ReportSection section : content.sections()) {
            for (ReportRow row : section.rows()) {
                assertTrue(seen.add(row.key()), "one row per key: " + row.key());
                List<Figure> figures = figures(row.value());
                if (figures.isEmpty() || VERDICT_ROWS.contains(row.key())) {
                    continue;
                }
                assertTrue(core.containsKey(row.key()), row.key() + " shows numbers; name their core source in core()");
                List<Double> expected = core.get(row.key());
                assertEquals(expected.size(), figures.size(), row.key().toString());
                for (int i = 0; i < expected.size(); i++) {
                    // Exact: the model keeps the core's SI figure; only renderers convert and round.
                    assertEquals(0, Double.compare(expected.get(i), figures.get(i).value()),
                            row.key() + "[" + i + "]: " + expected.get(i) + " vs " + figures.get(i).value());
                }
            }
        }
        assertEquals(r.rms().isPresent(), content.section(ReportSection.SectionId.RMS).isPresent());
        assertEquals(mc.isPresent(), content.section(ReportSection.SectionId.MONTE_CARLO).isPresent());
        assertEquals(r.warnings().stream().map(w -> w.code()).toList(),
                content.warnings().stream().map(ReportContent.Note::code).toList());
        // Identity rows: whitespace runs become one space.
        assertEquals("Plant 4", ((Words) content.row(ReportKey.CLIENT).orElseThrow().value()).text());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("designs")
    void theSameRowShowsTheSameValueInTextJsonAndSheet(DesignResult r) {
        Optional<MonteCarloResult> mc = monteCarlo(r);
        ReportContent content = DesignContent.of(r, IDENTITY, mc);
        String text = DesignReport.render(r, IDENTITY);
        JsonObject json = ResultJson.of(r);
        SheetContent sheet = SheetContent.of(r, "", "2026-11-30", "C", mc.orElse(null), IDENTITY);
        Set<String> jsonKeysWritten = new HashSet<>(Set.of("name", "warnings", "cautions", "acceptance"));
        for (ReportRow row : content.sections().stream().flatMap(s -> s.rows().stream()).toList()) {
            // The text report: one line with the label and the value (two columns for before and after).
            if (row.shown() && !MONTE_CARLO_ROWS.contains(row.key())) {
                String label = (row.symbol().isEmpty() ? row.label() : row.label() + " " + ValueText.ascii(row.symbol()))
                        + row.conventionSuffix();
                List<String> lines = text.lines().filter(l -> l.startsWith("  " + label + " ")).toList();
                assertFalse(lines.isEmpty(), "text report lacks the row " + label);
                String line = lines.get(0);
                if (row.value() instanceof Pair p && p.kind() == PairKind.BEFORE_AFTER) {
                    assertTrue(line.contains(" " + ValueText.inline(p.first()) + " ")
                            && line.endsWith(" " + ValueText.inline(p.second())), line);
                } else {
                    assertTrue(line.endsWith(" " + ValueText.inline(row.value())), line);
                }
            }
            // The sheet: the same cells, except revision and date, which it prints in its header.
            var sheetRow = sheet.sections().stream().flatMap(s -> s.rows().stream())
                    .filter(x -> x.key() == row.key()).findFirst();
            boolean inHeader = row.key() == ReportKey.REVISION || row.key() == ReportKey.DATE;
            assertEquals(row.shown() && !inHeader, sheetRow.isPresent(), "sheet row " + row.key());
            sheetRow.ifPresent(x -> {
                ValueText.Cells cells = ValueText.cells(row.value());
                assertEquals(List.of(ValueText.capitalised(row.labelWithSymbol()), cells.value(), cells.unit()),
                        List.of(x.label(), x.value(), x.unit()));
            });
            // The JSON: every key of the row, holding the row's figures (Hz for frequencies, null when
            // unbounded or not defined).
            List<String> keys = row.key().jsonKeys();
            jsonKeysWritten.addAll(keys);
            if (keys.isEmpty() || MONTE_CARLO_ROWS.contains(row.key()) // the design JSON has no Monte Carlo
                    || VERDICT_ROWS.contains(row.key())) { // nested in "acceptance": AcceptanceReportTest
                continue;
            }
            if (row.value() instanceof Words w) {
                for (int i = 0; i < keys.size(); i++) {
                    assertEquals(w.ids().isEmpty() ? w.text() : w.ids().get(i), json.get(keys.get(i)).getAsString());
                }
                continue;
            }
            if (row.value() instanceof ReportValue.PlusMinus p) {
                // a range the project did not state is marked as the default in the JSON
                assertEquals(p.stated() ? "stated" : "default", json.get(keys.get(1)).getAsString(), keys.get(1));
            }
            List<Figure> figures = figures(row.value());
            if (row.value() instanceof Series) {
                var array = json.getAsJsonArray(keys.get(0));
                assertEquals(figures.size(), array.size());
                for (int i = 0; i < figures.size(); i++) {
                    assertJsonNumber(figures.get(i), array.get(i), keys.get(0));
                }
                continue;
            }
            for (int i = 0; i < figures.size(); i++) {
                assertJsonNumber(figures.get(i), json.get(keys.get(i)), keys.get(i));
                assertEquals(Double.isInfinite(figures.get(i).value()), json.has(keys.get(i) + "_unbounded"),
                        keys.get(i) + "_unbounded");
                jsonKeysWritten.add(keys.get(i) + "_unbounded");
            }
        }
        // Nothing in the JSON that no row carries.
        for (String key : json.keySet()) {
            assertTrue(jsonKeysWritten.contains(key), "JSON key " + key + " comes from no report row");
        }
    }

    private static void assertJsonNumber(Figure f, JsonElement e, String key) {
        if (!Double.isFinite(f.value())) {
            assertTrue(e.isJsonNull(), key + " is null when not finite");
            return;
        }
        double expected = f.dimension() == Dimension.FREQUENCY ? f.value() / (2 * Math.PI) : f.value();
        assertEquals(expected, e.getAsDouble(), 1e-15 * Math.abs(expected), key);
    }
}
