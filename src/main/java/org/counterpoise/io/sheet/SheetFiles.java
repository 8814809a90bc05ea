package org.counterpoise.io.sheet;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Map;
import java.util.Set;
import java.util.function.BiFunction;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.io.AtomicFiles;
import org.counterpoise.io.FileWriteException;
import org.counterpoise.io.PlainMessages;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.chart.ChartFiles;
import org.counterpoise.io.chart.ChartTheme;
import org.counterpoise.io.export.CurveCsv;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.counterpoise.io.text.UnitSystem;
import org.knowm.xchart.XYChart;

/*
 * Longer than 400 lines because the all-or-none output set (Outputs) and the checks that guard it
 * (replaceable targets, spared inputs, folders created and removed again) belong with the writes
 * they guard; the overloads for the wizard's preview and the display convention add the rest.
 */
/**
 * Writes the parameter sheet and the exports of a {@link DesignDossier} (it computes nothing itself)
 * to files through {@link AtomicFiles}: a crash never
 * leaves a broken file, and the files of one request are written all or none. An existing file is
 * replaced only when the caller says so, and only if it is an ordinary file; every failure is
 * reported as a clear message naming the option and the path.
 */
public final class SheetFiles {
    /** Chart size for the sheet and the exports, in points or pixels. */
    private static final int CHART_WIDTH = 720;
    private static final int CHART_HEIGHT = 430;

    /** File names (without extension) of the run-up page's charts, in order. */
    public static final List<String> RUN_UP_CHARTS = List.of("runup-response", "runup-stroke");

    private SheetFiles() {
    }

    /**
     * @param r the design
     * @param curves its curves
     * @return the charts the sheet prints: response (log axis) and stroke
     */
    public static List<XYChart> charts(DesignResult r, DesignCurves curves) {
        return charts(r, curves, AmplitudeConvention.PEAK);
    }

    /**
     * @param r the design
     * @param curves its curves
     * @param convention the convention the response is stated in (the stroke stays a peak)
     * @return the charts the sheet prints: response (log axis, with the criterion's limit when the
     *     study has one) and stroke
     */
    public static List<XYChart> charts(DesignResult r, DesignCurves curves, AmplitudeConvention convention) {
        return charts(r, curves, convention, UnitSystem.SI);
    }

    /**
     * @param r the design
     * @param curves its curves
     * @param convention the convention the response is stated in (the stroke stays a peak)
     * @param units the unit system of the charts' vertical axes
     * @return the charts the sheet prints: response and stroke
     */
    public static List<XYChart> charts(DesignResult r, DesignCurves curves, AmplitudeConvention convention,
            UnitSystem units) {
        return List.of(ChartFactory.response(r, curves, true, ChartTheme.LIGHT, convention, units, CHART_WIDTH,
                CHART_HEIGHT), ChartFactory.stroke(r, curves, false, ChartTheme.LIGHT, units, CHART_WIDTH, CHART_HEIGHT));
    }

    /**
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param pdf the PDF to write
     * @param date date of issue
     * @param revision revision mark
     * @param force true to replace an existing file
     * @param option the option the path came from (for messages)
     */
    public static void writeSheet(DesignDossier dossier, String notes, Path pdf, String date, String revision,
            boolean force, String option) {
        writeSheet(dossier, notes, pdf, date, revision, force, option, ProjectIdentity.EMPTY);
    }

    /**
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param pdf the PDF to write
     * @param date date of issue
     * @param revision revision mark
     * @param force true to replace an existing file
     * @param option the option the path came from (for messages)
     * @param identity the project's engineer and client or site
     */
    public static void writeSheet(DesignDossier dossier, String notes, Path pdf, String date, String revision,
            boolean force, String option, ProjectIdentity identity) {
        new Outputs(dossier).sheet(pdf, notes, date, revision, option, identity).write(force);
    }

