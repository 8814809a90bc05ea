package org.counterpoise.core.error;

/**
 * A non-fatal finding the user must see next to the result.
 * @param code stable identifier (for tests and tools)
 * @param text the English sentence
 */
public record Warning(String code, String text) {
}
