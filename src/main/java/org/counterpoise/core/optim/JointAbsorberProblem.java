package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.Mode;

/**
 * One absorber per mode on a structure of two modes, non-dimensional, the force acting and the
 * displacement taken at the first point, where the absorbers sit too unless a second point is
 * given (then each sits where its mode's shape value is larger in size): mode 1 has omega1 = 1, modal mass 1 and shape value 1
 * there; mode 2 has omega2 = R, modal mass M and shape value phi there; both the damping ratio
 * zeta. The peak of the receptance X k1 / F over the band of frequency ratios g = omega / omega1 is
 * minimised (H-infinity) by the two absorbers' tunings and dampings together.
 *
 * <p>Mass split (the rule of this design, common practice with no single source): each absorber
 * gets the same mass ratio on its own mode, the mode's modal mass as seen at the point being
 * m_r / phi_r^2 (the single-mode structure the rest of the program designs on); so absorber j has
 * mu_j = mu (m_j / phi_j^2) / sum_r (m_r / phi_r^2), mu = sum mu_j the total, relative to m1.
 *
 * @param massRatio total mass ratio mu = (m_a1 + m_a2) / m1
 * @param structureDamping zeta of both modes
 * @param secondModeRatio R = omega2 / omega1 (&gt; 1, at most {@value #MAX_MODE_RATIO})
 * @param secondModeMass M = m2 / m1 (&gt; 0)
 * @param secondModeShape phi, mode 2's shape value at the point, mode 1's being 1 (non-zero)
 * @param bandLow lowest g (&gt;= 0)
 * @param bandHigh highest g (+infinity for all frequencies)
 * @param otherPoint a second point of the structure with both modes' shape values there, where an
 *     absorber sits when its mode's shape value is larger there in size (each absorber at the point
 *     where its mode moves most); the force and the displacement stay at the first point
 */
