package org.counterpoise.io.project;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.StringReader;
import org.counterpoise.core.model.Structure;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every structure form docs/project-file.md documents (mass or weight with stiffness, natural
 * frequency or static deflection; stiffness and natural frequency without a mass) times every
 * damping measure describes one physical structure here, and each must read, and write and read
 * again, to the same Structure. Expected values are worked by hand from the definitions (common
 * practice): m = 1000 kg, f_n = 10 Hz, k = m (2 pi f_n)^2, W = m g0 with g0 = 9.80665 m/s^2,
 * delta = g0 / (2 pi f_n)^2, zeta = eta / 2 = 1 / (2 Q) = bandwidth / (2 f_n).
 */
class StructureFormsTest {
    private static final double M = 1000;
    private static final double OMEGA = 2 * Math.PI * 10;
    private static final double K = M * OMEGA * OMEGA;
    private static final double G0 = 9.80665;

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "mass|stiffness", "mass|natural_frequency", "mass|static_deflection",
        "weight|stiffness", "weight|natural_frequency", "weight|static_deflection",
        "|stiffness+natural_frequency"})
    void everyDocumentedFormReadsAndRoundTripsToTheSameStructure(String massForm, String stiffnessForm) {
        for (String damping : new String[] {"{\"ratio\": 0.02}", "{\"loss_factor\": 0.04}", "{\"q_factor\": 25}",
            "{\"half_power_bandwidth\": {\"value\": 0.4, \"unit\": \"Hz\"}}", null}) {
            StringBuilder s = new StringBuilder();
            if ("mass".equals(massForm)) {
                s.append("\"mass\": {\"value\": ").append(M).append(", \"unit\": \"kg\"}, ");
            } else if ("weight".equals(massForm)) {
                s.append("\"weight\": {\"value\": ").append(M * G0).append(", \"unit\": \"N\"}, ");
            }
            if (stiffnessForm.contains("stiffness")) {
                s.append("\"stiffness\": {\"value\": ").append(K).append(", \"unit\": \"N/m\"}, ");
            }
            if (stiffnessForm.contains("natural_frequency")) {
                s.append("\"natural_frequency\": {\"value\": 10, \"unit\": \"Hz\"}, ");
            }
            if (stiffnessForm.equals("static_deflection")) {
                s.append("\"static_deflection\": {\"value\": ").append(G0 / (OMEGA * OMEGA)).append(", \"unit\": \"m\"}, ");
            }
            s.append("\"damping\": ").append(damping == null ? "{\"ratio\": 0}" : damping);
            String text = "{\"format_version\": 1, \"structure\": {" + s + "},"
                    + " \"disturbance\": {\"kind\": \"force\", \"amplitude\": {\"value\": 100, \"unit\": \"N\"},"
                    + " \"frequency\": {\"value\": 9, \"unit\": \"Hz\"}},"
                    + " \"absorber\": {\"mass_ratio\": 0.05}}";
            String what = massForm + " + " + stiffnessForm + " + " + damping;
            Project p = ProjectReader.read(new StringReader(text)).project();
            Structure read = p.toStructure();
            double zeta = damping == null ? 0 : 0.02;
            assertEquals(M, read.modalMass(), 1e-9 * M, what);
            assertEquals(K, read.modalStiffness(), 1e-9 * K, what);
            assertEquals(zeta, read.dampingRatio(), 1e-12, what);
            Structure again = ProjectReader.read(new StringReader(ProjectWriter.toJson(p))).project().toStructure();
            assertEquals(read, again, what);
            // the whole study builds as well (no crash downstream of the structure)
            assertEquals(OMEGA, p.toStudy().structure().naturalFrequency(), 1e-9 * OMEGA, what);
        }
    }
}
