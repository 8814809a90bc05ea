package org.counterpoise.io.project;

import com.google.gson.JsonObject;
import java.util.OptionalDouble;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.realisation.Conductor;
import org.counterpoise.core.realisation.DamperKind;
import org.counterpoise.core.realisation.EddyCurrentChoice;
import org.counterpoise.core.realisation.ElastomerChoice;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.core.realisation.SpringKind;
import org.counterpoise.core.realisation.SpringMaterial;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;
import org.counterpoise.io.text.DisplayUnits;
import org.counterpoise.io.text.UnitSystem;

/**
 * The project file's {@code hardware} object (since format 4), read and written here: the one list of
 * its keys. Kinds and materials are the ids of the {@code core.realisation} enums; quantities that have
 * a unit are {"value", "unit"} objects in either unit system; an absent key is that choice's default
 * ({@link HardwareChoice#DEFAULT}). See docs/project-file.md.
 */
final class HardwareJson {
    /** The key of the object in a project file. */
    static final String KEY = "hardware";
    static final String SPRING = "spring";
    static final String SPRING_MATERIAL = "spring_material";
    static final String SPRING_COUNT = "spring_count";
    static final String DAMPER = "damper";
    static final String EDDY_CURRENT = "eddy_current";
    static final String CONDUCTOR = "conductor";
    static final String FLUX_DENSITY = "flux_density";
    static final String PLATE_THICKNESS = "plate_thickness";
    static final String ELASTOMER = "elastomer";
    static final String DYNAMIC_TO_STATIC = "dynamic_to_static_ratio";
    static final String LOSS_FACTOR = "loss_factor";
    static final String SERVICE_LIFE = "service_life";
    static final String MASS_TOLERANCE = "mass_tolerance";
    static final String TRIM_STEP = "trim_step";

    private HardwareJson() {
    }

    /**
     * @param h the {@code hardware} object, or null when the file has none
     * @return the choices, the defaults where a key is absent
     * @throws InvalidInputException naming the field, the value as typed and what is allowed
     */
    static HardwareChoice read(JsonFields h) {
        HardwareChoice d = HardwareChoice.DEFAULT;
        if (h == null) {
            return d;
        }
        SpringKind spring = h.has(SPRING) ? AcceptanceJson.choice(h, SPRING, SpringKind.values(), SpringKind::id)
                : d.springKind();
        SpringMaterial material = h.has(SPRING_MATERIAL)
                ? AcceptanceJson.choice(h, SPRING_MATERIAL, SpringMaterial.values(), SpringMaterial::id)
                : d.springMaterial();
        double count = h.number(SPRING_COUNT, d.springCount());
        if (count != Math.rint(count) || count < 0 || count > HardwareChoice.MOST_SPRINGS) {
            throw new InvalidInputException(h.pathOf(SPRING_COUNT), h.shown(SPRING_COUNT), "a whole number from 0"
                    + " (the design chooses) to " + HardwareChoice.MOST_SPRINGS);
        }
        // an elastomer spring is its own damper: the damper then defaults to its loss, not to a dashpot
        DamperKind damperDefault = spring == SpringKind.ELASTOMER ? DamperKind.ELASTOMER_LOSS : d.damperKind();
        DamperKind damper = h.has(DAMPER) ? AcceptanceJson.choice(h, DAMPER, DamperKind.values(), DamperKind::id)
                : damperDefault;
        EddyCurrentChoice eddy = eddyCurrent(h.optionalObject(EDDY_CURRENT), d.eddyCurrent());
        ElastomerChoice elastomer = elastomer(h.optionalObject(ELASTOMER), d.elastomer());
        double hours = h.has(SERVICE_LIFE) ? hours(h.quantity(SERVICE_LIFE, Dimension.TIME)) : d.serviceHours();
        double massTolerance = h.has(MASS_TOLERANCE) ? fraction(h.object(MASS_TOLERANCE)) : d.massTolerance();
        double trimStep = h.has(TRIM_STEP) ? fraction(h.object(TRIM_STEP)) : d.trimStepFraction();
        h.finish();
        try {
            return new HardwareChoice(spring, material, (int) count, damper, eddy, elastomer, hours, massTolerance,
                    trimStep);
        } catch (InvalidInputException e) {
            throw explained(e);
        }
    }

    private static EddyCurrentChoice eddyCurrent(JsonFields e, EddyCurrentChoice d) {
        if (e == null) {
            return d;
        }
        Conductor conductor = e.has(CONDUCTOR) ? AcceptanceJson.choice(e, CONDUCTOR, Conductor.values(), Conductor::id)
                : d.conductor();
        double flux = e.has(FLUX_DENSITY) ? e.quantity(FLUX_DENSITY, Dimension.FLUX_DENSITY).si(e.pathOf(FLUX_DENSITY))
                : d.fluxDensity();
        double thickness = e.has(PLATE_THICKNESS) ? e.quantity(PLATE_THICKNESS, Dimension.LENGTH).si(
                e.pathOf(PLATE_THICKNESS)) : d.plateThickness();
        e.finish();
        try {
            return new EddyCurrentChoice(conductor, flux, thickness);
        } catch (InvalidInputException x) {
            throw explained(x);
        }
    }

