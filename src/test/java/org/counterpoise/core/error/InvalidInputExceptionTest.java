package org.counterpoise.core.error;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The problem shown beside a field is the message without that field, for every kind of refusal. */
class InvalidInputExceptionTest {

    @Test
    void problemIsTheMessageWithoutItsField() {
        InvalidInputException bad = new InvalidInputException("structure.mass.value", "-2.4 t",
                "must be a finite number greater than 0");
        assertEquals("structure.mass.value: -2.4 t is not allowed; must be a finite number greater than 0",
                bad.getMessage());
        assertEquals("-2.4 t is not allowed; must be a finite number greater than 0", bad.problem());

        InvalidInputException missing = InvalidInputException.missing("absorber.target", "type the target: it's needed");
        assertEquals("missing; type the target: it's needed", missing.problem());

        InvalidInputException unusable = InvalidInputException.unusable("fan.json", "not UTF-8 text at line 3",
                "save it as UTF-8");
        assertEquals("not UTF-8 text at line 3; save it as UTF-8", unusable.problem());
        assertEquals("fan.json: not UTF-8 text at line 3; save it as UTF-8", unusable.getMessage());
    }
}
