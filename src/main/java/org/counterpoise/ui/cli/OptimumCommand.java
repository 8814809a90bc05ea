package org.counterpoise.ui.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import java.util.Map;
import java.util.concurrent.Callable;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.optim.HInfinityOptimiser;
import org.counterpoise.core.optim.PeakOptimum;
import org.counterpoise.core.optim.PeakProblem;
import org.counterpoise.core.optim.VarianceOptimiser;
import org.counterpoise.core.optim.VarianceOptimum;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.PhysicalRange;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.TextFiles;
import org.counterpoise.io.export.OptimumTable;
import org.counterpoise.io.project.Ids;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code optimum}: exact optimum absorbers on the non-dimensional problem, like a design chart. */
@Command(name = "optimum", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Exact optimum absorber tuning and damping for the non-dimensional problem, one row per case.",
            "Peaks and variances are normalised as docs/cli.md states."})
public final class OptimumCommand implements Callable<Integer> {
    private static final List<ResponseKind> RESPONSES = List.of(ResponseKind.DISPLACEMENT, ResponseKind.VELOCITY,
            ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT, ResponseKind.STROKE,
            ResponseKind.TRANSMITTED_FORCE);

    /**
     * Most cases in one run: 100 000. A design chart needs a few hundred points; one case takes
     * about 1 ms (H-infinity or H2, measured on the presets' problems), so the cap is about two
     * minutes of work and some 30 MB of output, while a 10^4 x 10^4 grid (10^8 cases, days of work
     * and more memory than a desktop has) is refused before anything is computed.
     */
    static final int MAX_CASES = 100_000;
    /** Rows solved together before they are printed: enough to keep both cores busy. */
    private static final int CHUNK = 64;
    /** Largest --cases file: 100 000 rows of a few dozen characters stay below 8 MiB. */
    static final long MAX_CASES_BYTES = 8L << 20;

    @Spec
    private CommandSpec spec;

    @Option(names = "--mass-ratio", paramLabel = "MU|LO:HI:N",
            description = "mass ratio mu = m2/m1, or N values from LO to HI (required unless --cases)")
    private String massRatio;

    @Option(names = "--structure-damping", paramLabel = "Z|LO:HI:N", defaultValue = "0",
            description = "structure damping ratio zeta1, or N values from LO to HI (default ${DEFAULT-VALUE})")
    private String structureDamping;

    @Option(names = "--excitation", paramLabel = "KIND", defaultValue = "force",
            description = "force, unbalance, base-acceleration or base-displacement (default ${DEFAULT-VALUE})")
    private String excitation;

    @Option(names = "--response", paramLabel = "KIND", defaultValue = "displacement",
            description = "displacement, velocity, acceleration, relative-displacement, stroke or transmitted-force"
                    + " (default ${DEFAULT-VALUE})")
    private String response;

    @Option(names = "--objective", paramLabel = "peak|variance", defaultValue = "peak",
            description = "minimise the peak over the band (H-infinity) or the mean square under white noise (H2)")
    private String objective;

    @Option(names = "--band", paramLabel = "LO:HI",
            description = "forcing frequency ratios g = omega/omega1 (default: all frequencies)")
    private String band;

    @Option(names = "--fixed-damping", paramLabel = "ZETA_A", description = "hold the absorber damping ratio fixed")
    private Double fixedDamping;

    @Option(names = "--fixed-tuning", paramLabel = "F", description = "hold the tuning ratio fixed")
    private Double fixedTuning;

    @Option(names = "--stroke-limit", paramLabel = "S",
            description = "largest allowed peak stroke from zero frequency to the top of the band (the run-up),"
                    + " in the stroke's normalisation")
    private Double strokeLimit;

    @Option(names = "--cases", paramLabel = "FILE",
            description = "CSV of cases: columns mass_ratio and structure_damping_ratio (others optional)")
    private Path cases;

    @Option(names = "--absorbers", paramLabel = "N",
            description = "several absorbers of equal mass sharing the mass ratio, on the structure's one mode"
                    + " (force to displacement, peak objective; default 1)")
    private Integer absorbers;

