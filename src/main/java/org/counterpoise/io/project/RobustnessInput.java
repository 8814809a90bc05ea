package org.counterpoise.io.project;

import java.util.Map;
import java.util.Optional;
import org.counterpoise.core.robust.Tolerance;

/**
 * The robustness section of a project as typed. Percent values; absent entries are NaN or null.
 *
 * @param structureMistuningPercent the structure's natural frequency may be off by +/- this
 * @param absorberMistuningPercent the absorber's natural frequency may be off by +/- this
 * @param target largest acceptable peak of the response that matters, or null
 * @param samples Monte Carlo samples (0 for the default)
 * @param seed Monte Carlo seed
 * @param structureMass tolerance of the structure's mass, or null
 * @param structureStiffness tolerance of the structure's stiffness, or null
 * @param absorberMass tolerance of the absorber's mass, or null
 * @param absorberStiffness tolerance of the absorber's spring rate, or null
 * @param absorberDamping tolerance of the absorber's damping coefficient, or null
 */
public record RobustnessInput(double structureMistuningPercent, double absorberMistuningPercent, QuantityInput target,
        int samples, long seed, ToleranceInput structureMass, ToleranceInput structureStiffness,
        ToleranceInput absorberMass, ToleranceInput absorberStiffness, ToleranceInput absorberDamping) {

    /**
     * A tolerance as typed: a distribution and either a percent or an absolute value with unit.
     *
     * @param distribution the file's token: "uniform", "normal" or "none" (see {@link #token})
     * @param percent half-width (uniform) or standard deviation (normal) in percent, or NaN
     * @param absolute the same as an absolute quantity, or null
     */
    public record ToleranceInput(String distribution, double percent, QuantityInput absolute) {

        /** The project file's token of each distribution: the one list, read and written from here. */
        private static final Map<Tolerance.Distribution, String> TOKENS = Map.of(Tolerance.Distribution.NONE,
                "none", Tolerance.Distribution.UNIFORM, "uniform", Tolerance.Distribution.NORMAL, "normal");

        /**
         * @param d a distribution
         * @return its token in project files
         */
        public static String token(Tolerance.Distribution d) {
            return TOKENS.get(d);
        }

        /** @return the distribution the token names, empty when the token is not one of {@link #tokens} */
        public Optional<Tolerance.Distribution> kind() {
            return TOKENS.entrySet().stream().filter(e -> e.getValue().equals(distribution)).map(Map.Entry::getKey)
                    .findFirst();
        }

        /** @return the tokens, for messages */
        public static String tokens() {
            return "one of uniform, normal, none";
        }
    }
}
