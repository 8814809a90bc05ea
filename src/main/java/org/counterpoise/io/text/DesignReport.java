package org.counterpoise.io.text;

import java.util.Locale;
import org.counterpoise.core.design.Cautions;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.Warning;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.FrequencyBand;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.remedy.DetuningAlternative;
import org.counterpoise.core.robust.MistuningRange;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.response.ResponsePeak;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.ProjectIdentity;

/** The plain-text design report printed by the command line. */
public final class DesignReport {
    private static final int LABEL = 40;

    private DesignReport() {
    }

    /**
     * @param r the design result
     * @return the report, lines ending in '\n'
     */
    public static String render(DesignResult r) {
        return render(r, ProjectIdentity.EMPTY);
    }

    /**
     * @param r the design result
     * @param identity revision, engineer, client or site and date, printed under the title when given
     * @return the report, lines ending in '\n'
     */
    public static String render(DesignResult r, ProjectIdentity identity) {
        StringBuilder out = new StringBuilder();
        DesignStudy study = r.study();
        Structure s = study.structure();
        Excitation e = study.excitation();
        out.append("Counterpoise absorber design: ").append(study.name()).append('\n');
        if (!identity.isEmpty()) {
            section(out, "Project");
            identityRow(out, "revision", identity.revision());
            identityRow(out, "date", identity.date());
            identityRow(out, "engineer", identity.engineer());
            identityRow(out, "client or site", identity.client());
        }

        section(out, "Structure (effective values at the absorber point)");
        row(out, "mass", DisplayUnits.format(s.effectiveMass(), Dimension.MASS));
        row(out, "stiffness", DisplayUnits.format(s.effectiveStiffness(), Dimension.STIFFNESS));
        row(out, "natural frequency", frequency(s.naturalFrequency()));
        row(out, "damping ratio", QuantityFormat.number(s.dampingRatio(), 3));
        if (s.modeShapeAtAbsorber() != 1.0) {
            row(out, "mode shape at the absorber", QuantityFormat.number(s.modeShapeAtAbsorber(), 3)
                    + " (modal mass " + DisplayUnits.format(s.modalMass(), Dimension.MASS) + ")");
        }

        section(out, "Disturbance");
        row(out, "kind", e.kind().label() + ", amplitude "
                + DisplayUnits.format(e.amplitude(), e.kind().amplitudeDimension()));
        FrequencyBand band = e.band();
        row(out, band.isSingle() ? "forcing frequency" : "forcing band",
                band.isSingle() ? frequency(band.low())
                        : QuantityFormat.number(hz(band.low()), 4) + " to " + QuantityFormat.number(hz(band.high()), 4)
                                + " Hz (" + QuantityFormat.number(Unit.REV_PER_MINUTE.fromSi(band.low()), 4) + " to "
                                + QuantityFormat.format(band.high(), Unit.REV_PER_MINUTE) + ")");
        row(out, "forcing / natural frequency", band.isSingle() ? ratio(band.low() / s.naturalFrequency())
                : ratio(band.low() / s.naturalFrequency()) + " to " + ratio(band.high() / s.naturalFrequency()));

        section(out, "Design");
        row(out, "method", study.method().id() + " (" + study.method().description() + ")");
        row(out, "source", r.methodSource());
        row(out, "note", r.methodNote());
        row(out, "response reduced", study.response().label());
        row(out, "mass ratio mu", ratio(r.tuning().massRatio()));
        row(out, "tuning ratio f", ratio(r.tuning().tuningRatio()));
        row(out, "absorber damping ratio zeta_a", ratio(r.tuning().dampingRatio()));

        section(out, "Absorber to build");
        row(out, "mass", DisplayUnits.format(r.absorber().mass(), Dimension.MASS));
        row(out, "spring rate", DisplayUnits.format(r.absorber().stiffness(), Dimension.STIFFNESS));
        row(out, "damping coefficient", DisplayUnits.format(r.absorber().damping(), Dimension.DAMPING_COEFFICIENT));
        row(out, "natural frequency", frequency(r.absorber().naturalFrequency()));
        if (!Double.isNaN(r.staticDeflection())) {
            row(out, "static deflection of the spring", DisplayUnits.format(r.staticDeflection(), Dimension.LENGTH));
        }

        section(out, band.isSingle() ? "Structure response at the forcing frequency"
                : "Structure response, worst case in the band");
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %-16s %s%n", "", "before", "after"));
        for (ResponseKind k : DesignResult.MOTIONS) {
            compare(out, k.label(), r.motionBefore().get(k), r.motionAfter().get(k), k.dimension());
        }
        if (!DesignResult.MOTIONS.contains(study.response())) {
            compare(out, study.response().label(), r.responseBefore(), r.responseAfter(), study.response().dimension());
        }
        row(out, "reduction of " + shortLabel(study.response()), reduction(r));

        r.rms().ifPresent(rms -> {
            section(out, "Response to the white-noise disturbance (root mean square)");
            row(out, "spectral density (one-sided)", QuantityFormat.number(rms.psdLevel(), 4)
                    + (study.excitation().kind() == org.counterpoise.core.model.ExcitationKind.FORCE ? " N^2/Hz"
                            : " (m/s^2)^2/Hz"));
            row(out, "rms without absorber", rmsText(rms.before(), study.response().dimension()));
            row(out, "rms with absorber", rmsText(rms.after(), study.response().dimension()));
            row(out, "rms absorber stroke", rmsText(rms.stroke(), Dimension.LENGTH));
        });
        section(out, "Stroke and forces");
        row(out, "absorber stroke in band", DisplayUnits.format(r.strokeInBand().value(), Dimension.LENGTH));
        row(out, "absorber stroke during run-up", DisplayUnits.format(r.strokeRunUp().value(), Dimension.LENGTH)
                + (r.strokeRunUp().unbounded() ? "" : " at " + frequency(r.strokeRunUp().frequency())));
        row(out, "clearance to leave (x" + QuantityFormat.number(study.strokeMargin(), 3) + ")",
                DisplayUnits.format(r.clearance(), Dimension.LENGTH));
        row(out, "spring force in band", DisplayUnits.format(r.springForce().value(), Dimension.FORCE));
        row(out, "damper force in band", DisplayUnits.format(r.damperForce().value(), Dimension.FORCE));
        row(out, "total absorber force in band", DisplayUnits.format(r.absorberForce().value(), Dimension.FORCE));
        double[] w = r.coupledNaturalFrequencies();
        row(out, "natural frequencies with absorber", QuantityFormat.number(hz(w[0]), 4) + " Hz and "
                + QuantityFormat.number(hz(w[1]), 4) + " Hz (undamped)");

        section(out, "Tolerated mistuning (peak in band rising by at most "
                + QuantityFormat.number(100 * DesignResult.TOLERANCE_ALLOWANCE, 2) + " %)");
        row(out, "structure natural frequency", tolerance(r.structureTolerance(), 1));
        row(out, "absorber spring rate", tolerance(r.absorberTolerance(), 2));

        section(out, "Alternative: detune the structure instead");
        DetuningAlternative d = r.stiffnessDetuning();
        row(out, "target (what the absorber achieves)", DisplayUnits.format(d.target(), study.response().dimension()));
        if (d.target() == 0.0) {
            row(out, "stiffer or softer", "no stiffness change stops the motion entirely");
        } else {
            row(out, "stiffer", change(d.raiseFactor(), s, 1, "stiffness"));
            row(out, "softer", change(d.lowerFactor(), s, 1, "stiffness"));
            DetuningAlternative m = r.massDetuning();
            row(out, "lighter", change(m.raiseFactor(), s, -1, "mass"));
            row(out, "heavier", change(m.lowerFactor(), s, -1, "mass"));
        }

        if (!r.warnings().isEmpty()) {
            section(out, "Warnings");
            for (Warning warning : r.warnings()) {
                bullet(out, warning.text());
            }
        }
        section(out, "Cautions");
        for (String caution : Cautions.STANDARD) {
            bullet(out, caution);
        }
        return out.toString();
    }

