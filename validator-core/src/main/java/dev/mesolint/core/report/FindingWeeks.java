package dev.mesolint.core.report;

import dev.mesolint.core.finding.Finding;
import java.util.Collections;
import java.util.SortedSet;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The weeks a finding is about: those its subject names, else those its message names first: {@code week 3}, {@code weeks 5-7},
 * {@code weeks 1-2, 4}. A message that names no week gives the empty set.
 */
final class FindingWeeks {
    private static final Pattern WEEKS = Pattern.compile(
            "\\bweeks? (\\d+(?:\\s*-\\s*\\d+)?(?:, \\d+(?:\\s*-\\s*\\d+)?)*)\\b", Pattern.CASE_INSENSITIVE);
    /** A range wider than any programme: guards against a message with a typo'd huge range. */
    private static final int MAX_SPAN = 520;

    private FindingWeeks() {
    }

    /** The weeks the finding's subject names (the framework's merged week range), else those its message names. */
    static SortedSet<Integer> of(Finding finding) {
        java.util.List<Integer> structured = finding.facts().subject().weeks();
        if (!structured.isEmpty()) {
            return Collections.unmodifiableSortedSet(new TreeSet<>(structured));
        }
        return of(finding.message());
    }

    static SortedSet<Integer> of(String message) {
        Matcher m = WEEKS.matcher(message);
        if (!m.find()) {
            return Collections.emptySortedSet();
        }
        SortedSet<Integer> weeks = new TreeSet<>();
        for (String part : m.group(1).split(",")) {
            String[] ends = part.trim().split("\\s*-\\s*");
            int from = Integer.parseInt(ends[0]);
            int to = ends.length > 1 ? Integer.parseInt(ends[1]) : from;
            for (int w = from; w <= to && w - from < MAX_SPAN; w++) {
                weeks.add(w);
            }
        }
        return Collections.unmodifiableSortedSet(weeks);
    }

    /** {@code Week 3}, {@code Weeks 5-7}, {@code Weeks 1-2, 4}. */
    static String title(SortedSet<Integer> weeks) {
        StringBuilder out = new StringBuilder(weeks.size() == 1 ? "Week " : "Weeks ");
        Integer start = null;
        Integer previous = null;
        for (int w : weeks) {
            if (previous != null && w == previous + 1) {
                previous = w;
                continue;
            }
            if (start != null) {
                out.append(run(start, previous)).append(", ");
            }
            start = w;
            previous = w;
        }
        return out.append(run(start, previous)).toString();
    }

    private static String run(int from, int to) {
        return from == to ? Integer.toString(from) : from + "-" + to;
    }
}
