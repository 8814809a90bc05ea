package org.counterpoise.io.project;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.criteria.Assessor;
import org.counterpoise.core.criteria.Criterion;
import org.counterpoise.core.design.AbsorberSizing;
import org.counterpoise.core.design.DesignConstraints;
import org.counterpoise.core.design.DesignMethod;
import org.counterpoise.core.design.RobustnessSettings;
import org.counterpoise.core.design.DesignStudy;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.model.Excitation;
import org.counterpoise.core.model.Structure;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.response.ResponseKind;
import org.counterpoise.io.text.UnitSystem;

/**
 * A project as the user entered it (units and measures kept as typed), and its conversion to the
 * core's SI {@link DesignStudy}. Problems are reported against the project-file field names.
 *
 * @param name project name
 * @param notes free text
 * @param structure the structure as known
 * @param disturbance the disturbance
 * @param absorber the designer's choices
 * @param robustness expected mistuning, target and tolerances, or null for the defaults
 * @param identity revision, engineer, client or site and date (never null; empty when not given)
 * @param acceptance the criterion the response is judged against, or null for none (since format 3)
 * @param displayConvention how response values are shown: peak, r.m.s. or peak-to-peak (never null;
 *     peak when not given; since format 3)
 * @param hardware the hardware choices the design is realised with (never null; the defaults when not
 *     given; since format 4)
 * @param displayUnits the unit system outputs are shown in (never null; SI when not given; since format 4)
 * @param modes the structure as several modes with named points, or null for the single mode of
 *     {@code structure} (since format 6)
 * @param absorbers how many absorbers share the mass, their tuning rule and point, or null for one
 *     absorber (since format 6)
 */
