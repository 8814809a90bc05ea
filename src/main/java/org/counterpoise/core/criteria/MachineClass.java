package org.counterpoise.core.criteria;

import java.util.List;

/**
 * A machine group and support, and the boundaries of its evaluation zones (A/B, B/C, C/D), broadband r.m.s.
 * values measured on the bearing housings or pedestals.
 *
 * <p>Groups 1 and 2 with rigid or flexible support: ISO 10816-3:2009 Annex A, Table A.1 (group 1:
 * above 300 kW up to 50 MW, or electrical machines of shaft height 315 mm and more) and Table A.2
 * (group 2: above 15 kW up to 300 kW, or shaft height 160 mm up to 315 mm), r.m.s. velocity and
 * r.m.s. displacement, 10 to 1000 Hz (2 to 1000 Hz below 600 r/min). Transcribed from two public
 * implementations that agree (jmrplens/phonometry {@code vibration/machinery/evaluation.py},
 * velocity and displacement; LGDiMaggio/predictive-maintenance-mcp {@code diagnostics/iso20816.py},
 * velocity), not read in the standard itself. ISO 20816-3:2022 supersedes that edition; one of those
 * implementations says the 2022 edition merges zones A and B into one acceptance region and keeps
 * the other boundaries. That was not checked against the 2022 text: the four zones of 2009 are kept
 * here, and the A/B boundary (the newly commissioned machine) is the one to treat with most caution.
 * A support is rigid when its lowest natural frequency in the measured direction is at least 25 %
 * above the main excitation frequency (ISO 10816-3:2009, 4.3), flexible otherwise. When velocity and
 * displacement give different zones, the more restrictive applies (ISO 10816-3:2009, 5.2.3).
 */
public enum MachineClass {
    /** Group 1 (above 300 kW to 50 MW; electrical machines of shaft height 315 mm and more), rigid support. */
    GROUP_1_RIGID("group-1-rigid", Sources.ISO_10816_3_A1, new double[] {2.3e-3, 4.5e-3, 7.1e-3},
            new double[] {29e-6, 57e-6, 90e-6}),
    /** Group 1, flexible support. */
    GROUP_1_FLEXIBLE("group-1-flexible", Sources.ISO_10816_3_A1, new double[] {3.5e-3, 7.1e-3, 11.0e-3},
            new double[] {45e-6, 90e-6, 140e-6}),
    /** Group 2 (above 15 kW to 300 kW; electrical machines of shaft height 160 mm to 315 mm), rigid support. */
    GROUP_2_RIGID("group-2-rigid", Sources.ISO_10816_3_A2, new double[] {1.4e-3, 2.8e-3, 4.5e-3},
            new double[] {22e-6, 45e-6, 71e-6}),
    /** Group 2, flexible support. */
    GROUP_2_FLEXIBLE("group-2-flexible", Sources.ISO_10816_3_A2, new double[] {2.3e-3, 4.5e-3, 7.1e-3},
            new double[] {37e-6, 71e-6, 113e-6});

    /** Source of the tables, in one line for the family. */
    public static final String SOURCE = "ISO 10816-3:2009 Tables A.1, A.2 (superseded by ISO 20816-3:2022)";

    /**
     * A support is rigid when its lowest natural frequency is at least this multiple of the main
     * excitation frequency (ISO 10816-3:2009, 4.3: 25 % above), flexible otherwise.
     */
    public static final double RIGID_FREQUENCY_RATIO = 1.25;

    /** The sources, one line each. */
    private static final class Sources {
        static final String ISO_10816_3_A1 = "ISO 10816-3:2009 Table A.1 (superseded by ISO 20816-3:2022)";
        static final String ISO_10816_3_A2 = "ISO 10816-3:2009 Table A.2 (superseded by ISO 20816-3:2022)";
    }

    private final String id;
    private final String source;
    private final double[] velocity;
    private final double[] displacement;

    MachineClass(String id, String source, double[] velocity, double[] displacement) {
        this.id = id;
        this.source = source;
        this.velocity = velocity;
        this.displacement = displacement;
    }

    /** @return true for the classes of a rigid support */
    public boolean rigidSupport() {
        return this == GROUP_1_RIGID || this == GROUP_2_RIGID;
    }

    /** @return the id in project files */
    public String id() {
        return id;
    }

    /** @return standard, edition and table of this class's boundaries */
    public String source() {
        return source;
    }

    /**
     * @param zone a zone
     * @return the upper boundary of that zone in r.m.s. velocity, m/s (+infinity for D)
     */
    public double upperBoundary(SeverityZone zone) {
        return zone == SeverityZone.D ? Double.POSITIVE_INFINITY : velocity[zone.ordinal()];
    }

    /** @return the four zones with their bounds in r.m.s. velocity, m/s */
    public List<Zone> zones() {
        return zonesOf(velocity);
    }

    /**
     * @param zone a zone
     * @return the upper boundary of that zone in r.m.s. displacement, m (+infinity for D)
     */
    public double upperDisplacementBoundary(SeverityZone zone) {
        return zone == SeverityZone.D ? Double.POSITIVE_INFINITY : displacement[zone.ordinal()];
    }

    /** @return the four zones with their bounds in r.m.s. displacement, m */
    public List<Zone> displacementZones() {
        return zonesOf(displacement);
    }

    /**
     * For a single harmonic of frequency f, r.m.s. displacement = r.m.s. velocity / (2 pi f): below
     * this frequency the displacement boundary of the zone is the more restrictive of the two
     * (ISO 10816-3:2009, 5.2.3), above it the velocity boundary.
     *
     * @param zone A, B or C
     * @return v / (2 pi d) for the zone's upper boundaries, Hz; 0 for D (no upper boundary)
     */
    public double displacementGovernsBelow(SeverityZone zone) {
        if (zone == SeverityZone.D) {
            return 0;
        }
        return velocity[zone.ordinal()] / (2 * Math.PI * displacement[zone.ordinal()]);
    }

    private static List<Zone> zonesOf(double[] b) {
        return List.of(new Zone("A", 0, b[0]), new Zone("B", b[0], b[1]), new Zone("C", b[1], b[2]),
                new Zone("D", b[2], Double.POSITIVE_INFINITY));
    }
}
