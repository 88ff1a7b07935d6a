package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.ExerciseKind;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Named;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.catalogue.Skill;
import dev.mesolint.core.catalogue.Stability;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import tools.jackson.databind.JsonNode;

/** Reads catalogue entries (schema-valid) from a programme's {@code exercises} or a catalogue file. */
final class CatalogueEntryBinder {
    private CatalogueEntryBinder() {
    }

    static List<Exercise> readAll(BindContext ctx, JsonNode list, String pointer, String origin) {
        List<Exercise> out = new ArrayList<>();
        if (list == null || !list.isArray()) {
            return out;
        }
        for (int i = 0; i < list.size(); i++) {
            out.add(read(list.get(i), ctx, Pointers.child(pointer, i), origin));
        }
        return out;
    }

    private static Exercise read(JsonNode e, BindContext ctx, String pointer, String origin) {
        Map<Muscle, Double> muscles = new LinkedHashMap<>();
        for (Map.Entry<String, JsonNode> m : e.get("muscles").properties()) {
            muscles.put(named(Muscle.class, m.getKey()), m.getValue().doubleValue());
        }
        Set<Region> regions = EnumSet.noneOf(Region.class);
        e.get("regions").forEach(r -> regions.add(named(Region.class, r.asString())));
        return new Exercise(e.get("id").asString(), e.get("name").asString(),
                named(ExerciseKind.class, e.get("kind").asString()),
                named(MovementPattern.class, e.get("pattern").asString()),
                named(Stability.class, e.get("stability").asString()), named(Skill.class, e.get("skill").asString()),
                muscles, regions, e.path("ballistic").asBoolean(false),
                Optional.ofNullable(BindContext.text(e, "role")).map(r -> named(Role.class, r)), origin, ctx.at(pointer));
    }

    /** Schema enums guarantee the name exists. */
    static <E extends Enum<E> & Named> E named(Class<E> type, String name) {
        return Named.byYamlName(type, name)
                .orElseThrow(() -> new IllegalStateException("schema let through " + type.getSimpleName() + " " + name));
    }
}