    @Option(names = "--tuning", paramLabel = "uniform|individual",
            description = "with --absorbers: frequencies spread uniformly with one damping ratio, or each absorber"
                    + " tuned and damped on its own (default uniform)")
    private String tuning;

    @Option(names = "--second-mode", paramLabel = "RATIO",
            description = "with --absorbers: a second mode at RATIO times the first (same modal mass and damping),"
                    + " to report the spillover")
    private Double secondMode;

    @Option(names = "--second-mode-shape", paramLabel = "PHI", defaultValue = "1",
            description = "the second mode's shape value at the absorbers' point, the first's being 1 (default"
                    + " ${DEFAULT-VALUE})")
    private double secondModeShape;

    @Option(names = "--second-mode-mass", paramLabel = "M",
            description = "with --one-per-mode: the second mode's modal mass over the first's (default 1)")
    private Double secondModeMass;

    @Option(names = "--second-point", paramLabel = "PHI1:PHI2",
            description = "with --one-per-mode: mode 1's and mode 2's shape values at a second point; each absorber"
                    + " sits where its mode's shape value is largest in size (force and displacement stay at the first)")
    private String secondPoint;

    @Option(names = "--one-per-mode",
            description = "with --second-mode: one absorber on each of the two modes, at the same point, tuned and"
                    + " damped jointly for the least peak of the two-mode structure; beside it the sequential design"
                    + " (each absorber designed on its own mode alone)")
    private boolean onePerMode;

    @Option(names = "--structure-range", paramLabel = "S",
            description = "with --absorbers: design the set for the least worst peak with the structure's natural"
                    + " frequency anywhere within +/-S (a fraction, 0 to 0.5) of nominal; every damping ratio at least 1 %%")
    private Double structureRange;

    @Option(names = "--absorber-range", paramLabel = "A",
            description = "with --structure-range: and all absorbers' natural frequencies off together by up to +/-A"
                    + " (a fraction, 0 to 0.5; one spring batch; default 0)")
    private Double absorberRange;

    @Option(names = "--json", description = "print a JSON array of objects")
    private boolean json;

    @Option(names = "--csv", description = "print CSV")
    private boolean csv;

    @Override
    public Integer call() throws IOException {
        try {
            return run();
        } catch (InvalidInputException e) {
            throw e.renamed(OPTIONS.getOrDefault(e.field(), e.field()));
        }
    }

    private int run() throws IOException {
        if (json && csv) {
            throw new InvalidInputException("--json", "given with --csv", "choose one output format");
        }
        boolean variance = switch (objective) {
            case "peak" -> false;
            case "variance" -> true;
            default -> throw new InvalidInputException("--objective", objective, "peak or variance");
        };
        if (absorbers != null || tuning != null || secondMode != null || secondModeMass != null || secondPoint != null
                || onePerMode || structureRange != null || absorberRange != null) {
            return AbsorberSetRun.run(this, spec.commandLine().getOut());
        }
        List<PeakProblem> problems = cases == null ? fromOptions() : fromCases(cases);
        PrintWriter out = spec.commandLine().getOut();
        OptimumTable.Streamed table = new OptimumTable.Streamed(json ? OptimumTable.Format.JSON
                : csv ? OptimumTable.Format.CSV : OptimumTable.Format.TEXT, variance ? "variance" : "peak");
        // Rows are independent: each chunk is solved on all cores, then printed in order, so the
        // output is that of a sequential run and memory stays bounded however long the batch.
        boolean started = false;
        for (int start = 0; start < problems.size(); start += CHUNK) {
            List<Object> solved = IntStream.range(start, Math.min(start + CHUNK, problems.size())).parallel()
                    .mapToObj(i -> solve(problems.get(i), variance)).collect(Collectors.toList());
            for (Object result : solved) {
                if (result instanceof InvalidInputException refused) {
                    out.flush();
                    throw refused; // the first refused row in order, as a sequential run would report
                }
                if (!started) {
                    out.print(table.start()); // not before a row: a refused first case prints nothing
                    started = true;
                }
                out.print(table.row((OptimumTable.Row) result));
            }
            out.flush();
        }
        out.print(table.end());
        out.flush();
        return 0;
    }

