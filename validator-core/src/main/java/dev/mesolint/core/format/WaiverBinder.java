package dev.mesolint.core.format;

import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.List;
import tools.jackson.databind.JsonNode;

/** Reads {@code waive:} lists. */
final class WaiverBinder {
    private WaiverBinder() {
    }

    /** The waivers written on {@code node}, after those inherited from its parents. */
    static List<Waiver> read(BindContext ctx, JsonNode node, String pointer, List<Waiver> inherited, boolean wholeFile) {
        JsonNode list = node.get("waive");
        if (list == null || !list.isArray() || list.isEmpty()) {
            return inherited;
        }
        List<Waiver> all = new ArrayList<>(inherited);
        String base = Pointers.child(pointer, "waive");
        for (int i = 0; i < list.size(); i++) {
            JsonNode w = list.get(i);
            all.add(new Waiver(w.get("rule").asString(), w.get("reason").asString(), ctx.at(list, i, Pointers.child(base, i)),
                    wholeFile));
        }
        return List.copyOf(all);
    }
}
