package org.counterpoise.io.commission;

import java.util.Optional;
import org.counterpoise.core.commission.CommissioningCheck;
import org.counterpoise.core.commission.OperatingComparison;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.identify.MeasuredFrf;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.text.UnitSystem;

/**
 * What a site check found, with what the user gave to get it (file names, units), for the report
 * and the JSON.
 *
 * @param project the project's name
 * @param design the design checked
 * @param operating the operating comparison, if a spectrum was given
 * @param fitted the commissioning check, if a response with the absorber fitted was given
 * @param plan the trim plan supplied with the absorber
 * @param keptAbsorberFrequency the absorber frequency the sheet's procedure keeps while the structure lies in
 *     the range the design holds (an elastomer element's own optimum, else the design's), rad/s
 * @param units the display unit system
 */
public record SiteCheck(String project, DesignResult design, Optional<Operating> operating,
        Optional<Fitted> fitted, TrimPlan plan, double keptAbsorberFrequency, UnitSystem units) {

    /**
     * @param file the spectrum file as the user named it
     * @param unit the unit its amplitudes were read in
     * @param convention how they were stated
     * @param runningGiven whether the running frequency was given (otherwise found in the band)
     * @param comparison the comparison
     */
    public record Operating(String file, Unit unit, AmplitudeConvention convention, boolean runningGiven,
            OperatingComparison comparison) {
    }

    /**
     * @param file the FRF file as the user named it
     * @param unit the kind and unit of its values
     * @param lines the lines used
     * @param check the check
     */
    public record Fitted(String file, FrfUnit unit, MeasuredFrf lines, CommissioningCheck check) {
    }
}
