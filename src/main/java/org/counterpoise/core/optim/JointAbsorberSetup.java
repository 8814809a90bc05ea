package org.counterpoise.core.optim;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.system.ModalPeak;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.ModalSystem;
import org.counterpoise.core.system.Mode;
import org.counterpoise.core.system.PointAbsorber;

/**
 * One absorber on each of two modes of a structure of any number of modes, designed jointly: the
 * general form behind {@link JointAbsorberProblem}. Each mode keeps its own damping ratio; the force
 * acts at one named point, the displacement is taken at another, each absorber sits at its own;
 * the structure's other modes are part of the structure the design sees, with no absorber of their
 * own. Any consistent units (SI, or the non-dimensional ones of {@link JointAbsorberProblem}): masses
 * in the unit of the modal masses, frequencies (natural, the band's, the absorbers' tunings) in one
 * unit of angular frequency.
 *
 * <p>Mass split (the rule of this design, common practice with no single source): each absorber gets
 * the same mass ratio on its own mode as seen at its point, m_r / phi_r(a_r)^2; so absorber j's mass is
 * m_a (m_j / phi_j^2) / sum_r (m_r / phi_r^2).
 *
 * @param structure the modes, in ascending natural frequency
 * @param modes the indices of the two modes with an absorber each, the lower first
 * @param absorberPoints each absorber's point, in the order of {@code modes}
 * @param excitationPoint where the force acts
 * @param responsePoint where the displacement is taken
 * @param totalMass the two absorbers' mass together (&gt; 0)
 * @param bandLow lowest forcing frequency (&gt;= 0)
 * @param bandHigh highest (+infinity for all frequencies)
 */
