package org.counterpoise.ui.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.Realiser;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.chart.SiteCheckCharts;
import org.counterpoise.io.commission.SetSiteRun;
import org.counterpoise.io.commission.SiteCheck;
import org.counterpoise.io.commission.SiteCheckJson;
import org.counterpoise.io.commission.SiteCheckReport;
import org.counterpoise.io.commission.SiteCheckRun;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.measurement.SpectrumCsv;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.SeveralModes;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code site-check PROJECT}: the project's design against what is measured on site: an operating
 * spectrum at running speed ({@code --operating}) and the frequency response with the absorber
 * fitted ({@code --fitted-frf}), with the absorber as built and the trim that brings it to the design.
 */
@Command(name = "site-check", mixinStandardHelpOptions = true,
        description = {"Check a project's design against site measurements at the absorber's point: an operating"
            + " spectrum at running speed against the model's prediction (--operating), and the frequency response"
            + " measured with the absorber fitted against the design, with the absorber as built and the trim plates"
            + " that bring it to the design (--fitted-frf). See docs/identify.md."})
public final class SiteCheckCommand implements Callable<Integer> {
    private static final int CHART_WIDTH = 800;
    private static final int CHART_HEIGHT = 500;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "PROJECT", description = "project file (JSON, see docs/project-file.md)")
    private Path file;

    @Option(names = "--operating", paramLabel = "FILE.csv",
            description = "operating spectrum at the absorber's point: frequency_Hz, amplitude")
    private Path operating;

    @Option(names = "--spectrum-units", paramLabel = "UNIT",
            description = "unit of the spectrum's amplitudes; it says the quantity: displacement (um, mm, m, in, mil),"
                    + " velocity (mm/s, m/s, in/s) or acceleration (m/s^2, g) (default mm/s)")
    private String spectrumUnits = "mm/s";

    @Option(names = "--convention", paramLabel = "peak|rms|peak-to-peak",
            description = "how the spectrum's amplitudes are stated (default rms, as vibration meters read)")
    private AmplitudeConvention convention = AmplitudeConvention.RMS;

    @Option(names = "--running-frequency", paramLabel = "HZ",
            description = "the running (forcing) frequency, Hz (default: the largest line in the project's band)")
    private Double running;

    @Option(names = "--with-absorber", description = "the spectrum was measured with the absorber fitted")
    private boolean withAbsorber;

    @Option(names = "--fitted-frf", paramLabel = "FILE.csv",
            description = "driving-point FRF at the absorber's point with the absorber fitted (as identify reads)")
    private Path fittedFrf;

    @Option(names = "--kind", paramLabel = "receptance|mobility|accelerance",
            description = "what the FRF measures per force (default accelerance)")
    private String kind;

    @Option(names = "--frf-units", paramLabel = "RESPONSE/FORCE",
            description = "unit of the FRF's values, e.g. m/N, mm/s/N, g/N, m/s^2/N, in/lbf (default: SI of the kind)")
    private String frfUnits;

    @Option(names = "--band", paramLabel = "LO:HI", description = "use only the FRF's lines from LO to HI Hz")
    private String band;

    @Option(names = "--free-structure",
            description = "fit the structure's natural frequency too (when it was not measured with the absorber locked)")
    private boolean freeStructure;

    @Option(names = "--absorber-mass", paramLabel = "KG", split = "[,;]",
            description = "the absorber's mass as weighed with its fitted plates, kg (default: the design's); for"
                    + " several absorbers one mass per absorber, in the design's order, separated by commas or"
                    + " semicolons (as the wizard takes them)")
    private List<Double> absorberMass;

    @Option(names = "--json", description = "print the result as one JSON object with SI units in the key names")
    private boolean json;

    @Option(names = "--plot", paramLabel = "FILE.png|FILE.svg",
            description = "with --fitted-frf: draw the measured magnitude with the design's and the as-built model's")
    private Path plot;

    @Option(names = "--force", description = "replace a chart file that already exists")
    private boolean force;

    private List<Double> weighed(int absorbers) {
        if (absorberMass == null) {
            return List.of();
        }
        if (absorberMass.size() != absorbers) {
            throw new InvalidInputException("--absorber-mass", absorberMass.size() + (absorberMass.size() == 1
                    ? " mass" : " masses"),
                    absorbers == 1 ? "one mass, kg" : absorbers + " masses, kg, one per absorber in the design's order,"
                            + " separated by commas or semicolons");
        }
        absorberMass.forEach(m -> Checks.positive("--absorber-mass", m));
        return List.copyOf(absorberMass);
    }

    @Override
    public Integer call() {
        if (plot != null) {
            PlotFiles.svg("--plot", plot);
            if (fittedFrf == null) {
                throw new InvalidInputException("--plot", PlainText.escape(plot.toString()),
                        "a chart of the response with the absorber fitted: give --fitted-frf too");
            }
        }
        if (operating == null && fittedFrf == null) {
            throw InvalidInputException.missing("--operating or --fitted-frf",
                    "an operating spectrum (--operating FILE.csv), a response with the absorber fitted"
                            + " (--fitted-frf FILE.csv), or both");
        }
        LoadedProject loaded = ProjectFiles.read(spec, file);
        DesignDossier dossier = DesignDossier.of(loaded.project().toStudy());
        DesignResult design = dossier.design();
        Optional<AbsorberLayout> layout = SeveralModes.layout(loaded.project());
        if (layout.isPresent() && layout.get().joint().isPresent()) {
            throw new InvalidInputException("absorbers.arrangement", "\"one-per-mode\"", "absorbers all on one"
                    + " mode for site-check: one absorber per mode is not yet checked against a measurement");
        }
        if (layout.isPresent()) {
            return several(loaded, design, SeveralAbsorbersDesigner.design(design, layout.get()));
        }
        Realisation realisation = Realiser.realisation(dossier, loaded.project().hardware());
        Optional<SiteCheckRun.OperatingInput> op = operatingInput();
        Optional<SiteCheckRun.FittedInput> fit = Optional.empty();
        if (fittedFrf != null) {
            FrfUnit unit = frfUnit();
            fit = Optional.of(new SiteCheckRun.FittedInput(fittedFrf, unit,
                    all -> band == null ? all : FrfOptions.band("--band", band, all), freeStructure,
                    weighed(1).stream().mapToDouble(Double::doubleValue).findFirst()));
        }
        SiteCheck check = SiteCheckRun.run(loaded.project().name(), design, realisation,
                loaded.project().displayUnits(), op, fit);
        Optional<SiteCheck.Fitted> fitted = check.fitted();
        List<String> wrote = plot == null ? List.of() : PlotFiles.write("--plot", List.of(plot),
                List.of(SiteCheckCharts.magnitude(fitted.get().lines(), design.study().structure(), design.tuning(),
                        fitted.get().check().built(), fitted.get().unit(), CHART_WIDTH, CHART_HEIGHT)),
                force, List.of(fittedFrf, file));
        PrintWriter out = spec.commandLine().getOut();
        out.print(PlainText.forTerminal(json ? SiteCheckJson.toJson(check) : SiteCheckReport.render(check)));
        // with --json the standard output is the JSON alone; what was written goes to standard error
        PrintWriter notes = json ? spec.commandLine().getErr() : out;
        wrote.forEach(notes::println);
        out.flush();
        notes.flush();
        return 0;
    }

    /** The kind and unit of the fitted response's values, from --kind and --frf-units. */
    private FrfUnit frfUnit() {
        FrfKind k = FrfOptions.kind("--kind", kind);
        return frfUnits == null ? FrfUnit.si(k) : FrfUnit.parse(frfUnits, k, "--frf-units");
    }

    /** The operating spectrum's options, when a spectrum was given. */
    private Optional<SiteCheckRun.OperatingInput> operatingInput() {
        if (operating == null) {
            return Optional.empty();
        }
        OptionalDouble at = OptionalDouble.empty();
        if (running != null) {
            Checks.positive("--running-frequency", running);
            at = OptionalDouble.of(Unit.HERTZ.toSi(running));
        }
        return Optional.of(new SiteCheckRun.OperatingInput(operating, SpectrumCsv.unit(spectrumUnits,
                "--spectrum-units"), convention, at, withAbsorber));
    }

    /**
     * Several modes or absorbers (format 6): the operating spectrum at the response point against the
     * whole structure's model, and the response with them fitted, each absorber as built.
     */
    private Integer several(LoadedProject loaded, DesignResult single, SeveralAbsorbers design) {
        Optional<SetSiteRun.FittedInput> fitted = Optional.empty();
        if (fittedFrf != null) {
            FrfUnit unit = frfUnit();
            fitted = Optional.of(new SetSiteRun.FittedInput(fittedFrf, unit,
                    all -> band == null ? all : FrfOptions.band("--band", band, all), freeStructure,
                    weighed(design.absorbers().size())));
        }
        SetSiteRun run = SetSiteRun.run(loaded.project().name(), single, design, loaded.project().hardware(),
                loaded.project().displayUnits(), operatingInput(), fitted);
        List<String> wrote = plot == null || run.fitted().isEmpty() ? List.of() : PlotFiles.write("--plot",
                List.of(plot), List.of(SiteCheckCharts.setMagnitude(run.fitted().get().lines(), design,
                        run.fitted().get().check().built(), run.fitted().get().unit(), CHART_WIDTH, CHART_HEIGHT)),
                force, List.of(fittedFrf, file));
        PrintWriter out = spec.commandLine().getOut();
        out.print(PlainText.forTerminal(json ? run.json() : run.report()));
        // with --json the standard output is the JSON alone; what was written goes to standard error
        PrintWriter notes = json ? spec.commandLine().getErr() : out;
        wrote.forEach(notes::println);
        out.flush();
        notes.flush();
        return 0;
    }
}
