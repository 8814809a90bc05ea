package org.counterpoise.core.system;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * A structure described by its modes (natural frequency, damping ratio, modal mass and mode-shape
 * values at named points), the structure alone, before any absorber. Every mode names the same
 * points. Modes are kept in ascending natural frequency. SI units.
 *
 * @param modes the modes (at least one), each with the same point names
 */
public record ModalStructure(List<Mode> modes) {

    /** Validates the structure. */
    public ModalStructure {
        Checks.present("modes", modes, "at least one mode");
        if (modes.isEmpty()) {
            throw new InvalidInputException("modes", "none", "at least one mode");
        }
        Set<String> points = modes.get(0).shape().keySet();
        for (int r = 1; r < modes.size(); r++) {
            if (!modes.get(r).shape().keySet().equals(points)) {
                throw new InvalidInputException("mode " + (r + 1) + " shape", String.valueOf(modes.get(r).shape().keySet()),
                        "the same named points as mode 1: " + points);
            }
        }
        List<Mode> sorted = new ArrayList<>(modes);
        sorted.sort(Comparator.comparingDouble(Mode::naturalFrequency));
        modes = List.copyOf(sorted);
    }

    /**
     * One mode seen at one point: the single-mode structure of the rest of the program.
     *
     * @param point the point's name
     * @param frequency natural frequency, rad/s
     * @param dampingRatio damping ratio
     * @param modalMass modal mass at that point (shape value 1), kg
     * @return the structure
     */
    public static ModalStructure singleMode(String point, double frequency, double dampingRatio, double modalMass) {
        return new ModalStructure(List.of(new Mode(frequency, dampingRatio, modalMass, Map.of(point, 1.0))));
    }

    /** @return the named points */
    public Set<String> points() {
        return modes.get(0).shape().keySet();
    }

    /**
     * One mode's natural frequency changed, as a structure whose stiffness, contents or supports are
     * not as assumed: its stiffness by the square of the change, its modal mass, damping ratio and
     * shape kept (the single-mode structure's mistuning, {@code Structure.withFrequencyScaledBy}).
     *
     * @param mode the index of the mode
     * @param frequency its natural frequency, rad/s
     * @return the structure with that mode so changed (modes in ascending frequency again)
     */
    public ModalStructure withFrequency(int mode, double frequency) {
        List<Mode> changed = new ArrayList<>(modes);
        Mode m = changed.get(mode);
        changed.set(mode, new Mode(frequency, m.dampingRatio(), m.modalMass(), m.shape()));
        return new ModalStructure(changed);
    }

    /** @return the number of modes */
    public int size() {
        return modes.size();
    }

    /**
     * @param point a point's name
     * @return the point, when the structure has it
     */
    public String requirePoint(String point) {
        if (!points().contains(point)) {
            throw new InvalidInputException("point", String.valueOf(point), "one of the structure's named points " + points());
        }
        return point;
    }

    /**
     * The mode an absorber at a point should be fitted to for a band of forcing frequencies: of the
     * modes that move the point, the one nearest the band in ratio of frequencies (0 inside it);
     * between modes equally near (several inside the band) the one with the highest resonance peak
     * at the point, phi(a)^2 / (2 zeta m omega_n^2) (an undamped mode first, then the lower).
     *
     * @param point the absorber's point
     * @param low low end of the band, rad/s
     * @param high high end of the band, rad/s
     * @return the index of that mode, from 0 in ascending natural frequency
     */
    public int nearestMode(String point, double low, double high) {
        requirePoint(point);
        int best = -1;
        double bestDistance = Double.POSITIVE_INFINITY;
        double bestPeak = 0;
        for (int r = 0; r < modes.size(); r++) {
            Mode m = modes.get(r);
            double phi = m.shapeAt(point);
            if (phi == 0.0) {
                continue;
            }
            double w = m.naturalFrequency();
            double distance = w < low ? Math.log(low / w) : w > high ? Math.log(w / high) : 0.0;
            double peak = m.dampingRatio() == 0.0 ? Double.POSITIVE_INFINITY
                    : phi * phi / (2 * m.dampingRatio() * m.modalMass() * w * w);
            if (distance < bestDistance || distance == bestDistance && peak > bestPeak) {
                best = r;
                bestDistance = distance;
                bestPeak = peak;
            }
        }
        if (best < 0) {
            throw new InvalidInputException("absorber point", point, "a point that some mode moves (every mode-shape"
                    + " value there is 0)");
        }
        return best;
    }
}
