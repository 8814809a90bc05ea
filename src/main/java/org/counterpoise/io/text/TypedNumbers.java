package org.counterpoise.io.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.text.DecimalFormatSymbols;
import java.util.Locale;
import java.util.Set;
import org.counterpoise.core.error.InvalidInputException;

/**
 * Numbers as people type them, read with the decimal and grouping marks of their locale, and
 * numbers written back for editing in the same locale.
 *
 * <p>Reading is strict so that a number is never misread: the whole text must be a number,
 * grouping marks may stand only between whole groups of the integer part (groups of three digits;
 * in India also the lakh/crore groups of two before the last three), and a text that fits no
 * reading of the locale is refused with the locale's marks named. Examples in English (United
 * States): "1,800" is 1800 and "1,8" is refused; in German (Germany): "1,8" is 1.8, "1.800" is
 * 1800 and "1.8" is refused. Spaces (plain, no-break, narrow no-break or thin) group digits in
 * every locale, as ISO 80000-1 (7.3.1) writes them. Scientific notation "1.5e3" is accepted.
 *
 * <p>The marks come from {@link DecimalFormatSymbols} (the JDK's CLDR data). The JDK's number
 * patterns collapse the Indian grouping to groups of three, so the lakh/crore grouping is added
 * here for the countries that use it (common practice).
 */
public final class TypedNumbers {
    /** Spaces that group digits whatever the locale. */
    private static final String SPACES = " \u00a0\u202f\u2009";
    /** Countries that group as 12,34,567 (lakh and crore). */
    private static final Set<String> LAKH_GROUPING = Set.of("IN", "BD", "NP");
    /** Significant figures written for editing: enough to keep what was typed, few enough to hide round-off. */
    private static final int EDIT_FIGURES = 12;

    private TypedNumbers() {
    }

