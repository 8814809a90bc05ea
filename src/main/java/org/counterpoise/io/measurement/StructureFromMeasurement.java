package org.counterpoise.io.measurement;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.OptionalDouble;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.StructureInput;

/**
 * Puts an identified mode into a project file's structure section: modal mass (kg), natural
 * frequency (Hz) and damping ratio, with the mode shape value 1 (the modal mass is the one at the
 * measured point, which is taken to be the absorber's). Everything else in the project is kept;
 * the file is replaced atomically ({@link ProjectWriter}).
 */
public final class StructureFromMeasurement {
    private StructureFromMeasurement() {
    }

    /**
     * Significant figures the values are written with: a relative rounding of at most 5e-5, well inside
     * what any measurement gives (a fit's standard uncertainties are 1e-4 relative and more), and short
     * enough to read in the project file and the wizard's fields.
     */
    static final int FIGURES = 5;

    /**
     * @param mode the identified mode
     * @return the structure section it makes, each value to {@link #FIGURES} significant figures
     */
    public static StructureInput structure(IdentifiedMode mode) {
        mode.toStructure(); // refuses a negative mass or a damping a design cannot take, in plain words
        return new StructureInput(new QuantityInput(rounded(mode.modalMass()), Unit.KILOGRAM), null, null,
                new QuantityInput(rounded(Unit.HERTZ.fromSi(mode.naturalFrequency())), Unit.HERTZ), null,
                DampingInput.ratio(rounded(mode.dampingRatio())), 1.0);
    }

    private static double rounded(double v) {
        return new BigDecimal(v).round(new MathContext(FIGURES, RoundingMode.HALF_EVEN)).doubleValue();
    }

    /**
     * @param fit the FRF fit the mode came from
     * @param mode the identified mode
     * @param day the day of the fit
     * @return the structure section it makes, saying where it came from (structure.measured)
     */
    public static StructureInput structure(Identification.Frf fit, IdentifiedMode mode, LocalDate day) {
        return structure(mode).withMeasured(source(fit, mode, day));
    }

    /**
     * @param fit the FRF fit the mode came from
     * @param mode the identified mode
     * @param day the day of the fit
     * @return where the structure's data came from: method, file name, day, residual, uncertainties
     */
    public static MeasuredSource source(Identification.Frf fit, IdentifiedMode mode, LocalDate day) {
        Path name = Path.of(fit.source()).getFileName();
        return new MeasuredSource(fit.method(), name == null ? fit.source() : name.toString(), day.toString(),
                OptionalDouble.of(fit.model().normalisedResidual()),
                mode.naturalFrequencySd().isPresent()
                        ? new QuantityInput(Unit.HERTZ.fromSi(mode.naturalFrequencySd().getAsDouble()), Unit.HERTZ)
                        : null,
                mode.dampingRatioSd(),
                mode.modalMassSd().isPresent() ? new QuantityInput(mode.modalMassSd().getAsDouble(), Unit.KILOGRAM)
                        : null);
    }

    /**
     * @param project the project file, read and then replaced
     * @param fit the FRF fit the mode came from
     * @param mode the mode to put in
     * @param day the day of the fit
     * @return the project as written
     * @throws IOException when the file cannot be written
     */
    public static LoadedProject write(Path project, Identification.Frf fit, IdentifiedMode mode, LocalDate day)
            throws IOException {
        LoadedProject loaded = ProjectReader.read(project);
        Project updated = loaded.project().withStructure(structure(fit, mode, day));
        ProjectWriter.save(updated, project);
        return new LoadedProject(updated, loaded.unknownFields());
    }
}
