package dev.mesolint.core.source;

/** A place where a document breaks the programme format: what is wrong and how to fix it. */
public record Violation(Location location, String message, String hint) {
}
