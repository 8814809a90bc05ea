package org.counterpoise.core.design;

import java.util.Optional;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.response.ResponseKind;

/**
 * Everything a design needs: the structure, the disturbance, the response that matters and the
 * designer's choices. Immutable; validated on construction.
 *
 * @param name project name, for reports
 * @param structure the structure
 * @param excitation the disturbance
 * @param response the response that matters (the one the design minimises)
 * @param sizing mass ratio or mass budget
 * @param method design method
 * @param hangsVertically true when the absorber spring carries the absorber's weight (static deflection)
 * @param strokeMargin clearance over the computed peak stroke (&gt;= 1; 1.5 is common practice)
 * @param constraints limits on the design (used by the exact-peak and robust methods)
 * @param robustness expected mistuning, target and tolerances (used by robust-worst-case and the
 *     robustness study)
 * @param criterion what the response is judged against (the verdict before and after, and the goal of
 *     {@link AbsorberSizing.MeetCriterion}); empty when the project names none
 */
public record DesignStudy(String name, Structure structure, Excitation excitation, ResponseKind response,
        AbsorberSizing sizing, DesignMethod method, boolean hangsVertically, double strokeMargin,
        DesignConstraints constraints, RobustnessSettings robustness, Optional<Criterion> criterion) {

    /**
     * A study without a criterion.
     * @param name project name
     * @param structure the structure
     * @param excitation the disturbance
     * @param response the response that matters
     * @param sizing mass ratio, mass or target
     * @param method design method
     * @param hangsVertically true when the spring carries the absorber's weight
     * @param strokeMargin clearance over the computed stroke
     * @param constraints limits on the design
     * @param robustness expected mistuning, target and tolerances
     */
    public DesignStudy(String name, Structure structure, Excitation excitation, ResponseKind response,
            AbsorberSizing sizing, DesignMethod method, boolean hangsVertically, double strokeMargin,
            DesignConstraints constraints, RobustnessSettings robustness) {
        this(name, structure, excitation, response, sizing, method, hangsVertically, strokeMargin, constraints,
                robustness, Optional.empty());
    }

    /**
     * A study with default robustness settings.
     * @param name project name
     * @param structure the structure
     * @param excitation the disturbance
     * @param response the response that matters
     * @param sizing mass ratio, mass or target
     * @param method design method
     * @param hangsVertically true when the spring carries the absorber's weight
     * @param strokeMargin clearance over the computed stroke
     * @param constraints limits on the design
     */
    public DesignStudy(String name, Structure structure, Excitation excitation, ResponseKind response,
            AbsorberSizing sizing, DesignMethod method, boolean hangsVertically, double strokeMargin,
            DesignConstraints constraints) {
        this(name, structure, excitation, response, sizing, method, hangsVertically, strokeMargin, constraints,
                RobustnessSettings.DEFAULT);
    }

    /**
     * A study without constraints.
     * @param name project name
     * @param structure the structure
     * @param excitation the disturbance
     * @param response the response that matters
     * @param sizing mass ratio, mass or target
     * @param method design method
     * @param hangsVertically true when the spring carries the absorber's weight
     * @param strokeMargin clearance over the computed stroke
     */
    public DesignStudy(String name, Structure structure, Excitation excitation, ResponseKind response,
            AbsorberSizing sizing, DesignMethod method, boolean hangsVertically, double strokeMargin) {
        this(name, structure, excitation, response, sizing, method, hangsVertically, strokeMargin,
                DesignConstraints.NONE);
    }

    /** Validates the record. */
    public DesignStudy {
        Checks.present("structure", structure, "a structure");
        Checks.present("disturbance", excitation, "a disturbance");
        Checks.present("absorber.response", response, "a response kind");
        Checks.present("absorber.mass_ratio", sizing, "a mass ratio or a mass");
        Checks.present("absorber.method", method, "one of " + DesignMethod.ids());
        Checks.inRange("absorber.stroke_margin", strokeMargin, 1.0, 10.0);
        Checks.present("absorber", constraints, "design constraints");
        Checks.present("robustness", robustness, "robustness settings");
        Checks.present("acceptance", criterion, "a criterion or none");
        // refuses, on the field acceptance, a criterion that cannot judge this disturbance (white noise)
        criterion.ifPresent(c -> Assessor.of(c, excitation));
        if (sizing instanceof AbsorberSizing.MeetCriterion && criterion.isEmpty()) {
            throw InvalidInputException.missing("acceptance", "designing to meet the criterion needs a criterion");
        }
        if (sizing instanceof AbsorberSizing.MeetCriterion && method != DesignMethod.EXACT_PEAK && !method.robust()) {
            throw new InvalidInputException("absorber.method", method.id(),
                    "designing to meet the criterion needs the exact-peak, robust-worst-case or robust-p95 method");
        }
        if (sizing instanceof AbsorberSizing.ByTarget t && method != DesignMethod.EXACT_PEAK && !method.robust()) {
            throw new InvalidInputException("absorber.target", Checks.show(t.target()),
                    "sizing for a target needs the exact-peak, robust-worst-case or robust-p95 method");
        }
        if (constraints.any() && method != DesignMethod.EXACT_PEAK && !method.robust()) {
            throw new InvalidInputException("absorber.method", method.id(),
                    "a stroke limit, fixed damping or fixed tuning needs the exact-peak, robust-worst-case or"
                            + " robust-p95 method");
        }
        if (excitation.spectrum().isWhiteNoise()) {
            if (excitation.kind() != ExcitationKind.FORCE
                    && excitation.kind() != ExcitationKind.BASE_ACCELERATION) {
                throw new InvalidInputException("disturbance.spectrum",
                        "white-noise " + excitation.kind().label(),
                        "white noise is a force or a base acceleration; choose disturbance.kind force or"
                                + " base-acceleration, or a harmonic spectrum");
            }
            if (method != DesignMethod.EXACT_VARIANCE && method != DesignMethod.MINIMUM_VARIANCE) {
                throw new InvalidInputException("absorber.method", method.id(),
                        "under white noise the design minimises the rms response: choose exact-variance (any"
                                + " structure damping) or minimum-variance (the published closed form)");
            }
            if (sizing.byTarget() || constraints.any()) {
                throw new InvalidInputException("absorber", "a target or a constraint",
                        "targets, stroke limits and fixed tuning or damping work on peaks; leave them out under"
                                + " white noise");
            }
        }
        if (response.needsAbsorber()) {
            throw new InvalidInputException("absorber.response", response.name(),
                    "the response to reduce must be a response of the structure, not of the absorber");
        }
    }

    /**
     * @param settings other robustness settings (the command line's sample count or seed, say)
     * @return this study with them
     */
    public DesignStudy withRobustness(RobustnessSettings settings) {
        return new DesignStudy(name, structure, excitation, response, sizing, method, hangsVertically, strokeMargin,
                constraints, settings, criterion);
    }

    /**
     * @param other another design method
     * @return this study designed by that method (validated as any study: a method that does not
     *     take this study's sizing or constraints is refused with an {@link InvalidInputException})
     */
    public DesignStudy withMethod(DesignMethod other) {
        return new DesignStudy(name, structure, excitation, response, sizing, other, hangsVertically, strokeMargin,
                constraints, robustness, criterion);
    }

    /**
     * @param otherSizing another sizing
     * @param otherConstraints other constraints
     * @return this study with them
     */
    public DesignStudy withSizing(AbsorberSizing otherSizing, DesignConstraints otherConstraints) {
        return new DesignStudy(name, structure, excitation, response, otherSizing, method, hangsVertically,
                strokeMargin, otherConstraints, robustness, criterion);
    }

    /**
     * @param other another structure (the one measured on site, say)
     * @return this study on it
     */
    public DesignStudy withStructure(Structure other) {
        return new DesignStudy(name, other, excitation, response, sizing, method, hangsVertically, strokeMargin,
                constraints, robustness, criterion);
    }

    /**
     * @param judgedAgainst the criterion (empty for none)
     * @return this study with it
     */
    public DesignStudy withCriterion(Optional<Criterion> judgedAgainst) {
        return new DesignStudy(name, structure, excitation, response, sizing, method, hangsVertically, strokeMargin,
                constraints, robustness, judgedAgainst);
    }

    /** Common-practice clearance margin over the computed stroke (no published source). */
    public static final double DEFAULT_STROKE_MARGIN = 1.5;
}
