package org.counterpoise.ui.gui.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.AbsorberSetTuning;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.AbsorbersInput;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.ModeInput;
import org.counterpoise.io.project.ModesInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.UnitSystem;
import org.junit.jupiter.api.Test;

/**
 * The modes table as plain values (ModesEdits) on the invented gallery floor of two modes: the cells
 * against the values the preset file writes (read by eye from presets/gallery-floor-two-modes.json),
 * the US customary cells against the pound's definition, each edit against the project it must give,
 * and each refusal with its plain message, the project untouched.
 */
class ModesEditsTest {
    private static final Project GALLERY = Presets.load("gallery-floor-two-modes.json").project();
    private static final Locale EN = Locale.US;

    /** A file's spillover limit (format 8) stays through the absorbers' edits and a mode's renaming. */
    @Test
    void theSpilloverLimitIsKeptByTheAbsorbersEdits() {
        AbsorbersInput a = GALLERY.absorbers();
        Project limited = GALLERY.withSeveral(GALLERY.modes(), new AbsorbersInput(a.count(), a.tuning(), a.point(),
                a.targetMode(), a.arrangement(), a.modes(), a.points(), 0.8));
        Project three = ModesEdits.withAbsorbers(limited, 3, a.tuning(), a.point(), a.targetMode());
        assertEquals(0.8, three.absorbers().spilloverLimit());
        assertEquals(3, three.absorbers().count());
        Project renamed = ModesEdits.withCell(limited, 0, ModesEdits.NAME, "flexure", EN);
        assertEquals(0.8, renamed.absorbers().spilloverLimit());
        assertEquals("flexure", renamed.absorbers().targetMode());
        // one absorber takes no limit: it goes with the count (the reader would refuse the pair)
        assertEquals(null, ModesEdits.withAbsorbers(limited, 1, a.tuning(), a.point(), a.targetMode()).absorbers()
                .spilloverLimit());
    }

    @Test
    void theCellsAreTheFilesValuesInTheDisplayUnits() {
        assertEquals(List.of("Mode", "Natural frequency (Hz)", "Damping ratio", "Modal mass (kg)", "\u03c6 at display",
                "\u03c6 at midspan"), ModesEdits.headings(GALLERY.modes(), UnitSystem.SI));
        // the file: bending 8.2 Hz, ratio 0.015, 18000 kg, display 0.8, midspan 1.0; twisting 9.1 Hz, 0.015,
        // 15000 kg, display 1.0, midspan 0.45
        assertEquals(List.of(List.of("bending", "8.2", "0.015", "18000", "0.8", "1"),
                List.of("twisting", "9.1", "0.015", "15000", "1", "0.45")),
                ModesEdits.rows(GALLERY.modes(), UnitSystem.SI, EN));
        // US customary: the pound is 0.45359237 kg exactly (international yard and pound agreement, 1959;
        // NIST SP 811 appendix B): 18000 kg = 39683.207 lb and 15000 kg = 33069.339 lb, six figures shown
        assertEquals("Modal mass (lb)", ModesEdits.headings(GALLERY.modes(), UnitSystem.US_CUSTOMARY).get(3));
        List<List<String>> us = ModesEdits.rows(GALLERY.modes(), UnitSystem.US_CUSTOMARY, EN);
        assertEquals("39683.2", us.get(0).get(ModesEdits.MASS));
        assertEquals("33069.3", us.get(1).get(ModesEdits.MASS));
        assertEquals("8.2", us.get(0).get(ModesEdits.FREQUENCY));
        // German decimal comma (the locale's marks: TypedNumbers)
        assertEquals("0,45", ModesEdits.rows(GALLERY.modes(), UnitSystem.SI, Locale.GERMANY).get(1).get(5));
    }

