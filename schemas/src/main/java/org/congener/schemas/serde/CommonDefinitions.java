package org.congener.schemas.serde;

import java.time.Month;
import java.time.Year;

/**
 * The {@code id}, {@code unit} and {@code instant} definitions of {@code common.schema.json}, checked
 * on a decoded string without a regular expression. The validator compiles each pattern with
 * {@code $} as the very end of the text, so a trailing line break is no match here either; lengths
 * count code points, which equal chars for every string these patterns allow.
 */
final class CommonDefinitions {
    private static final int ID_MAX_LENGTH = 128;
    private static final int UNIT_MAX_LENGTH = 16;
    private static final char MICRO_SIGN = '\u00B5';
    private static final char GREEK_MU = '\u03BC';
    /** java.time, and so the validator's date-time format, knows no offset beyond ±18:00. */
    private static final int MAX_OFFSET_MINUTES = 18 * 60;

    private CommonDefinitions() {
    }

    /** {@code ^[A-Za-z0-9][A-Za-z0-9._:@-]*$}, 1 to 128 characters. */
    static boolean isId(String s) {
        int n = s.length();
        if (n == 0 || n > ID_MAX_LENGTH || !isAsciiLetterOrDigit(s.charAt(0))) {
            return false;
        }
        for (int i = 1; i < n; i++) {
            char c = s.charAt(i);
            if (!isAsciiLetterOrDigit(c) && c != '.' && c != '_' && c != ':' && c != '@' && c != '-') {
                return false;
            }
        }
        return true;
    }

    /** {@code ^[A-Za-zµμ][A-Za-z0-9µμ/.]*$}, 1 to 16 characters. */
    static boolean isUnit(String s) {
        int n = s.length();
        if (n == 0 || n > UNIT_MAX_LENGTH || !isUnitStart(s.charAt(0))) {
            return false;
        }
        for (int i = 1; i < n; i++) {
            char c = s.charAt(i);
            if (!isUnitStart(c) && !isDigit(c) && c != '/' && c != '.') {
                return false;
            }
        }
        return true;
    }

    /**
     * The instant pattern ({@code yyyy-MM-ddTHH:mm:ss}, 1 to 9 fraction digits, {@code Z} or
     * {@code ±HH:mm}) plus what format date-time adds to it: the day exists in its month of the
     * proleptic Gregorian calendar, the offset is within ±18:00, and {@code -00:00} (RFC 3339's
     * "offset unknown") is refused.
     */
    static boolean isInstant(String s) {
        int n = s.length();
        if (n < 20 || !digits(s, 0, 4) || s.charAt(4) != '-' || !digits(s, 5, 2) || s.charAt(7) != '-'
                || !digits(s, 8, 2) || s.charAt(10) != 'T' || !digits(s, 11, 2) || s.charAt(13) != ':'
                || !digits(s, 14, 2) || s.charAt(16) != ':' || !digits(s, 17, 2)) {
            return false;
        }
        int year = number(s, 0, 4);
        int month = number(s, 5, 2);
        int day = number(s, 8, 2);
        if (month < 1 || month > 12 || day < 1 || day > Month.of(month).length(Year.isLeap(year))
                || number(s, 11, 2) > 23 || number(s, 14, 2) > 59 || number(s, 17, 2) > 59) {
            return false;
        }
        int i = 19;
        if (s.charAt(i) == '.') {
            int first = ++i;
            while (i < n && isDigit(s.charAt(i))) {
                i++;
            }
            if (i == first || i - first > 9 || i == n) {
                return false;
            }
        }
        char zone = s.charAt(i);
        if (zone == 'Z') {
            return i + 1 == n;
        }
        if ((zone != '+' && zone != '-') || n - i != 6 || !digits(s, i + 1, 2) || s.charAt(i + 3) != ':'
                || !digits(s, i + 4, 2)) {
            return false;
        }
        int hours = number(s, i + 1, 2);
        int minutes = number(s, i + 4, 2);
        int offset = hours * 60 + minutes;
        return hours <= 23 && minutes <= 59 && offset <= MAX_OFFSET_MINUTES && !(zone == '-' && offset == 0);
    }

    private static boolean isAsciiLetterOrDigit(char c) {
        return c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z' || isDigit(c);
    }

    private static boolean isUnitStart(char c) {
        return c >= 'A' && c <= 'Z' || c >= 'a' && c <= 'z' || c == MICRO_SIGN || c == GREEK_MU;
    }

    /** {@code [0-9]} is ASCII only, unlike {@link Character#isDigit}. */
    private static boolean isDigit(char c) {
        return c >= '0' && c <= '9';
    }

    private static boolean digits(String s, int from, int count) {
        for (int i = from; i < from + count; i++) {
            if (!isDigit(s.charAt(i))) {
                return false;
            }
        }
        return true;
    }

    private static int number(String s, int from, int count) {
        int value = 0;
        for (int i = from; i < from + count; i++) {
            value = value * 10 + (s.charAt(i) - '0');
        }
        return value;
    }
}
