package dev.mesolint.core.catalogue;

import java.util.HashMap;
import java.util.Map;

/** Each {@link Named} enum's constants by written name, made once per type: names are read for every entry. */
final class NamedConstants {
    private static final ClassValue<Map<String, Object>> BY_NAME = new ClassValue<>() {
        @Override
        protected Map<String, Object> computeValue(Class<?> type) {
            Map<String, Object> byName = new HashMap<>();
            for (Object constant : type.getEnumConstants()) {
                byName.putIfAbsent(((Named) constant).yamlName(), constant); // the first, as a search in order finds
            }
            return Map.copyOf(byName);
        }
    };

    private NamedConstants() {
    }

    static Map<String, Object> of(Class<?> type) {
        return BY_NAME.get(type);
    }
}
