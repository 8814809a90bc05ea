package org.counterpoise.core.realisation;

import java.util.Optional;
import org.counterpoise.core.design.AbsorbersToBuild;
import org.counterpoise.core.error.CoreException;

/**
 * The hardware of one absorber of a set, or why it has none: the one rule that the sheet's pages and
 * the site check of a set both follow.
 *
 * <p>An elastomer element is not sized for an absorber of a set: the element's own optimum (that of
 * the absorber alone on the mode, {@link HystereticOptimum}) would replace the tuning the set needs.
 * Helical springs and a damper are sized from the absorber's own design with its figures within the
 * set ({@link AbsorbersToBuild}) and the largest velocity across its damper there.
 *
 * @param realisation its hardware, when sized
 * @param notSized why not, {@link NotSized#NONE} when sized
 * @param failure the realisation's refusal when {@link NotSized#UNREALISABLE}, else empty
 */
public record SetAbsorberHardware(Optional<Realisation> realisation, NotSized notSized,
        Optional<CoreException> failure) {

    /** Why an absorber of a set has no hardware. */
    public enum NotSized {
        /** It has. */
        NONE,
        /** The project chose an elastomer element, which is not sized for an absorber of a set. */
        ELASTOMER_IN_SET,
        /** The project's hardware choices cannot give its spring or damper ({@link #failure}). */
        UNREALISABLE
    }

    /**
     * @param built one absorber of the set
     * @param hardware the project's hardware choices
     * @return its hardware, or why it has none
     */
    public static SetAbsorberHardware of(AbsorbersToBuild.Built built, HardwareChoice hardware) {
        if (hardware.springKind() == SpringKind.ELASTOMER) {
            return new SetAbsorberHardware(Optional.empty(), NotSized.ELASTOMER_IN_SET, Optional.empty());
        }
        try {
            return new SetAbsorberHardware(Optional.of(Realiser.realise(built.design(), hardware,
                    built.damperVelocity())), NotSized.NONE, Optional.empty());
        } catch (CoreException unrealisable) {
            return new SetAbsorberHardware(Optional.empty(), NotSized.UNREALISABLE, Optional.of(unrealisable));
        }
    }
}
