package org.counterpoise.ui.cli;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.concurrent.Callable;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.Designer;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.sheet.SheetFiles;
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
            description = "also write curves.csv and result.json into DIR")
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

    @Override
    public Integer call() {
        LoadedProject loaded = ProjectFiles.read(spec, file);
        DesignResult result = Designer.design(loaded.project().toStudy());
        var identity = loaded.project().identity();
        String issued = date != null ? date.toString()
                : identity.date().isEmpty() ? LocalDate.now().toString() : identity.date();
        String mark = revision != null ? revision : identity.revision().isEmpty() ? "A" : identity.revision();
        SheetFiles.writeSheet(result, loaded.project().notes(), output, issued, mark, force, "--output", identity);
        var out = spec.commandLine().getOut();
        out.println("wrote " + output);
        for (Path dir : new Path[] {csvDir, plotsDir}) {
            if (dir != null) {
                for (Path p : SheetFiles.writeExports(result, dir, force, dir == csvDir ? "--csv" : "--plots")) {
                    out.println("wrote " + p);
                }
            }
        }
        out.flush();
        return 0;
    }
}
