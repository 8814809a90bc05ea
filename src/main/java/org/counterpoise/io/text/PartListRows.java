package org.counterpoise.io.text;

import java.util.ArrayList;
import java.util.List;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperDesign;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentDamper;
import org.counterpoise.core.realisation.ElastomerDesign;
import org.counterpoise.core.realisation.HystereticOptimum;
import org.counterpoise.core.realisation.Realisation;
import org.counterpoise.core.realisation.SpringDesign;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.io.text.ReportValue.Count;
import org.counterpoise.io.text.ReportValue.Level;
import org.counterpoise.io.text.ReportValue.NotApplicable;
import org.counterpoise.io.text.ReportValue.Pair;
import org.counterpoise.io.text.ReportValue.PairKind;
import org.counterpoise.io.text.ReportValue.Percent;
import org.counterpoise.io.text.ReportValue.Quantity;
import org.counterpoise.io.text.ReportValue.Words;

/**
 * The part list of a {@link Realisation} as report rows: the absorber mass with its tolerance, the
 * helical springs (count, wire, coils, lengths, rates) or the elastomer element (stiffness, ratio,
 * loss factor, the hysteretic optimum beside the viscous design and the published values), and the
 * damper (kind, coefficient, stroke, velocity, force, eddy-current plate and gap). The words of
 * the kinds live here.
 */
final class PartListRows {
    private static final String EN13906 = "EN 13906-1 (helical compression springs)";

    private final List<ReportRow> rows = new ArrayList<>();

    private PartListRows() {
    }

    /**
     * @param r the realisation
     * @param d the design it realises
     * @return the part list's rows, in print order; the hidden rows that write a null spring,
     *     elastomer or eddy-current object to the JSON included
     */
    static List<ReportRow> of(Realisation r, DesignResult d) {
        PartListRows p = new PartListRows();
        p.add(ReportKey.HARDWARE_KINDS, "spring / damper", "", new Words(springWords(r.choice().springKind()) + " / "
                + damperWords(r.damper().kind()), List.of(r.choice().springKind().id(), r.damper().kind().id())), "", "");
        p.add(ReportKey.HARDWARE_ABSORBER_MASS, "absorber mass as built", "m2",
                quantity(d.absorber().mass(), Dimension.MASS), "the design", "");
        p.add(ReportKey.HARDWARE_MASS_TOLERANCE, "absorber mass held to +/-", "", new Percent(r.tolerances().mass(), 2),
                "the part tolerances", "weigh the mass with its plates before fitting");
        r.spring().ifPresentOrElse(p::spring, () -> p.hidden(ReportKey.SPRING_NONE, "helical springs"));
        r.elastomer().ifPresentOrElse(e -> p.elastomer(e, d, r.choice().elastomer().compoundLossFactor()), () -> p.hidden(ReportKey.ELASTOMER_NONE,
                "elastomer element"));
        p.damper(r.damper());
        return List.copyOf(p.rows);
    }

    /**
     * @param kind a spring kind
     * @return its words
     */
    static String springWords(SpringKind kind) {
        return switch (kind) {
            case HELICAL_COMPRESSION -> "helical compression springs";
            case ELASTOMER -> "elastomer element";
        };
    }

    /**
     * @param kind a damper kind
     * @return its words
     */
    static String damperWords(DamperKind kind) {
        return switch (kind) {
            case VISCOUS_DASHPOT -> "viscous dashpot";
            case EDDY_CURRENT -> "eddy-current damper (conducting plate in a magnet gap)";
            case ELASTOMER_LOSS -> "the elastomer's own loss";
        };
    }

    private static String conductorWords(Conductor c) {
        return switch (c) {
            case COPPER -> "copper";
            case ALUMINIUM -> "aluminium";
        };
    }

