package org.counterpoise.core.realisation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The EN 13906-1:2013 formulas against hand calculations (the arithmetic is written beside each
 * check) and against independent routes: the standard's own form of the surge formula in its units,
 * and the surge frequency of a fixed-fixed spring from its rate and mass.
 */
class CompressionSpringFormulasTest {

    // A spring of EN 10270-1 wire: G = 81 500 N/mm^2, E = 206 000 N/mm^2, rho = 7850 kg/m^3,
    // d = 4 mm, D = 32 mm (w = 8), n = 8 active coils.
    private static final double G = 81.5e9;
    private static final double E = 206e9;
    private static final double RHO = 7850;
    private static final double D_WIRE = 4e-3;
    private static final double D_MEAN = 32e-3;
    private static final double N = 8;

    @Test
    void rateByHand() {
        // R = G d^4 / (8 D^3 n) = 81.5e9 * (0.004)^4 / (8 * 0.032^3 * 8)
        //   = 81.5e9 * 2.56e-10 / (8 * 3.2768e-5 * 8) = 20.864 / 2.097152e-3 = 9948.73 N/m
        assertEquals(9948.73, CompressionSpringFormulas.rate(G, D_WIRE, D_MEAN, N), 0.01);
        // and solved back for D
        assertEquals(D_MEAN, CompressionSpringFormulas.meanDiameterForRate(G, D_WIRE, N, 9948.730468750), 1e-12);
    }

    @Test
    void bergstraesserFactorByHand() {
        // k = (w + 0.5) / (w - 0.75): w = 8 gives 8.5 / 7.25 = 1.172414; w = 4 gives 4.5 / 3.25 = 1.384615
        assertEquals(1.172414, CompressionSpringFormulas.bergstraesser(8), 1e-6);
        assertEquals(1.384615, CompressionSpringFormulas.bergstraesser(4), 1e-6);
        // the same factor as Shigley's K_B = (4C + 2) / (4C - 3) (an independent spelling of it)
        for (double c = 4; c <= 20; c += 0.5) {
            assertEquals((4 * c + 2) / (4 * c - 3), CompressionSpringFormulas.bergstraesser(c), 1e-14);
        }
    }

    @Test
    void stressByHand() {
        // tau = 8 D F / (pi d^3) = 8 * 0.032 * 500 / (pi * 6.4e-8) = 128 / 2.010619e-7 = 636.62 MPa;
        // tau_k = 1.172414 * 636.62 = 746.38 MPa
        assertEquals(636.62e6, CompressionSpringFormulas.shearStress(500, D_WIRE, D_MEAN), 0.01e6);
        assertEquals(746.38e6, CompressionSpringFormulas.correctedShearStress(500, D_WIRE, D_MEAN), 0.01e6);
    }

    @Test
    void surgeFrequencyByHandAndInTheStandardsUnits() {
        // f = d / (2 pi n D^2) sqrt(G / (2 rho)) = 0.004 / (2 pi * 8 * 0.001024) * sqrt(81.5e9 / 15700)
        //   = 0.0777124 * 2278.40 = 177.06 Hz
        double omega = CompressionSpringFormulas.surgeFrequency(G, RHO, D_WIRE, D_MEAN, N);
        assertEquals(177.06, omega / (2 * Math.PI), 0.01);
        // EN 13906-1 writes f = 3.56e3 d / (n D^2) sqrt(G / rho) with d, D in mm, G in N/mm^2, rho in
        // kg/dm^3: 3.56e3 * 4 / (8 * 1024) * sqrt(81500 / 7.85) = 177.12 Hz; the 3.56e3 is rounded from
        // 1e3^1.5 / (2 pi sqrt 2) = 3558.8, hence 0.04 % apart
        assertEquals(3.56e3 * 4 / (8 * 1024) * Math.sqrt(81500 / 7.85), omega / (2 * Math.PI), 0.001 * 177);
    }

    @Test
    void surgeFrequencyIsTheHalfWaveOfTheSpringBetweenFixedEnds() {
        // Independent route: a uniform spring fixed at both ends vibrates first at f = (1/2) sqrt(R / m),
        // m the active coils' mass rho (pi d^2 / 4)(pi D n) (wave along the spring, common practice)
        double rate = CompressionSpringFormulas.rate(G, D_WIRE, D_MEAN, N);
        double mass = RHO * Math.PI * D_WIRE * D_WIRE / 4 * Math.PI * D_MEAN * N;
        double omega = CompressionSpringFormulas.surgeFrequency(G, RHO, D_WIRE, D_MEAN, N);
        assertEquals(0.5 * Math.sqrt(rate / mass), omega / (2 * Math.PI), 1e-9);
    }

