package dev.mesolint.core.catalogue;

import java.util.Locale;
import java.util.Optional;

/** An enum written in programmes by its lower-case, hyphenated name ({@code front-delts}, {@code horizontal-push}). */
public interface Named {

    /** The name as written in YAML. */
    default String yamlName() {
        return ((Enum<?>) this).name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static <E extends Enum<E> & Named> Optional<E> byYamlName(Class<E> type, String name) {
        return name == null ? Optional.empty() : Optional.ofNullable(type.cast(NamedConstants.of(type).get(name)));
    }
}
