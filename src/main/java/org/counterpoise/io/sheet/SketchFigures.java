package org.counterpoise.io.sheet;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.ProcedureStep;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.SpringArrangement;
import org.counterpoise.core.realisation.SpringDesign;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.StepFigure;
import org.counterpoise.core.realisation.TrimPlan;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.io.text.ValueText;

/**
 * What the arrangement sketch draws, taken from the design and its hardware, with every dimension
 * already written in the display units. Kept apart from the drawing so that it can be tested
 * without a PDF.
 *
 * @param vertical true when the absorber hangs on its spring (the spring carries its weight): the
 *     sketch stands on the structure; false: the absorber moves sideways on a guide
 * @param springKind helical springs or an elastomer element
 * @param springCount springs in parallel (1 for an elastomer element)
 * @param opposed true when the springs stand in opposed preloaded pairs, half on each side of the mass
 * @param damperKind how the damping is realised
 * @param mass the absorber mass, as text ("42.0 kg")
 * @param trimFitted trim plates fitted as built (0 when there is no trim plan)
 * @param trimTotal trim plates supplied (0 when there is no trim plan)
 * @param clearance the clearance to the stroke stops, as text
 * @param freeLength the spring's free length as text, when the springs are designed
 * @param installedLength the spring's installed length as text, when the springs are designed
 * @param freeOverInstalled free length over installed length (1 when not known), for the drawing's proportions
 * @param legend the lines printed under the sketch (what each symbol stands for, with its figures)
 */
public record SketchFigures(boolean vertical, SpringKind springKind, int springCount, boolean opposed,
        DamperKind damperKind,
        String mass, int trimFitted, int trimTotal, String clearance, Optional<String> freeLength,
        Optional<String> installedLength, double freeOverInstalled, List<Legend> legend) {

    /**
     * One line of the legend.
     * @param symbol the symbol on the sketch ("m", "k" ...), or empty
     * @param text what it stands for, with its figures
     */
    public record Legend(String symbol, String text) {
    }

    /** Immutable copy. */
    public SketchFigures {
        legend = List.copyOf(legend);
    }

    /**
     * @param r the design
     * @param realisation its hardware, when made
     * @param units the display units
     * @return what the sketch draws
     */
    public static SketchFigures of(DesignResult r, Optional<Realisation> realisation, UnitSystem units) {
        SpringKind springKind = realisation.map(x -> x.choice().springKind()).orElse(SpringKind.HELICAL_COMPRESSION);
        DamperKind damperKind = realisation.map(x -> x.damper().kind()).orElse(DamperKind.VISCOUS_DASHPOT);
        Optional<SpringDesign> spring = realisation.flatMap(Realisation::spring);
        int count = spring.map(SpringDesign::count).orElse(1);
        Optional<TrimPlan> trim = realisation.map(Realisation::trim);
        double clearance = realisation.flatMap(SketchFigures::clearanceStep).orElse(r.clearance());
        String mass = mass(r.absorber().mass(), units);
        Optional<String> free = spring.map(s -> length(s.freeLength(), units));
        Optional<String> installed = spring.map(s -> length(s.installedLength(), units));
        double ratio = spring.map(s -> s.freeLength() / s.installedLength()).orElse(1.0);
        List<Legend> legend = new ArrayList<>();
        legend.add(new Legend("m", "absorber mass " + mass + (trim.isPresent() && trim.get().platesTotal() > 0
                ? ", with " + trim.get().platesFitted() + " of " + trim.get().platesTotal() + " trim plates of "
                        + mass(trim.get().plateMass(), units) + " fitted" : "")));
        if (springKind == SpringKind.ELASTOMER) {
            legend.add(new Legend("k", "elastomer element, rate " + rate(r.absorber().stiffness(), units)));
        } else {
            legend.add(new Legend("k", (count == 1 ? "helical compression spring" : count + " helical compression springs"
                    + (spring.get().arrangement() == SpringArrangement.OPPOSED_PRELOADED_PAIRS
                            ? " in opposed preloaded pairs" : " in parallel")) + ", total rate " + rate(r.absorber().stiffness(), units)));
        }
        legend.add(new Legend("c", switch (damperKind) {
            case VISCOUS_DASHPOT -> "viscous dashpot, ";
            case EDDY_CURRENT -> "conducting plate in a magnet gap (eddy current), ";
            case ELASTOMER_LOSS -> "the elastomer's own loss, ";
        } + damping(r.absorber().damping(), units)));
        legend.add(new Legend("s", "stroke stops, clearance " + length(clearance, units) + " each way"));
        free.ifPresent(f -> legend.add(new Legend("L0, L1", "spring free length " + f + ", installed length "
                + installed.orElse(""))));
        OptionalDouble sag = r.staticDeflection();
        if (sag.isPresent()) {
            legend.add(new Legend("", "static deflection under the absorber's weight " + length(sag.getAsDouble(), units)));
        }
        if (!r.study().hangsVertically()) {
            legend.add(new Legend("", "the absorber moves along its axis on a guide (not drawn) that carries its"
                    + " weight"));
        }
        boolean opposed = spring.map(s -> s.arrangement() == SpringArrangement.OPPOSED_PRELOADED_PAIRS).orElse(false);
        return new SketchFigures(r.study().hangsVertically(), springKind,
                springKind == SpringKind.ELASTOMER ? 1 : count, opposed && count >= 2, damperKind, mass,
                trim.map(TrimPlan::platesFitted).orElse(0), trim.map(TrimPlan::platesTotal).orElse(0),
                length(clearance, units), free, installed, Double.isFinite(ratio) && ratio > 0 ? ratio : 1.0, legend);
    }

    private static Optional<Double> clearanceStep(Realisation realisation) {
        for (ProcedureStep step : realisation.procedure()) {
            for (StepFigure f : step.figures()) {
                if (f.quantity() == StepFigure.StepQuantity.CLEARANCE && Double.isFinite(f.value())) {
                    return Optional.of(f.value());
                }
            }
        }
        return Optional.empty();
    }

    /**
     * @param metres a length, m
     * @param units the display units
     * @return it in the display unit of lengths (mm or in), three figures
     */
    static String length(double metres, UnitSystem units) {
        return shown(metres, Dimension.LENGTH, units);
    }

    private static String mass(double kg, UnitSystem units) {
        return shown(kg, Dimension.MASS, units);
    }

    private static String rate(double newtonPerMetre, UnitSystem units) {
        return shown(newtonPerMetre, Dimension.STIFFNESS, units);
    }

    private static String damping(double newtonSecondPerMetre, UnitSystem units) {
        return shown(newtonSecondPerMetre, Dimension.DAMPING_COEFFICIENT, units);
    }

    /** A value in the display unit of its dimension (the one table, {@link DisplayUnits}), three figures. */
    private static String shown(double si, Dimension dimension, UnitSystem units) {
        Unit unit = DisplayUnits.of(dimension, units);
        return QuantityFormat.number(unit.fromSi(si), 3) + " " + ValueText.pretty(unit.symbol());
    }
}
