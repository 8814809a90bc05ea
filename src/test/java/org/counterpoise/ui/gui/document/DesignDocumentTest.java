package org.counterpoise.ui.gui.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.StructureInput;
import org.counterpoise.ui.gui.action.FileActions;
import org.junit.jupiter.api.Test;

/** The document's rules, without a window: undo granularity, the dirty flag, the target rule. */
class DesignDocumentTest {
    private static final Project FAN = Presets.defaultProject().project();

    private static StructureInput withMass(StructureInput s, double kg) {
        return new StructureInput(new QuantityInput(kg, Unit.KILOGRAM), null, s.stiffness(), s.naturalFrequency(),
                s.staticDeflection(), s.damping(), s.modeShapeAtAbsorber());
    }

    @Test
    void keystrokesInOneFieldUndoTogetherAndAnotherFieldIsAStepOfItsOwn() {
        DesignDocument doc = new DesignDocument(FAN);
        List<DocumentChange.Kind> seen = new ArrayList<>();
        doc.addListener(c -> seen.add(c.kind()));
        for (double kg : new double[] {1, 15, 150, 1500}) { // typing "1500"
            doc.apply(ProjectEdits.structure("structure.mass", withMass(doc.project().structure(), kg)));
        }
        StructureInput typed = doc.project().structure();
        doc.apply(ProjectEdits.structure("structure.mode_shape_at_absorber", new StructureInput(typed.mass(), null,
                typed.stiffness(), typed.naturalFrequency(), typed.staticDeflection(), typed.damping(), 0.8)));
        assertTrue(doc.dirty());
        assertEquals("structure", doc.undoLabel());
        assertTrue(doc.undo());
        assertEquals(typed, doc.project().structure(), "the mode shape edit alone is undone");
        assertTrue(doc.undo());
        assertEquals(FAN.structure(), doc.project().structure(), "the four keystrokes are one step");
        assertFalse(doc.dirty(), "back to the state loaded: nothing to save");
        assertFalse(doc.undo());
        assertTrue(doc.redo());
        assertEquals(typed, doc.project().structure());
        assertTrue(doc.redo());
        assertEquals(0.8, doc.project().structure().modeShapeAtAbsorber());
        assertNull(doc.redoLabel());
        assertEquals(List.of(DocumentChange.Kind.EDITED, DocumentChange.Kind.EDITED, DocumentChange.Kind.EDITED,
                DocumentChange.Kind.EDITED, DocumentChange.Kind.EDITED, DocumentChange.Kind.UNDONE,
                DocumentChange.Kind.UNDONE, DocumentChange.Kind.REDONE, DocumentChange.Kind.REDONE), seen);
    }

    @Test
    void anEditAfterUndoDropsTheRedoAndASaveMakesTheDocumentClean() {
        DesignDocument doc = new DesignDocument(FAN);
        doc.apply(ProjectEdits.structure("structure.mass", withMass(FAN.structure(), 2000)));
        doc.undo();
        doc.apply(ProjectEdits.structure("structure.mass", withMass(FAN.structure(), 2500)));
        assertNull(doc.redoLabel());
        Project written = doc.project();
        doc.saved(written, Path.of("fan.json"));
        assertFalse(doc.dirty());
        assertEquals(Path.of("fan.json"), doc.file());
        doc.apply(ProjectEdits.structure("structure.mass", withMass(FAN.structure(), 2600)));
        assertTrue(doc.dirty(), "an edit after the save");
        assertNotNull(doc.undoLabel());
    }

    @Test
    void aTargetWhoseQuantityNoLongerMatchesTheResponseIsClearedAndSaidSo() {
        DesignDocument doc = new DesignDocument(FAN);
        assertEquals(new QuantityInput(0.15, Unit.MILLIMETRE), doc.project().robustness().target());
        List<String> notes = new ArrayList<>();
        doc.addListener(c -> notes.add(c.note()));
        AbsorberInput a = FAN.absorber();
        doc.apply(ProjectEdits.absorber("absorber.response", new AbsorberInput(a.massRatio(), a.mass(),
                DesignMethod.EXACT_PEAK, ResponseKind.VELOCITY, a.hangsVertically(), a.strokeMargin())));
        RobustnessInput r = doc.project().robustness();
        assertNull(r.target());
        assertEquals(FAN.robustness().structureMass(), r.structureMass(), "the rest of the section is kept");
        assertTrue(notes.get(0).contains("0.1500 mm") && notes.get(0).contains("velocity"), notes.get(0));
        // A relative displacement is a length too: a millimetre target keeps its meaning.
        DesignDocument other = new DesignDocument(FAN);
        other.apply(ProjectEdits.absorber("absorber.response", new AbsorberInput(a.massRatio(), a.mass(),
                DesignMethod.EXACT_PEAK, ResponseKind.RELATIVE_DISPLACEMENT, a.hangsVertically(), a.strokeMargin())));
        assertEquals(FAN.robustness().target(), other.project().robustness().target());
        // Undo brings the target back with the response.
        assertTrue(doc.undo());
        assertEquals(FAN, doc.project());
    }

    @Test
    void aNewProjectIsUntitledWithTheScenarioNumbersOnly() {
        Project p = FileActions.untitled();
        assertEquals("Untitled", p.name());
        assertEquals("", p.notes());
        assertTrue(p.identity().isEmpty());
        assertEquals(FAN.structure(), p.structure());
    }
}