    /**
     * @param range tolerated frequency factors
     * @param power 1 for a frequency, 2 for a stiffness (proportional to frequency squared)
     * @return e.g. "-3.1 % to +2.7 %"
     */
    public static String tolerance(MistuningRange range, int power) {
        if (!range.defined()) {
            return "not defined (the nominal response is zero or unbounded)";
        }
        return side(range.low(), power, range.searchLimit(), -1) + " to " + side(range.high(), power, range.searchLimit(), 1)
                + (range.ofBareResponse() ? " (response kept below " + QuantityFormat.number(100 * range.allowance(), 2)
                        + " % of the bare structure's: the design cancels it at its one speed)" : "");
    }

    private static String side(double factor, int power, double limit, int sign) {
        if (Double.isNaN(factor)) {
            double bound = Math.pow(1 + sign * limit, power) - 1;
            return "beyond " + (bound > 0 ? "+" : "") + QuantityFormat.number(100 * bound, 2) + " %";
        }
        double change = 100 * (Math.pow(factor, power) - 1);
        return (change > 0 ? "+" : "") + QuantityFormat.number(change, 2) + " %";
    }

    private static String rmsText(double value, Dimension dimension) {
        return Double.isFinite(value) ? DisplayUnits.format(value, dimension)
                : "unbounded (undamped structure: the mean square diverges)";
    }

