package dev.mesolint.core.report;

import java.util.List;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/** One CSV record, quoted as RFC 4180 asks (fields with commas, quotes or line breaks in double quotes). */
final class CsvRow {
    private CsvRow() {
    }

    static String of(List<String> fields) {
        return fields.stream().map(CsvRow::quote).collect(Collectors.joining(",")) + "\r\n";
    }

    static String number(double value) {
        return Numbers.text(value);
    }

    /** An empty field for a figure the model cannot know. */
    static String number(OptionalDouble value) {
        return value.isPresent() ? Numbers.text(value.getAsDouble()) : "";
    }

    private static String quote(String field) {
        if (field == null) {
            return "";
        }
        if (field.contains(",") || field.contains("\"") || field.contains("\n") || field.contains("\r")) {
            return "\"" + field.replace("\"", "\"\"") + "\"";
        }
        return field;
    }
}
