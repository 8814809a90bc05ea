package org.counterpoise.io.measurement;

import java.util.Optional;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.core.identify.FrfKind;
import org.counterpoise.core.units.Dimension;
import org.counterpoise.core.units.Unit;

/**
 * The unit of an FRF's values: a response unit per force unit, written RESPONSE/FORCE, e.g. m/N,
 * mm/s/N, g/N (g = standard gravity), m/s^2/N, in/lbf, in/s/lbf, g/lbf.
 *
 * @param kind what was measured
 * @param response the response unit (length, velocity or acceleration)
 * @param force the force unit
 */
public record FrfUnit(FrfKind kind, Unit response, Unit force) {

    /**
     * @param kind what was measured
     * @return the SI unit of that kind (m/N, m/s/N, m/s^2/N)
     */
    public static FrfUnit si(FrfKind kind) {
        return new FrfUnit(kind, switch (kind) {
            case RECEPTANCE -> Unit.METRE;
            case MOBILITY -> Unit.METRE_PER_SECOND;
            case ACCELERANCE -> Unit.METRE_PER_SECOND_SQUARED;
        }, Unit.NEWTON);
    }

    /**
     * @param text RESPONSE/FORCE
     * @param kind what was measured
     * @param field the option or field the text came from
     * @return the unit
     */
    public static FrfUnit parse(String text, FrfKind kind, String field) {
        Dimension dimension = switch (kind) {
            case RECEPTANCE -> Dimension.LENGTH;
            case MOBILITY -> Dimension.VELOCITY;
            case ACCELERANCE -> Dimension.ACCELERATION;
        };
        int slash = text.lastIndexOf('/');
        Optional<Unit> response = slash > 0 ? Unit.find(text.substring(0, slash).strip(), dimension) : Optional.empty();
        Optional<Unit> force = slash > 0 ? Unit.find(text.substring(slash + 1).strip(), Dimension.FORCE)
                : Optional.empty();
        if (response.isEmpty() || force.isEmpty()) {
            throw new InvalidInputException(field, text, "RESPONSE/FORCE for " + kind.id() + ": a response unit of "
                    + Unit.symbolsOf(dimension) + ", then /, then a force unit of " + Unit.symbolsOf(Dimension.FORCE)
                    + " (for example " + si(kind).symbol() + ")");
        }
        return new FrfUnit(kind, response.get(), force.get());
    }

    /** @return the SI value of 1 in this unit */
    public double toSi() {
        return response.toSi(1.0) / force.toSi(1.0);
    }

    /** @return RESPONSE/FORCE */
    public String symbol() {
        return response.symbol() + "/" + force.symbol();
    }
}