    @Test
    void aTypedValueBecomesTheModesValueInTheDisplayUnit() {
        Project p = ModesEdits.withCell(GALLERY, 1, ModesEdits.FREQUENCY, "9.4", EN);
        ModeInput twisting = p.modes().modes().get(1);
        assertEquals(new QuantityInput(9.4, Unit.HERTZ), twisting.naturalFrequency());
        // 2 pi f: 9.4 Hz = 59.0619 rad/s (definition of the hertz)
        assertEquals(2 * Math.PI * 9.4, twisting.naturalFrequency().si(), 1e-12);
        assertEquals(GALLERY.modes().modes().get(0), p.modes().modes().get(0), "the other mode is untouched");
        assertEquals(GALLERY.absorbers(), p.absorbers());

        Project damped = ModesEdits.withCell(GALLERY, 0, ModesEdits.DAMPING, "0.02", EN);
        assertEquals(DampingInput.ratio(0.02), damped.modes().modes().get(0).damping());

        Project us = GALLERY.withDisplayUnits(UnitSystem.US_CUSTOMARY);
        Project heavier = ModesEdits.withCell(us, 0, ModesEdits.MASS, "40,000", EN);
        assertEquals(new QuantityInput(40000, Unit.POUND), heavier.modes().modes().get(0).modalMass());
        assertEquals(40000 * 0.45359237, heavier.modes().modes().get(0).modalMass().si(), 1e-9);

        Project shape = ModesEdits.withCell(GALLERY, 0, ModesEdits.FIRST_POINT, "0,6", Locale.GERMANY);
        assertEquals(Map.of("display", 0.6, "midspan", 1.0), shape.modes().modes().get(0).modeShape());
        assertEquals(List.of("display", "midspan"), ModesEdits.points(shape.modes()), "the points keep their order");
        // a shape of 0 at a point the absorbers do not use is taken (bending at the display)
        assertEquals(0.0, ModesEdits.withCell(GALLERY, 0, ModesEdits.FIRST_POINT, "0", EN).modes().modes().get(0)
                .modeShape().get("display"));
    }

