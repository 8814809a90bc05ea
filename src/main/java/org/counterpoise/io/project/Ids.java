package org.counterpoise.io.project;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;
import java.util.stream.Collectors;

/** Text identifiers of enum constants in files and on the command line: BASE_ACCELERATION is "base-acceleration". */
public final class Ids {
    private Ids() {
    }

    /**
     * @param constant an enum constant
     * @return its identifier
     */
    public static String of(Enum<?> constant) {
        return constant.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /**
     * @param type the enum class
     * @param id an identifier (underscores are accepted for dashes)
     * @param <E> enum type
     * @return the constant, if any
     */
    public static <E extends Enum<E>> Optional<E> parse(Class<E> type, String id) {
        String wanted = id.trim().toLowerCase(Locale.ROOT).replace('_', '-');
        return Arrays.stream(type.getEnumConstants()).filter(e -> of(e).equals(wanted)).findFirst();
    }

    /**
     * @param constants allowed constants
     * @return their identifiers, comma separated
     */
    @SafeVarargs
    public static <E extends Enum<E>> String list(E... constants) {
        return Arrays.stream(constants).map(Ids::of).collect(Collectors.joining(", "));
    }
}
