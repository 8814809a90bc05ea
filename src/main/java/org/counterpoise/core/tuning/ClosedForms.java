package org.counterpoise.core.tuning;

import java.util.Optional;
import java.util.Set;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;

/**
 * Which published closed form answers which excitation and response pair. The pairing uses exact
 * identities of the model with an undamped structure (zeta1 = 0): the base-displacement
 * transmissibility, the base-acceleration to absolute-acceleration ratio and the force to
 * transmitted-force ratio all equal the force-to-displacement receptance, and unbalance to
 * displacement equals force to acceleration. Pairs with no published form return empty.
 */
public final class ClosedForms {
    private static final String DEN_HARTOG = "Den Hartog (1956), Mechanical Vibrations, eq. 3.23; Brock (1946), J. Appl. Mech. 13";
    private static final String WARBURTON = "Warburton (1982), Earthquake Eng. Struct. Dyn. 10, Table I";
    private static final String CRANDALL_MARK = "Crandall and Mark (1963), Random Vibration in Mechanical Systems; "
            + WARBURTON;
    /** The note of every closed form that assumes an undamped structure. */
    public static final String UNDAMPED_STRUCTURE = "assumes an undamped structure";
    private static final Set<Assumption> UNDAMPED = Set.of(Assumption.UNDAMPED_STRUCTURE);
    private static final Set<Assumption> UNDAMPED_WHITE_NOISE =
            Set.of(Assumption.UNDAMPED_STRUCTURE, Assumption.WHITE_NOISE);

    private ClosedForms() {
    }

    /**
     * @param excitation excitation kind
     * @param response response kind
     * @param massRatio mu
     * @return the fixed-point equal-peak tuning for the pair, if one is published
     */
    public static Optional<ClosedForm> equalPeak(ExcitationKind excitation, ResponseKind response, double massRatio) {
        if (isReceptanceLike(excitation, response)) {
            return Optional.of(new ClosedForm(DenHartogEqualPeak.tuning(massRatio), DEN_HARTOG, UNDAMPED_STRUCTURE,
                    UNDAMPED));
        }
        if (isForceAccelerationLike(excitation, response)) {
            return Optional.of(new ClosedForm(WarburtonEqualPeak.forceAcceleration(massRatio), WARBURTON,
                    UNDAMPED_STRUCTURE, UNDAMPED));
        }
        if (excitation == ExcitationKind.BASE_ACCELERATION && response == ResponseKind.RELATIVE_DISPLACEMENT) {
            return Optional.of(new ClosedForm(WarburtonEqualPeak.baseAccelerationRelativeDisplacement(massRatio),
                    WARBURTON, UNDAMPED_STRUCTURE, UNDAMPED));
        }
        return Optional.empty();
    }

    /**
     * @param excitation excitation kind (white noise of this quantity)
     * @param response response kind
     * @param massRatio mu
     * @return the minimum-variance tuning for the pair, if one is known in closed form
     */
    public static Optional<ClosedForm> minimumVariance(ExcitationKind excitation, ResponseKind response,
            double massRatio) {
        if (isReceptanceLike(excitation, response)) {
            return Optional.of(new ClosedForm(MinimumVariance.forceDisplacement(massRatio), CRANDALL_MARK,
                    UNDAMPED_STRUCTURE + "; white-noise excitation", UNDAMPED_WHITE_NOISE));
        }
        if (excitation == ExcitationKind.BASE_ACCELERATION && response == ResponseKind.RELATIVE_DISPLACEMENT) {
            return Optional.of(new ClosedForm(MinimumVariance.baseAccelerationRelativeDisplacement(massRatio),
                    WARBURTON, UNDAMPED_STRUCTURE + "; white-noise base acceleration", UNDAMPED_WHITE_NOISE));
        }
        if (excitation == ExcitationKind.FORCE && response == ResponseKind.VELOCITY) {
            return Optional.of(new ClosedForm(MinimumVariance.forceVelocity(massRatio),
                    "derived for Counterpoise from the closed-form mean square",
                    UNDAMPED_STRUCTURE + "; white-noise force", UNDAMPED_WHITE_NOISE));
        }
        return Optional.empty();
    }

    private static boolean isReceptanceLike(ExcitationKind excitation, ResponseKind response) {
        return switch (excitation) {
            case FORCE -> response == ResponseKind.DISPLACEMENT || response == ResponseKind.RELATIVE_DISPLACEMENT
                    || response == ResponseKind.TRANSMITTED_FORCE;
            case BASE_DISPLACEMENT -> response == ResponseKind.DISPLACEMENT;
            case BASE_ACCELERATION -> response == ResponseKind.ACCELERATION;
            case UNBALANCE -> false;
        };
    }

    private static boolean isForceAccelerationLike(ExcitationKind excitation, ResponseKind response) {
        return (excitation == ExcitationKind.FORCE && response == ResponseKind.ACCELERATION)
                || (excitation == ExcitationKind.UNBALANCE
                    && (response == ResponseKind.DISPLACEMENT || response == ResponseKind.RELATIVE_DISPLACEMENT));
    }
}
