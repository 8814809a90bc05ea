package org.counterpoise.core.realisation;

/**
 * Spring wire materials offered for helical springs, with their standard and the elastic moduli
 * EN 13906-1 uses for them, the minimum tensile strength as a function of wire diameter (the wire
 * standard's table, kept once in {@link WireStrengthTable}), the permissible shear stress and the
 * strengths the fatigue check needs. Everything a spring check reads about its wire is here.
 *
 * <p>Moduli at room temperature: EN 13906-1:2013, table of moduli (G = 81 500 N/mm^2 and
 * E = 206 000 N/mm^2 for the unalloyed wires of EN 10270-1; G = 70 000 N/mm^2, E = 185 000 N/mm^2 for
 * the stainless wire 1.4310 of EN 10270-3). Values from memory until certified against the standard.
 */
public enum SpringMaterial {
    /** Patented cold-drawn unalloyed spring steel wire, grade SH (static, higher strength). */
    EN10270_1_SH("en10270-1-sh", "EN 10270-1:2011 grade SH", 81.5e9, 206e9, 7850),
    /** Patented cold-drawn unalloyed spring steel wire, grade DH (dynamic duty). */
    EN10270_1_DH("en10270-1-dh", "EN 10270-1:2011 grade DH", 81.5e9, 206e9, 7850),
    /** Stainless spring steel wire X10CrNi18-8 (1.4310), for damp or corrosive places. */
    EN10270_3_1_4310("en10270-3-1.4310", "EN 10270-3:2011 1.4310 (X10CrNi18-8)", 70.0e9, 185e9, 7900);

    private final String id;
    private final String standard;
    private final double shearModulus;
    private final double youngsModulus;
    private final double density;

    SpringMaterial(String id, String standard, double shearModulus, double youngsModulus, double density) {
        this.id = id;
        this.standard = standard;
        this.shearModulus = shearModulus;
        this.youngsModulus = youngsModulus;
        this.density = density;
    }

    /** @return the identifier in project files, the JSON and on the command line */
    public String id() {
        return id;
    }

    /** @return the wire standard and grade */
    public String standard() {
        return standard;
    }

    /** @return shear modulus G, Pa */
    public double shearModulus() {
        return shearModulus;
    }

    /** @return Young's modulus E, Pa */
    public double youngsModulus() {
        return youngsModulus;
    }

    /** @return density, kg/m^3 */
    public double density() {
        return density;
    }

    /** @return the stock wire diameters this wire is wound from, m, ascending (a copy) */
    public double[] stockDiameters() {
        return WireStrengthTable.stockDiameters(this);
    }

    /**
     * @param wireDiameter d, m, within {@link #stockDiameters()}
     * @return the minimum tensile strength Rm of the wire standard's table, Pa (interpolated in log d)
     */
    public double minimumTensileStrength(double wireDiameter) {
        return WireStrengthTable.minimumTensileStrength(this, wireDiameter);
    }

    /**
     * The permissible (uncorrected) shear stress of a cold-coiled spring at solid length, which also
     * bounds the stress at every working load: 0.56 Rm (EN 13906-1:2013, clause 10.1.1, as a public
     * transcription of the 2013 text gives it; the older figure of 0.5 Rm was not found in it).
     *
     * @param wireDiameter d, m
     * @return permissible shear stress, Pa
     */
    public double permissibleShearStress(double wireDiameter) {
        return PERMISSIBLE_SHEAR_FRACTION * minimumTensileStrength(wireDiameter);
    }

    /**
     * The ultimate shear strength of cold-drawn spring wire, 0.67 Rm (Budynas and Nisbett, Shigley's
     * Mechanical Engineering Design, 9th ed., section 10-9, eq. 10-30; from memory), the end of the
     * Goodman line of the fatigue check.
     *
     * @param wireDiameter d, m
     * @return ultimate shear strength, Pa
     */
    public double ultimateShearStrength(double wireDiameter) {
        return ULTIMATE_SHEAR_FRACTION * minimumTensileStrength(wireDiameter);
    }

    /**
     * Zimmerli's fatigue strength of unpeened spring wire for infinite life (10^7 cycles and more),
     * the same for every spring steel and stainless wire below 10 mm: a shear stress amplitude of
     * 241 MPa (35 kpsi) at a mean of 379 MPa (55 kpsi) (F. P. Zimmerli, "Human Failures in Spring
     * Applications", The Mainspring, 1957, as quoted by Budynas and Nisbett, Shigley's Mechanical
     * Engineering Design, 9th ed., section 10-9; from memory). Used above 10 mm as well: a stated
     * extrapolation.
     *
     * @return the amplitude S_sa, Pa
     */
    public double enduranceAmplitude() {
        return ZIMMERLI_AMPLITUDE;
    }

    /** @return the mean stress S_sm of Zimmerli's endurance point, Pa (see {@link #enduranceAmplitude()}) */
    public double enduranceMean() {
        return ZIMMERLI_MEAN;
    }

    /** Permissible shear stress at solid length over Rm, cold-coiled (EN 13906-1:2013, 10.1.1). */
    public static final double PERMISSIBLE_SHEAR_FRACTION = 0.56;
    /** Ultimate shear strength over Rm (Shigley, eq. 10-30). */
    public static final double ULTIMATE_SHEAR_FRACTION = 0.67;
    private static final double ZIMMERLI_AMPLITUDE = 241e6;
    private static final double ZIMMERLI_MEAN = 379e6;
}