    /**
     * The sheet as PDF bytes (the wizard's preview).
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param identity the project's engineer and client or site
     * @param out where the PDF goes
     * @throws IOException when the stream cannot be written
     */
    public static void writeSheet(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, OutputStream out) throws IOException {
        writeSheet(dossier, notes, date, revision, identity, List.of(), out);
    }

    /**
     * The sheet with further pages (the run-up page) as PDF bytes (the wizard's preview).
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param identity the project's engineer and client or site
     * @param panels further pages after the design's charts
     * @param out where the PDF goes
     * @throws IOException when the stream cannot be written
     */
    public static void writeSheet(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, List<SheetPanel> panels, OutputStream out) throws IOException {
        writeSheet(dossier, notes, date, revision, identity, panels, AmplitudeConvention.PEAK, out);
    }

    /**
     * The sheet with further pages, its response values in a convention, as PDF bytes.
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param identity the project's engineer and client or site
     * @param panels further pages after the design's charts
     * @param convention the convention response values are stated in
     * @param out where the PDF goes
     * @throws IOException when the stream cannot be written
     */
    public static void writeSheet(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, List<SheetPanel> panels, AmplitudeConvention convention, OutputStream out)
            throws IOException {
        writeSheet(dossier, notes, date, revision, identity, panels, convention, HardwareChoice.DEFAULT,
                UnitSystem.SI, null, out);
    }

    /**
     * The sheet with its hardware, as PDF bytes (the wizard's preview).
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param identity the project's identity
     * @param panels further pages after the design's charts
     * @param convention the convention response values are stated in
     * @param hardware the project's hardware choices (the realisation the sketch and part list show)
     * @param units the project's display units
     * @param measured where the structure's data came from when measured, or null when typed
     * @param out where the PDF goes
     * @throws IOException when the stream cannot be written
     */
    public static void writeSheet(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, List<SheetPanel> panels, AmplitudeConvention convention, HardwareChoice hardware,
            UnitSystem units, MeasuredSource measured, OutputStream out) throws IOException {
        writeSheet(dossier, notes, date, revision, identity, panels, convention, hardware, units, measured,
                Optional.empty(), out);
    }

    /**
     * The sheet of a project with several modes or absorbers, as PDF bytes (the wizard's preview).
     * @param dossier the design and its analyses
     * @param notes the project's notes, or empty
     * @param date date of issue
     * @param revision revision mark
     * @param identity the project's identity
     * @param panels further pages after the design's charts
     * @param convention the convention response values are stated in
     * @param hardware the project's hardware choices
     * @param units the project's display units
     * @param measured where the structure's data came from when measured, or null when typed
     * @param layout the project's modes and absorbers, or empty for one of each
     * @param out where the PDF goes
     * @throws IOException when the stream cannot be written
     */
    public static void writeSheet(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, List<SheetPanel> panels, AmplitudeConvention convention, HardwareChoice hardware,
            UnitSystem units, MeasuredSource measured, Optional<AbsorberLayout> layout, OutputStream out)
            throws IOException {
        List<XYChart> charts = charts(dossier.design(), dossier.curves(), convention, units);
        SheetWriter.write(() -> content(dossier, notes, date, revision, identity, convention, hardware, units,
                measured, layout), charts, panels, out);
    }

    private static SheetContent content(DesignDossier dossier, String notes, String date, String revision,
            ProjectIdentity identity, AmplitudeConvention convention, HardwareChoice hardware, UnitSystem units,
            MeasuredSource measured, Optional<AbsorberLayout> layout) {
        // the dossier's Monte Carlo, comparison and realisation: computed once for the project
        // state, whoever asked first
        if (layout.isPresent()) {
            SeveralAbsorbers several = SeveralAbsorbersDesigner.design(dossier.design(), layout.get());
            // where the several absorbers are, said first, after the project's notes
            String note = layout.get().count() > 1 ? SeveralAbsorbersContent.SHEET_SEVERAL_ABSORBERS
                    : SeveralAbsorbersContent.SHEET_SEVERAL_MODES;
            return SheetContent.of(dossier.design(), notes.isBlank() ? note : notes + " " + note, date, revision,
                    dossier.monteCarlo(ProgressListener.NONE),
                    identity, dossier.comparison(ProgressListener.NONE), convention, realisation(dossier, hardware),
                    units, measured, several, hardware);
        }
        return SheetContent.of(dossier.design(), notes, date, revision, dossier.monteCarlo(ProgressListener.NONE),
                identity, dossier.comparison(ProgressListener.NONE), convention, realisation(dossier, hardware),
                units, measured);
    }

