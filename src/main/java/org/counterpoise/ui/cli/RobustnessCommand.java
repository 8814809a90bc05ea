package org.counterpoise.ui.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.design.RobustnessResult;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.progress.ProgressListener;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.export.RobustnessJson;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.text.RobustnessReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code robustness FILE}: sensitivity, worst case, robust design and Monte Carlo of the project's design. */
@Command(name = "robustness", mixinStandardHelpOptions = true, sortOptions = false,
        description = "How the project's design fares when structure and absorber are mistuned.")
public final class RobustnessCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "project file (JSON)")
    private Path file;

    @Option(names = "--samples", paramLabel = "N", description = "Monte Carlo samples (default: the project's, or 10000)")
    private Integer samples;

    @Option(names = "--seed", paramLabel = "S", description = "Monte Carlo seed (default: the project's, or 1)")
    private Long seed;

    @Option(names = "--json", description = "print one JSON object (SI units)")
    private boolean json;

    @Option(names = "--convention", paramLabel = "peak|rms|peak-to-peak", description = DisplayConvention.HELP)
    private AmplitudeConvention convention;

    @Option(names = "--units", paramLabel = "si|us", description = DisplayUnitSystem.HELP)
    private UnitSystem units;

    @Override
    public Integer call() {
        LoadedProject loaded = ProjectFiles.readForOneAbsorber(spec, file);
        DesignStudy study = loaded.project().toStudy();
        RobustnessSettings s = study.robustness();
        if (samples != null) {
            Checks.inRange("--samples", samples, 1, 1_000_000);
        }
        RobustnessSettings used = s.withSampling(samples == null ? s.samples() : samples,
                seed == null ? s.seed() : seed);
        // the sample count and seed move no part of the design itself, only its Monte Carlo
        DesignDossier dossier = DesignDossier.of(study.withRobustness(used));
        DesignResult design = dossier.design();
        RobustnessResult r = dossier.robustness(ProgressListener.NONE);
        AmplitudeConvention display = DisplayConvention.of(convention, loaded.project());
        spec.commandLine().getOut().print(PlainText.forTerminal(json ? RobustnessJson.toJson(design, r, display)
                : RobustnessReport.render(design, r, display, DisplayUnitSystem.of(units, loaded.project()))));
        spec.commandLine().getOut().flush();
        return 0;
    }
}
