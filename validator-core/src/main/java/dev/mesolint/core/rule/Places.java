package dev.mesolint.core.rule;

import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Subject;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.source.Location;
import java.util.List;
import java.util.Optional;

/**
 * Where the model rules' weekly and per-session findings point (the week or session as written) and which waivers
 * apply there, and how messages name the place. Session and set texts carry {@link Occurrences#WEEKS} for the week.
 */
public final class Places {
    private Places() {
    }

    public static Optional<Week> week(RuleContext context, int number) {
        return context.programme().weeks().stream().filter(w -> w.number() == number).findFirst();
    }

    /** The written session behind the figures: same day, preferring the one written at the same place. */
    public static Optional<Session> session(RuleContext context, int weekNumber, SessionMetrics figures) {
        List<Session> sameDay = week(context, weekNumber).map(Week::sessions).orElse(List.of()).stream()
                .filter(s -> s.day() == figures.day())
                .toList();
        return sameDay.stream().filter(s -> s.location().equals(figures.location())).findFirst()
                .or(() -> sameDay.stream().findFirst());
    }

    /** {@code day 1 (Upper A)}, or {@code day 1} for a session without a name. */
    public static String day(SessionMetrics session) {
        return "day " + session.day() + (session.name() == null || session.name().isBlank() ? ""
                : " (" + session.name() + ")");
    }

    /** {@code {weeks} day 1 (Upper A)}: how session findings name their session. */
    public static String session(SessionMetrics session) {
        return Occurrences.WEEKS + " " + day(session);
    }

    /** Reports at the week as written ({@code - week: 2}), with its waivers. */
    public static void reportWeek(RuleContext context, WeekMetrics week, String message, String fix) {
        reportWeek(context, week, message, fix, Facts.NONE);
    }

    /** As {@link #reportWeek(RuleContext, WeekMetrics, String, String)}, with what it is about (a muscle). */
    public static void reportWeek(RuleContext context, WeekMetrics week, String message, String fix, Facts facts) {
        Optional<Week> written = week(context, week.number());
        Location at = written.map(Week::location).orElse(week.location());
        context.report(at, written.map(Week::waivers).orElse(List.of()), context.severity(), message, fix,
                facts.withSubject(facts.subject().or(Subject.NONE.withWeeks(List.of(week.number())))));
    }

    /** Adds a finding at the session as written, with its waivers, at the rule's severity. */
    public static void addSession(RuleContext context, Occurrences found, WeekMetrics week, SessionMetrics session,
            String message, String fix) {
        addSession(context, found, week, session, message, fix, Facts.NONE);
    }

    /** As {@link #addSession(RuleContext, Occurrences, WeekMetrics, SessionMetrics, String, String)}, with facts. */
    public static void addSession(RuleContext context, Occurrences found, WeekMetrics week, SessionMetrics session,
            String message, String fix, Facts facts) {
        Optional<Session> written = session(context, week.number(), session);
        Location at = written.map(Session::location).orElse(session.location());
        found.add(week.number(), at, written.map(Session::waivers).orElse(List.of()), context.severity(), message,
                fix, facts.withSubject(facts.subject().or(Subject.NONE.withDay(session.day()))));
    }
}