    /** The realisation, or none when the hardware cannot be sized for this design (the report says why). */
    private static Optional<Realisation> realisation(DesignDossier dossier, HardwareChoice hardware) {
        try {
            return Optional.of(Realiser.realisation(dossier, hardware));
        } catch (CoreException unrealisable) {
            return Optional.empty();
        }
    }

    /**
     * Writes curves.csv, result.json, and response and stroke charts as PNG and SVG into a folder,
     * all or none.
     * @param dossier the design and its curves
     * @param dir the folder (created when missing)
     * @param force true to replace existing files
     * @param option the option the path came from
     * @return the files written
     */
    public static List<Path> writeExports(DesignDossier dossier, Path dir, boolean force, String option) {
        return new Outputs(dossier).data(dir, option).charts(dir, option).write(force);
    }

    /**
     * The files of one request (sheet, data, charts), written as one set: every file or none.
     * Before anything is written, every destination is checked (an existing file needs
     * {@code force}; only an ordinary file is ever replaced); on a failure the files already
     * there are left as they were and folders this request created are removed again.
     */
    public static final class Outputs {
        private final DesignDossier dossier;
        private final Map<Path, Planned> planned = new LinkedHashMap<>();
        private final Set<Path> folders = new LinkedHashSet<>();
        private final Map<Path, String> spared = new LinkedHashMap<>();
        private final List<SheetPanel> panels = new ArrayList<>();
        private List<XYChart> charts;
        private AmplitudeConvention convention = AmplitudeConvention.PEAK;
        private HardwareChoice hardware = HardwareChoice.DEFAULT;
        private UnitSystem units = UnitSystem.SI;
        private MeasuredSource measured;
        private Optional<AbsorberLayout> layout = Optional.empty();

        /** @param dossier the design whose sheet and exports are written, with its analyses */
        public Outputs(DesignDossier dossier) {
            this.dossier = dossier;
        }

        /**
         * @param display the convention response values are stated in, on the sheet, its charts
         *     and result.json (peak unless set)
         * @return this
         */
        public Outputs convention(AmplitudeConvention display) {
            this.convention = display;
            this.charts = null;
            return this;
        }

        /**
         * @param choice the project's hardware choices (what the sheet's sketch and part list show;
         *     {@link HardwareChoice#DEFAULT} unless set)
         * @param display the project's display units (SI unless set)
         * @return this
         */
        public Outputs hardware(HardwareChoice choice, UnitSystem display) {
            this.hardware = choice;
            this.units = display;
            this.charts = null;
            return this;
        }

        /**
         * @param source where the structure's data came from when measured, or null when typed
         * @return this
         */
        public Outputs measured(MeasuredSource source) {
            this.measured = source;
            return this;
        }

        /**
         * @param several the project's modes and absorbers (format 6), or empty for one mode and one
         *     absorber: the sheet then lists every absorber to build with its own parts
         * @return this
         */
        public Outputs absorbers(Optional<AbsorberLayout> several) {
            this.layout = several;
            return this;
        }

        /**
         * The sheet without project identity lines.
         * @param pdf the PDF
         * @param notes the project's notes, or empty
         * @param date date of issue
         * @param revision revision mark
         * @param option the option the path came from (for messages)
         * @return this
         */
        public Outputs sheet(Path pdf, String notes, String date, String revision, String option) {
            return sheet(pdf, notes, date, revision, option, ProjectIdentity.EMPTY);
        }

