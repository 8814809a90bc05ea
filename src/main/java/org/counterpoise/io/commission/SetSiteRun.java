package org.counterpoise.io.commission;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.counterpoise.core.commission.SetCommissioning;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SetAbsorberHardware;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.UnitSystem;

/**
 * The one route from site measurement files to the site check of several absorbers, for the command
 * line and the wizard: the operating spectrum at the response point, the response with every absorber
 * fitted, or both ({@link SetOperatingSite}, {@link SetSiteCheck}); every refusal names the file.
 *
 * @param project the project's name
 * @param design the absorbers as designed
 * @param operating the operating check, if a spectrum was given
 * @param fitted the check with the absorbers fitted, if a response was given
 * @param units the display unit system
 */
public record SetSiteRun(String project, SeveralAbsorbers design, Optional<SetOperatingSite> operating,
        Optional<SetSiteCheck> fitted, UnitSystem units) {

    /**
     * @param file the FRF measured with every absorber fitted
     * @param unit the kind and unit of its values
     * @param lines which of its lines to use (the identity for all)
     * @param freeStructure whether to fit the target mode's frequency too
     * @param weighed each absorber's mass as weighed, kg, in the design's order, or empty for the design's
     */
    public record FittedInput(Path file, FrfUnit unit, UnaryOperator<MeasuredFrf> lines, boolean freeStructure,
            List<Double> weighed) {
        /** Copies the masses. */
        public FittedInput {
            weighed = List.copyOf(weighed);
        }
    }

    /**
     * @param project the project's name
     * @param single the study's design on the target mode (each absorber's own design starts from it)
     * @param design the absorbers as designed
     * @param hardware the project's hardware choices (each absorber's trim plates, as on the sheet)
     * @param units the display unit system
     * @param operating the operating spectrum, if any
     * @param fitted the response with the absorbers fitted, if any
     * @return the check
     * @throws InvalidInputException naming the file (and line) of what is wrong, or both inputs missing
     */
    public static SetSiteRun run(String project, DesignResult single, SeveralAbsorbers design,
            HardwareChoice hardware, UnitSystem units, Optional<SiteCheckRun.OperatingInput> operating,
            Optional<FittedInput> fitted) {
        if (design.layout().joint().isPresent()) {
            throw new InvalidInputException("absorbers.arrangement", "\"one-per-mode\"", "absorbers all on one mode"
                    + " for the site check: one absorber per mode is not yet checked against a measurement");
        }
        if (operating.isEmpty() && fitted.isEmpty()) {
            throw InvalidInputException.missing("site measurement",
                    "an operating spectrum, a response with the absorbers fitted, or both");
        }
        AbsorbersToBuild build = AbsorbersToBuild.of(single, design);
        Optional<SetOperatingSite> op = operating.map(in -> SetOperatingSite.run(build, in));
        Optional<SetSiteCheck> check = fitted.map(in -> {
            // each absorber's trim plates as the sheet supplies them: its trims are whole plates
            List<Optional<SetCommissioning.Plates>> plates = new ArrayList<>();
            for (AbsorbersToBuild.Built built : build.absorbers()) {
                plates.add(SetAbsorberHardware.of(built, hardware).realisation().map(r ->
                        new SetCommissioning.Plates(r.trim(), r.tolerances().absorberFrequency())));
            }
            return SetSiteCheck.run(project, design, in.file(), in.unit(), in.lines(), in.freeStructure(),
                    in.weighed(), plates, units);
        });
        return new SetSiteRun(project, design, op, check, units);
    }

    /** @return the plain-text report with the usual cautions */
    public String report() {
        return SetSiteCheckReport.render(project, design, operating, fitted, units);
    }

    /** @return the JSON object */
    public String json() {
        return SetSiteCheckJson.toJson(project, operating, fitted);
    }
}
