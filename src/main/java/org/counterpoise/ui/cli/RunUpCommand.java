package org.counterpoise.ui.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.RunUpStudy;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.core.runup.RunUpReportData;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.chart.RunUpCharts;
import org.counterpoise.io.export.RunUpJson;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.sheet.RunUpPanel;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.sheet.SheetPanel;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.RunUpReport;
import org.counterpoise.io.text.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code runup FILE}: designs the absorber of a project file, then runs the machine up through
 * resonance (or down from running speed) in the time domain, with and without the absorber.
 */
@Command(name = "runup", mixinStandardHelpOptions = true,
        description = {"Run the machine up from rest (or down from running speed) at a constant shaft acceleration"
            + " and report the peak response met on the way, with and without the absorber, beside the"
            + " steady-state peaks (or JSON with --json). See docs/runup.md."})
public final class RunUpCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON, see docs/project-file.md)")
    private Path file;

    @Option(names = "--rate", paramLabel = "RPM_PER_S",
            description = "shaft speed change per second, rpm/s (default: disturbance.run_up_rate in the file)")
    private Double rate;

    @Option(names = "--final-speed", paramLabel = "RPM",
            description = "shaft speed the run-up ends at (or the run-down starts from), rpm"
                    + " (default: 1.25 x the top running speed)")
    private Double finalSpeed;

    @Option(names = "--run-down", description = "run down from steady running at the final speed to rest instead")
    private boolean runDown;

    @Option(names = "--json", description = "print the result as one JSON object with SI units in the key names")
    private boolean json;

    @Option(names = "--plots", paramLabel = "DIR",
            description = "also write the envelope charts runup-response and runup-stroke as PNG and SVG into DIR")
    private Path plotsDir;

    @Option(names = "--force", description = "replace chart files that already exist")
    private boolean force;

    @Option(names = "--units", paramLabel = "si|us", description = DisplayUnitSystem.HELP)
    private UnitSystem units;

    @Override
    public Integer call() {
        LoadedProject loaded = ProjectFiles.readForOneAbsorber(spec, file);
        Project project = loaded.project();
        DesignDossier dossier = DesignDossier.of(project.toStudy());
        DesignResult design = dossier.design();
        double order = project.disturbance().harmonicOrder();
        double shaftRate = shaftRate(project);
        double topShaft = RunUpStudy.topShaftSpeed(design, order);
        double finalShaft = RunUpStudy.defaultFinalShaftSpeed(design, order);
        if (finalSpeed != null) {
            if (finalSpeed <= 0.0 || Unit.REV_PER_MINUTE.toSi(finalSpeed) > 10.0 * topShaft) {
                throw new InvalidInputException("--final-speed", Checks.show(finalSpeed),
                        "a shaft speed in rpm above 0 and at most 10 times the top running speed ("
                                + QuantityFormat.format(10.0 * topShaft, Unit.REV_PER_MINUTE) + ")");
            }
            finalShaft = Unit.REV_PER_MINUTE.toSi(finalSpeed);
        }
        RunUpStudy.Result result;
        try {
            result = new RunUpStudy(design, order, shaftRate, finalShaft, runDown).run(ProgressListener.NONE);
        } catch (InvalidInputException e) {
            throw switch (e.field()) {
                case "run_up.rate" -> e.renamed(rate != null ? "--rate" : "disturbance.run_up_rate");
                case "run_up.final_speed" -> e.renamed(finalSpeed != null ? "--final-speed" : "disturbance");
                default -> e;
            };
        }
        RunUpReportData data = result.data();
        var out = spec.commandLine().getOut();
        UnitSystem shown = DisplayUnitSystem.of(units, project);
        out.print(json ? RunUpJson.toJson(data) : RunUpReport.render(data, shown));
        if (plotsDir != null) {
            Unit speedUnit = RunUpCharts.speedUnit(project.disturbance());
            SheetPanel panel = RunUpPanel.of(result, speedUnit, shown);
            SheetFiles.Outputs outputs = new SheetFiles.Outputs(dossier).sparing(file, "the project file being read");
            for (int i = 0; i < SheetFiles.RUN_UP_CHARTS.size(); i++) {
                outputs.chart(plotsDir, SheetFiles.RUN_UP_CHARTS.get(i), "--plots", panel.charts().get(i));
            }
            List<Path> written = outputs.write(force);
            if (!json) {
                // with --json, stdout stays one JSON object
                for (Path p : written) {
                    out.println("wrote " + PlainText.escape(p.toString()));
                }
            }
        }
        out.flush();
        return 0;
    }

    /** @return the shaft's angular acceleration, rad/s^2, from --rate or the file */
    private double shaftRate(Project project) {
        if (rate != null) {
            if (rate <= 0.0) {
                throw new InvalidInputException("--rate", Checks.show(rate),
                        "a shaft speed change per second in rpm/s, greater than 0");
            }
            return Unit.RPM_PER_SECOND.toSi(rate);
        }
        return project.runUpRate().orElseThrow(() -> InvalidInputException.missing("--rate",
                "give the shaft speed change per second in rpm/s with --rate, or disturbance.run_up_rate in the file"));
    }
}
