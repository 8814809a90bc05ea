package org.counterpoise.io.text;

import org.counterpoise.core.realisation.HardwareCaution;

/**
 * The words of the cautions that depend on the hardware ({@link HardwareCaution}, chosen by the
 * spring and damper kinds). The standing cautions every absorber carries are
 * {@code core.design.Cautions.STANDARD}. Duties of care of the trade (common practice).
 */
public final class CautionText {
    private CautionText() {
    }

    /**
     * @param c a caution
     * @return its sentence
     */
    public static String of(HardwareCaution c) {
        return switch (c) {
            case HELICAL_SPRING_FRACTURE -> "Helical springs can break without warning at a surface flaw or"
                    + " corrosion pit: locate each spring on its seats so that it cannot walk off, keep the"
                    + " secondary catch able to hold the mass with every spring broken, and inspect the springs for"
                    + " cracks, corrosion and set at each service.";
            case ELASTOMER_AGEING -> "An elastomer element ages (ozone, oil, heat and light harden it), creeps under"
                    + " the static load and stiffens in the cold, so the absorber frequency drifts: keep it out of oil"
                    + " and sunlight, check the tuning after the first weeks and then yearly, and replace the element"
                    + " when its frequency has drifted by more than the tolerance.";
            case DASHPOT_LEAK_AND_HEAT -> "A fluid dashpot can leak and warms as it works; its coefficient falls as"
                    + " the fluid warms and rises in the cold: check it for leaks at each service, keep it within"
                    + " the supplier's temperature range and replace it when it has lost fluid.";
            case MAGNET_ATTRACTION_AND_HEAT -> "The eddy-current damper's magnets attract tools, fixings and loose"
                    + " steel with great force and can trap fingers: handle them with non-magnetic tools, keep"
                    + " swarf out of the gap and warn people with pacemakers; permanent magnets lose strength when"
                    + " hot (neodymium magnets above about 80 degrees C), so keep them cool and check the damping"
                    + " after any overheating.";
        };
    }
}
