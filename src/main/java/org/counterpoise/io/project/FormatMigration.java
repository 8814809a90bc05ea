package org.counterpoise.io.project;

import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignMethod;

/**
 * How files of older formats are read as the current one (users' files: a format change keeps every
 * older file readable). The one place each migration rule is written:
 * <ul>
 * <li>format 1: an absent {@code absorber.method} meant equal-peak ({@link #defaultMethod});</li>
 * <li>formats 1 and 2: {@code absorber.target} is the criterion it means ({@link #targetAsAcceptance});</li>
 * <li>formats 1 to 3: no hardware, display units, document number, revision history or sign-off: the
 *     defaults ({@code HardwareChoice.DEFAULT}, SI, empty), which the reader gives for absent keys;</li>
 * <li>formats 1 to 5: one mode and one absorber: no {@code structure.modes} and no {@code absorbers}
 *     ({@link Project#modes()} and {@link Project#absorbers()} null), which the reader gives for absent
 *     keys, so such a file designs exactly as before ({@link #isOneModeOneAbsorber});</li>
 * <li>formats 1 to 6: every absorber on one mode: no {@code absorbers.arrangement}, {@code modes} or
 *     {@code points}, which the reader gives for absent keys ({@link AbsorberArrangement#ONE_MODE}): nothing to add;</li>
 * <li>formats 1 to 7: no {@code absorbers.spillover_limit} (null: the spillover is reported, not
 *     limited), which the reader gives for an absent key: nothing to add.</li>
 * </ul>
 */
public final class FormatMigration {
    private FormatMigration() {
    }

    /**
     * Version 2 (issue 12) changed the meaning of an absent {@code absorber.method}: recommended
     * ({@link DesignMethod#RECOMMENDED}) instead of equal-peak; version-1 files are read as they always meant.
     * @param formatVersion the file's format version
     * @return the method a file of that version means when it gives no {@code absorber.method}
     */
    public static DesignMethod defaultMethod(int formatVersion) {
        return formatVersion < 2 ? DesignMethod.EQUAL_PEAK : DesignMethod.RECOMMENDED;
    }

    /**
     * The project with a target of older files (and of a wizard that does not yet know criteria) in
     * the form of format 3: the target becomes the criterion it means, a user limit on
     * {@code absorber.response} stated as a peak, flat at the target, and the absorber is sized to
     * meet it up to the same largest mass ratio. A criterion the project had is replaced, since the
     * target is what the absorber was sized for.
     * @param p a project
     * @return the project in that form (itself when it has no target)
     */
    public static Project targetAsAcceptance(Project p) {
        AbsorberInput absorber = p.absorber();
        QuantityInput target = absorber.target();
        if (target == null) {
            return p;
        }
        return p.withAbsorber(absorber.meetingAcceptance(absorber.maxMassRatio())).withAcceptance(
                AcceptanceInput.StatedLimit.flat(absorber.response(), AmplitudeConvention.PEAK, target));
    }

    /**
     * The inverse of {@link #targetAsAcceptance} where it exists: the absorber sized for the target
     * that the criterion to meet stands for, when the criterion says exactly what a target of format 2
     * said (absorber.meet_acceptance with a user limit of one peak value on {@code absorber.response}).
     * For a front end that shows sizing by a target; such a target is saved back as the same criterion.
     * @param p a project
     * @return the absorber with that target, or empty
     */
    public static Optional<AbsorberInput> absorberWithTarget(Project p) {
        AbsorberInput a = p.absorber();
        if (a.meetAcceptance() && p.acceptance() instanceof AcceptanceInput.StatedLimit s && s.value() != null
                && s.convention() == AmplitudeConvention.PEAK && s.quantity() == a.response()) {
            return Optional.of(new AbsorberInput(OptionalDouble.empty(), null, a.method(), a.response(),
                    a.hangsVertically(), a.strokeMargin(), s.value(), a.maxMassRatio(), a.strokeLimit(),
                    a.fixedDampingRatio(), a.fixedTuningRatio()));
        }
        return Optional.empty();
    }

    /**
     * @param p a project
     * @return true when it is a project of one mode and one absorber, as every file of formats 1 to 5
     *     is: it designs exactly as those formats did, with no section on several absorbers
     */
    public static boolean isOneModeOneAbsorber(Project p) {
        return p.modes() == null && p.absorbers() == null;
    }
}