    private void spring(SpringDesign s) {
        add(ReportKey.SPRING_COUNT, "springs in parallel", "", new Count(s.count()), "", s.count() > 1
                ? "they share the load equally: mount them symmetrically about the mass" : "");
        add(ReportKey.SPRING_MATERIAL, "wire", "", new Words(s.material().standard(), List.of(s.material().id(),
                s.material().standard())), "", "");
        add(ReportKey.SPRING_WIRE_DIAMETER, "wire diameter", "d", quantity(s.wireDiameter(), Dimension.LENGTH), EN13906,
                "");
        add(ReportKey.SPRING_MEAN_COIL_DIAMETER, "mean coil diameter", "D",
                quantity(s.meanCoilDiameter(), Dimension.LENGTH), EN13906, "");
        add(ReportKey.SPRING_INDEX, "spring index D/d", "", new Quantity(s.springIndex(), Dimension.RATIO, 3), EN13906,
                "");
        add(ReportKey.SPRING_COILS, "active / total coils", "", new Pair(new Quantity(s.activeCoils(), Dimension.RATIO,
                3), new Quantity(s.totalCoils(), Dimension.RATIO, 3), PairKind.SIDE_BY_SIDE), EN13906,
                "ends closed and ground");
        add(ReportKey.SPRING_FREE_LENGTH, "free length", "L0", quantity(s.freeLength(), Dimension.LENGTH), EN13906, "");
        add(ReportKey.SPRING_SOLID_LENGTH, "solid length", "Lc", quantity(s.solidLength(), Dimension.LENGTH), EN13906,
                "");
        add(ReportKey.SPRING_INSTALLED_LENGTH, "installed length (static load)", "",
                quantity(s.installedLength(), Dimension.LENGTH), EN13906, "");
        add(ReportKey.SPRING_RATE_PER_SPRING, "rate per spring", "R",
                quantity(s.ratePerSpring(), Dimension.STIFFNESS), EN13906 + ", R = G d^4 / (8 D^3 n)", "");
        add(ReportKey.SPRING_TOTAL_RATE, "total rate", "", quantity(s.totalRate(), Dimension.STIFFNESS),
                "count times the rate per spring", "");
        add(ReportKey.SPRING_RATE_DEVIATION, "total rate against the design's", "",
                new Percent(s.rateDeviation(), 2), "", "the trim plates take up the difference");
        add(ReportKey.SPRING_LOADS, "load per spring, static / dynamic", "", new Pair(quantity(s.staticLoadPerSpring(),
                Dimension.FORCE), quantity(s.dynamicLoadPerSpring(), Dimension.FORCE), PairKind.SIDE_BY_SIDE),
                "the dynamic load is the amplitude at the worst of band and run-up", "");
        add(ReportKey.SPRING_CYCLES, "load cycles in service", "",
                new Quantity(s.serviceCycles(), Dimension.RATIO, 3), "service hours at the forcing frequency", "");
    }

    private void elastomer(ElastomerDesign e, DesignResult d, double compoundLossFactor) {
        add(ReportKey.ELASTOMER_STIFFNESS, "dynamic / static stiffness", "", new Pair(quantity(e.dynamicStiffness(),
                Dimension.STIFFNESS), quantity(e.staticStiffness(), Dimension.STIFFNESS), PairKind.SIDE_BY_SIDE),
                "static = dynamic / the ratio assumed", "order the element by its dynamic stiffness at the working"
                        + " frequency; a static load test shows the static one");
        add(ReportKey.ELASTOMER_RATIO, "dynamic / static ratio assumed", "",
                new Quantity(e.dynamicToStaticRatio(), Dimension.RATIO, 3), "common practice",
                "it rises with frequency and in the cold: confirm it with the compound's supplier");
        add(ReportKey.ELASTOMER_LOSS_FACTOR, "loss factor needed / compound's", "\u03b7",
                new Pair(new Quantity(e.lossFactorNeeded(), Dimension.RATIO, 3),
                        new Quantity(compoundLossFactor, Dimension.RATIO, 3), PairKind.SIDE_BY_SIDE),
                "exact hysteretic optimum", "");
        HystereticOptimum o = e.optimum();
        add(ReportKey.HYSTERETIC_OPTIMUM, "hysteretic optimum: f / loss factor", "",
                new Pair(new Quantity(o.tuningRatio(), Dimension.RATIO, 4), new Quantity(o.lossFactor(), Dimension.RATIO,
                        4), PairKind.SIDE_BY_SIDE), "exact optimum of the absorber with stiffness k (1 + i eta)", "");
        add(ReportKey.VISCOUS_DESIGN, "viscous design: f / damping ratio", "",
                new Pair(new Quantity(d.tuning().tuningRatio(), Dimension.RATIO, 4),
                        new Quantity(d.tuning().dampingRatio(), Dimension.RATIO, 4), PairKind.SIDE_BY_SIDE),
                d.methodSource(), "");
        Dimension response = d.study().response().dimension();
        add(ReportKey.HYSTERETIC_PEAKS, "peak in band: hysteretic / viscous", "",
                new Pair(quantity(o.peakResponse(), response), quantity(o.viscousPeakResponse(), response),
                        PairKind.SIDE_BY_SIDE), "", "");
        add(ReportKey.HYSTERETIC_PUBLISHED, "published optimum: f / loss factor", "", o.published()
                .<ReportValue>map(p -> new Pair(new Quantity(p.tuningRatio(), Dimension.RATIO, 4),
                        new Quantity(p.lossFactor(), Dimension.RATIO, 4), PairKind.SIDE_BY_SIDE))
                .orElse(new Pair(new NotApplicable(), new NotApplicable(), PairKind.SIDE_BY_SIDE)),
                o.published().map(HystereticOptimum.PublishedHysteretic::source).orElse(""), "");
        add(ReportKey.HYSTERETIC_PUBLISHED_SOURCE, "published optimum from", "", o.published()
                .<ReportValue>map(p -> new Words(p.source(), List.of())).orElse(new NotApplicable()), "", "");
    }

