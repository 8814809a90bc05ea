package org.counterpoise.ui.gui.wizard;

import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.io.text.QuantityFormat;

/** The hardware step's list items in words (the lists hold the core's values; these only say them). */
final class HardwareWords {
    private HardwareWords() {
    }

    static String of(SpringKind kind) {
        return switch (kind) {
            case HELICAL_COMPRESSION -> "helical compression springs (steel wire)";
            case ELASTOMER -> "elastomer element (its loss is the damping)";
        };
    }

    static String of(SpringMaterial material) {
        return switch (material) {
            case EN10270_1_SH -> "spring steel, grade SH (static duty)";
            case EN10270_1_DH -> "spring steel, grade DH (dynamic duty)";
            case EN10270_3_1_4310 -> "stainless 1.4310 (damp or corrosive places)";
        } + ", " + material.standard().replaceFirst(":\\d{4}.*", "");
    }

    static String of(DamperKind kind) {
        return switch (kind) {
            case VISCOUS_DASHPOT -> "viscous dashpot";
            case EDDY_CURRENT -> "eddy current (plate in a magnet gap)";
            case ELASTOMER_LOSS -> "the elastomer's own loss";
        };
    }

    static String of(Conductor conductor) {
        return switch (conductor) {
            case COPPER -> "copper";
            case ALUMINIUM -> "aluminium";
        } + " (" + QuantityFormat.number(conductor.conductivity() / 1e6, 3) + " MS/m)";
    }

    /**
     * @param count helical springs in parallel, 0 for the design's choice
     * @return the words for the list
     */
    static String springCount(int count) {
        return count == 0 ? "fewest that pass every check" : Integer.toString(count);
    }
}
