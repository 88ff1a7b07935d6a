package dev.mesolint.core.review;

/** One session's estimated minutes before and after; a session added or removed has one side only. */
public record SessionChange(int week, int day, String name, Delta minutes) {
}