    @Test
    void aRenamedModeKeepsItsPlaceAsTheAbsorbersTarget() {
        Project p = ModesEdits.withCell(GALLERY, 0, ModesEdits.NAME, " flexure ", EN);
        assertEquals("flexure", p.modes().modes().get(0).name());
        assertEquals("flexure", p.absorbers().targetMode());
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.NAME, "twisting", EN), "a name no other mode has");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.NAME, "  ", EN), "an empty name");
    }

    @Test
    void badValuesAreRefusedInPlainWords() {
        assertRefused(() -> ModesEdits.withCell(GALLERY, 1, ModesEdits.MASS, "-5", EN), "twisting, modal mass (kg)",
                "greater than 0");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 1, ModesEdits.MASS, "0", EN), "greater than 0");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.FREQUENCY, "", EN), "bending, natural frequency",
                "type a number");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.FREQUENCY, "fast", EN), "fast");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.DAMPING, "1.2", EN), "from 0 to 0.99");
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.DAMPING, "-0.01", EN), "from 0 to 0.99");
        // the absorbers sit at mid-span and are fitted to bending: a bending shape of 0 there leaves them nothing
        assertRefused(() -> ModesEdits.withCell(GALLERY, 0, ModesEdits.FIRST_POINT + 1, "0", EN),
                "bending, mode shape at midspan 0", "midspan");
    }

    @Test
    void modesOpenedUnusableTakeEditsOneAtATime() {
        // a file whose target mode does not move the absorbers' point (bending 0 at mid-span): refused by
        // the design, yet each edit is taken so the user can mend it
        ModeInput bending = GALLERY.modes().modes().get(0);
        Map<String, Double> shape = new LinkedHashMap<>(bending.modeShape()); // display, midspan: as written
        shape.put("midspan", 0.0);
        ModeInput still = new ModeInput(bending.name(), bending.naturalFrequency(), bending.damping(),
                bending.modalMass(), shape);
        Project broken = GALLERY.withSeveral(new ModesInput(List.of(still,
                GALLERY.modes().modes().get(1)), "display", "midspan"), GALLERY.absorbers());
        assertThrows(InvalidInputException.class, broken::toStructure);
        Project other = ModesEdits.withCell(broken, 1, ModesEdits.FREQUENCY, "9.3", EN);
        assertEquals(new QuantityInput(9.3, Unit.HERTZ), other.modes().modes().get(1).naturalFrequency());
        Project mended = ModesEdits.withCell(other, 0, ModesEdits.FIRST_POINT + 1, "1", EN);
        assertEquals(Unit.HERTZ.toSi(8.2), mended.toStructure().naturalFrequency(), 1e-9, "designable again");
    }

    @Test
    void modesAreAddedAndRemovedAndOneAlwaysStays() {
        Project three = ModesEdits.withModeAdded(GALLERY);
        assertEquals(3, three.modes().modes().size());
        ModeInput added = three.modes().modes().get(2);
        assertEquals("mode 3", added.name());
        // a quarter above the highest (9.1 Hz), to three figures: 11.375 -> 11.4 Hz
        assertEquals(new QuantityInput(11.4, Unit.HERTZ), added.naturalFrequency());
        assertEquals(GALLERY.modes().modes().get(1).modeShape(), added.modeShape());
        assertEquals("mode 4", ModesEdits.withModeAdded(three).modes().modes().get(3).name());

        assertRefused(() -> ModesEdits.withModeRemoved(GALLERY, 0), "Remove mode bending", "fitted to it");
        Project one = ModesEdits.withModeRemoved(GALLERY, 1);
        assertEquals(List.of("bending"), one.modes().modes().stream().map(ModeInput::name).toList());
        Project untargeted = one.withSeveral(one.modes(), new AbsorbersInput(2, AbsorberSetTuning.INDIVIDUAL,
                "midspan", null));
        assertRefused(() -> ModesEdits.withModeRemoved(untargeted, 0), "the only mode");
    }

    @Test
    void aPointIsAddedOnceWithZeroEverywhere() {
        Project p = ModesEdits.withPointAdded(GALLERY, " quarter span ");
        assertEquals(List.of("display", "midspan", "quarter span"), ModesEdits.points(p.modes()));
        for (ModeInput m : p.modes().modes()) {
            assertEquals(0.0, m.modeShape().get("quarter span"));
        }
        assertRefused(() -> ModesEdits.withPointAdded(GALLERY, "Midspan"), "a name no other point has");
        assertRefused(() -> ModesEdits.withPointAdded(GALLERY, ""), "an empty name");
        // the absorbers cannot move to a point no mode moves yet
        assertRefused(() -> ModesEdits.withAbsorbers(p, 2, AbsorberSetTuning.INDIVIDUAL, "quarter span", "bending"),
                "quarter span");
    }

    @Test
    void thePointsAndTheAbsorbersAreChosen() {
        Project p = ModesEdits.withPoints(GALLERY, "midspan", "display");
        assertEquals("midspan", p.modes().excitationPoint());
        assertEquals("display", p.modes().responsePoint());
        Project a = ModesEdits.withAbsorbers(GALLERY, 3, AbsorberSetTuning.UNIFORM, "display", null);
        assertEquals(new AbsorbersInput(3, AbsorberSetTuning.UNIFORM, "display", null), a.absorbers());
        assertRefused(() -> ModesEdits.withAbsorbers(GALLERY, 9, AbsorberSetTuning.UNIFORM, "display", null),
                "from 1 to 8");
    }

    @Test
    void theEditedModesAreWrittenAndReadBackEqual() {
        Project p = ModesEdits.withPointAdded(ModesEdits.withModeAdded(ModesEdits.withCell(GALLERY, 0,
                ModesEdits.FREQUENCY, "8.35", EN)), "stair");
        Project back = ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project();
        assertEquals(p.modes(), back.modes());
        assertEquals(p.absorbers(), back.absorbers());
        assertNull(GALLERY.modes().modes().get(0).modeShape().get("stair"));
        assertFalse(ProjectWriter.toJson(p).contains("mode_shape_at_absorber"), "a file of modes keeps its format");
    }

    @Test
    void aSingleModeIsDescribedByItsModesAsTheDesignSeesIt() {
        // the invented pump skid: 34 kN weight, 23.5 Hz, loss factor 0.04, mode shape 0.85 at the absorber
        Project skid = Presets.load("pump-skid-mezzanine.json").project();
        Project modal = ModesEdits.asModes(skid);
        assertEquals(1, modal.modes().modes().size());
        ModeInput mode = modal.modes().modes().get(0);
        assertEquals(SeveralModes.SINGLE_MODE, mode.name());
        assertEquals(new QuantityInput(23.5, Unit.HERTZ), mode.naturalFrequency());
        assertEquals(skid.structure().damping(), mode.damping());
        // effective modal mass m / phi^2 (the modal mass and the shape go together; Ewins 2000, Modal Testing,
        // 2nd ed., section 2.3): the
        // weight over standard gravity 9.80665 m/s^2 (3rd CGPM, 1901), 3467.035 kg, over 0.85^2: 4798.665 kg
        assertEquals(4798.66453166084, mode.modalMass().si(), 1e-6);
        assertEquals(Map.of(SeveralModes.SINGLE_POINT, 1.0), mode.modeShape());
        assertEquals(SeveralModes.SINGLE_POINT, modal.modes().excitationPoint());
        assertEquals(new AbsorbersInput(1, AbsorberSetTuning.UNIFORM, SeveralModes.SINGLE_POINT, null),
                modal.absorbers());
        // the design sees the same single mode
        Structure before = skid.toStructure();
        Structure after = modal.toStructure();
        assertEquals(before.effectiveMass(), after.effectiveMass(), 1e-9 * before.effectiveMass());
        assertEquals(before.naturalFrequency(), after.naturalFrequency(), 1e-9 * before.naturalFrequency());
        assertEquals(before.dampingRatio(), after.dampingRatio(), 1e-12);
        // and designs as it did: the single-mode design's absorber and peak (the 2-DOF algebra) to 1e-9
        DesignResult single = Designer.design(skid.toStudy());
        DesignResult asModes = Designer.design(modal.toStudy());
        assertEquals(single.absorber().stiffness(), asModes.absorber().stiffness(), 1e-9 * single.absorber().stiffness());
        assertEquals(single.responseAfter().value(), asModes.responseAfter().value(),
                1e-9 * single.responseAfter().value());
        Project back = ProjectReader.read(new StringReader(ProjectWriter.toJson(modal))).project();
        assertEquals(modal, back, "written and read back equal");

        // several absorbers on one mode keep their count and tuning (the invented test rig: 3, uniform)
        Project rig = ModesEdits.asModes(Presets.load("split-mass-test-rig.json").project());
        assertEquals(new AbsorbersInput(3, AbsorberSetTuning.UNIFORM, SeveralModes.SINGLE_POINT, null), rig.absorbers());
        // the rooftop fan is driven by an unbalance: modes are designed for a force, so it is refused
        assertRefused(() -> ModesEdits.asModes(Presets.load("rooftop-fan-platform.json").project()),
                "Describe the structure by its modes", "disturbance.kind");
    }

    private static void assertRefused(Runnable edit, String... said) {
        InvalidInputException e = assertThrows(InvalidInputException.class, edit::run);
        for (String s : said) {
            assertTrue(e.getMessage().contains(s), "\"" + e.getMessage() + "\" lacks " + s);
        }
        assertFalse(e.getMessage().matches(".*(Exception|NaN|Infinity).*"), e.getMessage());
    }
}
