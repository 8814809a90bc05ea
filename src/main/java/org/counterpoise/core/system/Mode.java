package org.counterpoise.core.system;

import java.util.Map;
import java.util.TreeMap;
import org.counterpoise.core.error.Checks;
import org.counterpoise.core.error.InvalidInputException;

/**
 * One mode of a structure in modal coordinates: the structure's receptance from a force at point q
 * to the displacement at point p gains the term phi(p) phi(q) / (m (omega_n^2 - omega^2 + 2 i zeta
 * omega_n omega)) (modal superposition of classically damped modes; for example Ewins 2000, Modal
 * Testing: Theory, Practice and Application, 2nd ed., section 2.3). The mode-shape values and the
 * modal mass go together: scaling the shape by a scales the modal mass by a^2 and leaves every
 * receptance unchanged.
 *
 * @param naturalFrequency undamped natural frequency omega_n, rad/s (&gt; 0)
 * @param dampingRatio modal damping ratio zeta (0 to 0.99)
 * @param modalMass modal mass m, kg (&gt; 0), for the shape values given
 * @param shape mode-shape value at each named point (the excitation, response and absorber points)
 */
public record Mode(double naturalFrequency, double dampingRatio, double modalMass, Map<String, Double> shape) {

    /** Validates the mode; a message names the field and what is allowed. */
    public Mode {
        Checks.positive("mode natural frequency", naturalFrequency);
        Checks.inRange("mode damping ratio", dampingRatio, 0.0, 0.99);
        Checks.positive("modal mass", modalMass);
        Checks.present("mode shape", shape, "the mode-shape value at each named point");
        if (shape.isEmpty()) {
            throw new InvalidInputException("mode shape", "no points", "at least one named point with its shape value");
        }
        for (Map.Entry<String, Double> e : shape.entrySet()) {
            Double v = e.getValue();
            if (v == null || !Double.isFinite(v)) {
                throw new InvalidInputException("mode shape at " + e.getKey(), v == null ? "missing" : Checks.show(v),
                        "a finite number (0 where the mode does not move the point)");
            }
        }
        shape = Map.copyOf(new TreeMap<>(shape));
    }

    /**
     * The single-mode reduction: the mode's modal mass as seen at a point, m_r / phi_r(p)^2 (Den Hartog
     * 1956, Mechanical Vibrations, 4th ed., 3.3; Warburton 1982, section 2); infinite where the mode does
     * not move the point.
     *
     * @param point a point name
     * @return the mass seen there, kg
     */
    public double massSeenAt(String point) {
        double phi = shapeAt(point);
        return modalMass / (phi * phi);
    }

    /**
     * @param point a point name
     * @return the mode-shape value there
     */
    public double shapeAt(String point) {
        Double v = shape.get(point);
        if (v == null) {
            throw new InvalidInputException("point", point, "one of the structure's named points " + shape.keySet());
        }
        return v;
    }
}
