package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.BiFunction;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;

/**
 * The one entry point that turns a design into hardware: {@link DesignResult} and
 * {@link HardwareChoice} in, {@link Realisation} out. The parts are sized by their own classes
 * ({@link DamperSizing}, {@link ToleranceSizing}, {@link TrimSizing}, {@link CommissioningProcedure},
 * {@link PredictedTable}); front ends ask {@link #realisation(DesignDossier, HardwareChoice)}, which
 * computes it once per choice per dossier.
 */
public final class Realiser {

    private Realiser() {
    }

    /**
     * @param design the design
     * @param choice the hardware choices
     * @return the design turned into hardware
     */
    public static Realisation realise(DesignResult design, HardwareChoice choice) {
        List<Warning> warnings = new ArrayList<>();
        DamperDesign damper = DamperSizing.size(design, choice, warnings);
        PartTolerances tolerances = ToleranceSizing.of(design, choice, warnings);
        TrimPlan trim = TrimSizing.of(design, choice);
        List<ProcedureStep> procedure = CommissioningProcedure.of(design, tolerances, trim);
        List<PredictedPoint> predicted = PredictedTable.of(design);
        // the spring and the elastomer element are sized by SpringSizing and ElastomerSizing (their slices)
        return new Realisation(choice, Optional.empty(), Optional.empty(), damper, tolerances, trim, procedure,
                predicted, warnings);
    }

    /**
     * The realisation of a dossier's design for a hardware choice, computed once per choice per
     * dossier (thread-safe, as the dossier's other parts; see {@link DesignDossier#derived}).
     *
     * @param dossier the dossier
     * @param choice the hardware choices
     * @return the realisation
     */
    public static Realisation realisation(DesignDossier dossier, HardwareChoice choice) {
        return realisation(dossier, choice, Realiser::realise);
    }

    /** The same with the computation given (the seam through which tests count computations). */
    static Realisation realisation(DesignDossier dossier, HardwareChoice choice,
            BiFunction<DesignResult, HardwareChoice, Realisation> compute) {
        return dossier.derived(new ChoiceKey(choice), Realisation.class, d -> compute.apply(d, choice));
    }

    /** The dossier key of a realisation: this package's own type, so no other derived part shares it. */
    private record ChoiceKey(HardwareChoice choice) {
    }
}