public record Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
        AbsorberInput absorber, RobustnessInput robustness, ProjectIdentity identity, AcceptanceInput acceptance,
        AmplitudeConvention displayConvention, HardwareChoice hardware, UnitSystem displayUnits, ModesInput modes,
        AbsorbersInput absorbers) {

    /** The name of a project that has not been named yet. */
    public static final String UNTITLED = "Untitled";

    /** The convention response values are shown in when a project names none. */
    public static final AmplitudeConvention DEFAULT_DISPLAY_CONVENTION = AmplitudeConvention.PEAK;

    /** Absent name, notes, identity and display convention get their default values. */
    public Project {
        name = name == null || name.isBlank() ? UNTITLED : name;
        notes = notes == null ? "" : notes;
        identity = identity == null ? ProjectIdentity.EMPTY : identity;
        displayConvention = displayConvention == null ? DEFAULT_DISPLAY_CONVENTION : displayConvention;
        hardware = hardware == null ? HardwareChoice.DEFAULT : hardware;
        displayUnits = displayUnits == null ? UnitSystem.SI : displayUnits;
    }

    /**
     * A project of one mode and one absorber (as format 5 had).
     * @param name project name
     * @param notes free text
     * @param structure the structure as known
     * @param disturbance the disturbance
     * @param absorber the designer's choices
     * @param robustness robustness settings, or null for the defaults
     * @param identity revision, engineer, client or site and date
     * @param acceptance the criterion, or null for none
     * @param displayConvention peak, r.m.s. or peak-to-peak, or null for peak
     * @param hardware the hardware choices, or null for the defaults
     * @param displayUnits the unit system outputs are shown in, or null for SI
     */
    public Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
            AbsorberInput absorber, RobustnessInput robustness, ProjectIdentity identity, AcceptanceInput acceptance,
            AmplitudeConvention displayConvention, HardwareChoice hardware, UnitSystem displayUnits) {
        this(name, notes, structure, disturbance, absorber, robustness, identity, acceptance, displayConvention,
                hardware, displayUnits, null, null);
    }

    /**
     * A project with the default hardware choices, shown in SI (as format 3 had).
     * @param name project name
     * @param notes free text
     * @param structure the structure as known
     * @param disturbance the disturbance
     * @param absorber the designer's choices
     * @param robustness robustness settings, or null for the defaults
     * @param identity revision, engineer, client or site and date
     * @param acceptance the criterion, or null for none
     * @param displayConvention peak, r.m.s. or peak-to-peak, or null for peak
     */
    public Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
            AbsorberInput absorber, RobustnessInput robustness, ProjectIdentity identity, AcceptanceInput acceptance,
            AmplitudeConvention displayConvention) {
        this(name, notes, structure, disturbance, absorber, robustness, identity, acceptance, displayConvention,
                null, null);
    }

    /**
     * A project without criterion, shown in the default convention.
     * @param name project name
     * @param notes free text
     * @param structure the structure as known
     * @param disturbance the disturbance
     * @param absorber the designer's choices
     * @param robustness robustness settings, or null for the defaults
     * @param identity revision, engineer, client or site and date
     */
    public Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
            AbsorberInput absorber, RobustnessInput robustness, ProjectIdentity identity) {
        this(name, notes, structure, disturbance, absorber, robustness, identity, null, null);
    }

    /**
     * A project without identity details (revision, engineer, client, date).
     * @param name project name
     * @param notes free text
     * @param structure the structure as known
     * @param disturbance the disturbance
     * @param absorber the designer's choices
     * @param robustness robustness settings, or null for the defaults
     */
    public Project(String name, String notes, StructureInput structure, DisturbanceInput disturbance,
            AbsorberInput absorber, RobustnessInput robustness) {
        this(name, notes, structure, disturbance, absorber, robustness, ProjectIdentity.EMPTY);
    }

    /**
     * The project-file format version this build writes. Version 2 (issue 12) changed the meaning of
     * an absent {@code absorber.method}; version 3 (issue 13) added the acceptance criterion, the
     * rotor's other orders, the balance grade and the display convention, and replaced
     * {@code absorber.target} by a criterion to meet; version 4 (issue 14) added the hardware choices,
     * the display unit system, the document number, the revision history and the sign-off; version 5
     * (issue 15) added {@code structure.measured}, where the structure's data came from when they were
     * identified from a measurement (an older file has none: its structure was typed); version 6
     * (issue 16) added {@code structure.modes} with named points and {@code absorbers} (several
     * absorbers sharing the mass; an older file has one mode and one absorber); version 7 (issue 16)
     * added {@code absorbers.arrangement} with one absorber per mode, designed jointly, and its
     * {@code modes} and {@code points} (an older file has every absorber on one mode); version 8 (issue 16)
     * added {@code absorbers.spillover_limit} (an older file has none: the spillover is reported, not
     * limited). How older files are read: {@link FormatMigration}.
     */
    public static final int FORMAT_VERSION = 8;

    /** The oldest project-file format version this build reads (and migrates on load). */
    public static final int OLDEST_FORMAT_VERSION = 1;

    /**
     * @param formatVersion the file's format version ({@link #OLDEST_FORMAT_VERSION} to {@link #FORMAT_VERSION})
     * @return the method a file of that version means when it gives no {@code absorber.method}
     * @see FormatMigration#defaultMethod
     */
    public static DesignMethod defaultMethod(int formatVersion) {
        return FormatMigration.defaultMethod(formatVersion);
    }

    /** Response kinds a design may reduce (those of the structure). */
    public static final List<ResponseKind> DESIGN_RESPONSES = List.of(ResponseKind.DISPLACEMENT,
            ResponseKind.VELOCITY, ResponseKind.ACCELERATION, ResponseKind.RELATIVE_DISPLACEMENT,
            ResponseKind.TRANSMITTED_FORCE);

    /**
     * @return the structure in SI: the single mode as given, or, for a structure of several modes
     *     ({@code structure.modes}), the mode the absorbers are fitted to, seen at their point
     */
    public Structure toStructure() {
        return modes == null ? structure.toStructure() : SeveralModes.targetStructure(this);
    }

    /**
     * @return the excitation in SI: the order the design is for (picked in
     *     {@code disturbance.design_order}, or the governing one), with the rotor's other orders beside it
     */
    public Excitation toExcitation() {
        RotorOrders orders = new RotorOrders(disturbance, runUpRate());
        if (orders.orders().size() == 1) {
            return orders.excitation(0);
        }
        OptionalDouble picked = disturbance.designOrder();
        return orders.excitation(picked.isPresent() ? orders.indexOf(picked.getAsDouble())
                : governingOrder(orders.excitation(0)));
    }

    /**
     * The order that governs the verdict of the bare structure, which the design then serves (the
     * disturbance's own order when the project names no criterion, since nothing then governs).
     * @param allOrders the excitation with the disturbance's own order as the design order and the
     *     others beside it (their indices are those of {@link Excitation#orders()})
     * @return the index of the governing order in {@code allOrders.orders()}
     */
    private int governingOrder(Excitation allOrders) {
        Optional<Criterion> criterion = withTargetAsAcceptance().acceptanceCriterion();
        return criterion.isEmpty() ? 0 : Assessor.governingOrder(criterion.get(), toStructure(), allOrders);
    }

    /**
     * @return the shaft's angular acceleration at start and stop, rad/s^2, when the file states
     *     {@code disturbance.run_up_rate}
     */
    public OptionalDouble runUpRate() {
        QuantityInput rate = disturbance.runUpRate();
        return rate == null ? OptionalDouble.empty()
                : OptionalDouble.of(rate.positiveSi("disturbance.run_up_rate.value"));
    }

    /** @return the study the core designs */
    public DesignStudy toStudy() {
        AbsorberInput a = absorber;
        Structure s = toStructure();
        Excitation excitation = toExcitation();
        Optional<Criterion> criterion = withTargetAsAcceptance().acceptanceCriterion();
        AbsorberSizing sizing;
        int sizes = (a.massRatio().isPresent() ? 1 : 0) + (a.mass() == null ? 0 : 1) + (a.target() == null ? 0 : 1)
                + (a.meetAcceptance() ? 1 : 0);
        if (sizes > 1) {
            throw new InvalidInputException("absorber", sizes + " sizes given",
                    "give one of absorber.mass_ratio, absorber.mass and absorber.meet_acceptance");
        } else if (a.target() != null) {
            // a target typed in the wizard before it knew criteria: designed as it always was
            sizing = AbsorberSizing.ofTarget(a.target().positiveSi("absorber.target.value"),
                    a.maxMassRatio().orElse(AbsorberSizing.DEFAULT_MAX_MASS_RATIO));
        } else if (a.meetAcceptance()) {
            criterion.orElseThrow(() -> InvalidInputException.missing("acceptance",
                    "absorber.meet_acceptance needs a criterion to meet: give the acceptance object"));
            sizing = meetSizing();
        } else if (a.massRatio().isPresent()) {
            sizing = AbsorberSizing.ofMassRatio(a.massRatio().getAsDouble());
        } else if (a.mass() != null) {
            sizing = AbsorberSizing.ofMass(a.mass().positiveSi("absorber.mass.value"));
        } else {
            throw InvalidInputException.missing("absorber.mass_ratio",
                    "give absorber.mass_ratio, absorber.mass or absorber.meet_acceptance");
        }
        SeveralModes.check(this);
        DesignConstraints constraints = new DesignConstraints(
                a.strokeLimit() == null ? OptionalDouble.empty()
                        : OptionalDouble.of(a.strokeLimit().positiveSi("absorber.stroke_limit.value")),
                a.fixedDampingRatio(), a.fixedTuningRatio());
        return new DesignStudy(name, s, excitation, a.response(), sizing, a.method(), a.hangsVertically(),
                a.strokeMargin(), constraints, toRobustness(), criterion);
    }

    /** The sizing that meets the criterion: the lightest absorber up to the largest mass ratio. */
    private AbsorberSizing meetSizing() {
        return new AbsorberSizing.MeetCriterion(absorber.maxMassRatio().orElse(AbsorberSizing.DEFAULT_MAX_MASS_RATIO));
    }

    /**
     * @return the criterion in SI, empty when the project names none
     * @throws InvalidInputException for a stated limit that cannot be judged against
     */
    public Optional<Criterion> acceptanceCriterion() {
        return acceptance == null ? Optional.empty() : Optional.of(acceptance.toCriterion());
    }

    /**
     * @return this project with a target of an older file as the criterion it means
     * @see FormatMigration#targetAsAcceptance
     */
    public Project withTargetAsAcceptance() {
        return FormatMigration.targetAsAcceptance(this);
    }

    /**
     * @return the absorber with the target the criterion to meet stands for, or empty
     * @see FormatMigration#absorberWithTarget
     */
    public Optional<AbsorberInput> absorberWithTarget() {
        return FormatMigration.absorberWithTarget(this);
    }

    /**
     * @param s the structure as now given
     * @return this project with it
     */
    public Project withStructure(StructureInput s) {
        return new Project(name, notes, s, disturbance, absorber, robustness, identity, acceptance,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param d the disturbance as now given
     * @return this project with it
     */
    public Project withDisturbance(DisturbanceInput d) {
        return new Project(name, notes, structure, d, absorber, robustness, identity, acceptance,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param a the absorber choices as now given
     * @return this project with them
     */
    public Project withAbsorber(AbsorberInput a) {
        return new Project(name, notes, structure, disturbance, a, robustness, identity, acceptance,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param r the robustness section as now given, or null for none
     * @return this project with it
     */
    public Project withRobustness(RobustnessInput r) {
        return new Project(name, notes, structure, disturbance, absorber, r, identity, acceptance,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param newName project name
     * @param newNotes notes
     * @param newIdentity revision, engineer, client or site, date
     * @return this project with them
     */
    public Project withDetails(String newName, String newNotes, ProjectIdentity newIdentity) {
        return new Project(newName, newNotes, structure, disturbance, absorber, robustness, newIdentity, acceptance,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param criterion the criterion, or null for none
     * @return this project with it
     */
    public Project withAcceptance(AcceptanceInput criterion) {
        return new Project(name, notes, structure, disturbance, absorber, robustness, identity, criterion,
                displayConvention, hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param convention how response values are shown
     * @return this project with it
     */
    public Project withDisplayConvention(AmplitudeConvention convention) {
        return new Project(name, notes, structure, disturbance, absorber, robustness, identity, acceptance, convention,
                hardware, displayUnits, modes, absorbers);
    }

    /**
     * @param choice the hardware choices
     * @return this project with them
     */
    public Project withHardware(HardwareChoice choice) {
        return new Project(name, notes, structure, disturbance, absorber, robustness, identity, acceptance,
                displayConvention, choice, displayUnits, modes, absorbers);
    }

    /**
     * @param system the unit system outputs are shown in
     * @return this project with it
     */
    public Project withDisplayUnits(UnitSystem system) {
        return new Project(name, notes, structure, disturbance, absorber, robustness, identity, acceptance,
                displayConvention, hardware, system, modes, absorbers);
    }

    /**
     * @param newModes the structure's modes with named points, or null for the single mode
     * @param newAbsorbers the number, tuning rule and point of the absorbers, or null for one
     * @return this project with them
     */
    public Project withSeveral(ModesInput newModes, AbsorbersInput newAbsorbers) {
        return new Project(name, notes, structure, disturbance, absorber, robustness, identity, acceptance,
                displayConvention, hardware, displayUnits, newModes, newAbsorbers);
    }

    /** @return the robustness settings in SI (the defaults where the project gives none) */
    public RobustnessSettings toRobustness() {
        return robustness == null ? RobustnessSettings.DEFAULT : robustness.toSettings();
    }
}
