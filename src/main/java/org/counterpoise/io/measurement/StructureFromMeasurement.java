package org.counterpoise.io.measurement;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.robust.Tolerance;
import org.counterpoise.core.robust.ToleranceRanges.FrequencyBasis;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.io.project.QuantityInput;
import org.counterpoise.io.project.RobustnessInput;
import org.counterpoise.io.project.StructureInput;

/**
 * Puts an identified mode into a project file's structure section: modal mass (kg), natural
 * frequency (Hz) and damping ratio, with the mode shape value 1 (the modal mass is the one at the
 * measured point, which is taken to be the absorber's), and the fit's uncertainties as the
 * structure's mass and stiffness tolerances where the project states none. Everything else in the project is kept; the file is
 * replaced atomically ({@link ProjectWriter}).
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
                OptionalDouble.of(fit.model().normalisedResidual()), mode.naturalFrequencySd(), mode.dampingRatioSd(),
                mode.modalMassSd());
    }

    /**
     * The fit's standard uncertainties as the structure's tolerances (normal distributions, standard
     * deviation in percent), so that the Monte Carlo and the robust designs carry them: the modal
     * mass's as it is, the stiffness k = m omega_n^2 as sqrt(u_m^2 + (2 u_omega)^2) in relative
     * terms (first-order propagation, the correlation of m and omega_n left out; common practice).
     * Only where the project states no tolerance of its own: one the user typed (which may
     * include what the fit cannot know, such as a model error) is kept. A mode without
     * uncertainties changes nothing; the rest of the robustness section is kept, and a project
     * without one gets one with the defaults (seed 1).
     * @param project the project
     * @param mode the identified mode
     * @return the project with the structure's tolerances from the fit
     */
    public static Project withUncertainties(Project project, IdentifiedMode mode) {
        RobustnessInput r = project.robustness() != null ? project.robustness()
                : new RobustnessInput(RobustnessInput.Ranges.NONE, null, 0, 1L, null, null, null, null, null);
        // the structure's frequency is now a measured one: said so where the project did not say how it was found
        RobustnessInput.Ranges ranges = r.ranges().basis() != FrequencyBasis.NOT_STATED ? r.ranges()
                : new RobustnessInput.Ranges(r.ranges().structurePercent(), r.ranges().absorberPercent(),
                        r.ranges().dampingPercent(), FrequencyBasis.MEASURED);
        if (mode.modalMassSd().isEmpty() || mode.naturalFrequencySd().isEmpty()) {
            return project.withRobustness(r.withRanges(ranges));
        }
        double mass = mode.modalMassSd().getAsDouble() / mode.modalMass();
        double frequency = mode.naturalFrequencySd().getAsDouble() / mode.naturalFrequency();
        double stiffness = Math.hypot(mass, 2.0 * frequency);
        String normal = RobustnessInput.ToleranceInput.token(Tolerance.Distribution.NORMAL);
        return project.withRobustness(new RobustnessInput(ranges, r.target(), r.samples(), r.seed(),
                r.structureMass() != null ? r.structureMass()
                        : new RobustnessInput.ToleranceInput(normal, percent(mass), null),
                r.structureStiffness() != null ? r.structureStiffness()
                        : new RobustnessInput.ToleranceInput(normal, percent(stiffness), null), r.absorberMass(),
                r.absorberStiffness(), r.absorberDamping()));
    }

    /** A relative uncertainty in percent, to 4 significant figures (the file keeps what is shown). */
    private static double percent(double relative) {
        return Double.parseDouble(String.format(Locale.ROOT, "%.4g", 100.0 * relative));
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
        if (loaded.project().modes() != null) {
            // the identified mode would stand beside the modes and be left unused: refused, not ignored
            throw new InvalidInputException("--write-structure", PlainText.escape(project.toString()),
                    "a project whose structure is one mode: this one gives structure.modes (several modes), which"
                            + " a measured mode does not replace; write to a project of one mode");
        }
        Project updated = withUncertainties(loaded.project().withStructure(structure(fit, mode, day)), mode);
        ProjectWriter.save(updated, project);
        return new LoadedProject(updated, loaded.unknownFields());
    }
}
