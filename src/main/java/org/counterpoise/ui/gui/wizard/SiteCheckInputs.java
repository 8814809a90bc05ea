package org.counterpoise.ui.gui.wizard;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.UnaryOperator;
import org.counterpoise.core.design.SeveralAbsorbers;
import org.counterpoise.core.design.SeveralAbsorbersDesigner;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.commission.SetSiteRun;
import org.counterpoise.io.commission.SiteCheckRun;
import org.counterpoise.io.measurement.FrfUnit;
import org.counterpoise.io.measurement.SpectrumCsv;
import org.counterpoise.ui.gui.wizard.SiteCheckDialog.Basis;
import org.counterpoise.ui.gui.wizard.SiteCheckDialog.Checked;
import org.counterpoise.ui.gui.wizard.SiteCheckDialog.Inputs;
import org.counterpoise.ui.gui.wizard.SiteCheckDialog.One;
import org.counterpoise.ui.gui.wizard.SiteCheckDialog.Several;

/** The site check dialog's inputs read and checked off the event thread: one absorber's or several's. */
final class SiteCheckInputs {
    private SiteCheckInputs() {
    }

    /** Reads the files and checks; every problem is an InvalidInputException in plain words. */
    static Checked checked(Inputs in, Basis basis) {
        Optional<SiteCheckRun.OperatingInput> op = Optional.empty();
        if (!in.spectrumFile().isEmpty()) {
            OptionalDouble at = in.running().isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(Unit.HERTZ.toSi(
                    positive(in.running(), "running frequency", "a frequency in Hz above 0, or empty")));
            op = Optional.of(new SiteCheckRun.OperatingInput(Path.of(in.spectrumFile()),
                    SpectrumCsv.unit(in.spectrumUnit(), "unit of the amplitudes"), in.convention(), at,
                    in.withAbsorber()));
        }
        if (basis.layout().isPresent()) {
            // several absorbers at one point: the set is designed again here, off the event thread
            SeveralAbsorbers set = SeveralAbsorbersDesigner.design(basis.design(), basis.layout().get());
            Optional<SetSiteRun.FittedInput> fittedSet = Optional.empty();
            if (!in.frfFile().isEmpty()) {
                fittedSet = Optional.of(new SetSiteRun.FittedInput(Path.of(in.frfFile()),
                        FrfUnit.parse(in.frfUnit(), in.kind(), "unit of the values"), UnaryOperator.identity(),
                        in.freeStructure(), masses(in.weighed(), set.absorbers().size())));
            }
            return new Several(SetSiteRun.run(basis.project(), basis.design(), set, basis.hardware(), basis.units(),
                    op, fittedSet));
        }
        Optional<SiteCheckRun.FittedInput> fitted = Optional.empty();
        if (!in.frfFile().isEmpty()) {
            fitted = Optional.of(new SiteCheckRun.FittedInput(Path.of(in.frfFile()),
                    FrfUnit.parse(in.frfUnit(), in.kind(), "unit of the values"), UnaryOperator.identity(),
                    in.freeStructure(), in.weighed().isEmpty() ? OptionalDouble.empty()
                            : OptionalDouble.of(positive(in.weighed(), "absorber mass as weighed", "a mass in kg above 0, or empty"))));
        }
        return new One(SiteCheckRun.run(basis.project(), basis.design(), basis.realisation(), basis.units(), op,
                fitted));
    }

    /** The masses as weighed, one per absorber separated by semicolons, or none for the design's. */
    private static List<Double> masses(String text, int absorbers) {
        if (text.isEmpty()) {
            return List.of();
        }
        List<Double> out = new ArrayList<>();
        // a comma may be the decimal separator (450,5): the masses are separated by semicolons only
        for (String one : text.split(";")) {
            out.add(positive(one.strip(), "absorber masses as weighed", absorbers + " masses in kg above 0, one per"
                    + " absorber in the design's order separated by semicolons, or empty for the design's"));
        }
        return out;
    }

    private static double positive(String text, String field, String allowed) {
        try {
            double v = Double.parseDouble(text.replace(',', '.'));
            if (v > 0 && Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // falls through to the plain message
        }
        throw new InvalidInputException(field, text, allowed);
    }

}