        /**
         * @param pdf the PDF
         * @param notes the project's notes, or empty
         * @param date date of issue
         * @param revision revision mark
         * @param option the option the path came from (for messages)
         * @param identity the project's engineer and client or site
         * @return this
         */
        public Outputs sheet(Path pdf, String notes, String date, String revision, String option,
                ProjectIdentity identity) {
            return add(pdf, "sheet", option, out -> SheetWriter.write(
                    () -> content(dossier, notes, date, revision, identity, convention, hardware, units, measured,
                            layout),
                    charts(),
                    panels, out));
        }

        /**
         * A further page of the sheet (the run-up page); its charts are written by {@link #charts}
         * too, named after the page ({@code runup-response}, {@code runup-stroke}).
         * @param panel the page
         * @return this
         */
        public Outputs panel(SheetPanel panel) {
            panels.add(panel);
            return this;
        }

        /**
         * A chart of another study as PNG and SVG in a folder, written with the set.
         * @param dir the folder (created when missing)
         * @param name the file name without extension
         * @param option the option the folder came from
         * @param chart the chart
         * @return this
         */
        public Outputs chart(Path dir, String name, String option, XYChart chart) {
            folders.add(dir);
            add(dir.resolve(name + ".png"), name + ".png", option, out -> ChartFiles.png(chart, out));
            return add(dir.resolve(name + ".svg"), name + ".svg", option, out -> ChartFiles.svg(chart, out));
        }

        /**
         * @param dir folder for curves.csv and result.json (created when missing)
         * @param option the option the folder came from
         * @return this
         */
        public Outputs data(Path dir, String option) {
            folders.add(dir);
            add(dir.resolve("curves.csv"), "curves.csv", option,
                    out -> out.write(CurveCsv.of(dossier.curves()).getBytes(StandardCharsets.UTF_8)));
            return add(dir.resolve("result.json"), "result.json", option,
                    out -> out.write(ResultJson.toJson(DesignContent.of(judged()).shownIn(convention))
                            .getBytes(StandardCharsets.UTF_8)));
        }

        /** The design, its criterion judged on the whole structure for several modes or absorbers (as the sheet). */
        private DesignResult judged() {
            DesignResult single = dossier.design();
            if (layout.isEmpty() || single.study().criterion().isEmpty()) {
                return single;
            }
            return SeveralAbsorbersDesigner.design(single, layout.get()).judged(single);
        }

        /**
         * @param dir folder for the response and stroke charts as PNG and SVG (created when missing)
         * @param option the option the folder came from
         * @return this
         */
        public Outputs charts(Path dir, String option) {
            folders.add(dir);
            add(dir.resolve("response.png"), "response.png", option, out -> ChartFiles.png(charts().get(0), out));
            add(dir.resolve("response.svg"), "response.svg", option, out -> ChartFiles.svg(charts().get(0), out));
            add(dir.resolve("stroke.png"), "stroke.png", option, out -> ChartFiles.png(charts().get(1), out));
            add(dir.resolve("stroke.svg"), "stroke.svg", option, out -> ChartFiles.svg(charts().get(1), out));
            for (SheetPanel panel : panels) {
                List<XYChart> extra = panel.charts();
                for (int i = 0; i < Math.min(extra.size(), RUN_UP_CHARTS.size()); i++) {
                    chart(dir, RUN_UP_CHARTS.get(i), option, extra.get(i));
                }
            }
            return this;
        }

        /**
         * A file no output may replace, even with force (the project being read, say).
         * @param kept the file
         * @param what what it is, for the message
         * @return this
         */
        public Outputs sparing(Path kept, String what) {
            spared.put(kept, what);
            return this;
        }

        /** @return the files this request writes, in order */
        public List<Path> paths() {
            return List.copyOf(planned.keySet());
        }

        /**
         * @param force true to replace existing files
         * @return the files written
         * @throws InvalidInputException naming the option and the path when a file must not be
         *     replaced or cannot be written; nothing is then changed
         */
        public List<Path> write(boolean force) {
            return write(force, (index, body) -> body);
        }

