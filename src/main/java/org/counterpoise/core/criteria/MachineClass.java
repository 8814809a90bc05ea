package org.counterpoise.core.criteria;

import java.util.List;

/**
 * A machine group and its support, with the boundaries of the evaluation zones of r.m.s. velocity
 * measured on the bearing housings (broadband, 10 to 1000 Hz; 2 to 1000 Hz below 600 r/min):
 * ISO 10816-3:2009 Tables A.1 and A.2, kept by ISO 20816-3:2022 (reference/acceptance-criteria.md
 * sections 3.1 and 3.2: transcribed from two public implementations; the 2022 edition's
 * unchanged velocity boundaries are from memory there). A support is rigid when its lowest natural
 * frequency in the measured direction is at least 25 % above the main excitation frequency.
 */
public enum MachineClass {
    /** Group 1 (300 kW to 50 MW; electrical machines of shaft height 315 mm and more), rigid support. */
    GROUP_1_RIGID("group-1-rigid", 2.3e-3, 4.5e-3, 7.1e-3),
    /** Group 1, flexible support. */
    GROUP_1_FLEXIBLE("group-1-flexible", 3.5e-3, 7.1e-3, 11.0e-3),
    /** Group 2 (15 kW to 300 kW; electrical machines of shaft height 160 to 315 mm), rigid support. */
    GROUP_2_RIGID("group-2-rigid", 1.4e-3, 2.8e-3, 4.5e-3),
    /** Group 2, flexible support. */
    GROUP_2_FLEXIBLE("group-2-flexible", 2.3e-3, 4.5e-3, 7.1e-3);

    /** Source of the table. */
    public static final String SOURCE = "ISO 20816-3:2022 (zone boundaries of ISO 10816-3:2009 Tables A.1, A.2)";

    private final String id;
    private final double boundaryAB;
    private final double boundaryBC;
    private final double boundaryCD;

    MachineClass(String id, double boundaryAB, double boundaryBC, double boundaryCD) {
        this.id = id;
        this.boundaryAB = boundaryAB;
        this.boundaryBC = boundaryBC;
        this.boundaryCD = boundaryCD;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /**
     * @param zone a zone
     * @return the upper boundary of that zone, m/s r.m.s. (+infinity for D)
     */
    public double upperBoundary(SeverityZone zone) {
        return switch (zone) {
            case A -> boundaryAB;
            case B -> boundaryBC;
            case C -> boundaryCD;
            case D -> Double.POSITIVE_INFINITY;
        };
    }

    /** @return the four zones with their bounds, m/s r.m.s. */
    public List<Zone> zones() {
        return List.of(new Zone("A", 0, boundaryAB), new Zone("B", boundaryAB, boundaryBC),
                new Zone("C", boundaryBC, boundaryCD), new Zone("D", boundaryCD, Double.POSITIVE_INFINITY));
    }
}
