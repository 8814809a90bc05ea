package org.counterpoise.io.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import org.counterpoise.core.error.InvalidInputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Numbers as typed in four locales. The expected readings follow each locale's marks as the CLDR
 * data in the JDK gives them (en-US: decimal ".", grouping ","; de-DE: decimal ",", grouping ".";
 * fr-FR: decimal ",", grouping U+202F narrow no-break space; en-IN: decimal ".", grouping "," with
 * the lakh/crore groups of two, common practice in India), and ISO 80000-1 (7.3.1) for spaces
 * between groups of three. Texts that fit no reading of the locale are refused, never guessed.
 */
class TypedNumbersTest {
    private static final Locale US = Locale.forLanguageTag("en-US");
    private static final Locale GERMANY = Locale.forLanguageTag("de-DE");
    private static final Locale FRANCE = Locale.forLanguageTag("fr-FR");
    private static final Locale INDIA = Locale.forLanguageTag("en-IN");

    @ParameterizedTest(name = "{0}: \"{1}\" = {2}")
    @CsvSource(delimiter = '|', value = {
        // en-US
        "en-US | 1,800          | 1800",
        "en-US | 1800           | 1800",
        "en-US | 1,800.5        | 1800.5",
        "en-US | 1,234,567.25   | 1234567.25",
        "en-US | 0.05           | 0.05",
        "en-US | .5             | 0.5",
        "en-US | -2.5           | -2.5",
        "en-US | +7             | 7",
        "en-US | 1.5e3          | 1500",
        "en-US | 1.5E-3         | 0.0015",
        "en-US | 2e+6           | 2000000",
        "en-US | 1 800          | 1800",
        "en-US | '  42  '       | 42",
        // de-DE
        "de-DE | 1,800          | 1.8",
        "de-DE | 1.800          | 1800",
        "de-DE | 1.800,5        | 1800.5",
        "de-DE | 1.234.567,25   | 1234567.25",
        "de-DE | 0,05           | 0.05",
        "de-DE | 1,5e3          | 1500",
        "de-DE | 1,5E-3         | 0.0015",
        "de-DE | 1 800,5        | 1800.5",
        "de-DE | -0,3           | -0.3",
        // fr-FR: the locale's own grouping is the narrow no-break space; plain spaces are typed too
        "fr-FR | 1\u202f800,5   | 1800.5",
        "fr-FR | 1\u00a0800     | 1800",
        "fr-FR | 1 234 567,25   | 1234567.25",
        "fr-FR | 1,5            | 1.5",
        "fr-FR | 1,5e3          | 1500",
        "fr-FR | 1800           | 1800",
        // en-IN: lakh/crore grouping and the groups of three that the JDK itself prints
        "en-IN | 18,00,000      | 1800000",
        "en-IN | 1,800,000      | 1800000",
        "en-IN | 12,34,567.5    | 1234567.5",
        "en-IN | 1,00,00,000    | 10000000",
        "en-IN | 1,800          | 1800",
        "en-IN | 2.5e-4         | 0.00025",
    })
    void readsWhatTheLocaleMeans(String tag, String text, double expected) {
        assertEquals(expected, TypedNumbers.parse(text, Locale.forLanguageTag(tag), "f"), 1e-12 * Math.abs(expected));
    }

