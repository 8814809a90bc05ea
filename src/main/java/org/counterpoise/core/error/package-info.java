/**
 * How the core says that something is wrong: the one unchecked exception family
 * ({@link org.counterpoise.core.error.CoreException}, with {@link
 * org.counterpoise.core.error.InvalidInputException} naming the field, the value and what is
 * allowed), the preconditions that raise it ({@link org.counterpoise.core.error.Checks}), the
 * message keys, and the non-fatal {@link org.counterpoise.core.error.Warning}s a result carries.
 * The lowest layer of the core: depends only on java.*, and every other core package may use it.
 */
package org.counterpoise.core.error;
