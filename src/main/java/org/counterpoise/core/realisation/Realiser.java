package org.counterpoise.core.realisation;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.BiFunction;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.units.Gravity;

/**
 * The one entry point that turns a design into hardware: {@link DesignResult} and
 * {@link HardwareChoice} in, {@link Realisation} out. The parts are sized by their own classes
 * ({@link SpringSizing} from the {@link #springDemand}, {@link ElastomerSizing}, {@link DamperSizing}, {@link ToleranceSizing}, {@link TrimSizing}, {@link CommissioningProcedure},
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
        return realise(design, choice, DamperSizing.peakVelocity(design));
    }

    /**
     * @param design the design
     * @param choice the hardware choices
     * @param damperVelocity the largest relative velocity across the damper, band and run-up, m/s: the
     *     design's own ({@link DamperSizing#peakVelocity}), or, for one absorber of a set, the one it has
     *     within the set
     * @return the design turned into hardware
     */
    public static Realisation realise(DesignResult design, HardwareChoice choice, double damperVelocity) {
        List<Warning> warnings = new ArrayList<>();
        Optional<SpringDesign> spring = Optional.empty();
        Optional<ElastomerDesign> elastomer = Optional.empty();
        if (choice.springKind() == SpringKind.HELICAL_COMPRESSION) {
            spring = spring(design, choice, warnings);
        } else {
            ElastomerDesign element = ElastomerSizing.size(design, choice);
            warnings.addAll(ElastomerSizing.warnings(element, choice));
            elastomer = Optional.of(element);
        }
        BuiltAbsorber built = BuiltAbsorber.of(design, choice, elastomer);
        DamperDesign damper = DamperSizing.size(design, choice, built, damperVelocity, warnings);
        PartTolerances tolerances = ToleranceSizing.of(design, choice, warnings);
        TrimPlan trim = TrimSizing.of(design, choice);
        List<ProcedureStep> procedure = CommissioningProcedure.of(design, built, tolerances, trim);
        List<PredictedPoint> predicted = PredictedTable.of(design, built);
        return new Realisation(choice, spring, elastomer, damper, tolerances, trim, procedure, predicted, warnings);
    }

    /**
     * The helical springs. When no stock wire gives the rate, the sizing returns the closest springs
     * and its checks say how far off they are (a typed warning), so the damper, tolerances, trim and
     * procedure still stand beside them.
     */
    private static Optional<SpringDesign> spring(DesignResult design, HardwareChoice choice, List<Warning> warnings) {
        SpringDesign s = SpringSizing.size(springDemand(design, choice), choice);
        warnings.addAll(SpringChecks.warnings(s, choice));
        return Optional.of(s);
    }

    /**
     * What the design asks of its helical springs, in total: the absorber's rate; the absorber's
     * weight as the static load when it hangs on its springs (the design has a static deflection),
     * else none; as the dynamic load the worst of the spring force in the band and the rate times the
     * largest bounded run-up stroke (steady state, and transient when the project states a run-up
     * rate); the highest forcing frequency; and the service hours at that frequency as load cycles.
     *
     * @param design the design
     * @param choice the hardware choices (the service hours)
     * @return the spring demand
     */
    static SpringDemand springDemand(DesignResult design, HardwareChoice choice) {
        double rate = design.absorber().stiffness();
        double staticLoad = design.staticDeflection().isPresent() ? design.absorber().mass() * Gravity.STANDARD : 0.0;
        double stroke = 0.0;
        for (ResponsePeak runUp : List.of(design.strokeRunUp(), design.runUpStroke().peak())) {
            if (!runUp.unbounded()) {
                stroke = Math.max(stroke, runUp.value());
            }
        }
        double dynamicLoad = Math.max(design.springForce().value(), rate * stroke);
        double forcing = design.study().excitation().band().high();
        double cycles = choice.serviceHours() * SECONDS_PER_HOUR * forcing / (2 * Math.PI);
        return new SpringDemand(rate, staticLoad, dynamicLoad, forcing, cycles);
    }

    private static final double SECONDS_PER_HOUR = 3600.0;

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