    private static ElastomerChoice elastomer(JsonFields e, ElastomerChoice d) {
        if (e == null) {
            return d;
        }
        double ratio = e.number(DYNAMIC_TO_STATIC, d.dynamicToStaticRatio());
        double loss = e.number(LOSS_FACTOR, d.compoundLossFactor());
        e.finish();
        return new ElastomerChoice(ratio, loss);
    }

    /**
     * A fraction stated as {"value", "unit": "%" or ""}: the choice checks its own range (the mass
     * ratio's plausible range, which a quantity of no dimension gets, is not this one's).
     */
    private static double fraction(JsonFields q) {
        double value = q.number("value");
        Unit unit = JsonFields.unit(q, "unit", Dimension.RATIO);
        q.finish();
        return unit.toSi(value);
    }

    /** Hours as typed in hours are kept exactly; another unit of time is converted. */
    private static double hours(QuantityInput q) {
        return q.unit() == Unit.HOUR ? q.value() : q.unit().toSi(q.value()) / Unit.HOUR.toSi(1.0);
    }

    /**
     * The choices' own checks state their limits in SI (metres, tesla, fractions, hours); the message
     * says so, since the file may state the value in another unit.
     */
    private static InvalidInputException explained(InvalidInputException e) {
        String si = switch (e.field()) {
            case "hardware.mass_tolerance", "hardware.trim_step" -> " (as a fraction of the absorber mass: 0.01"
                    + " is 1 %)";
            case "hardware.eddy_current.plate_thickness" -> " (in metres: 0.001 is 1 mm)";
            case "hardware.eddy_current.flux_density" -> " (in tesla)";
            case "hardware.service_hours" -> " (in hours)";
            default -> "";
        };
        String field = e.field().equals("hardware.service_hours") ? KEY + "." + SERVICE_LIFE : e.field();
        return new InvalidInputException(field, e.value(), e.allowed() + si);
    }

    /**
     * @param c the choices
     * @param system the system the project is shown in: lengths are written in its unit
     * @return the {@code hardware} object, every key written
     */
    static JsonObject write(HardwareChoice c, UnitSystem system) {
        JsonObject o = new JsonObject();
        o.addProperty(SPRING, c.springKind().id());
        o.addProperty(SPRING_MATERIAL, c.springMaterial().id());
        o.addProperty(SPRING_COUNT, c.springCount());
        o.addProperty(DAMPER, c.damperKind().id());
        JsonObject eddy = new JsonObject();
        eddy.addProperty(CONDUCTOR, c.eddyCurrent().conductor().id());
        eddy.add(FLUX_DENSITY, exactly(c.eddyCurrent().fluxDensity(), Unit.TESLA));
        eddy.add(PLATE_THICKNESS, exactly(c.eddyCurrent().plateThickness(),
                system == UnitSystem.US_CUSTOMARY ? DisplayUnits.of(Dimension.LENGTH, system) : Unit.MILLIMETRE));
        o.add(EDDY_CURRENT, eddy);
        JsonObject elastomer = new JsonObject();
        elastomer.addProperty(DYNAMIC_TO_STATIC, c.elastomer().dynamicToStaticRatio());
        elastomer.addProperty(LOSS_FACTOR, c.elastomer().compoundLossFactor());
        o.add(ELASTOMER, elastomer);
        JsonObject life = new JsonObject();
        life.addProperty("value", c.serviceHours());
        life.addProperty("unit", Unit.HOUR.symbol());
        o.add(SERVICE_LIFE, life);
        o.add(MASS_TOLERANCE, exactly(c.massTolerance(), Unit.PERCENT));
        o.add(TRIM_STEP, exactly(c.trimStepFraction(), Unit.PERCENT));
        return o;
    }

    /**
     * A quantity in the unit wished for when its value there reads back to exactly the same SI value
     * (so that a saved file reopens identically), else in the SI unit itself (factor 1, always exact).
     */
    private static JsonObject exactly(double si, Unit wished) {
        OptionalDouble v = exactValue(si, wished);
        Unit unit = v.isPresent() ? wished
                : Unit.find(wished.dimension().siSymbol(), wished.dimension()).orElseThrow();
        return ProjectWriter.quantity(new QuantityInput(v.isPresent() ? v.getAsDouble() : si, unit));
    }

    /**
     * @param si a value in SI
     * @param unit a unit
     * @return the value in that unit whose conversion back gives {@code si} exactly: the quotient or one
     *     of its nearest neighbours, empty when none does
     */
    static OptionalDouble exactValue(double si, Unit unit) {
        double v = unit.fromSi(si);
        double up = v;
        double down = v;
        for (int i = 0; i < 4; i++) {
            if (unit.toSi(up) == si) {
                return OptionalDouble.of(up);
            }
            if (unit.toSi(down) == si) {
                return OptionalDouble.of(down);
            }
            up = Math.nextUp(up);
            down = Math.nextDown(down);
        }
        return OptionalDouble.empty();
    }
}