    private void damper(DamperDesign m) {
        add(ReportKey.DAMPER_KIND, "damper", "", new Words(damperWords(m.kind()), List.of(m.kind().id())), "", "");
        add(ReportKey.DAMPER_COEFFICIENT, "damping coefficient", "c2",
                quantity(m.coefficient(), Dimension.DAMPING_COEFFICIENT), "the design", "");
        add(ReportKey.DAMPER_STROKE, "stroke in band / during run-up", "",
                new Pair(quantity(m.strokeAmplitude(), Dimension.LENGTH), quantity(m.runUpStroke(), Dimension.LENGTH),
                        PairKind.SIDE_BY_SIDE), "", "a bought damper's usable stroke must exceed twice the larger");
        add(ReportKey.DAMPER_PEAK_VELOCITY, "peak relative velocity", "", quantity(m.peakVelocity(),
                Dimension.VELOCITY), "the larger of band and run-up", "");
        add(ReportKey.DAMPER_PEAK_FORCE, "peak damper force", "", quantity(m.peakForce(), Dimension.FORCE),
                "coefficient times peak velocity", "");
        m.eddyCurrent().ifPresentOrElse(this::eddyCurrent, () -> hidden(ReportKey.EDDY_CURRENT_NONE,
                "eddy-current damper"));
    }

    private void eddyCurrent(EddyCurrentDamper e) {
        add(ReportKey.EDDY_CURRENT_CONDUCTOR, "plate material", "", new Words(conductorWords(e.choice().conductor()),
                List.of(e.choice().conductor().id())), "", "");
        add(ReportKey.EDDY_CURRENT_PLATE_THICKNESS, "plate thickness", "",
                quantity(e.choice().plateThickness(), Dimension.LENGTH), "a design choice", "");
        add(ReportKey.EDDY_CURRENT_FLUX_DENSITY, "flux density across the gap", "B",
                new Level(e.choice().fluxDensity(), 3, "T"), "a design choice", "measure it in the built gap");
        add(ReportKey.EDDY_CURRENT_POLE_AREA, "magnet pole area covered", "",
                new Level(e.poleArea(), 3, "m^2"), e.source(), "");
        add(ReportKey.EDDY_CURRENT_EDGE_FACTOR, "edge factor (current return path)", "",
                new Quantity(e.edgeFactor(), Dimension.RATIO, 3), e.source(), "");
        add(ReportKey.EDDY_CURRENT_COEFFICIENT, "damping coefficient it gives", "",
                quantity(e.coefficient(), Dimension.DAMPING_COEFFICIENT), e.source(), "");
        add(ReportKey.EDDY_CURRENT_SOURCE, "eddy-current formula from", "", new Words(e.source(), List.of()), "", "");
    }

    /** A row the tables and the text leave out, that writes the part's JSON object as null. */
    private void hidden(ReportKey key, String label) {
        add(key, label, "", new NotApplicable(), "", "");
    }

    private void add(ReportKey key, String label, String symbol, ReportValue value, String source, String caution) {
        rows.add(new ReportRow(key, label, symbol, value, source, caution));
    }

    private static ReportValue quantity(double si, Dimension d) {
        return DesignContent.quantity(si, d);
    }
}
