package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.realisation.HardwareCaution;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.SpringDesign;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.text.ReportSection.SectionId;
import org.junit.jupiter.api.Test;

/**
 * The realisation in the report and the JSON: every row shows the realisation's own number,
 * converted by hand into the display unit (mm, kN/m, Hz); every JSON key holds the record's SI
 * value (frequencies in Hz, 1 Hz = 2 pi rad/s); the hardware cautions follow the hardware kinds.
 * The realisations are made by hand ({@link HandMadeRealisation}), so these tests check the
 * report, not the sizing.
 */
class HardwareReportTest {
    private static final DesignResult DESIGN = Designer.design(
            ProjectReader.read(Path.of("presets", "rooftop-fan-platform.json")).project().toStudy());

    private static ReportContent content(Realisation r) {
        return HardwareContent.with(DesignContent.of(DESIGN, ProjectIdentity.EMPTY, Optional.empty()), r, DESIGN);
    }

    private static String cell(ReportContent c, ReportKey key) {
        return ValueText.inline(c.row(key).orElseThrow().value());
    }

    @Test
    void partListShowsTheSpringInDisplayUnits() {
        Realisation r = HandMadeRealisation.helical(DESIGN);
        ReportContent c = content(r);
        // hand conversion: 0.006 m = 6.000 mm, 0.040 m = 40.00 mm, 0.120 m = 120.0 mm
        assertEquals("6.000 mm", cell(c, ReportKey.SPRING_WIRE_DIAMETER));
        assertEquals("40.00 mm", cell(c, ReportKey.SPRING_MEAN_COIL_DIAMETER));
        assertEquals("120.0 mm", cell(c, ReportKey.SPRING_FREE_LENGTH));
        assertEquals("51.00 mm", cell(c, ReportKey.SPRING_SOLID_LENGTH));
        assertEquals("6.25 / 8.25", cell(c, ReportKey.SPRING_COILS));
        assertEquals("4", cell(c, ReportKey.SPRING_COUNT));
        assertEquals("6.67", cell(c, ReportKey.SPRING_INDEX)); // 40 / 6
        // R = 81.5e9 * 0.006^4 / (8 * 0.04^3 * 6.25) = 33 006.6 N/m = 33.01 kN/m (EN 13906-1 rate, by hand)
        assertEquals("33.01 kN/m", cell(c, ReportKey.SPRING_RATE_PER_SPRING));
        assertEquals("132.0 kN/m", cell(c, ReportKey.SPRING_TOTAL_RATE));
        assertEquals("150.0 N / 60.00 N", cell(c, ReportKey.SPRING_LOADS));
        assertEquals("EN 10270-1:2011 grade DH", cell(c, ReportKey.SPRING_MATERIAL));
        assertEquals("1.0 %", cell(c, ReportKey.HARDWARE_MASS_TOLERANCE));
        assertEquals("viscous dashpot", cell(c, ReportKey.DAMPER_KIND));
        assertEquals("4.000 mm / 9.000 mm", cell(c, ReportKey.DAMPER_STROKE));
        assertEquals("500.0 mm/s", cell(c, ReportKey.DAMPER_PEAK_VELOCITY));
        assertTrue(c.section(SectionId.PART_LIST).isPresent());
    }

    @Test
    void checksAreOneGridRowEachWithDemandCapacityAndVerdict() {
        ReportContent c = content(HandMadeRealisation.helical(DESIGN));
        ReportSection checks = c.section(SectionId.CHECKS).orElseThrow();
        ReportTable.Grid grid = ReportTable.grid(checks).orElseThrow();
        assertEquals(List.of("Check", "Demand", "Capacity", "Utilisation", "Verdict"), grid.headings());
        assertEquals(4, grid.cells().size());
        // the realisation's first spring check is the springs' total rate against the 2 % rate tolerance
        assertEquals("springs' total rate off the design's, against the rate tolerance", grid.cells().get(0).get(0));
        // a deviation reads as a percentage: the 2 % rate tolerance of the hand-made tolerances
        assertEquals("2.00 %", grid.cells().get(0).get(2));
        // surge: 18 Hz against 150 Hz, 12.0 %; solid: 30 mm against 25 mm, 120 %, fails
        assertEquals(List.of("forcing against the spring's surge frequency", "18.00 Hz", "150.0 Hz", "12.0 %",
                "passes"), grid.cells().get(1));
        assertEquals(List.of("compression before the coils touch", "30.00 mm", "25.00 mm", "120 %", "FAILS"),
                grid.cells().get(2));
        assertEquals("Compression before the coils touch: EN 13906-1:2013, solid length.", grid.sentences().get(2));
        assertTrue(checks.title().contains("NOT ALL PASS"));
    }

