package org.counterpoise.io.commission;

import java.nio.file.Path;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.UnaryOperator;
import org.counterpoise.core.commission.CommissioningCheck;
import org.counterpoise.core.commission.OperatingCheck;
import org.counterpoise.core.commission.OperatingSpectrum;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.realisation.ProcedureStepKind;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.StepFigure;
import org.counterpoise.core.realisation.StepFigure.StepQuantity;
import org.counterpoise.io.measurement.FrfCsv;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.measurement.SpectrumCsv;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.core.units.Unit;

/**
 * The one route from site measurement files to a {@link SiteCheck}, for the command line and the
 * wizard: reads the files, runs the checks, and names the file in every refusal.
 */
public final class SiteCheckRun {
    private SiteCheckRun() {
    }

    /**
     * @param file the operating spectrum
     * @param unit the unit of its amplitudes (it says the quantity)
     * @param convention how they are stated
     * @param running the running frequency, rad/s, or empty for the largest line in the band
     * @param withAbsorber whether the absorber was fitted when measured
     */
    public record OperatingInput(Path file, Unit unit, AmplitudeConvention convention, OptionalDouble running,
            boolean withAbsorber) {
    }

    /**
     * @param file the FRF measured with the absorber fitted
     * @param unit the kind and unit of its values
     * @param lines which of its lines to use (the identity for all)
     * @param freeStructure whether to fit the structure's natural frequency too
     * @param weighed the absorber mass as weighed with its fitted plates, kg, or empty for the design's
     */
    public record FittedInput(Path file, FrfUnit unit, UnaryOperator<MeasuredFrf> lines, boolean freeStructure,
            OptionalDouble weighed) {
    }

    /**
     * @param project the project's name
     * @param design the design
     * @param realisation its hardware (trim plan and part tolerances)
     * @param units the display unit system
     * @param operating the operating spectrum, if any
     * @param fitted the response with the absorber fitted, if any
     * @return the site check
     * @throws InvalidInputException naming the file (and line) of what is wrong, or both inputs missing
     */
    public static SiteCheck run(String project, DesignResult design, Realisation realisation, UnitSystem units,
            Optional<OperatingInput> operating, Optional<FittedInput> fitted) {
        if (operating.isEmpty() && fitted.isEmpty()) {
            throw InvalidInputException.missing("site measurement",
                    "an operating spectrum, a response with the absorber fitted, or both");
        }
        Optional<SiteCheck.Operating> op = operating.map(in -> operating(design, in));
        Optional<SiteCheck.Fitted> fit = fitted.map(in -> fitted(design, realisation, in));
        return new SiteCheck(project, design, op, fit, realisation.trim(), keptAbsorberFrequency(design, realisation),
                units);
    }

    /** The absorber frequency the procedure's step COMPUTE_ABSORBER_TARGET keeps, rad/s (the one place it is computed). */
    private static double keptAbsorberFrequency(DesignResult design, Realisation realisation) {
        return realisation.procedure().stream().filter(s -> s.kind() == ProcedureStepKind.COMPUTE_ABSORBER_TARGET)
                .flatMap(s -> s.figures().stream()).filter(f -> f.quantity() == StepQuantity.ABSORBER_TARGET_FREQUENCY)
                .mapToDouble(StepFigure::value).findFirst().orElse(design.absorber().naturalFrequency());
    }

    private static SiteCheck.Operating operating(DesignResult design, OperatingInput in) {
        OperatingSpectrum spectrum = SpectrumCsv.read(in.file(), in.unit(), in.convention());
        try {
            return new SiteCheck.Operating(in.file().toString(), in.unit(), in.convention(), in.running().isPresent(),
                    OperatingCheck.of(design, spectrum, in.running(), in.withAbsorber()));
        } catch (InvalidInputException e) {
            throw e.renamed(in.file() + " (" + e.field() + ")");
        }
    }

    private static SiteCheck.Fitted fitted(DesignResult design, Realisation realisation, FittedInput in) {
        MeasuredFrf lines = in.lines().apply(FrfCsv.read(in.file(), in.unit()));
        try {
            return new SiteCheck.Fitted(in.file().toString(), in.unit(), lines,
                    CommissioningCheck.of(design, realisation, lines, in.freeStructure(), in.weighed()));
        } catch (InvalidInputException e) {
            throw e.renamed(in.file() + " (" + e.field() + ")");
        }
    }
}
