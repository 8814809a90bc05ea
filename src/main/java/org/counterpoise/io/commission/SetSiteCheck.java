package org.counterpoise.io.commission;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.function.UnaryOperator;
import org.counterpoise.core.commission.SetCommissioning;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.io.measurement.FrfCsv;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.UnitSystem;

/**
 * The site check of several absorbers at one point: the response measured there with all of them
 * fitted, each absorber as built and its trim ({@link SetCommissioning}).
 *
 * @param project the project's name
 * @param design the absorbers as designed
 * @param file the FRF file
 * @param unit its kind and unit
 * @param lines the lines fitted (the file's, within the band asked)
 * @param check the absorbers as built and what to do
 * @param weighed whether the masses were given as weighed (else the design's)
 * @param units the display unit system
 */
public record SetSiteCheck(String project, SeveralAbsorbers design, String file, FrfUnit unit, MeasuredFrf lines,
        SetCommissioning check, boolean weighed, UnitSystem units) {

    /**
     * Reads the file and runs the check; a refusal names the file.
     *
     * @param project the project's name
     * @param design the absorbers as designed
     * @param file the FRF measured at their point with all of them fitted
     * @param unit the kind and unit of its values
     * @param lines which of its lines to use (the identity for all)
     * @param freeStructure whether to fit the target mode's frequency too
     * @param weighed each absorber's mass as weighed, kg, or empty for the design's
     * @param plates each absorber's trim plates (empty where its hardware is not sized)
     * @param units the display unit system
     * @return the check
     */
    public static SetSiteCheck run(String project, SeveralAbsorbers design, Path file, FrfUnit unit,
            UnaryOperator<MeasuredFrf> lines, boolean freeStructure, List<Double> weighed,
            List<Optional<SetCommissioning.Plates>> plates, UnitSystem units) {
        MeasuredFrf measured = lines.apply(FrfCsv.read(file, unit));
        try {
            return new SetSiteCheck(project, design, file.toString(), unit, measured,
                    SetCommissioning.of(design, measured, freeStructure, weighed, plates), !weighed.isEmpty(), units);
        } catch (InvalidInputException e) {
            throw e.renamed(file + " (" + e.field() + ")");
        }
    }
}
