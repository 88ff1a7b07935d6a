package dev.mesolint.core.format;

import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.databind.JsonNode;

/** Reads sessions, their work items and sets (schema-valid input). */
final class SessionBinder {
    /** The keys a set takes from its entry unless it writes them itself; their places go with the values. */
    private static final List<String> SET_KEYS = List.of("reps", "rir", "rpe", "load", "rest", "tempo", "technique");
    private static final List<String> EFFORT_KEYS = List.of("rir", "rpe", "load");

    private final BindContext ctx;

    SessionBinder(BindContext ctx) {
        this.ctx = ctx;
    }

    List<Session> sessions(JsonNode list, String pointer, List<Waiver> inherited) {
        List<Session> out = new ArrayList<>();
        if (list == null) {
            return out;
        }
        for (int i = 0; i < list.size(); i++) {
            out.add(session(list.get(i), Pointers.child(pointer, i), inherited));
        }
        return out;
    }

    private Session session(JsonNode s, String pointer, List<Waiver> inherited) {
        List<Waiver> waivers = WaiverBinder.read(ctx, s, pointer, inherited, false);
        List<WorkItem> work = new ArrayList<>();
        JsonNode items = s.get("work");
        String workPointer = Pointers.child(pointer, "work");
        for (int i = 0; i < items.size(); i++) {
            JsonNode item = items.get(i);
            String itemPointer = Pointers.child(workPointer, i);
            work.add(item.has("superset")
                    ? superset(item.get("superset"), Pointers.child(itemPointer, "superset"), waivers)
                    : exercise(item, itemPointer, waivers));
        }
        return new Session(s.get("day").asInt(), BindContext.text(s, "name"), work, ctx.at(pointer),
                ctx.at(Pointers.child(pointer, "day")), waivers);
    }

    private ExerciseWork exercise(JsonNode e, String pointer, List<Waiver> inherited) {
        List<Waiver> waivers = WaiverBinder.read(ctx, e, pointer, inherited, false);
        SetDefaults defaults = defaults(e, pointer);
        List<SetPrescription> sets = new ArrayList<>();
        JsonNode setsNode = e.get("sets");
        if (setsNode != null && setsNode.isArray()) {
            String setsPointer = Pointers.child(pointer, "sets");
            for (int i = 0; i < setsNode.size(); i++) {
                String setPointer = Pointers.child(setsPointer, i);
                JsonNode set = setsNode.get(i);
                sets.add(defaults.override(defaults(set, setPointer)).toSet(i + 1, ctx.at(setPointer),
                        WaiverBinder.read(ctx, set, setPointer, waivers, false), ctx, setPointer));
            }
        } else {
            int count = setsNode == null ? 1 : setsNode.asInt();
            for (int i = 1; i <= count; i++) {
                // A technique written on the entry belongs to its last set only.
                SetDefaults forSet = i == count ? defaults : defaults.withoutTechnique();
                sets.add(forSet.toSet(i, ctx.at(pointer), waivers, ctx, pointer));
            }
        }
        JsonNode warmUp = e.get("warm-up");
        return new ExerciseWork(e.get("exercise").asString(), warmUp == null ? 0 : warmUp.asInt(), sets, ctx.at(pointer),
                ctx.at(Pointers.child(pointer, "exercise")), waivers);
    }

    private Superset superset(JsonNode s, String pointer, List<Waiver> inherited) {
        List<Waiver> waivers = WaiverBinder.read(ctx, s, pointer, inherited, false);
        int rounds = s.get("rounds").asInt();
        List<ExerciseWork> items = new ArrayList<>();
        JsonNode list = s.get("items");
        String itemsPointer = Pointers.child(pointer, "items");
        for (int i = 0; i < list.size(); i++) {
            String itemPointer = Pointers.child(itemsPointer, i);
            JsonNode item = list.get(i);
            List<Waiver> itemWaivers = WaiverBinder.read(ctx, item, itemPointer, waivers, false);
            SetDefaults defaults = defaults(item, itemPointer);
            List<SetPrescription> sets = new ArrayList<>();
            for (int round = 1; round <= rounds; round++) {
                sets.add(defaults.toSet(round, ctx.at(itemPointer), itemWaivers, ctx, itemPointer));
            }
            items.add(new ExerciseWork(item.get("exercise").asString(), 0, sets, ctx.at(itemPointer),
                    ctx.at(Pointers.child(itemPointer, "exercise")), itemWaivers));
        }
        return new Superset(rounds, ctx.value(s, pointer, "rest", Durations::parse), items, ctx.at(pointer), waivers);
    }

    private SetDefaults defaults(JsonNode node, String pointer) {
        Map<String, Location> written = new HashMap<>();
        for (String key : SET_KEYS) {
            if (node.has(key)) {
                written.put(key, ctx.at(Pointers.child(pointer, key)));
            }
        }
        return new SetDefaults(ctx.value(node, pointer, "reps", RepTarget::parse),
                ctx.value(node, pointer, "rir", RirRange::parse), ctx.value(node, pointer, "rpe", Rpe::parse),
                ctx.value(node, pointer, "load", Load::parse), ctx.value(node, pointer, "rest", Durations::parse),
                ctx.value(node, pointer, "tempo", Tempo::parse),
                Optional.ofNullable(BindContext.text(node, "technique"))
                        .map(t -> CatalogueEntryBinder.named(Technique.class, t)), written);
    }

    /** Values written on an exercise entry that its sets inherit unless a set overrides them. */
    private record SetDefaults(Optional<RepTarget> reps, Optional<RirRange> rir, Optional<Rpe> rpe, Optional<Load> load,
            Optional<java.time.Duration> rest, Optional<Tempo> tempo, Optional<Technique> technique,
            Map<String, Location> written) {

        SetDefaults override(SetDefaults set) {
            // An effort stated on the set replaces every effort form of the entry, so that the two never mix.
            boolean setStatesEffort = set.rir.isPresent() || set.rpe.isPresent() || set.load.isPresent();
            Map<String, Location> places = new HashMap<>(written);
            if (setStatesEffort) {
                EFFORT_KEYS.forEach(places::remove);
            }
            places.putAll(set.written);
            return new SetDefaults(set.reps.or(() -> reps),
                    setStatesEffort ? set.rir : rir, setStatesEffort ? set.rpe : rpe,
                    setStatesEffort ? set.load : load, set.rest.or(() -> rest),
                    set.tempo.or(() -> tempo), set.technique.or(() -> technique), places);
        }

        SetDefaults withoutTechnique() {
            Map<String, Location> places = new HashMap<>(written);
            places.remove("technique");
            return new SetDefaults(reps, rir, rpe, load, rest, tempo, Optional.empty(), places);
        }

        SetPrescription toSet(int number, Location location, List<Waiver> waivers,
                BindContext ctx, String pointer) {
            RepTarget repTarget = reps.orElseGet(() -> {
                ctx.reject(pointer, "the set has no reps", "add reps: 8, a range such as reps: 8-12, or reps: amrap");
                return RepTarget.exactly(1);
            });
            return new SetPrescription(number, repTarget, rir, rpe, load, rest, tempo, technique, location, waivers,
                    written);
        }
    }
}
