package org.counterpoise.ui.cli;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.sheet.RunUpPanel;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.text.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheet FILE -o OUT.pdf}: the PDF parameter sheet, and optionally the curve and chart exports. */
@Command(name = "sheet", mixinStandardHelpOptions = true, sortOptions = false,
        description = "Write the PDF parameter sheet of a project's design (and, on request, curves and charts).")
public final class SheetCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON)")
    private Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT.pdf", required = true, description = "the PDF to write")
    private Path output;

    @Option(names = "--csv", paramLabel = "DIR",
            description = "also write curves.csv and result.json into DIR (with the sheet: all files or none)")
    private Path csvDir;

    @Option(names = "--plots", paramLabel = "DIR",
            description = "also write the charts as PNG and SVG (and the CSV and JSON) into DIR")
    private Path plotsDir;

    @Option(names = "--revision", paramLabel = "REV",
            description = "revision mark (default: the project's revision, else A)")
    private String revision;

    @Option(names = "--date", paramLabel = "YYYY-MM-DD", description = "date of issue (default: the project's date, else today)")
    private LocalDate date;

    @Option(names = "--force", description = "replace files that already exist")
    private boolean force;

    @Option(names = "--convention", paramLabel = "peak|rms|peak-to-peak", description = DisplayConvention.HELP)
    private AmplitudeConvention convention;

    @Option(names = "--units", paramLabel = "si|us", description = DisplayUnitSystem.HELP)
    private UnitSystem units;

    @Override
    public Integer call() {
        if (revision != null && (revision.length() > 20 || !revision.equals(PlainText.escape(revision)))) {
            throw new InvalidInputException("--revision", "\"" + PlainText.quote(revision) + "\"",
                    "a short mark of at most 20 characters without control characters, such as A or 2b");
        }
        LoadedProject loaded = ProjectFiles.read(spec, file);
        // several modes or absorbers (format 6): the sheet lists every absorber to build
        Optional<AbsorberLayout> layout = SeveralModes.layout(loaded.project());
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        dossier.design(); // a design that cannot be made is reported before any file is touched
        var identity = loaded.project().identity();
        String issued = date != null ? date.toString()
                : identity.date().isEmpty() ? LocalDate.now().toString() : identity.date();
        String mark = revision != null ? revision : identity.revision().isEmpty() ? "A" : identity.revision();
        // The sheet and every export are one set: all are written, or none and nothing changes.
        SheetFiles.Outputs outputs = new SheetFiles.Outputs(dossier)
                .convention(DisplayConvention.of(convention, loaded.project()))
                .hardware(loaded.project().hardware(), DisplayUnitSystem.of(units, loaded.project()))
                .measured(loaded.project().structure().measured())
                .absorbers(layout)
                .sheet(output, loaded.project().notes(), issued, mark, "--output", identity)
                .sparing(file, "the project file being read")
                .panel(RunUpPanel.of(loaded.project().withDisplayUnits(DisplayUnitSystem.of(units, loaded.project())),
                        dossier.design(), ProgressListener.NONE));
        if (csvDir != null) {
            outputs.data(csvDir, "--csv");
        }
        if (plotsDir != null) {
            outputs.data(plotsDir, "--plots").charts(plotsDir, "--plots");
        }
        var out = spec.commandLine().getOut();
        for (Path p : outputs.write(force)) {
            out.println("wrote " + PlainText.escape(p.toString()));
        }
        out.flush();
        return 0;
    }
}
