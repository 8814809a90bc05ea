package org.counterpoise.ui.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.AddedMass;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.LogDecrement;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.identify.ModeShapeRatio;
import org.counterpoise.core.identify.RationalFraction;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.FileWriteException;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.chart.IdentificationCharts;
import org.counterpoise.io.measurement.DecayCsv;
import org.counterpoise.io.measurement.FrfCsv;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.measurement.Identification;
import org.counterpoise.io.measurement.IdentificationJson;
import org.counterpoise.io.measurement.IdentificationReport;
import org.counterpoise.io.measurement.StructureFromMeasurement;
import org.counterpoise.io.text.QuantityFormat;
import org.knowm.xchart.XYChart;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code identify FILE.csv}: the structure's modes from a measured FRF, a free decay
 * ({@code --decay}) or two natural frequencies around an added mass ({@code --added-mass}).
 */
@Command(name = "identify", mixinStandardHelpOptions = true,
        description = {"Identify the structure's mode (natural frequency, damping ratio, modal mass at the point)"
            + " from a measured frequency response (CSV), a free decay (--decay) or two natural frequencies"
            + " around a known added mass (--added-mass); report the values with their uncertainties (or JSON"
            + " with --json), draw measured and fitted curves, and put the chosen mode into a project file."
            + " See docs/identify.md."})