    /** @return the row of one case, or the refusal of a case that has no answer */
    private static Object solve(PeakProblem p, boolean variance) {
        try {
            if (variance) {
                VarianceOptimum o = VarianceOptimiser.optimise(p);
                return new OptimumTable.Row(p.massRatio(), p.structureDamping(), o.tuning().tuningRatio(),
                        o.tuning().dampingRatio(), o.variance(), "", o.converged());
            }
            PeakOptimum o = HInfinityOptimiser.optimise(p);
            return new OptimumTable.Row(p.massRatio(), p.structureDamping(), o.tuning().tuningRatio(),
                    o.tuning().dampingRatio(), o.peak(), o.activeSet(), o.converged());
        } catch (InvalidInputException refused) {
            return refused;
        }
    }

    /** @return the options as typed, for {@link AbsorberSetRun} */
    Options options() {
        return new Options(massRatio, structureDamping, excitation, response, objective, band, fixedDamping, fixedTuning,
                strokeLimit, cases, absorbers, tuning, secondMode, secondModeShape, secondModeMass, secondPoint, onePerMode,
                structureRange, absorberRange, json, csv);
    }

    /** The options of one run, as typed. */
    record Options(String massRatio, String structureDamping, String excitation, String response, String objective,
            String band, Double fixedDamping, Double fixedTuning, Double strokeLimit, Path cases, Integer absorbers,
            String tuning, Double secondMode, double secondModeShape, Double secondModeMass, String secondPoint,
            boolean onePerMode, Double structureRange, Double absorberRange, boolean json, boolean csv) {
    }

    private static final Map<String, String> OPTIONS = Map.of("mass ratio", "--mass-ratio", "structure damping",
            "--structure-damping", "band", "--band", "response", "--response", "stroke limit", "--stroke-limit",
            "fixed tuning ratio", "--fixed-tuning", "fixed absorber damping ratio", "--fixed-damping");

    private List<PeakProblem> fromOptions() {
        if (massRatio == null) {
            throw InvalidInputException.missing("--mass-ratio", "give a value such as 0.05 or a range LO:HI:N");
        }
        ExcitationKind e = parseExcitation(excitation, "--excitation");
        ResponseKind r = parseResponse(response, "--response");
        double[] g = BandOption.parse(band);
        double[] mus = range("--mass-ratio", massRatio);
        double[] zetas = range("--structure-damping", structureDamping);
        long count = (long) mus.length * zetas.length;
        if (count > MAX_CASES) {
            throw new InvalidInputException("--mass-ratio", mus.length + " values times --structure-damping "
                    + zetas.length + " values = " + count + " cases", "at most " + MAX_CASES + " cases in one run;"
                    + " use fewer values or split the grid into several runs");
        }
        List<PeakProblem> out = new ArrayList<>();
        for (double mu : mus) {
            PhysicalRange.MASS_RATIO.check("--mass-ratio", mu, null);
            for (double z : zetas) {
                out.add(problem(e, r, mu, z, g));
            }
        }
        return out;
    }

    private PeakProblem problem(ExcitationKind e, ResponseKind r, double mu, double z, double[] g) {
        PeakProblem p = PeakProblem.free(e, r, mu, z, g[0], g[1]);
        if (fixedDamping != null) {
            p = p.withFixedDamping(fixedDamping);
        }
        if (fixedTuning != null) {
            p = p.withFixedTuning(fixedTuning);
        }
        if (strokeLimit != null) {
            p = p.withStrokeLimit(strokeLimit);
        }
        return p;
    }