    /**
     * @param text the text as typed
     * @param locale whose marks to read with
     * @param field the field id named in a refusal
     * @return the number
     * @throws InvalidInputException naming the field, the text and the locale's way of writing numbers
     */
    public static double parse(String text, Locale locale, String field) {
        Marks marks = Marks.of(locale);
        String s = trim(text);
        if (s.isEmpty()) {
            throw new InvalidInputException(field, "an empty field", "type a number, such as " + marks.example());
        }
        StringBuilder normal = new StringBuilder();
        int i = 0;
        char first = s.charAt(0);
        if (first == '+' || first == '-' || first == '\u2212' || first == marks.minus) {
            if (first != '+') {
                normal.append('-');
            }
            i++;
        }
        // Mantissa: digits, grouping marks (integer part only) and one decimal mark.
        StringBuilder groups = new StringBuilder(); // digit counts between grouping marks, comma separated
        int digitsInGroup = 0;
        char groupingUsed = 0;
        boolean decimal = false;
        int mantissaDigits = 0;
        for (; i < s.length(); i++) {
            char c = s.charAt(i);
            int digit = marks.digit(c);
            if (digit >= 0) {
                normal.append((char) ('0' + digit));
                mantissaDigits++;
                if (!decimal) {
                    digitsInGroup++;
                }
            } else if (c == marks.decimal && !decimal) {
                decimal = true;
                normal.append('.');
            } else if (marks.isGrouping(c)) {
                if (decimal) {
                    throw badGrouping(field, text, marks);
                }
                char kind = SPACES.indexOf(c) >= 0 ? ' ' : c;
                if (groupingUsed != 0 && groupingUsed != kind) {
                    throw new InvalidInputException(field, quote(text),
                            "group digits with one mark only; " + marks.howToWrite());
                }
                groupingUsed = kind;
                groups.append(digitsInGroup).append(',');
                digitsInGroup = 0;
            } else if (marks.startsExponent(s, i)) {
                break;
            } else if (c == marks.decimal || isForeignMark(c)) {
                throw badGrouping(field, text, marks);
            } else {
                throw notANumber(field, text, marks);
            }
        }
        if (mantissaDigits == 0) {
            throw notANumber(field, text, marks);
        }
        if (groupingUsed != 0) {
            groups.append(digitsInGroup);
            if (!validGroups(groups.toString(), marks.lakh, normal)) {
                throw badGrouping(field, text, marks);
            }
        }
        if (i < s.length()) {
            int after = i + marks.exponentLength(s, i);
            StringBuilder exponent = new StringBuilder("e");
            if (after < s.length() && (s.charAt(after) == '+' || s.charAt(after) == '-' || s.charAt(after) == '\u2212'
                    || s.charAt(after) == marks.minus)) {
                if (s.charAt(after) != '+') {
                    exponent.append('-');
                }
                after++;
            }
            int expDigits = 0;
            for (; after < s.length(); after++) {
                int digit = marks.digit(s.charAt(after));
                if (digit < 0) {
                    throw notANumber(field, text, marks);
                }
                exponent.append((char) ('0' + digit));
                expDigits++;
            }
            if (expDigits == 0 || expDigits > 4) {
                throw notANumber(field, text, marks);
            }
            normal.append(exponent);
        }
        double value = Double.parseDouble(normal.toString());
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(field, quote(text), "type a number of a size below 1e300");
        }
        return value;
    }

    /**
     * Writes a number for an input field in the locale's decimal mark, without grouping, to 12
     * significant figures with trailing zeros dropped (0.07200000000000001 is written 0.072).
     * @param value a finite number
     * @param locale the locale
     * @return the text, which {@link #parse} reads back to the same value within 12 figures
     */
    public static String forEditing(double value, Locale locale) {
        if (!Double.isFinite(value)) {
            return "";
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal b = new BigDecimal(value).round(new MathContext(EDIT_FIGURES)).stripTrailingZeros();
        double abs = Math.abs(value);
        String plain;
        if (abs >= 1e-6 && abs < 1e12) {
            plain = b.toPlainString();
        } else {
            plain = b.unscaledValue().toString();
            boolean negative = plain.startsWith("-");
            String digits = negative ? plain.substring(1) : plain;
            int exponent = digits.length() - 1 - b.scale();
            String mantissa = digits.length() == 1 ? digits : digits.charAt(0) + "." + digits.substring(1);
            plain = (negative ? "-" : "") + mantissa + "e" + exponent;
        }
        char decimal = DecimalFormatSymbols.getInstance(locale).getDecimalSeparator();
        return plain.replace('.', decimal);
    }

    /**
     * @param text text as typed
     * @param locale its locale
     * @return true when the text uses a grouping mark (worth echoing the number read)
     */
    public static boolean grouped(String text, Locale locale) {
        Marks marks = Marks.of(locale);
        String s = trim(text);
        for (int i = 0; i < s.length(); i++) {
            if (marks.isGrouping(s.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    /** Integer-part groups: the first 1 to 3 digits (not led by 0), then threes; or lakh/crore twos then three. */
    private static boolean validGroups(String counts, boolean lakh, StringBuilder normal) {
        String[] parts = counts.split(",");
        int[] n = new int[parts.length];
        for (int k = 0; k < parts.length; k++) {
            n[k] = Integer.parseInt(parts[k]);
        }
        String digits = normal.toString().replace("-", "");
        if (n[0] < 1 || n[0] > 3 || digits.charAt(0) == '0') {
            return false;
        }
        boolean threes = true;
        for (int k = 1; k < n.length; k++) {
            threes &= n[k] == 3;
        }
        if (threes) {
            return true;
        }
        if (!lakh || n[n.length - 1] != 3 || n[0] > 2) {
            return false;
        }
        for (int k = 1; k < n.length - 1; k++) {
            if (n[k] != 2) {
                return false;
            }
        }
        return true;
    }

    private static boolean isForeignMark(char c) {
        return c == '.' || c == ',' || c == '\'' || c == '\u2019' || c == '\u066b' || c == '\u066c';
    }

    private static String trim(String text) {
        String s = text == null ? "" : text;
        int a = 0;
        int b = s.length();
        while (a < b && (Character.isWhitespace(s.charAt(a)) || SPACES.indexOf(s.charAt(a)) >= 0)) {
            a++;
        }
        while (b > a && (Character.isWhitespace(s.charAt(b - 1)) || SPACES.indexOf(s.charAt(b - 1)) >= 0)) {
            b--;
        }
        return s.substring(a, b);
    }

    private static InvalidInputException badGrouping(String field, String text, Marks marks) {
        return new InvalidInputException(field, quote(text), marks.howToWrite());
    }

    private static InvalidInputException notANumber(String field, String text, Marks marks) {
        return new InvalidInputException(field, quote(text), "type a number, such as " + marks.example() + " or 1"
                + marks.decimal + "5e3");
    }

    private static String quote(String text) {
        return "\u201c" + text.strip() + "\u201d";
    }

    /** The marks of one locale. */
    private record Marks(char decimal, char grouping, char minus, char zero, String exponent, boolean lakh) {
        static Marks of(Locale locale) {
            DecimalFormatSymbols s = DecimalFormatSymbols.getInstance(locale);
            return new Marks(s.getDecimalSeparator(), s.getGroupingSeparator(), s.getMinusSign(), s.getZeroDigit(),
                    s.getExponentSeparator(), LAKH_GROUPING.contains(locale.getCountry()));
        }

        int digit(char c) {
            if (c >= '0' && c <= '9') {
                return c - '0';
            }
            if (c >= zero && c <= zero + 9) {
                return c - zero;
            }
            return -1;
        }

        boolean isGrouping(char c) {
            if (c == decimal) {
                return false;
            }
            return c == grouping || SPACES.indexOf(c) >= 0
                    || (grouping == '\u2019' && c == '\'');
        }

        boolean startsExponent(String s, int i) {
            return exponentLength(s, i) > 0;
        }

        int exponentLength(String s, int i) {
            char c = s.charAt(i);
            if (c == 'e' || c == 'E') {
                return 1;
            }
            if (!exponent.isEmpty() && s.regionMatches(true, i, exponent, 0, exponent.length())) {
                return exponent.length();
            }
            return 0;
        }

        String markName(char c) {
            return SPACES.indexOf(c) >= 0 ? "a space" : "\u201c" + c + "\u201d";
        }

        String example() {
            return "12" + decimal + "5";
        }

        /** The plain description of how numbers are written in this locale. */
        String howToWrite() {
            String g = SPACES.indexOf(grouping) >= 0 ? " " : String.valueOf(grouping);
            return "here the decimal mark is " + markName(decimal) + " (as in 1" + decimal + "5) and "
                    + markName(grouping) + " groups whole thousands (as in 1" + g + "800" + (lakh ? " or 1" + g + "00" + g
                    + "000" : "") + ")";
        }
    }
}
