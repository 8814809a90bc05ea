package org.counterpoise.io.sheet;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.AtomicFiles;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.chart.ChartFiles;
import org.counterpoise.io.export.CurveCsv;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.ProjectIdentity;
import org.knowm.xchart.XYChart;

/**
 * Writes the parameter sheet and the exports to files. Every file is written to a temporary file
 * in the same folder and renamed over the target, so a crash never leaves a broken file. An
 * existing file is replaced only when the caller says so; every failure is reported as a clear
 * message naming the path.
 */
public final class SheetFiles {
    /** Chart size for the sheet and the exports, in points or pixels. */
    private static final int CHART_WIDTH = 720;
    private static final int CHART_HEIGHT = 430;

    private SheetFiles() {
    }

    /**
     * @param r the design
     * @param curves its curves
     * @return the charts the sheet prints: response (log axis) and stroke
     */
    public static List<XYChart> charts(DesignResult r, DesignCurves curves) {
        return List.of(ChartFactory.response(r, curves, true, CHART_WIDTH, CHART_HEIGHT),
                ChartFactory.stroke(r, curves, false, CHART_WIDTH, CHART_HEIGHT));
    }

    /**
     * @param r the design
     * @param notes the project's notes, or empty
     * @param pdf the PDF to write
     * @param date date of issue
     * @param revision revision mark
     * @param force true to replace an existing file
     * @param option the option the path came from (for messages)
     */
    public static void writeSheet(DesignResult r, String notes, Path pdf, String date, String revision, boolean force,
            String option) {
        writeSheet(r, notes, pdf, date, revision, force, option, ProjectIdentity.EMPTY);
    }

    /**
     * @param r the design
     * @param notes the project's notes, or empty
     * @param pdf the PDF to write
     * @param date date of issue
     * @param revision revision mark
     * @param force true to replace an existing file
     * @param option the option the path came from (for messages)
     * @param identity the project's engineer and client or site
     */
    public static void writeSheet(DesignResult r, String notes, Path pdf, String date, String revision, boolean force,
            String option, ProjectIdentity identity) {
        checkTarget(pdf, force, option);
        SheetContent content = SheetContent.of(r, notes, date, revision, monteCarlo(r), identity);
        List<XYChart> charts = charts(r, DesignCurves.of(r));
        atomically(pdf, option, out -> SheetWriter.write(content, charts, out));
    }

    /**
     * @param r the design
     * @return the Monte Carlo of the project's tolerances, or null when it has none
     */
    public static org.counterpoise.core.robust.MonteCarloResult monteCarlo(DesignResult r) {
        var settings = r.study().robustness();
        if (settings.tolerances().equals(org.counterpoise.core.robust.ToleranceSet.NONE)) {
            return null;
        }
        var m = new org.counterpoise.core.robust.Mistuning(r.study().structure(), r.study().excitation(),
                r.study().response());
        return org.counterpoise.core.robust.MonteCarlo.run(m, r.absorber(), settings.tolerances(), settings.samples(),
                settings.seed(), settings.target());
    }

    /**
     * Writes curves.csv, result.json, and response and stroke charts as PNG and SVG into a folder.
     * @param r the design
     * @param dir the folder (created when missing)
     * @param force true to replace existing files
     * @param option the option the path came from
     * @return the files written
     */
    public static List<Path> writeExports(DesignResult r, Path dir, boolean force, String option) {
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw unwritable(dir, option, e);
        }
        DesignCurves curves = DesignCurves.of(r);
        Path csv = dir.resolve("curves.csv");
        Path json = dir.resolve("result.json");
        Path responsePng = dir.resolve("response.png");
        Path responseSvg = dir.resolve("response.svg");
        Path strokePng = dir.resolve("stroke.png");
        Path strokeSvg = dir.resolve("stroke.svg");
        List<Path> all = List.of(csv, json, responsePng, responseSvg, strokePng, strokeSvg);
        for (Path p : all) {
            checkTarget(p, force, option);
        }
        atomically(csv, option, out -> out.write(CurveCsv.of(curves).getBytes(StandardCharsets.UTF_8)));
        atomically(json, option, out -> out.write(ResultJson.toJson(r).getBytes(StandardCharsets.UTF_8)));
        List<XYChart> charts = charts(r, curves);
        atomically(responsePng, option, out -> ChartFiles.png(charts.get(0), out));
        atomically(responseSvg, option, out -> ChartFiles.svg(charts.get(0), out));
        atomically(strokePng, option, out -> ChartFiles.png(charts.get(1), out));
        atomically(strokeSvg, option, out -> ChartFiles.svg(charts.get(1), out));
        return all;
    }

    private static void checkTarget(Path target, boolean force, String option) {
        if (Files.isDirectory(target)) {
            throw new InvalidInputException(option, target.toString(), "is a folder; give a file name");
        }
        if (Files.exists(target) && !force) {
            throw new InvalidInputException(option, target.toString(),
                    "already exists; add --force to replace it, or choose another name");
        }
    }

    private static void atomically(Path target, String option, AtomicFiles.Body body) {
        try {
            AtomicFiles.write(target, body);
        } catch (IOException e) {
            throw unwritable(target, option, e);
        }
    }

    private static InvalidInputException unwritable(Path target, String option, IOException e) {
        String why = e instanceof NoSuchFileException ? "its folder does not exist"
                : e instanceof AccessDeniedException ? "permission denied"
                : e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new InvalidInputException(option, target.toString(), "cannot be written here (" + why + ")");
    }
}
