package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;

/**
 * The cautions that depend on the hardware chosen, beside the standing ones every absorber carries
 * ({@code core.design.Cautions}). Chosen by the spring and damper kinds, never by text; the words
 * are in io.text. Duties of care of the trade (common practice).
 */
public enum HardwareCaution {
    /** Helical springs: a broken coil, a spring that walks off its seat. */
    HELICAL_SPRING_FRACTURE,
    /** An elastomer element ages, creeps under the static load and stiffens in the cold. */
    ELASTOMER_AGEING,
    /** A fluid dashpot leaks and warms, and its coefficient changes with the fluid's temperature. */
    DASHPOT_LEAK_AND_HEAT,
    /** An eddy-current damper's magnets attract tools and loose steel, and lose strength when hot. */
    MAGNET_ATTRACTION_AND_HEAT;

    /**
     * @param choice the hardware chosen
     * @return the cautions its spring and damper kinds call for, spring first
     */
    public static List<HardwareCaution> of(HardwareChoice choice) {
        List<HardwareCaution> out = new ArrayList<>();
        out.add(switch (choice.springKind()) {
            case HELICAL_COMPRESSION -> HELICAL_SPRING_FRACTURE;
            case ELASTOMER -> ELASTOMER_AGEING;
        });
        switch (choice.damperKind()) {
            case VISCOUS_DASHPOT -> out.add(DASHPOT_LEAK_AND_HEAT);
            case EDDY_CURRENT -> out.add(MAGNET_ATTRACTION_AND_HEAT);
            case ELASTOMER_LOSS -> {
                // the elastomer's own caution covers its loss
            }
        }
        return List.copyOf(out);
    }
}
