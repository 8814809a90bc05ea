package org.counterpoise.core.commission;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.design.AbsorberLayout;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.system.AbsorberSensitivity;
import org.counterpoise.core.system.ModalSystem;

/**
 * An operating measurement against the whole structure's model with several absorbers: the response
 * at running speed that the site shows at the project's response point, against the one the modes
 * with the absorbers (or without them) predict there for the project's force, as {@link OperatingCheck}
 * does for one absorber. The model is linear, so their ratio is the ratio of the force the site shows
 * to the project's, and every absorber's stroke within the set scales by it: the check that matters
 * before the absorbers are built is whether any of them would use up its clearance.
 *
 * <p>The predicted amplitude is F |H(omega)| omega^p at the response point, H the receptance of the
 * whole structure with the absorbers ({@link AbsorberSensitivity#value} on {@link ModalSystem}, the
 * factored form checked against the dense LU solve), p = 0, 1, 2 for displacement, velocity and
 * acceleration amplitudes (harmonic motion, any vibration text).
 *
 * @param comparison the comparison; its design stroke, implied stroke and clearance are those of the
 *     absorber whose implied stroke uses the largest part of its clearance
 * @param designStrokes each absorber's largest stroke within the set (band or from rest), m
 * @param clearances each absorber's clearance, m
 * @param worstAbsorber the index of the absorber the comparison's strokes are of
 */
public record SetOperatingCheck(OperatingComparison comparison, List<Double> designStrokes, List<Double> clearances,
        int worstAbsorber) {

    /** Copies the lists. */
    public SetOperatingCheck {
        designStrokes = List.copyOf(designStrokes);
        clearances = List.copyOf(clearances);
    }

    /**
     * @param build the absorbers of the set as built (their strokes and clearances within the set)
     * @param spectrum the operating spectrum at the project's response point
     * @param running the running (forcing) frequency, rad/s; empty: the largest line in the band
     * @param withAbsorbers whether the absorbers were fitted when the spectrum was measured
     * @return the comparison
     */
    public static SetOperatingCheck of(AbsorbersToBuild build, OperatingSpectrum spectrum, OptionalDouble running,
            boolean withAbsorbers) {
        SeveralAbsorbers set = build.set();
        AbsorberLayout layout = set.layout();
        OperatingCheck.Line found = OperatingCheck.Line.of(set.band(), spectrum, running);
        int line = found.index();
        double omega = found.modelFrequency();
        ModalSystem all = ModalSystem.of(layout.structure(), set.absorbers());
        ModalSystem system = withAbsorbers ? all : all.bare();
        double receptance = set.forceAmplitude() * system.responseScale(layout.excitationPoint(), 1.0,
                layout.responsePoint()) * AbsorberSensitivity.value(system, layout.excitationPoint(),
                        layout.responsePoint(), omega / system.referenceFrequency()).abs();
        double predicted = receptance * Math.pow(omega, power(spectrum));
        double measured = spectrum.amplitude()[line];
        if (!(predicted > 0) || Double.isInfinite(predicted) || !(measured > 0)) {
            throw new InvalidInputException("spectrum", "amplitude " + (measured > 0 ? "predicted unbounded" : "zero")
                    + " at the line compared", "a line with a response at running speed, off an undamped resonance");
        }
        double ratio = measured / predicted;
        List<CommissioningWarning> warnings = OperatingCheck.warnings(spectrum, line, ratio);
        List<Double> strokes = new ArrayList<>();
        List<Double> clearances = new ArrayList<>();
        int worst = 0;
        for (int j = 0; j < build.absorbers().size(); j++) {
            DesignResult own = build.absorbers().get(j).design();
            strokes.add(largestStroke(own));
            clearances.add(own.clearance());
            if (strokes.get(j) / clearances.get(j) > strokes.get(worst) / clearances.get(worst)) {
                worst = j;
            }
        }
        if (strokes.get(worst) * ratio > clearances.get(worst)) {
            warnings.add(CommissioningWarning.STROKE_BEYOND_CLEARANCE);
        }
        int largest = spectrum.largestBetween(0.0, Double.MAX_VALUE);
        OperatingComparison comparison = new OperatingComparison(omega, spectrum.omega()[line], spectrum.kind(),
                measured, predicted, ratio, set.forceAmplitude() * ratio, strokes.get(worst), strokes.get(worst) * ratio,
                clearances.get(worst), withAbsorbers, warnings, spectrum.omega()[largest], spectrum.amplitude()[largest]);
        return new SetOperatingCheck(comparison, strokes, clearances, worst);
    }

    /** p in omega^p: 0 for displacement, 1 for velocity, 2 for acceleration. */
    private static int power(OperatingSpectrum spectrum) {
        return switch (spectrum.kind()) {
            case DISPLACEMENT -> 0;
            case VELOCITY -> 1;
            case ACCELERATION -> 2;
            default -> throw new IllegalArgumentException("bug: an operating spectrum of " + spectrum.kind());
        };
    }

    /** The larger of the stroke in band and from rest (the band's when that from rest is unbounded). */
    private static double largestStroke(DesignResult own) {
        ResponsePeak fromRest = own.strokeRunUp();
        double band = own.strokeInBand().value();
        return fromRest.unbounded() ? band : Math.max(band, fromRest.value());
    }
}