    @Test
    void jsonHoldsTheRecordsSiValues() {
        Realisation r = HandMadeRealisation.helical(DESIGN);
        JsonObject o = JsonParser.parseString(ResultJson.toJson(content(r))).getAsJsonObject();
        JsonObject hw = o.getAsJsonObject("hardware");
        SpringDesign s = r.spring().orElseThrow();
        JsonObject spring = hw.getAsJsonObject("spring");
        assertEquals(s.wireDiameter(), spring.get("wire_diameter_m").getAsDouble());
        assertEquals(s.meanCoilDiameter(), spring.get("mean_coil_diameter_m").getAsDouble());
        assertEquals(s.ratePerSpring(), spring.get("rate_per_spring_N_per_m").getAsDouble());
        assertEquals(s.totalRate(), spring.get("total_rate_N_per_m").getAsDouble());
        assertEquals(s.activeCoils(), spring.get("active_coils").getAsDouble());
        assertEquals(s.totalCoils(), spring.get("total_coils").getAsDouble());
        assertEquals(4, spring.get("count").getAsInt());
        assertEquals("en10270-1-dh", spring.get("material").getAsString());
        assertEquals(s.rateDeviation(), spring.get("rate_deviation").getAsDouble());
        assertTrue(hw.get("elastomer").isJsonNull());
        assertEquals("helical-compression", hw.get("spring_kind").getAsString());
        assertEquals("viscous-dashpot", hw.get("damper_kind").getAsString());
        assertEquals(DESIGN.absorber().mass(), hw.get("absorber_mass_kg").getAsDouble());

        JsonObject damper = hw.getAsJsonObject("damper");
        assertEquals(r.damper().coefficient(), damper.get("coefficient_Ns_per_m").getAsDouble());
        assertEquals(0.004, damper.get("stroke_m").getAsDouble());
        assertEquals(0.009, damper.get("run_up_stroke_m").getAsDouble());
        assertTrue(damper.get("eddy_current").isJsonNull());

        JsonArray checks = hw.getAsJsonArray("checks");
        assertEquals(r.checks().size(), checks.size());
        JsonObject rate = checks.get(0).getAsJsonObject();
        assertEquals("spring-rate", rate.get("kind").getAsString());
        assertEquals(Math.abs(s.rateDeviation()), rate.get("demand").getAsDouble(), 1e-15);
        assertEquals(0.02, rate.get("capacity").getAsDouble(), 1e-15);
        assertEquals(Math.abs(s.rateDeviation()) <= 0.02, rate.get("passes").getAsBoolean());
        JsonObject surge = checks.get(1).getAsJsonObject();
        assertEquals("spring-surge", surge.get("kind").getAsString());
        // frequencies in Hz: 2 pi 18 rad/s = 18 Hz
        assertEquals(18.0, surge.get("demand").getAsDouble(), 1e-12);
        assertEquals(150.0, surge.get("capacity").getAsDouble(), 1e-12);
        assertEquals("Hz", surge.get("unit").getAsString());
        assertEquals(0.12, surge.get("utilisation").getAsDouble(), 1e-12);
        assertTrue(surge.get("passes").getAsBoolean());
        JsonObject solid = checks.get(2).getAsJsonObject();
        assertEquals(0.030, solid.get("demand").getAsDouble());
        assertEquals("m", solid.get("unit").getAsString());
        assertFalse(solid.get("passes").getAsBoolean());

        JsonObject tol = hw.getAsJsonObject("tolerances");
        assertEquals(0.01, tol.get("mass").getAsDouble());
        assertEquals(0.02, tol.get("spring_rate").getAsDouble());
        assertEquals(0.2, tol.get("damping").getAsDouble());
        assertEquals(0.015, tol.get("absorber_frequency").getAsDouble());
        assertEquals("robust-ranges", tol.get("basis").getAsString());

        JsonObject trim = hw.getAsJsonObject("trim");
        assertEquals(r.trim().plateMass(), trim.get("plate_mass_kg").getAsDouble());
        assertEquals(5, trim.get("plates_fitted").getAsInt());
        assertEquals(10, trim.get("plates_total").getAsInt());
        assertEquals(0.5, trim.get("percent_per_plate").getAsDouble());
        assertEquals(r.trim().absorberFrequencyHigh() / (2 * Math.PI),
                trim.get("absorber_frequency_high_Hz").getAsDouble(), 1e-12);

        JsonArray predicted = hw.getAsJsonArray("predicted");
        assertEquals(3, predicted.size());
        JsonObject atResonance = predicted.get(1).getAsJsonObject();
        assertEquals(DESIGN.study().structure().naturalFrequency() / (2 * Math.PI),
                atResonance.get("frequency_Hz").getAsDouble(), 1e-12);
        assertTrue(atResonance.get("before").isJsonNull());
        assertTrue(atResonance.get("before_unbounded").getAsBoolean());
        assertEquals(3e-5, atResonance.get("after").getAsDouble());
        assertEquals(5e-4, atResonance.get("stroke_m").getAsDouble());
    }

