package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import java.nio.file.Path;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.SeveralModes;
import org.junit.jupiter.api.Test;

/**
 * The words of one absorber per mode in the report: a joint optimum whose certificate failed is
 * reported as "not found" with the best design seen and a caution (the status the certificate gives;
 * the preset's own design is certified, so the record is copied with the flag down). Invented preset.
 */
class JointAbsorbersContentTest {

    @Test
    void aJointOptimumNotFoundIsSaidInTheSectionTheJsonAndTheCautions() {
        Project p = ProjectReader.read(Path.of("presets/frame-bending-and-twisting.json")).project();
        DesignResult design = Designer.design(p.toStudy());
        SeveralAbsorbers found = SeveralAbsorbersDesigner.design(design, SeveralModes.layout(p).orElseThrow());
        assertTrue(found.certified());
        SeveralAbsorbers notFound = new SeveralAbsorbers(found.layout(), found.targetMode(), found.effectiveMass(),
                found.band(), found.forceAmplitude(), found.absorbers(), found.peakBefore(), found.peakAfter(),
                found.modes(), found.single(), false, found.structureTolerance(), found.robust(), found.joint());
        ReportContent content = SeveralAbsorbersContent.with(DesignContent.of(design), notFound);
        ReportRow status = content.row(ReportKey.SEVERAL_STATUS).orElseThrow();
        assertEquals("not found: the best design seen is shown", ValueText.inline(status.value()));
        assertTrue(content.cautions().contains(JointAbsorbersContent.NOT_FOUND), content.cautions().toString());
        JsonObject json = ResultJson.of(content).getAsJsonObject("several_absorbers");
        assertEquals("not found", json.get("status").getAsString());
        assertEquals(false, json.get("certified").getAsBoolean());
        // the found one says so
        JsonObject certified = ResultJson.of(SeveralAbsorbersContent.with(DesignContent.of(design), found))
                .getAsJsonObject("several_absorbers");
        assertEquals("certified", certified.get("status").getAsString());
        assertEquals(found.jointGain().orElseThrow(), certified.get("joint_gain").getAsDouble(), 1e-12);
    }
}
