package dev.mesolint.core.rules;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.rule.Ranges;
import java.util.Collection;
import java.util.TreeSet;

/** Number and list wording shared by the model rules' messages. */
final class Texts {
    private Texts() {
    }

    /** One decimal, without a trailing {@code .0}: {@code 6.4}, {@code 12}. */
    static String num(double value) {
        double rounded = Math.round(value * 10) / 10.0;
        return rounded == Math.rint(rounded) ? Long.toString((long) rounded) : Double.toString(rounded);
    }

    /** A share as a percentage with at most one decimal: {@code 80%}, {@code 87.5%}. */
    /** {@code 90 s}, {@code 2.5 s}: a duration in seconds as messages show it. */
    static String seconds(double s) {
        return (s == Math.rint(s) ? Long.toString((long) s) : String.format(java.util.Locale.ROOT, "%.1f", s)) + " s";
    }

    static String percent(double fraction) {
        return num(fraction * 100) + "%";
    }

    /** A share rounded down to the 2.5 % steps loads are written in. */
    static String loadStepDown(double fraction) {
        return num(Math.floor(fraction * 1000 / 25) * 2.5) + "%";
    }

    /** {@code a 7-rep effort}, {@code an 11-rep effort}: the article for a number read aloud. */
    static String article(String number) {
        boolean vowel = number.startsWith("8") || elevenOrEighteen(number);
        return vowel ? "an" : "a";
    }

    /** 11 or 18, with or without decimals ({@code 11}, {@code 18.5}): said with a vowel first. */
    private static boolean elevenOrEighteen(String number) {
        int n = number.length();
        if (n < 2 || number.charAt(0) != '1' || number.charAt(1) != '1' && number.charAt(1) != '8') {
            return false;
        }
        if (n == 2) {
            return true;
        }
        if (number.charAt(2) != '.' || n == 3) {
            return false;
        }
        for (int i = 3; i < n; i++) {
            if (number.charAt(i) < '0' || number.charAt(i) > '9') {
                return false;
            }
        }
        return true;
    }

    /** {@code a 7-rep effort}, {@code an 11-rep effort}: reps to failure of a set, reps plus reserve. */
    static String effort(double repsToFailure) {
        String n = num(repsToFailure);
        return article(n) + " " + n + "-rep effort";
    }

    static String muscle(Muscle muscle) {
        return muscle.yamlName();
    }

    /** {@code set 2}, {@code sets 1-3}, {@code sets 1, 3-4}. */
    static String sets(Collection<Integer> numbers) {
        return Ranges.sets(numbers);
    }

    /** {@code week 2}, {@code weeks 1-4}. */
    static String weeks(Collection<Integer> numbers) {
        return Ranges.weeks(numbers);
    }

    /** Consecutive runs joined with a hyphen: {@code 1-3, 5}. */
    static String ranges(TreeSet<Integer> sorted) {
        return Ranges.of(sorted);
    }

    /** {@code 1 set}, {@code 2.5 sets}. */
    static String sets(double count) {
        return num(count) + (count == 1 ? " hard set" : " hard sets");
    }
}
