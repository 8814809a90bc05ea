package org.counterpoise.testing;

import java.util.OptionalDouble;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.model.ExcitationKind;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.core.units.SpectralDensityUnit;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.AbsorberInput;
import org.counterpoise.io.project.DisturbanceInput;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.SpectrumInput;

/** Invented scenarios shared by tests. */
public final class Scenarios {
    private Scenarios() {
    }

    /** @return an invented scenario: the first preset's structure under a white-noise force, minimum-variance design */
    public static Project whiteNoiseProject() {
        Project base = Presets.defaultProject().project();
        DisturbanceInput d = new DisturbanceInput(ExcitationKind.FORCE, new QuantityInput(300, Unit.NEWTON),
                new QuantityInput(860, Unit.REV_PER_MINUTE), Double.NaN, Double.NaN, null, 1,
                new QuantityInput(12, Unit.RPM_PER_SECOND),
                SpectrumInput.whiteNoise(2.5, SpectralDensityUnit.KILONEWTON_SQUARED_PER_HERTZ));
        AbsorberInput a = new AbsorberInput(OptionalDouble.of(0.05), null, DesignMethod.MINIMUM_VARIANCE, ResponseKind.DISPLACEMENT,
                false, 1.5);
        return new Project(base.name(), base.notes(), base.structure(), d, a, base.robustness(), base.identity());
    }
}
