package org.counterpoise.core.error;

import java.util.EnumMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * A non-fatal finding the user must see next to the result: what it is about and its values in
 * SI units. The words are written in one place, {@code io.text.WarningText}.
 *
 * @param kind what the warning is about; its name is the stable code
 * @param parameters exactly the parameters the kind lists: a Double for a number, a String for a token
 */
public record Warning(WarningKind kind, Map<WarningParameter, Object> parameters) {

    /** Checks that the parameters are exactly those of the kind, each of its type, numbers finite. */
    public Warning {
        Objects.requireNonNull(kind, "kind");
        if (!parameters.keySet().equals(Set.copyOf(kind.parameters()))) {
            throw new IllegalArgumentException("bug: warning " + kind + " needs " + kind.parameters() + ", got "
                    + parameters.keySet());
        }
        for (Map.Entry<WarningParameter, Object> e : parameters.entrySet()) {
            Object v = e.getValue();
            boolean fits = e.getKey().token() ? v instanceof String : v instanceof Double d && Double.isFinite(d);
            if (!fits) {
                throw new IllegalArgumentException("bug: warning " + kind + " parameter " + e.getKey() + " = " + v);
            }
        }
        parameters = parameters.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(parameters));
    }

    /**
     * @param kind what the warning is about
     * @param values the kind's parameters in the order it lists them (Double or String)
     * @return the warning
     */
    public static Warning of(WarningKind kind, Object... values) {
        if (values.length != kind.parameters().size()) {
            throw new IllegalArgumentException("bug: warning " + kind + " needs " + kind.parameters());
        }
        Map<WarningParameter, Object> map = new EnumMap<>(WarningParameter.class);
        for (int i = 0; i < values.length; i++) {
            map.put(kind.parameters().get(i), values[i]);
        }
        return new Warning(kind, map);
    }

    /** @return the stable code (the kind's name), as JSON outputs write it */
    public String code() {
        return kind.name();
    }

    /**
     * @param p a number parameter of this warning's kind
     * @return its value, SI
     */
    public double number(WarningParameter p) {
        return (Double) parameters.get(p);
    }

    /**
     * @param p a token parameter of this warning's kind
     * @return its value
     */
    public String token(WarningParameter p) {
        return (String) parameters.get(p);
    }
}
