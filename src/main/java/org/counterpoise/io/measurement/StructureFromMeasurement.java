package org.counterpoise.io.measurement;

import java.io.IOException;
import java.nio.file.Path;
import org.counterpoise.core.identify.IdentifiedMode;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.project.DampingInput;
import org.counterpoise.io.project.LoadedProject;
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
     * @param mode the identified mode
     * @return the structure section it makes
     */
    public static StructureInput structure(IdentifiedMode mode) {
        mode.toStructure(); // refuses a negative mass or a damping a design cannot take, in plain words
        return new StructureInput(new QuantityInput(mode.modalMass(), Unit.KILOGRAM), null, null,
                new QuantityInput(Unit.HERTZ.fromSi(mode.naturalFrequency()), Unit.HERTZ), null,
                DampingInput.ratio(mode.dampingRatio()), 1.0);
    }

    /**
     * @param project the project file, read and then replaced
     * @param mode the mode to put in
     * @return the project as written
     * @throws IOException when the file cannot be written
     */
    public static LoadedProject write(Path project, IdentifiedMode mode) throws IOException {
        LoadedProject loaded = ProjectReader.read(project);
        Project updated = loaded.project().withStructure(structure(mode));
        ProjectWriter.save(updated, project);
        return new LoadedProject(updated, loaded.unknownFields());
    }
}