public final class IdentifyCommand implements Callable<Integer> {
    private static final int CHART_WIDTH = 800;
    private static final int CHART_HEIGHT = 500;

    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE",
            description = "measurement (CSV): frequency_Hz with real,imag or magnitude,phase_deg (and coherence);"
                    + " with --decay: time_s and the response")
    private Path file;

    @Option(names = "--kind", paramLabel = "receptance|mobility|accelerance",
            description = "what the FRF measures per force (default: accelerance, as an impact test with an"
                    + " accelerometer gives)")
    private String kind;

    @Option(names = "--units", paramLabel = "RESPONSE/FORCE",
            description = "unit of the FRF's values, e.g. m/N, mm/s/N, g/N, m/s^2/N, in/lbf, in/s/lbf, g/lbf"
                    + " (default: the SI unit of the kind)")
    private String units;

    @Option(names = "--band", paramLabel = "LO:HI", description = "fit only the lines from LO to HI Hz")
    private String band;

    @Option(names = "--modes", paramLabel = "N", description = "number of modes in the band, 1 to 4 (default 1)")
    private int modes = 1;

    @Option(names = "--no-residuals", description = "fit no residual terms for the modes outside the band")
    private boolean noResiduals;

    @Option(names = "--decay", description = "FILE is a free-decay record: logarithmic decrement")
    private boolean decay;

    @Option(names = "--cycles", paramLabel = "N", description = "with --decay: cycles to use (default: all found)")
    private int cycles;

    @Option(names = "--added-mass", paramLabel = "KG", description = "mass added at the point, kg (with --frequencies)")
    private Double addedMass;

    @Option(names = "--frequencies", paramLabel = "F1,F2",
            description = "natural frequencies in Hz without and with the added mass")
    private String frequencies;

    @Option(names = "--json", description = "print the result as one JSON object with SI units in the key names")
    private boolean json;

    @Option(names = "--plot", paramLabel = "FILE.png|FILE.svg",
            description = "draw measured and fitted magnitude into FILE and phase into FILE-phase (same type)")
    private Path plot;

    @Option(names = "--force", description = "replace chart files that already exist")
    private boolean force;

    @Option(names = "--write-structure", paramLabel = "PROJECT.json",
            description = "put the identified mode into the structure section of this project file")
    private Path project;

    @Option(names = "--mode", paramLabel = "K", description = "with --write-structure: which mode, 1 = lowest (default 1)")
    private int mode = 1;

    @Option(names = "--transfer", paramLabel = "FILE.csv",
            description = "a transfer FRF between the measured point and the absorber's point (same kind, units,"
                    + " band and modes): the mode shape there relative to the measured point; --write-structure"
                    + " then writes the mode as the absorber's point sees it")
    private Path transfer;

    @Override
    public Integer call() throws IOException {
        Identification result = identify();
        ModeShapeRatio shape = transfer == null ? null : shapeAtTransferPoint(result);
        PrintWriter out = spec.commandLine().getOut();
        List<String> notes = new ArrayList<>();
        if (plot != null) {
            notes.addAll(writePlots(result));
        }
        if (project != null) {
            notes.add(writeStructure(result, shape));
        }
        if (shape == null) {
            out.print(json ? IdentificationJson.toJson(result) : IdentificationReport.render(result));
        } else {
            String name = PlainText.escape(transfer.toString());
            out.print(json ? IdentificationJson.toJson(result, transfer.toString(), mode, shape)
                    : IdentificationReport.render(result) + IdentificationReport.transfer(name, mode, shape));
        }
        if (!json) { // with --json, stdout stays one JSON object
            notes.forEach(out::println);
        }
        out.flush();
        return 0;
    }

    private Identification identify() {
        if (addedMass != null || frequencies != null) {
            if (file != null) {
                throw new InvalidInputException("FILE", PlainText.escape(file.toString()),
                        "no measurement file with --added-mass and --frequencies (they are the whole input)");
            }
            return addedMass();
        }
        if (file == null) {
            throw InvalidInputException.missing("FILE", "a measurement file (CSV), or --added-mass with --frequencies");
        }
        if (decay) {
            double[][] tx = DecayCsv.read(file);
            try {
                return new Identification.Decay(file.toString(), LogDecrement.of(tx[0], tx[1], cycles));
            } catch (InvalidInputException e) {
                throw e.field().equals("cycles") ? e.renamed("--cycles") : e.renamed(file + " (" + e.field() + ")");
            }
        }
        FrfKind k = FrfOptions.kind("--kind", kind);
        FrfUnit unit = units == null ? FrfUnit.si(k) : FrfUnit.parse(units, k, "--units");
        MeasuredFrf all = FrfCsv.read(file, unit);
        if (modes < 1 || modes > RationalFraction.MAX_MODES) {
            throw new InvalidInputException("--modes", Integer.toString(modes), "1 to " + RationalFraction.MAX_MODES);
        }
        try {
            MeasuredFrf fitted = band == null ? all : FrfOptions.band("--band", band, all);
            return Identification.Frf.fit(file.toString(), unit, fitted, modes, !noResiduals);
        } catch (InvalidInputException e) {
            throw switch (e.field()) {
                case "modes" -> e.renamed("--modes");
                case "band" -> e.renamed(band == null ? "--band (the whole file)" : "--band");
                default -> e;
            };
        }
    }

    private Identification addedMass() {
        if (addedMass == null || frequencies == null) {
            throw InvalidInputException.missing(addedMass == null ? "--added-mass" : "--frequencies",
                    "both --added-mass KG and --frequencies F1,F2 (Hz, without and with the mass)");
        }
        String[] parts = frequencies.split(",", -1);
        if (parts.length != 2) {
            throw new InvalidInputException("--frequencies", Converters.shown(frequencies),
                    "two natural frequencies in Hz, F1,F2, without and then with the added mass");
        }
        double[] f = new double[2];
        for (int i = 0; i < 2; i++) {
            try {
                f[i] = Converters.real(parts[i]);
            } catch (RuntimeException e) {
                throw new InvalidInputException("--frequencies", Converters.shown(frequencies),
                        "two numbers in Hz separated by a comma, such as 23.1,21.4");
            }
        }
        try {
            AddedMass a = AddedMass.of(Unit.HERTZ.toSi(f[0]), Unit.HERTZ.toSi(f[1]), addedMass);
            return new Identification.Added(addedMass, Unit.HERTZ.toSi(f[1]), a);
        } catch (InvalidInputException e) {
            throw e.field().equals("added_mass") ? e.renamed("--added-mass") : e.renamed("--frequencies");
        }
    }

    private List<String> writePlots(Identification result) {
        if (!(result instanceof Identification.Frf f)) {
            throw new InvalidInputException("--plot", plot.toString(), "a plot of an FRF fit (not with --decay or"
                    + " --added-mass)");
        }
        PlotFiles.svg("--plot", plot);
        List<XYChart> charts = List.of(
                IdentificationCharts.magnitude(f.fitted(), f.model(), f.unit(), CHART_WIDTH, CHART_HEIGHT),
                IdentificationCharts.phase(f.fitted(), f.model(), f.unit(), CHART_WIDTH, CHART_HEIGHT));
        return PlotFiles.write("--plot", List.of(plot, PlotFiles.sibling(plot, "-phase")), charts, force,
                List.of(file));
    }

    /** Fits the transfer FRF as the driving point's and matches the chosen mode (--mode) in it. */
    private ModeShapeRatio shapeAtTransferPoint(Identification result) {
        if (!(result instanceof Identification.Frf fit) || fit.model().modes().isEmpty()) {
            throw new InvalidInputException("--transfer", PlainText.escape(transfer.toString()),
                    "a driving-point FRF file beside it (not --decay or --added-mass)");
        }
        List<IdentifiedMode> found = fit.model().modes();
        if (mode < 1 || mode > found.size()) {
            throw new InvalidInputException("--mode", Integer.toString(mode), "1 to " + found.size()
                    + " (the modes identified, lowest first)");
        }
        MeasuredFrf all = FrfCsv.read(transfer, fit.unit());
        try {
            MeasuredFrf lines = band == null ? all : FrfOptions.band("--band", band, all);
            Identification.Frf other = Identification.Frf.fit(transfer.toString(), fit.unit(), lines, modes,
                    !noResiduals);
            return ModeShapeRatio.of(found.get(mode - 1), other.model().modes());
        } catch (InvalidInputException e) {
            throw e.field().equals("transfer FRF") ? e.renamed("--transfer") : e.renamed("--transfer ("
                    + e.field() + ")");
        }
    }

    private String writeStructure(Identification result, ModeShapeRatio shape) throws IOException {
        if (!(result instanceof Identification.Frf fit) || fit.model().modes().isEmpty()) {
            throw new InvalidInputException("--write-structure", PlainText.escape(project.toString()),
                    "an FRF fit, which gives the modal mass (a decay gives none; with --added-mass the damping is"
                            + " unknown)");
        }
        List<IdentifiedMode> found = fit.model().modes();
        if (mode < 1 || mode > found.size()) {
            throw new InvalidInputException("--mode", Integer.toString(mode), "1 to " + found.size()
                    + " (the modes identified, lowest first)");
        }
        // with a transfer FRF, the mode as the absorber's point sees it (its modal mass there)
        IdentifiedMode chosen = shape == null ? found.get(mode - 1) : shape.atTransferPoint();
        try {
            StructureFromMeasurement.structure(chosen);
        } catch (InvalidInputException e) {
            throw new InvalidInputException("--mode", Integer.toString(mode), "a mode with a positive modal mass and"
                    + " damping below 99 %; this one has " + e.field() + " " + e.value()
                    + " (is the FRF a driving-point measurement?)");
        }
        try {
            LocalDate today = LocalDate.now();
            for (String unknown : StructureFromMeasurement.write(project, fit, chosen, today).unknownFields()) {
                spec.commandLine().getErr().println("note: " + PlainText.escape(project.toString()) + ": field "
                        + PlainText.quote(unknown) + " is not part of the project format and was not kept");
            }
        } catch (FileWriteException e) {
            throw new InvalidInputException("--write-structure", PlainText.escape(e.path().toString()), e.problem());
        }
        return "wrote mode " + mode + " (" + QuantityFormat.format(chosen.naturalFrequency(), Unit.HERTZ)
                + ") into the structure section of " + PlainText.escape(project.toString());
    }
}