    private List<PeakProblem> fromCases(Path file) throws IOException {
        String text = TextFiles.readUtf8(file, "--cases " + file, MAX_CASES_BYTES, "CSV file of cases");
        List<String> lines = new ArrayList<>(text.lines().toList());
        lines.removeIf(String::isBlank);
        if (lines.size() < 2) {
            throw InvalidInputException.unusable("--cases " + PlainText.escape(file.toString()),
                    lines.isEmpty() ? "is empty" : "holds a header line but no cases",
                    "a header line such as mass_ratio,structure_damping_ratio and one line per case");
        }
        if (lines.size() - 1 > MAX_CASES) {
            throw InvalidInputException.unusable("--cases " + PlainText.escape(file.toString()), "holds "
                    + (lines.size() - 1) + " cases", "at most " + MAX_CASES + " cases in one run; split the file");
        }
        List<String> header = Arrays.stream(lines.get(0).split(",")).map(String::strip).toList();
        int mu = header.indexOf("mass_ratio");
        if (mu < 0) {
            throw new InvalidInputException("--cases", "header " + PlainText.quote(lines.get(0)),
                    "needs a mass_ratio column (and optionally structure_damping_ratio, excitation, response,"
                            + " band_low, band_high)");
        }
        List<PeakProblem> out = new ArrayList<>();
        for (int i = 1; i < lines.size(); i++) {
            String[] cells = lines.get(i).split(",", -1);
            String where = PlainText.escape(String.valueOf(file.getFileName())) + " line " + (i + 1);
            if (cells.length != header.size()) {
                throw new InvalidInputException(where, PlainText.quote(lines.get(i)),
                        "needs " + header.size() + " comma-separated cells, as the header has");
            }
            double m = PhysicalRange.MASS_RATIO.check(where + " mass_ratio", number(where + " mass_ratio", cells[mu]),
                    null);
            double z = column(header, cells, "structure_damping_ratio", where, 0.0);
            ExcitationKind e = header.contains("excitation")
                    ? parseExcitation(cells[header.indexOf("excitation")].strip(), where + " excitation")
                    : parseExcitation(excitation, "--excitation");
            ResponseKind r = header.contains("response")
                    ? parseResponse(cells[header.indexOf("response")].strip(), where + " response")
                    : parseResponse(response, "--response");
            double[] g = BandOption.parse(band);
            if (header.contains("band_low")) {
                g = new double[] {column(header, cells, "band_low", where, 0.0),
                    column(header, cells, "band_high", where, Double.POSITIVE_INFINITY)};
            }
            try {
                out.add(problem(e, r, m, z, g));
            } catch (InvalidInputException bad) {
                throw bad.renamed(where + " " + bad.field());
            }
        }
        return out;
    }

    private static double column(List<String> header, String[] cells, String name, String where, double fallback) {
        int i = header.indexOf(name);
        if (i < 0 || cells[i].isBlank()) {
            return fallback;
        }
        return number(where + " " + name, cells[i]);
    }

    private static ExcitationKind parseExcitation(String text, String field) {
        return Ids.parse(ExcitationKind.class, text).orElseThrow(() -> new InvalidInputException(field,
                PlainText.quote(text),
                "one of " + Ids.list(ExcitationKind.values())));
    }

    private static ResponseKind parseResponse(String text, String field) {
        return Ids.parse(ResponseKind.class, text).filter(RESPONSES::contains).orElseThrow(() ->
                new InvalidInputException(field, PlainText.quote(text), "one of " + Ids.list(RESPONSES.toArray(new ResponseKind[0]))));
    }

    static double[] range(String option, String text) {
        String[] parts = text.split(":", -1);
        if (parts.length == 1) {
            return new double[] {number(option, parts[0])};
        }
        if (parts.length != 3) {
            throw new InvalidInputException(option, PlainText.quote(text),
                    "a number, or LO:HI:N for N values from LO to HI");
        }
        double lo = number(option, parts[0]);
        double hi = number(option, parts[1]);
        int n;
        try {
            n = Integer.parseInt(parts[2].strip());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(option, PlainText.quote(text), "N in LO:HI:N must be a whole number from 1 to "
                    + MAX_CASES);
        }
        if (n < 1 || n > MAX_CASES) {
            throw new InvalidInputException(option, PlainText.quote(text), "N in LO:HI:N must be a whole number from 1 to "
                    + MAX_CASES);
        }
        if (hi < lo) {
            throw new InvalidInputException(option, PlainText.quote(text), "HI must not be below LO");
        }
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = n == 1 ? lo : lo + (hi - lo) * i / (n - 1);
        }
        return out;
    }

    private static double number(String field, String text) {
        try {
            return Converters.real(text);
        } catch (CommandLine.TypeConversionException e) {
            throw new InvalidInputException(field, Converters.shown(text), e.getMessage());
        }
    }
}
