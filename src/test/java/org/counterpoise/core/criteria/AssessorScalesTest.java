package org.counterpoise.core.criteria;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Optional;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.model.ExcitationOrder;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.model.Tuning;
import org.junit.jupiter.api.Test;

/**
 * The verdict over wide scales: natural frequencies 0.3 to 200 Hz, masses 0.01 to 1e5 kg, four
 * orders from 0.5x to 24x (weighting coefficients scaled by up to (24 omega1)^12), against the
 * direct solve of the equations of motion maximised by brute force ({@link NewtonReference}, Den
 * Hartog 1956 ch. 3; ISO 2631-1:1997 Annex A for the weighting). Invented scenarios.
 */
class AssessorScalesTest {
    @Test
    void agreesWithTheDirectSolveOverWideScales() {
        double tp = 2 * Math.PI;
        for (double hz : new double[] {0.3, 1, 5, 50, 200}) {
            for (double m : new double[] {1e-2, 1e5}) {
                Structure s = Structure.of(m, m * Math.pow(tp * hz, 2), 0.01);
                Tuning t = new Tuning(0.02, 0.97, 0.08);
                Excitation e = new Excitation(ExcitationKind.UNBALANCE, 0.01, new FrequencyBand(tp * hz * 0.6, tp * hz * 1.5))
                        .withOtherOrders(List.of(new ExcitationOrder(ExcitationKind.FORCE, 30, 12.0),
                                new ExcitationOrder(ExcitationKind.UNBALANCE, 0.003, 0.5),
                                new ExcitationOrder(ExcitationKind.FORCE, 3, 24.0)));
                for (Criterion c : List.<Criterion>of(new HumanComfort(FrequencyWeighting.WK, ComfortReaction.UNCOMFORTABLE),
                        new HumanComfort(FrequencyWeighting.WD, ComfortReaction.UNCOMFORTABLE),
                        new MachineSeverity(MachineClass.GROUP_1_RIGID, SeverityZone.B),
                        new BuildingVibration(BuildingAxis.VERTICAL, RoomUse.WORKSHOP))) {
                    for (Tuning tt : new Tuning[] {t, null}) {
                        double u = Assessor.of(c, e).read(s, Optional.ofNullable(tt)).utilisation();
                        double b = BruteVerdict.utilisation(c, s, tt, e)[1];
                        assertEquals(b, u, 1e-9 * b, c + " at " + hz + " Hz, " + m + " kg, " + tt);
                    }
                }
            }
        }
    }
}