public record JointAbsorberSetup(ModalStructure structure, List<Integer> modes, List<String> absorberPoints,
        String excitationPoint, String responsePoint, double totalMass, double bandLow, double bandHigh) {

    /** Validates the setup; a message names the quantity. */
    public JointAbsorberSetup {
        Checks.present("structure", structure, "a structure of at least two modes");
        modes = List.copyOf(modes);
        absorberPoints = List.copyOf(absorberPoints);
        int n = JointAbsorberProblem.MODES;
        if (modes.size() != n || absorberPoints.size() != n) {
            throw new InvalidInputException("modes", modes.size() + " modes", "exactly " + n + " modes, one absorber each");
        }
        if (modes.get(0) < 0 || modes.get(1) >= structure.size()
                || !(structure.modes().get(modes.get(0)).naturalFrequency() < structure.modes().get(modes.get(1))
                        .naturalFrequency())) {
            throw new InvalidInputException("modes", String.valueOf(modes),
                    "two modes of the structure of different natural frequencies, the lower first");
        }
        structure.requirePoint(excitationPoint);
        structure.requirePoint(responsePoint);
        for (int j = 0; j < n; j++) {
            structure.requirePoint(absorberPoints.get(j));
            if (structure.modes().get(modes.get(j)).shapeAt(absorberPoints.get(j)) == 0.0) {
                throw new InvalidInputException("absorber point", absorberPoints.get(j),
                        "a point its mode moves (a mode-shape value other than 0: an absorber where its mode does"
                                + " not move does nothing)");
            }
        }
        if (!(totalMass > 0) || Double.isInfinite(totalMass)) {
            throw new InvalidInputException("absorber mass", Checks.show(totalMass), "a finite mass above 0");
        }
        PeakProblem.checkBand(bandLow, bandHigh);
    }

    /**
     * @param j 0 or 1 (the absorber of the lower or the upper designed mode)
     * @return that mode
     */
    public Mode mode(int j) {
        return structure.modes().get(modes.get(j));
    }

    /**
     * @param j 0 or 1
     * @param point a named point
     * @return designed mode j's shape value there
     */
    public double shape(int j, String point) {
        return mode(j).shapeAt(point);
    }

    /**
     * @param j 0 or 1
     * @return designed mode j's modal mass as seen at its absorber's point, m_j / phi_j(a_j)^2
     */
    public double seenMass(int j) {
        return mode(j).massSeenAt(absorberPoints.get(j));
    }

    /**
     * @param j 0 or 1
     * @return absorber j's mass, by the rule of equal mass ratios on each absorber's own mode
     */
    public double absorberMass(int j) {
        return totalMass * seenMass(j) / (seenMass(0) + seenMass(1));
    }

    /** @return each absorber's mass over its own mode's modal mass seen at its point (the same for both) */
    public double ownMassRatio() {
        return totalMass / (seenMass(0) + seenMass(1));
    }

    /**
     * @param tuning each absorber's own undamped frequency
     * @param damping each absorber's damping ratio, referred to its own frequency
     * @return the design with the masses of the split rule
     */
    public AbsorberSetDesign design(double[] tuning, double[] damping) {
        List<Double> m = new ArrayList<>();
        List<Double> f = new ArrayList<>();
        List<Double> z = new ArrayList<>();
        for (int j = 0; j < JointAbsorberProblem.MODES; j++) {
            m.add(absorberMass(j));
            f.add(tuning[j]);
            z.add(damping[j]);
        }
        return new AbsorberSetDesign(m, f, z);
    }

    /**
     * @param design the two absorbers (masses, frequencies, damping ratios in the setup's units)
     * @return the structure with them at their points, on the scales of its lowest mode
     */
    public ModalSystem system(AbsorberSetDesign design) {
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < design.count(); j++) {
            absorbers.add(PointAbsorber.tuned(absorberPoints.get(j), design.massRatios().get(j),
                    design.tuningRatios().get(j), design.dampingRatios().get(j)));
        }
        return ModalSystem.of(structure, absorbers);
    }

    /**
     * @param design the two absorbers
     * @return the exact peak over the band of the displacement at the response point per unit force at
     *     the excitation point, the whole structure seen ({@link ModalPeak})
     */
    public double peak(AbsorberSetDesign design) {
        return ModalPeak.over(system(design), excitationPoint, responsePoint, bandLow, bandHigh);
    }

    /**
     * A build off nominal: each designed mode's natural frequency times its own factor (its stiffness
     * by the square; modal mass, damping ratio and shape kept; the structure's other modes as they
     * are) and both absorbers' natural frequencies times one common factor (one spring batch: spring
     * rates by the square, masses and dampers kept, so each damping ratio becomes zeta_j / alpha). The
     * transfer functions stay on the nominal structure's scales, so a stiffer build's smaller
     * deflection counts.
     *
     * @param design the two absorbers as drawn
     * @param build {lower designed mode's factor, upper designed mode's factor, absorbers' factor}
     * @return the structure so varied with the absorbers so built
     */
    public ModalSystem system(AbsorberSetDesign design, double[] build) {
        // the modes changed by their nominal indices at once (the structure sorts them again)
        List<Mode> changed = new ArrayList<>(structure.modes());
        for (int j = 0; j < JointAbsorberProblem.MODES; j++) {
            Mode m = mode(j);
            changed.set(modes.get(j), new Mode(m.naturalFrequency() * build[j], m.dampingRatio(), m.modalMass(),
                    m.shape()));
        }
        ModalStructure varied = new ModalStructure(changed);
        double alpha = build[JointAbsorberProblem.MODES];
        List<PointAbsorber> absorbers = new ArrayList<>();
        for (int j = 0; j < design.count(); j++) {
            absorbers.add(PointAbsorber.tuned(absorberPoints.get(j), design.massRatios().get(j),
                    design.tuningRatios().get(j) * alpha, design.dampingRatios().get(j) / alpha));
        }
        ModalSystem nominal = ModalSystem.of(structure, absorbers);
        return new ModalSystem(varied, absorbers, nominal.referenceFrequency(), nominal.referenceStiffness());
    }

    /**
     * @param design the two absorbers as drawn
     * @param build the build's three factors, as {@link #system(AbsorberSetDesign, double[])}
     * @return the exact peak over the band of that build, the whole structure seen ({@link ModalPeak})
     */
    public double peak(AbsorberSetDesign design, double[] build) {
        return ModalPeak.over(system(design, build), excitationPoint, responsePoint, bandLow, bandHigh);
    }
}
