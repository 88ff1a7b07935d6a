package dev.mesolint.core.rule;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.TreeSet;

/** How findings name numbered things: {@code week 2}, {@code weeks 1-4}, {@code sets 1, 3-4}. */
public final class Ranges {
    private Ranges() {
    }

    /** {@code set 2}, {@code sets 1-3}, {@code sets 1, 3-4}. */
    public static String sets(Collection<Integer> numbers) {
        TreeSet<Integer> sorted = new TreeSet<>(numbers);
        return (sorted.size() == 1 ? "set " : "sets ") + of(sorted);
    }

    /** {@code week 2}, {@code weeks 1-4}. */
    public static String weeks(Collection<Integer> numbers) {
        TreeSet<Integer> sorted = new TreeSet<>(numbers);
        return (sorted.size() == 1 ? "week " : "weeks ") + of(sorted);
    }

    /** Consecutive runs joined with a hyphen: {@code 1-3, 5}. */
    public static String of(Collection<Integer> numbers) {
        List<String> parts = new ArrayList<>();
        Integer start = null;
        Integer previous = null;
        for (int n : new TreeSet<>(numbers)) {
            if (previous != null && n == previous + 1) {
                previous = n;
                continue;
            }
            if (start != null) {
                parts.add(run(start, previous));
            }
            start = n;
            previous = n;
        }
        if (start != null) {
            parts.add(run(start, previous));
        }
        return String.join(", ", parts);
    }

    private static String run(int from, int to) {
        return from == to ? Integer.toString(from) : from + "-" + to;
    }
}
