package dev.mesolint.core.report;

import java.util.Locale;

/** Enum constants as reports write them: lower case with hyphens, like the programme format. */
final class EnumNames {
    private EnumNames() {
    }

    static String of(Enum<?> value) {
        return value.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