        /** @param decorate wraps the body of the file at an index (tests inject failures with it) */
        List<Path> write(boolean force, BiFunction<Integer, AtomicFiles.Body, AtomicFiles.Body> decorate) {
            for (Planned p : planned.values()) {
                checkSpared(p);
                checkTarget(p.path, force, p.option);
            }
            List<Path> created = new ArrayList<>();
            for (Path dir : folders) {
                createFolder(dir, optionFor(dir), created);
            }
            List<AtomicFiles.Entry> entries = new ArrayList<>();
            int index = 0;
            for (Planned p : planned.values()) {
                entries.add(new AtomicFiles.Entry(p.path, decorate.apply(index++, p.body)));
            }
            boolean done = false;
            try {
                AtomicFiles.writeAll(entries);
                done = true;
            } catch (FileWriteException e) {
                Planned failed = planned.get(e.path());
                throw new InvalidInputException(failed == null ? "output" : failed.option, e.path().toString(),
                        e.problem());
            } finally {
                if (!done) {
                    removeEmpty(created);
                }
            }
            return paths();
        }

        private void checkSpared(Planned p) {
            for (Map.Entry<Path, String> kept : spared.entrySet()) {
                try {
                    if (Files.exists(p.path) && Files.isSameFile(p.path, kept.getKey())) {
                        throw new InvalidInputException(p.option, p.path.toString(),
                                "is " + kept.getValue() + "; choose another name");
                    }
                } catch (IOException unreadable) {
                    // a path that cannot be examined is reported by the write itself
                }
            }
        }

        private Outputs add(Path path, String kind, String option, AtomicFiles.Body body) {
            Planned before = planned.get(path);
            if (before == null) {
                planned.put(path, new Planned(path, kind, option, body));
            } else if (!before.kind.equals(kind)) {
                throw new InvalidInputException(option, path.toString(), "is also where the " + before.kind
                        + " goes (" + before.option + "); give another name");
            }
            return this;
        }

        private String optionFor(Path dir) {
            for (Planned p : planned.values()) {
                if (dir.equals(p.path.getParent())) {
                    return p.option;
                }
            }
            return "output";
        }

        private List<XYChart> charts() {
            if (charts == null) {
                charts = SheetFiles.charts(dossier.design(), dossier.curves(), convention, units);
            }
            return charts;
        }
    }

    private record Planned(Path path, String kind, String option, AtomicFiles.Body body) {
    }

    private static void checkTarget(Path target, boolean force, String option) {
        if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            try {
                AtomicFiles.checkReplaceable(target);
            } catch (FileWriteException e) {
                throw new InvalidInputException(option, target.toString(), e.problem());
            }
            if (!force) {
                throw new InvalidInputException(option, target.toString(),
                        "already exists; add --force to replace it, or choose another name");
            }
        }
    }

    /** Creates a folder and its missing parents, noting each one created (outermost first). */
    private static void createFolder(Path dir, String option, List<Path> created) {
        if (Files.isDirectory(dir)) {
            return;
        }
        if (Files.exists(dir)) {
            throw new InvalidInputException(option, dir.toString(), "is a file, not a folder; give a folder");
        }
        List<Path> missing = new ArrayList<>();
        for (Path p = dir.toAbsolutePath(); p != null && !Files.exists(p, LinkOption.NOFOLLOW_LINKS); p = p.getParent()) {
            missing.add(0, p);
        }
        try {
            Files.createDirectories(dir);
            created.addAll(missing);
        } catch (IOException e) {
            throw new InvalidInputException(option, dir.toString(),
                    "cannot be written here (" + PlainMessages.writeFailure(e) + ")");
        }
    }

    /** Removes folders this request created, innermost first, as long as they are empty. */
    private static void removeEmpty(List<Path> created) {
        for (int i = created.size() - 1; i >= 0; i--) {
            try {
                Files.deleteIfExists(created.get(i));
            } catch (IOException notEmptyOrGone) {
                return;
            }
        }
    }
}