public record JointAbsorberProblem(double massRatio, double structureDamping, double secondModeRatio,
        double secondModeMass, double secondModeShape, double bandLow, double bandHigh, Optional<OtherPoint> otherPoint) {
    /** Highest ratio of the two natural frequencies taken (as for the spillover of {@code optimum}). */
    public static final double MAX_MODE_RATIO = 100.0;
    /** The largest second-mode shape value taken, in size (the first mode's being 1). */
    public static final double MAX_SHAPE = 1000;
    /** The number of modes, and of absorbers: one per mode. */
    public static final int MODES = 2;
    /** The structure's first point: where the force acts, the displacement is taken and the absorbers sit by default. */
    public static final String POINT = "structure";
    /** The second point, when given. */
    public static final String OTHER_POINT = "second point";

    /**
     * A second point of the structure.
     *
     * @param firstModeShape mode 1's shape value there (mode 1's being 1 at the first point)
     * @param secondModeShape mode 2's shape value there
     */
    public record OtherPoint(double firstModeShape, double secondModeShape) {
        /** Validates the shape values. */
        public OtherPoint {
            if (!Double.isFinite(firstModeShape) || !Double.isFinite(secondModeShape)) {
                throw new InvalidInputException("second point shapes", Checks.show(firstModeShape) + ":"
                        + Checks.show(secondModeShape), "two finite numbers, mode 1's and mode 2's shape values there");
            }
        }
    }

    /**
     * The problem with every absorber at the first point.
     *
     * @param massRatio total mu
     * @param structureDamping zeta of both modes
     * @param secondModeRatio R
     * @param secondModeMass M
     * @param secondModeShape phi
     * @param bandLow lowest g
     * @param bandHigh highest g
     */
    public JointAbsorberProblem(double massRatio, double structureDamping, double secondModeRatio,
            double secondModeMass, double secondModeShape, double bandLow, double bandHigh) {
        this(massRatio, structureDamping, secondModeRatio, secondModeMass, secondModeShape, bandLow, bandHigh,
                Optional.empty());
    }

    /** Validates the problem; each message names the quantity a user sets. */
    public JointAbsorberProblem {
        Checks.inOpenRange("mass ratio", massRatio, 0.0, 10.0);
        Checks.inRange("structure damping", structureDamping, 0.0, 0.99);
        if (!(secondModeRatio > 1 && secondModeRatio <= MAX_MODE_RATIO)) {
            throw new InvalidInputException("second mode ratio", Checks.show(secondModeRatio),
                    "a ratio of the second natural frequency to the first, above 1 and at most " + (int) MAX_MODE_RATIO);
        }
        Checks.inOpenRange("second mode mass", secondModeMass, 0.0, 1e6);
        if (!(Math.abs(secondModeShape) <= MAX_SHAPE && secondModeShape != 0.0)) {
            throw new InvalidInputException("second mode shape", Checks.show(secondModeShape),
                    "a number from -" + (int) MAX_SHAPE + " to " + (int) MAX_SHAPE + " other than 0 (an absorber for"
                            + " mode 2 where mode 2 does not move does nothing; far beyond, the mass split overflows)");
        }
        PeakProblem.checkBand(bandLow, bandHigh);
        Checks.present("second point", otherPoint, "a second point or none");
    }

    /**
     * @param mode 0 or 1
     * @param point {@link #POINT} or {@link #OTHER_POINT}
     * @return the mode's shape value there
     */
    public double shape(int mode, String point) {
        if (point.equals(POINT)) {
            return mode == 0 ? 1.0 : secondModeShape;
        }
        OtherPoint other = otherPoint.orElseThrow();
        return mode == 0 ? other.firstModeShape() : other.secondModeShape();
    }

    /**
     * @param absorber 0 or 1 (the absorber of that mode)
     * @return its point: the first, or the second where its mode's shape value is larger in size
     */
    public String absorberPoint(int absorber) {
        return otherPoint.isPresent() && Math.abs(shape(absorber, OTHER_POINT)) > Math.abs(shape(absorber, POINT))
                ? OTHER_POINT : POINT;
    }

    /**
     * @param mode 0 or 1
     * @return its natural frequency over mode 1's
     */
    public double modeFrequency(int mode) {
        return mode == 0 ? 1.0 : secondModeRatio;
    }

    /**
     * @param mode 0 or 1
     * @return its modal mass as seen at its absorber's point, m_r / phi_r^2, over m1
     */
    public double seenMass(int mode) {
        return setup().seenMass(mode);
    }

    /**
     * @param absorber 0 or 1 (the absorber of that mode)
     * @return its mass over m1, by the rule of equal mass ratios on each absorber's own mode
     */
    public double absorberMassRatio(int absorber) {
        return setup().absorberMass(absorber);
    }

    /** @return each absorber's mass over the modal mass of its own mode seen at the point (the same for both) */
    public double ownMassRatio() {
        return setup().ownMassRatio();
    }

    /**
     * @return the same problem in the general form: the two-mode structure on the scales omega1 = 1
     *     and m1 = 1, the force and the displacement at the first point, the absorbers at theirs
     */
    public JointAbsorberSetup setup() {
        return new JointAbsorberSetup(structure(), List.of(0, 1), List.of(absorberPoint(0), absorberPoint(1)), POINT,
                POINT, massRatio, bandLow, bandHigh);
    }

    /** @return the two-mode structure, on the scales omega_ref = omega1 = 1, k_ref = m1 omega1^2 = 1 */
    public ModalStructure structure() {
        List<Mode> modes = new ArrayList<>();
        for (int r = 0; r < MODES; r++) {
            Map<String, Double> shapes = new TreeMap<>();
            shapes.put(POINT, shape(r, POINT));
            if (otherPoint.isPresent()) {
                shapes.put(OTHER_POINT, shape(r, OTHER_POINT));
            }
            modes.add(new Mode(modeFrequency(r), structureDamping, r == 0 ? 1.0 : secondModeMass, shapes));
        }
        return new ModalStructure(modes);
    }

    /**
     * @param tuningRatios f_j = omega_j / omega1 of each absorber
     * @param dampingRatios zeta_j of each
     * @return the design with the masses of the split rule
     */
    public AbsorberSetDesign design(double[] tuningRatios, double[] dampingRatios) {
        return setup().design(tuningRatios, dampingRatios);
    }

    /**
     * @param design the two absorbers
     * @return the structure with them at their points (X k1 / F is its transfer function)
     */
    public ModalSystem system(AbsorberSetDesign design) {
        return setup().system(design);
    }

    /**
     * @param design the two absorbers
     * @return the exact peak of |X k1 / F| over the band, the whole two-mode structure seen
     */
    public double peak(AbsorberSetDesign design) {
        return setup().peak(design);
    }
}
