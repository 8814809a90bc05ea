package org.counterpoise.io.measurement;

import java.util.List;
import java.util.OptionalDouble;
import org.counterpoise.core.identify.FitWarning;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.identify.ModalModel;
import org.counterpoise.core.identify.ModeShapeRatio;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.QuantityFormat;

/** An identification as plain text for the terminal, with the usual cautions. */
public final class IdentificationReport {
    /** What every identification report says after its numbers. */
    static final List<String> CAUTIONS = List.of(
            "The model is linear with viscous damping; a structure whose frequency or damping changes with"
                    + " amplitude needs measurements at the working amplitude.",
            "The modal mass is the mass an absorber sees only when the FRF is a driving-point measurement"
                    + " (force and response at the same point and direction) at the absorber's point.",
            "The uncertainties describe the scatter of the data about the model, not errors of the model"
                    + " (a missing mode, a non-driving point, non-linearity); look at the fitted curves.",
            "Identified values are estimates for design; follow local codes and licensed engineering practice.");

    private IdentificationReport() {
    }

    /**
     * @param identification what was found
     * @return the report
     */
    public static String render(Identification identification) {
        StringBuilder b = new StringBuilder();
        b.append("Identification (").append(identification.method().replace('_', ' ')).append(")");
        if (!identification.source().isEmpty()) {
            b.append(" of ").append(PlainText.escape(identification.source()));
        }
        b.append('\n');
        if (identification instanceof Identification.Frf f) {
            b.append("  ").append(f.unit().kind().id()).append(" in ").append(f.unit().symbol()).append(", ")
                    .append(f.fitted().size()).append(" lines from ")
                    .append(QuantityFormat.format(f.fitted().omega()[0], Unit.HERTZ)).append(" to ")
                    .append(QuantityFormat.format(f.fitted().omega()[f.fitted().size() - 1], Unit.HERTZ)).append('\n');
            List<IdentifiedMode> modes = f.model().modes();
            for (int r = 0; r < modes.size(); r++) {
                IdentifiedMode m = modes.get(r);
                b.append("Mode ").append(r + 1).append('\n');
                line(b, "natural frequency", QuantityFormat.format(m.naturalFrequency(), Unit.HERTZ),
                        sd(m.naturalFrequencySd(), Unit.HERTZ));
                line(b, "damping ratio", percent(m.dampingRatio()), m.dampingRatioSd().isPresent()
                        ? " +/- " + percent(m.dampingRatioSd().getAsDouble()) : "");
                line(b, "modal mass at the point", QuantityFormat.format(m.modalMass(), Unit.KILOGRAM),
                        sd(m.modalMassSd(), Unit.KILOGRAM));
                line(b, "modal stiffness", DisplayUnits.format(m.modalStiffness(), Dimension.STIFFNESS), "");
            }
            ModalModel model = f.model();
            b.append("Fit quality\n");
            line(b, "normalised residual", QuantityFormat.number(model.normalisedResidual(), 3), "");
            if (model.meanCoherence().isPresent()) {
                line(b, "mean coherence", QuantityFormat.number(model.meanCoherence().getAsDouble(), 3), "");
            }
            f.halfPower().ifPresent(m -> line(b, "half-power check", QuantityFormat.format(m.naturalFrequency(),
                    Unit.HERTZ) + ", " + percent(m.dampingRatio()) + ", " + QuantityFormat.format(m.modalMass(),
                    Unit.KILOGRAM), ""));
            f.circle().ifPresent(c -> line(b, "circle-fit check", QuantityFormat.format(c.mode().naturalFrequency(),
                    Unit.HERTZ) + ", " + percent(c.mode().dampingRatio()) + ", "
                    + QuantityFormat.format(c.mode().modalMass(), Unit.KILOGRAM), ""));
            for (FitWarning w : FitWarning.of(model, f.fitted())) {
                b.append("Warning: ").append(words(w)).append('\n');
            }
        } else if (identification instanceof Identification.Decay d) {
            line(b, "natural frequency", QuantityFormat.format(d.decay().naturalFrequency(), Unit.HERTZ), "");
            line(b, "damping ratio", percent(d.decay().dampingRatio()),
                    " +/- " + percent(d.decay().dampingRatioSd()));
            line(b, "logarithmic decrement", QuantityFormat.number(d.decay().logDecrement(), 4),
                    " over " + d.decay().cycles() + " cycles");
        } else if (identification instanceof Identification.Added a) {
            line(b, "natural frequency", QuantityFormat.format(a.result().naturalFrequency(), Unit.HERTZ), "");
            line(b, "with the added mass", QuantityFormat.format(a.frequencyAfter(), Unit.HERTZ),
                    " (" + QuantityFormat.format(a.addedMass(), Unit.KILOGRAM) + " added)");
            line(b, "modal mass at the point", QuantityFormat.format(a.result().modalMass(), Unit.KILOGRAM), "");
            line(b, "modal stiffness", QuantityFormat.format(a.result().modalStiffness(), Unit.NEWTON_PER_METRE), "");
        }
        b.append("Cautions\n");
        for (String c : CAUTIONS) {
            b.append("  - ").append(c).append('\n');
        }
        return b.toString();
    }

    /**
     * @param w a warning
     * @return its words, the one place they are written
     */
    public static String words(FitWarning w) {
        return switch (w) {
            case POOR_FIT -> "the model misses more than " + Math.round(FitWarning.POOR_FIT_LIMIT * 100)
                    + " % of the data; check the FRF kind (--kind), the band and the number of modes";
            case MASS_NOT_POSITIVE -> "a modal mass is not positive: the FRF is not a driving-point measurement,"
                    + " its kind is not the one given, or the mode is not in the data";
            case MODE_OUTSIDE_BAND -> "a fitted natural frequency lies outside the fitted band; widen the band";
            case LOW_COHERENCE -> "the mean coherence is below " + FitWarning.LOW_COHERENCE_LIMIT
                    + ": noise, leakage or a non-linear structure; repeat or average the measurement";
        };
    }

    /**
     * @param transferFile the transfer FRF's file as the user named it
     * @param mode the mode compared, 1 = lowest
     * @param shape the mode shape at the transfer point relative to the driving point
     * @return the text section on the transfer point
     */
    public static String transfer(String transferFile, int mode, ModeShapeRatio shape) {
        StringBuilder b = new StringBuilder("Transfer point (").append(PlainText.escape(transferFile)).append("), mode ")
                .append(mode).append('\n');
        line(b, "shape ratio phi_A/phi_P", QuantityFormat.number(shape.ratio(), 4),
                shape.ratioSd().isPresent() ? " +/- " + QuantityFormat.number(shape.ratioSd().getAsDouble(), 2) : "");
        line(b, "frequency in the transfer", QuantityFormat.format(shape.transfer().naturalFrequency(), Unit.HERTZ), "");
        IdentifiedMode at = shape.atTransferPoint();
        line(b, "modal mass at that point", QuantityFormat.format(at.modalMass(), Unit.KILOGRAM),
                sd(at.modalMassSd(), Unit.KILOGRAM));
        return b.toString();
    }

    private static void line(StringBuilder b, String label, String value, String extra) {
        b.append("  ").append(String.format("%-26s", label)).append(value).append(extra).append('\n');
    }

    private static String sd(OptionalDouble sd, Unit unit) {
        return sd.isPresent() ? " +/- " + QuantityFormat.format(sd.getAsDouble(), unit) : "";
    }

    private static String percent(double ratio) {
        return QuantityFormat.format(ratio, Unit.PERCENT);
    }
}
