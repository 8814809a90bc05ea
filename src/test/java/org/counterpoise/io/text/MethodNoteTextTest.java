package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.OptionalDouble;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignConstraints;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.optim.ActiveConstraint;
import org.counterpoise.core.response.ResponseKind;
import org.junit.jupiter.api.Test;

/** The method note keeps its words while the core decides on the active constraint's type. */
class MethodNoteTextTest {

    @Test
    void everyConstraintHasWords() {
        for (ActiveConstraint c : ActiveConstraint.values()) {
            assertFalse(MethodNoteText.words(c).isBlank(), c.name());
        }
    }

    @Test
    void aStrokeLimitedDesignSaysSoAsBefore() {
        // An invented floor, 800 kg at 25 Hz, forced over 22-28 Hz; the stroke limited to 80 % of the
        // free exact optimum's stroke during run-up (the limit is then active: that stroke sits on it).
        Structure s = Structure.of(800, 800 * Math.pow(2 * Math.PI * 25, 2), 0.02);
        Excitation e = new Excitation(ExcitationKind.FORCE, 400,
                new FrequencyBand(2 * Math.PI * 22, 2 * Math.PI * 28));
        DesignResult free = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5));
        assertEquals(ActiveConstraint.NONE, free.activeConstraint());
        assertEquals(free.methodNote(), MethodNoteText.of(free));
        DesignResult limited = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.EXACT_PEAK, false, 1.5, new DesignConstraints(
                        OptionalDouble.of(0.8 * free.strokeRunUp().value()), OptionalDouble.empty(),
                        OptionalDouble.empty())));
        assertEquals(ActiveConstraint.STROKE_LIMIT, limited.activeConstraint());
        String note = MethodNoteText.of(limited);
        assertTrue(note.startsWith("maxima equal at the optimum: ") && note.endsWith("; active constraint: stroke limit (held during run-up too)"),
                note);
    }
}
