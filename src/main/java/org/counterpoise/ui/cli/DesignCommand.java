package org.counterpoise.ui.cli;

import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.MethodComparison;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.export.ResultJson;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.text.ComparisonContent;
import org.counterpoise.io.text.DesignContent;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.io.text.HardwareContent;
import org.counterpoise.io.text.MeasuredSourceContent;
import org.counterpoise.io.text.ReportContent;
import org.counterpoise.io.text.SeveralAbsorbersContent;
import org.counterpoise.io.text.UnitSystem;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code design FILE}: designs the absorber described by a project file and prints the report. */
@Command(name = "design", mixinStandardHelpOptions = true,
        description = "Design the absorber for a project file and print the report (or JSON with --json).")
public final class DesignCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON, see docs/project-file.md)")
    private Path file;

    @Option(names = "--json", description = "print the result as one JSON object with SI units in the key names")
    private boolean json;

    @Option(names = "--convention", paramLabel = "peak|rms|peak-to-peak", description = DisplayConvention.HELP)
    private AmplitudeConvention convention;

    @Option(names = "--units", paramLabel = "si|us", description = DisplayUnitSystem.HELP)
    private UnitSystem units;

    @Override
    public Integer call() {
        LoadedProject loaded = ProjectFiles.read(spec, file);
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        // the comparison first: it makes the design on this thread while the other methods' run
        MethodComparison comparison = dossier.comparison(ProgressListener.NONE);
        DesignResult designed0 = dossier.design();
        // several modes or absorbers (format 6): their own section; a project of one of each has none
        Optional<SeveralAbsorbers> several = SeveralModes.layout(loaded.project())
                .map(layout -> SeveralAbsorbersDesigner.design(designed0, layout));
        // the criterion is judged on the whole structure with every absorber, not on the target mode alone
        DesignResult result = several.map(d -> d.judged(designed0)).orElse(designed0);
        // the JSON is SI whatever the display: its keys name SI units, its words follow them
        UnitSystem shown = json ? UnitSystem.SI : DisplayUnitSystem.of(units, loaded.project());
        ReportContent designed = DesignContent.of(result, json ? ProjectIdentity.EMPTY : loaded.project().identity(),
                Optional.empty(), shown).with(ComparisonContent.of(comparison, result.study()));
        ReportContent withHardware = HardwareContent.with(MeasuredSourceContent.with(designed,
                loaded.project().structure().measured()), dossier, loaded.project().hardware());
        // each absorber of a set as it works within the set: the figures its parts are sized from
        ReportContent content = several.map(d -> SeveralAbsorbersContent.with(withHardware, d, d.absorbers().size() > 1
                ? Optional.of(AbsorbersToBuild.of(result, d)) : Optional.empty())).orElse(withHardware)
                .shownIn(DisplayConvention.of(convention, loaded.project()));
        // the report's other sections are for one absorber of the total mass: said first, not only in the cautions
        String first = several.isPresent() && !json ? "Note: this project has several modes or absorbers. The"
                + " absorbers to build are in \"Several absorbers and modes\"; the other sections (absorber, parts,"
                + " checks, procedure) are for one absorber of the total mass on the target mode alone.\n\n" : "";
        spec.commandLine().getOut().print(PlainText.forTerminal(json ? ResultJson.toJson(content)
                : first + DesignReport.render(content)));
        spec.commandLine().getOut().flush();
        return 0;
    }
}
