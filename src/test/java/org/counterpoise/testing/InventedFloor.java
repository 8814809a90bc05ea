package org.counterpoise.testing;

import java.util.List;
import java.util.Map;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.system.ModalStructure;
import org.counterpoise.core.system.Mode;

/**
 * An invented floor of two close modes (8.2 and 9.1 Hz, 11 % apart, 1.5 % damping, modal masses
 * 18 t and 15 t) with three named points, and the band of a drive sweeping 460 to 540 rpm: the
 * structure of the gallery-floor preset, shared by the tests of several absorbers.
 */
public final class InventedFloor {
    private static final double HZ = 2 * Math.PI;
    /** The two modes. */
    public static final ModalStructure MODES = new ModalStructure(List.of(
            new Mode(8.2 * HZ, 0.015, 18000, Map.of("display", 0.8, "midspan", 1.0)),
            new Mode(9.1 * HZ, 0.015, 15000, Map.of("display", 1.0, "midspan", 0.45))));
    /** 460 to 540 rpm, rad/s. */
    public static final FrequencyBand BAND = new FrequencyBand(460 * HZ / 60, 540 * HZ / 60);

    private InventedFloor() {
    }
}
