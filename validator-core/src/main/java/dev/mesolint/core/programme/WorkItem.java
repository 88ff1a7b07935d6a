package dev.mesolint.core.programme;

/** One entry of a session's {@code work} list: an exercise, or a superset of exercises done back to back. */
public sealed interface WorkItem extends Located permits ExerciseWork, Superset {
}
