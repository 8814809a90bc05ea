package org.counterpoise.io.project;

import org.counterpoise.core.robust.MonteCarloResult;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringReader;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.sheet.SheetContent;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.io.text.ReportTable;
import org.junit.jupiter.api.Test;

/**
 * Project identity (revision, engineer, client or site, date of issue): optional fields of format
 * 1, so every older file still loads; written only when given; printed on the report and sheet.
 */
class ProjectIdentityTest {
    private static final Project FAN = Presets.defaultProject().project();

    private static Project withIdentity(ProjectIdentity id) {
        return new Project("Chiller skid \"north\"", "Invented for this test.", FAN.structure(), FAN.disturbance(),
                FAN.absorber(), FAN.robustness(), id);
    }

    @Test
    void identityRoundTripsAndAnOldFileWithoutItReadsAsEmpty() {
        ProjectIdentity id = new ProjectIdentity("C", "R. \u00c5berg", "Plant 4, roof \u2013 bay 2", "2026-11-30");
        Project p = withIdentity(id);
        String json = ProjectWriter.toJson(p);
        LoadedProject back = ProjectReader.read(new StringReader(json));
        assertEquals(p, back.project());
        assertEquals(List.of(), back.unknownFields());
        // The shipped presets predate identity: they load with none, and write none back.
        assertTrue(FAN.identity().isEmpty());
        assertFalse(ProjectWriter.toJson(FAN).contains("\"engineer\""));
    }

    @Test
    void aBadDateNamesTheFieldAndTheFormAllowedAndUnknownFieldsAreStillReported() {
        String json = ProjectWriter.toJson(FAN).replaceFirst("\\{", "{\"date\": \"30/11/2026\", \"enginer\": \"x\",");
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ProjectReader.read(new StringReader(json)));
        assertTrue(e.getMessage().startsWith("date:") && e.getMessage().contains("YYYY-MM-DD"), e.getMessage());
        String misspelt = ProjectWriter.toJson(FAN).replaceFirst("\\{", "{\"enginer\": \"x\",");
        assertEquals(List.of("enginer"), ProjectReader.read(new StringReader(misspelt)).unknownFields());
    }

    @Test
    void reportAndSheetPrintTheIdentityAndNothingWhenThereIsNone() {
        ProjectIdentity id = new ProjectIdentity("C", "R. Aberg", "Plant 4", "2026-11-30");
        DesignResult r = Designer.design(withIdentity(id).toStudy());
        String report = DesignReport.render(r, id);
        assertTrue(report.contains("\nProject\n"), report);
        for (String line : List.of("revision", "date", "engineer", "client or site")) {
            assertTrue(report.lines().anyMatch(l -> l.strip().startsWith(line)), line);
        }
        assertTrue(report.contains("R. Aberg") && report.contains("Plant 4") && report.contains("2026-11-30"));
        assertEquals(DesignReport.render(r), DesignReport.render(r, ProjectIdentity.EMPTY),
                "a project without identity prints as before");
        assertFalse(DesignReport.render(r).contains("\nProject\n"));
        SheetContent sheet = SheetContent.of(r, "", "2026-11-30", "C", (MonteCarloResult) null, id);
        ReportTable.Section first = sheet.sections().get(0);
        assertEquals("Project", first.title());
        // The sheet prints revision and date in its header, so its Project table has only these two.
        assertEquals(List.of(List.of("Engineer", "R. Aberg", ""), List.of("Client or site", "Plant 4", "")),
                first.rows().stream().map(row -> List.of(row.label(), row.value(), row.unit())).toList());
        assertFalse(SheetContent.of(r, "", "", "").sections().get(0).title().equals("Project"));
    }
}