    @Test
    void bucklingDeflectionByHand() {
        // G/E = 81.5/206 = 0.395631; L0 = 100 mm, nu = 1:
        // (pi D / (nu L0))^2 = (pi * 0.032 / 0.1)^2 = 1.005310^2 = 1.010648
        // (1 - G/E) / (0.5 + G/E) = 0.604369 / 0.895631 = 0.674797; root = sqrt(1 - 0.681982) = 0.563931
        // s_K = 0.1 * 0.5 / 0.604369 * (1 - 0.563931) = 0.0360764 m
        assertEquals(0.0360764, CompressionSpringFormulas.bucklingDeflection(G, E, 0.1, D_MEAN, 1.0), 1e-7);
        // nu = 0.5: (pi * 0.032 / 0.05)^2 = 4.042589, 1 - 0.674797 * 4.042589 < 0: it cannot buckle
        assertTrue(CompressionSpringFormulas.bucklingDeflection(G, E, 0.1, D_MEAN, 0.5) < 0);
    }

    @Test
    void bucklingSetsInAtTheSlendernessWhereTheRootTurnsReal() {
        // The root is real from L0 = (pi D / nu) sqrt((1 - G/E) / (0.5 + G/E)) on (rearranged 9.14)
        double r = G / E;
        double limit = Math.PI * D_MEAN / 0.5 * Math.sqrt((1 - r) / (0.5 + r));
        assertTrue(CompressionSpringFormulas.bucklingDeflection(G, E, 0.999 * limit, D_MEAN, 0.5) < 0);
        double justBeyond = CompressionSpringFormulas.bucklingDeflection(G, E, 1.001 * limit, D_MEAN, 0.5);
        // at the limit s_K = L0 * 0.5 / (1 - G/E): the spring buckles only near half its length and more
        assertEquals(1.001 * limit * 0.5 / (1 - r), justBeyond, 0.05 * justBeyond);
    }

    @Test
    void solidLengthAndGapsByHand() {
        // closed and ground ends: n_t = n + 2 = 10, Lc = n_t d = 40 mm
        assertEquals(40e-3, CompressionSpringFormulas.solidLength(N + CompressionSpringFormulas.INACTIVE_COILS,
                D_WIRE), 1e-15);
        // Sa = (0.0015 D^2 / d + 0.1 d) n = (0.0015 * 1024 / 4 + 0.4) * 8 = (0.384 + 0.4) * 8 = 6.272 mm,
        // times 1.5 under dynamic load = 9.408 mm
        assertEquals(6.272e-3, CompressionSpringFormulas.minimumGapSum(D_WIRE, D_MEAN, N, false), 1e-12);
        assertEquals(9.408e-3, CompressionSpringFormulas.minimumGapSum(D_WIRE, D_MEAN, N, true), 1e-12);
    }

    @Test
    void massByHand() {
        // rho (pi d^2 / 4)(pi D n_t) = 7850 * 1.256637e-5 * (pi * 0.032 * 10) = 7850 * 1.256637e-5 * 1.005310
        //   = 7850 * 1.263310e-5 = 0.099170 kg
        assertEquals(0.099170, CompressionSpringFormulas.mass(RHO, D_WIRE, D_MEAN, 10), 1e-6);
    }

    @Test
    void textbookExampleOfAMusicWireSpring() {
        // Budynas and Nisbett, Shigley's Mechanical Engineering Design, 9th ed., Example 10-1 (from
        // memory): music wire d = 0.037 in, outside diameter 7/16 in, squared and ground ends with
        // N_t = 12.5 total coils (N_a = 10.5 active), G = 11.75 Mpsi; the book finds C = 10.82,
        // K_B = 1.124, S_sy = 0.45 S_ut = 0.45 * 324 = 146 kpsi, the load that stresses the wire to it
        // F = 6.45 lbf, the rate k = 4.08 lbf/in, its deflection y = 1.58 in and the solid length
        // L_s = d N_t = 0.4625 in. Worked here in SI through the EN 13906-1 formulas.
        double inch = 0.0254;
        double psi = 6894.757;
        double lbf = 4.4482216;
        double d = 0.037 * inch;
        double meanD = (0.4375 - 0.037) * inch;
        double g = 11.75e6 * psi;
        assertEquals(10.82, meanD / d, 0.005);
        assertEquals(1.124, CompressionSpringFormulas.bergstraesser(meanD / d), 0.0005);
        // F from tau_k = S_sy: the stress formula is linear in F
        double force = 146e3 * psi / CompressionSpringFormulas.correctedShearStress(1.0, d, meanD);
        assertEquals(6.45, force / lbf, 0.01);
        double rate = CompressionSpringFormulas.rate(g, d, meanD, 10.5);
        assertEquals(4.08, rate / (lbf / inch), 0.01);
        assertEquals(1.58, force / rate / inch, 0.01);
        assertEquals(0.4625, CompressionSpringFormulas.solidLength(12.5, d) / inch, 1e-12);
    }
}
