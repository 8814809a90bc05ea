package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.junit.jupiter.api.Test;

/** The alternative's rows when the design's own peak is unbounded: no structure change is compared with it. */
class DetuningRowsTest {
    @Test
    void anUnboundedTargetGivesNotApplicableRows() {
        // An invented undamped floor (2000 kg, 10 Hz) with an undamped absorber tuned to 10 Hz, forced over
        // 8-12 Hz: the coupled natural frequencies (undamped, inside the band) make the peak unbounded.
        Structure s = Structure.of(2000, 2000 * Math.pow(2 * Math.PI * 10, 2), 0.0);
        Excitation e = new Excitation(ExcitationKind.FORCE, 1000, new FrequencyBand(2 * Math.PI * 8, 2 * Math.PI * 12));
        DesignResult r = Designer.design(new DesignStudy("t", s, e, ResponseKind.DISPLACEMENT,
                AbsorberSizing.ofMassRatio(0.05), DesignMethod.UNDAMPED_SINGLE_SPEED, false, 1.5));
        assertTrue(r.responseAfter().unbounded());
        ReportContent content = DesignContent.of(r);
        for (ReportKey key : new ReportKey[] {ReportKey.STIFFER, ReportKey.SOFTER, ReportKey.LIGHTER, ReportKey.HEAVIER}) {
            assertInstanceOf(NotApplicable.class, content.row(key).orElseThrow().value(), key.toString());
        }
        String text = DesignReport.render(r);
        // the text report leaves rows that do not apply out, rather than calling the change unreachable
        assertTrue(text.contains("target (what the absorber achieves) (peak) unbounded") && !text.contains("not reachable"),
                text);
    }
}
