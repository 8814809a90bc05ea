package org.counterpoise.io.commission;

import org.counterpoise.core.commission.OperatingSpectrum;
import org.counterpoise.core.commission.SetOperatingCheck;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.measurement.SpectrumCsv;
import org.counterpoise.core.criteria.AmplitudeConvention;

/**
 * The operating check of several absorbers: the spectrum measured at the project's response point
 * against the whole structure's model ({@link SetOperatingCheck}).
 *
 * @param file the spectrum file
 * @param unit the unit of its amplitudes
 * @param convention how they are stated
 * @param runningGiven whether the running frequency was stated
 * @param check the comparison and every absorber's stroke against its clearance
 */
public record SetOperatingSite(String file, Unit unit, AmplitudeConvention convention, boolean runningGiven,
        SetOperatingCheck check) {

    /**
     * Reads the spectrum and runs the check; a refusal names the file.
     *
     * @param build the absorbers of the set as built (their strokes and clearances within the set)
     * @param in the spectrum file and how it is stated
     * @return the check
     */
    public static SetOperatingSite run(AbsorbersToBuild build, SiteCheckRun.OperatingInput in) {
        OperatingSpectrum spectrum = SpectrumCsv.read(in.file(), in.unit(), in.convention());
        try {
            return new SetOperatingSite(in.file().toString(), in.unit(), in.convention(), in.running().isPresent(),
                    SetOperatingCheck.of(build, spectrum, in.running(), in.withAbsorber()));
        } catch (InvalidInputException e) {
            throw e.renamed(in.file() + " (" + e.field() + ")");
        }
    }
}