    @ParameterizedTest(name = "{0}: \"{1}\" refused")
    @CsvSource(delimiter = '|', value = {
        // A comma that cannot group thousands in en-US is a European decimal: refused, not read as 1.8.
        "en-US | 1,8",
        "en-US | 1,80",
        "en-US | 0,5",
        "en-US | 0,500",
        "en-US | 1,8000",
        "en-US | 1.800.000",
        "en-US | 1,,800",
        "en-US | ',800'",
        "en-US | 1800,",
        "en-US | 1,800.5,5",
        "en-US | 12,34,567",
        "en-US | 1 800,000",
        "en-US | 1.2.3",
        "en-US | 12o0",
        "en-US | 0x10",
        "en-US | NaN",
        "en-US | Infinity",
        "en-US | 1e",
        "en-US | 1e400",
        "en-US | -",
        "en-US | 5 kg",
        // A point that cannot group thousands in de-DE is an English decimal: refused, not guessed.
        "de-DE | 1.8",
        "de-DE | 0.05",
        "de-DE | 1.5e3",
        "de-DE | 12.5",
        "de-DE | 1.800.5",
        "de-DE | 1,800,5",
        // fr-FR has no point at all: "1.800" could be either, so it is refused.
        "fr-FR | 1.800",
        "fr-FR | 1.5",
        "fr-FR | 1 80",
        // en-IN: neither lakh nor thousands grouping
        "en-IN | 1,80,0000",
        "en-IN | 123,45,678",
        "en-IN | 1,8",
    })
    void refusesWhatItCannotReadForSure(String tag, String text) {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> TypedNumbers.parse(text, Locale.forLanguageTag(tag), "structure.mass"));
        assertEquals("structure.mass", e.field());
        assertFalse(e.getMessage().contains("Exception"), e.getMessage());
        assertFalse(e.getMessage().contains("NaN") && !text.equals("NaN"), e.getMessage());
    }

    @Test
    void emptyIsRefusedWithAnExampleInTheLocale() {
        InvalidInputException de = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse(" ", GERMANY, "f"));
        assertTrue(de.getMessage().contains("12,5"), de.getMessage());
        InvalidInputException us = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse("", US, "f"));
        assertTrue(us.getMessage().contains("12.5"), us.getMessage());
    }

    @Test
    void refusalNamesTheLocalesMarks() {
        String us = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse("1,8", US, "f")).getMessage();
        assertTrue(us.contains("decimal mark is \u201c.\u201d") && us.contains("\u201c,\u201d groups"), us);
        String de = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse("1.8", GERMANY, "f"))
                .getMessage();
        assertTrue(de.contains("decimal mark is \u201c,\u201d") && de.contains("\u201c.\u201d groups"), de);
        String fr = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse("1.5", FRANCE, "f"))
                .getMessage();
        assertTrue(fr.contains("decimal mark is \u201c,\u201d") && fr.contains("a space groups"), fr);
        String in = assertThrows(InvalidInputException.class, () -> TypedNumbers.parse("1,80,0000", INDIA, "f"))
                .getMessage();
        assertTrue(in.contains("1,00,000"), in);
    }

    @Test
    void writtenForEditingReadsBackInEveryLocale() {
        double[] values = {1800, 0.05, 0.07200000000000001, 14.2, 1234567.25, -0.3, 2.5e-9, 3.75e14, 1.0 / 3};
        for (Locale l : new Locale[] {US, GERMANY, FRANCE, INDIA}) {
            for (double v : values) {
                String text = TypedNumbers.forEditing(v, l);
                assertEquals(v, TypedNumbers.parse(text, l, "f"), 1e-11 * Math.abs(v), l + " " + text);
            }
        }
        assertEquals("0.072", TypedNumbers.forEditing(0.07200000000000001, US));
        assertEquals("0,072", TypedNumbers.forEditing(0.07200000000000001, GERMANY));
        assertEquals("1800", TypedNumbers.forEditing(1800, FRANCE));
        assertEquals("2.5e-9", TypedNumbers.forEditing(2.5e-9, US));
        assertEquals("14.2", TypedNumbers.forEditing(14.2, INDIA));
    }

    @Test
    void groupedTextIsRecognised() {
        assertTrue(TypedNumbers.grouped("1,800", US));
        assertFalse(TypedNumbers.grouped("1,8", GERMANY));
        assertTrue(TypedNumbers.grouped("1\u202f800", FRANCE));
        assertFalse(TypedNumbers.grouped("1800", US));
    }
}