    private static String reduction(DesignResult r) {
        if (r.responseBefore().unbounded()) {
            return "from unbounded (undamped resonance) to a finite level";
        }
        if (r.responseAfter().value() == 0.0) {
            return "complete: the structure stands still at the tuned frequency";
        }
        return "factor " + QuantityFormat.number(r.reductionFactor(), 3) + " ("
                + QuantityFormat.number(r.reductionDecibels(), 3) + " dB)";
    }

    /**
     * @param factor new over old stiffness or mass
     * @param power +1 for stiffness (frequency goes as its square root), -1 for mass
     */
    private static String change(double factor, Structure s, int power, String what) {
        if (Double.isNaN(factor)) {
            return "cannot reach the target alone";
        }
        if (factor == 1.0) {
            return "no change needed";
        }
        return String.format(Locale.ROOT, "%s %% %s (natural frequency %s)",
                (factor > 1 ? "+" : "") + QuantityFormat.number(100 * (factor - 1), 3), what,
                frequency(s.naturalFrequency() * Math.pow(factor, 0.5 * power)));
    }

    private static String shortLabel(ResponseKind k) {
        return k.label().replace("structure ", "");
    }

    private static void compare(StringBuilder out, String label, ResponsePeak before, ResponsePeak after, Dimension d) {
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %-16s %s%n", label,
                DisplayUnits.format(before.value(), d), DisplayUnits.format(after.value(), d)));
    }

    private static String frequency(double omega) {
        return QuantityFormat.number(hz(omega), 4) + " Hz (" + QuantityFormat.format(omega, Unit.REV_PER_MINUTE) + ")";
    }

    private static double hz(double omega) {
        return Unit.HERTZ.fromSi(omega);
    }

    private static String ratio(double v) {
        return QuantityFormat.number(v, 4);
    }

    private static void section(StringBuilder out, String title) {
        out.append('\n').append(title).append('\n');
    }

    private static void row(StringBuilder out, String label, String value) {
        out.append(String.format(Locale.ROOT, "  %-" + (LABEL - 2) + "s %s%n", label, value));
    }

    static void bullet(StringBuilder out, String text) {
        StringBuilder line = new StringBuilder("  - ");
        for (String word : text.split(" ")) {
            if (line.length() + word.length() > 98) {
                out.append(line.toString().stripTrailing()).append('\n');
                line = new StringBuilder("    ");
            }
            line.append(word).append(' ');
        }
        out.append(line.toString().stripTrailing()).append('\n');
    }

    private static void identityRow(StringBuilder out, String label, String value) {
        if (!value.isBlank()) {
            row(out, label, value.strip().replaceAll("\\s+", " "));
        }
    }
}