    @Test
    void procedureIsNumberedAndItsTargetIsTheDesignFrequencyOverTheRangeTheDesignHolds() {
        Realisation r = HandMadeRealisation.helical(DESIGN);
        ReportContent c = content(r);
        JsonArray steps = JsonParser.parseString(ResultJson.toJson(c)).getAsJsonObject()
                .getAsJsonObject("hardware").getAsJsonArray("procedure");
        assertEquals(r.procedure().size(), steps.size());
        JsonObject compute = steps.get(1).getAsJsonObject();
        assertEquals(2, compute.get("number").getAsInt());
        assertEquals("compute-absorber-target", compute.get("step").getAsString());
        JsonObject figures = compute.getAsJsonObject("figures");
        double f = DESIGN.tuning().tuningRatio();
        double expected = steps.get(0).getAsJsonObject().getAsJsonObject("figures")
                .get("expected_structure_frequency_Hz").getAsDouble();
        // independent arithmetic: the target is f times the expected structure frequency, kept over the range
        assertEquals(f * expected, figures.get("absorber_target_frequency_Hz").getAsDouble(), 1e-9 * expected);
        assertEquals(0.95 * expected, figures.get("structure_frequency_low_Hz").getAsDouble(), 1e-9 * expected);
        assertEquals(1.05 * expected, figures.get("structure_frequency_high_Hz").getAsDouble(), 1e-9 * expected);

        String text = DesignReport.render(c);
        assertTrue(text.contains("\nTuning and commissioning\n  1. Measure the structure's natural frequency"), text);
        String targetHz = QuantityFormat.number(f * expected, 4) + " Hz";
        assertTrue(text.contains("  2. Check the measured structure frequency against the range the design holds"),
                text);
        assertTrue(text.replaceAll("\\s+", " ").contains("do not scale it with the structure"), text);
        assertTrue(text.contains(targetHz), "the target " + targetHz + " is printed");
        assertTrue(text.contains("within +/-1.5 %"), text);
        assertTrue(text.contains("  7. If the readings are off"), text);
    }

    @Test
    void elastomerAndEddyCurrentPartsAndTheirCautions() {
        ReportContent e = content(HandMadeRealisation.elastomer(DESIGN));
        JsonObject hw = JsonParser.parseString(ResultJson.toJson(e)).getAsJsonObject().getAsJsonObject("hardware");
        assertTrue(hw.get("spring").isJsonNull());
        JsonObject el = hw.getAsJsonObject("elastomer");
        assertEquals(DESIGN.absorber().stiffness(), el.get("dynamic_stiffness_N_per_m").getAsDouble());
        assertEquals(DESIGN.absorber().stiffness() / 1.4, el.get("static_stiffness_N_per_m").getAsDouble());
        assertEquals(0.35, el.get("loss_factor_needed").getAsDouble());
        assertEquals(0.1, el.get("compound_loss_factor").getAsDouble());
        assertEquals(0.96, el.get("published_tuning_ratio").getAsDouble());
        assertEquals(DESIGN.tuning().tuningRatio(), el.get("viscous_tuning_ratio").getAsDouble());
        assertEquals("elastomer-loss", hw.getAsJsonObject("damper").get("kind").getAsString());
        assertTrue(e.cautions().contains(CautionText.of(HardwareCaution.ELASTOMER_AGEING)));
        assertFalse(e.cautions().contains(CautionText.of(HardwareCaution.DASHPOT_LEAK_AND_HEAT)));
        assertFalse(e.cautions().contains(CautionText.of(HardwareCaution.HELICAL_SPRING_FRACTURE)));

        ReportContent m = content(HandMadeRealisation.eddyCurrent(DESIGN));
        JsonObject eddy = JsonParser.parseString(ResultJson.toJson(m)).getAsJsonObject().getAsJsonObject("hardware")
                .getAsJsonObject("damper").getAsJsonObject("eddy_current");
        assertEquals("copper", eddy.get("conductor").getAsString());
        assertEquals(0.5, eddy.get("flux_density_T").getAsDouble());
        assertEquals(0.0125, eddy.get("pole_area_m2").getAsDouble());
        assertEquals(0.005, eddy.get("plate_thickness_m").getAsDouble());
        assertEquals("5.000 mm", cell(m, ReportKey.EDDY_CURRENT_PLATE_THICKNESS));
        assertTrue(m.cautions().contains(CautionText.of(HardwareCaution.MAGNET_ATTRACTION_AND_HEAT)));
        assertTrue(m.cautions().contains(CautionText.of(HardwareCaution.HELICAL_SPRING_FRACTURE)));
        assertFalse(m.cautions().contains(CautionText.of(HardwareCaution.DASHPOT_LEAK_AND_HEAT)));
        // the standing caution that defers to local codes stays last
        assertTrue(m.cautions().get(m.cautions().size() - 1).startsWith("Local codes"));
    }

    @Test
    void noNotANumberOrInfinityInTextTablesOrJson() {
        for (Realisation r : List.of(HandMadeRealisation.helical(DESIGN), HandMadeRealisation.elastomer(DESIGN),
                HandMadeRealisation.eddyCurrent(DESIGN))) {
            ReportContent c = content(r);
            String text = DesignReport.render(c) + ResultJson.toJson(c);
            for (ReportTable.Section s : ReportTable.of(c, Set.of())) {
                for (ReportTable.Row row : s.rows()) {
                    text += row.value() + row.unit();
                }
            }
            for (String bad : List.of("NaN", "Infinity", " not available\n", "not available /", "/ not available")) {
                assertFalse(text.contains(bad), bad + " in " + text);
            }
        }
    }
}
