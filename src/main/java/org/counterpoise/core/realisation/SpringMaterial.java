package org.counterpoise.core.realisation;

/**
 * Spring wire materials offered for helical springs, with their standard and the elastic moduli
 * EN 13906-1 uses for them. The tensile strength as a function of wire diameter and the permissible
 * stresses are added by the spring design (one table, here).
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
}
