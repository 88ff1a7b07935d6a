package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.programme.ExerciseWork;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Superset;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.programme.WorkItem;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Distance;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import dev.mesolint.core.yaml.Pointers;
import java.time.Duration;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import tools.jackson.databind.JsonNode;

/** Reads sessions, their work items and sets (schema-valid input). */
final class SessionBinder {
    /** The keys a set takes from its entry unless it writes them itself; their places go with the values. */
    private static final List<String> SET_KEYS = List.of("reps", "hold", "distance", "test", "rir", "rpe", "load",
            "rest", "tempo", "technique");
    private static final List<String> EFFORT_KEYS = List.of("rir", "rpe", "load");
    private static final List<String> AMOUNT_KEYS = List.of("reps", "hold", "distance");

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
            String sessionPointer = Pointers.child(pointer, i);
            out.add(session(list.get(i), sessionPointer, ctx.at(list, i, sessionPointer), inherited));
        }
        return out;
    }

    private Session session(JsonNode s, String pointer, Location at, List<Waiver> inherited) {
        List<Waiver> waivers = WaiverBinder.read(ctx, s, pointer, inherited, false);
        List<WorkItem> work = new ArrayList<>();
        JsonNode items = s.get("work");
        String workPointer = Pointers.child(pointer, "work");
        for (int i = 0; i < items.size(); i++) {
            JsonNode item = items.get(i);
            String itemPointer = Pointers.child(workPointer, i);
            if (item.has("superset")) {
                String supersetPointer = Pointers.child(itemPointer, "superset");
                work.add(superset(item.get("superset"), supersetPointer, ctx.at(item, "superset", supersetPointer),
                        waivers));
            } else {
                work.add(exercise(item, itemPointer, ctx.at(items, i, itemPointer), waivers));
            }
        }
        return new Session(s.get("day").asInt(), BindContext.text(s, "name"), work, at,
                ctx.at(s, "day", Pointers.child(pointer, "day")), waivers);
    }

    private ExerciseWork exercise(JsonNode e, String pointer, Location at, List<Waiver> inherited) {
        List<Waiver> waivers = WaiverBinder.read(ctx, e, pointer, inherited, false);
        SetDefaults defaults = defaults(e, pointer);
        List<SetPrescription> sets = new ArrayList<>();
        JsonNode setsNode = e.get("sets");
        if (setsNode != null && setsNode.isArray()) {
            String setsPointer = Pointers.child(pointer, "sets");
            for (int i = 0; i < setsNode.size(); i++) {
                String setPointer = Pointers.child(setsPointer, i);
                JsonNode set = setsNode.get(i);
                sets.add(defaults.override(defaults(set, setPointer)).toSet(i + 1, ctx.at(setsNode, i, setPointer),
                        WaiverBinder.read(ctx, set, setPointer, waivers, false), ctx, setPointer));
            }
        } else {
            int count = setsNode == null ? 1 : setsNode.asInt();
            SetDefaults beforeLast = defaults.beforeLastSet();
            for (int i = 1; i <= count; i++) {
                // A technique, and the "as many as possible" of 5+, written on the entry belong to its last set.
                SetDefaults forSet = i == count ? defaults : beforeLast;
                sets.add(forSet.toSet(i, at, waivers, ctx, pointer));
            }
        }
        JsonNode warmUp = e.get("warm-up");
        return new ExerciseWork(e.get("exercise").asString(), warmUp == null ? 0 : warmUp.asInt(), sets, at,
                ctx.at(e, "exercise", Pointers.child(pointer, "exercise")), waivers, role(e));
    }

    private Superset superset(JsonNode s, String pointer, Location at, List<Waiver> inherited) {
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
            Location itemAt = ctx.at(list, i, itemPointer);
            List<SetPrescription> sets = new ArrayList<>();
            SetDefaults beforeLast = defaults.beforeLastSet();
            for (int round = 1; round <= rounds; round++) {
                SetDefaults forRound = round == rounds ? defaults : beforeLast;
                sets.add(forRound.toSet(round, itemAt, itemWaivers, ctx, itemPointer));
            }
            items.add(new ExerciseWork(item.get("exercise").asString(), 0, sets, itemAt,
                    ctx.at(item, "exercise", Pointers.child(itemPointer, "exercise")), itemWaivers, role(item)));
        }
        return new Superset(rounds, ctx.value(s, pointer, "rest", Durations::parse), items, at, waivers);
    }

    private static Optional<Role> role(JsonNode node) {
        return Optional.ofNullable(BindContext.text(node, "role")).map(r -> CatalogueEntryBinder.named(Role.class, r));
    }

    private SetDefaults defaults(JsonNode node, String pointer) {
        Map<String, Location> written = new HashMap<>();
        for (String key : SET_KEYS) {
            if (node.has(key)) {
                written.put(key, ctx.at(node, key, Pointers.child(pointer, key)));
            }
        }
        Optional<RepTarget> reps = ctx.value(node, pointer, "reps", RepTarget::parse);
        Optional<Duration> hold = ctx.value(node, pointer, "hold", Durations::parseHold);
        Optional<Distance> distance = ctx.value(node, pointer, "distance", Distance::parse);
        boolean test = node.has("test");
        int amounts = (node.has("reps") ? 1 : 0) + (node.has("hold") ? 1 : 0) + (node.has("distance") ? 1 : 0);
        if (amounts > 1) {
            ctx.reject(pointer, "a set is reps, a timed hold or a distance, not several of them",
                    "keep one of reps: 8, hold: 30s or distance: 40m");
        }
        if (test && (node.has("hold") || node.has("distance"))) {
            ctx.reject(Pointers.child(pointer, "test"), "a 1RM test is a single, not a hold or a carry",
                    "write the test as reps: 1, test: 1rm");
        }
        if (test && reps.isPresent() && (reps.get().amrap() || reps.get().max() != 1)) {
            ctx.reject(Pointers.child(pointer, "reps"), "a 1RM test is one rep, not " + reps.get(),
                    "write reps: 1 with test: 1rm, or estimate the 1RM from a rep set without test:");
        }
        return new SetDefaults(test && reps.isEmpty() ? Optional.of(RepTarget.exactly(1)) : reps, hold, distance,
                ctx.value(node, pointer, "rir", RirRange::parse), ctx.value(node, pointer, "rpe", Rpe::parse),
                ctx.value(node, pointer, "load", Load::parse), ctx.value(node, pointer, "rest", Durations::parse),
                ctx.value(node, pointer, "tempo", Tempo::parse),
                Optional.ofNullable(BindContext.text(node, "technique"))
                        .map(t -> CatalogueEntryBinder.named(Technique.class, t)), test, amounts > 0,
                Map.copyOf(written));
    }

    /** Values written on an exercise entry that its sets inherit unless a set overrides them. */
    private record SetDefaults(Optional<RepTarget> reps, Optional<Duration> hold, Optional<Distance> distance,
            Optional<RirRange> rir, Optional<Rpe> rpe, Optional<Load> load, Optional<Duration> rest,
            Optional<Tempo> tempo, Optional<Technique> technique, boolean test, boolean amountWritten,
            Map<String, Location> written) {

        SetDefaults override(SetDefaults set) {
            // An effort stated on the set replaces every effort form of the entry, so that the two never mix;
            // so does the amount of work: reps, a hold or a distance.
            boolean setStatesEffort = set.rir.isPresent() || set.rpe.isPresent() || set.load.isPresent();
            boolean setStatesAmount = set.reps.isPresent() || set.hold.isPresent() || set.distance.isPresent();
            Map<String, Location> places = new HashMap<>(written);
            if (setStatesEffort) {
                EFFORT_KEYS.forEach(places::remove);
            }
            if (setStatesAmount) {
                AMOUNT_KEYS.forEach(places::remove);
            }
            places.putAll(set.written);
            places = Map.copyOf(places);
            return new SetDefaults(setStatesAmount ? set.reps : reps, setStatesAmount ? set.hold : hold,
                    setStatesAmount ? set.distance : distance,
                    setStatesEffort ? set.rir : rir, setStatesEffort ? set.rpe : rpe,
                    setStatesEffort ? set.load : load, set.rest.or(() -> rest),
                    set.tempo.or(() -> tempo), set.technique.or(() -> technique), set.test || test,
                    set.amountWritten || amountWritten, places);
        }

        /** The entry's values for a set before its last: no technique, and {@code 5+} read as 5. */
        SetDefaults beforeLastSet() {
            return new SetDefaults(reps.map(RepTarget::withoutAmrap), hold, distance, rir, rpe, load, rest, tempo,
                    Optional.empty(), test, amountWritten, withoutTechnique());
        }

        private Map<String, Location> withoutTechnique() {
            if (!written.containsKey("technique")) {
                return written;
            }
            Map<String, Location> places = new HashMap<>(written);
            places.remove("technique");
            return Map.copyOf(places);
        }

        SetPrescription toSet(int number, Location location, List<Waiver> waivers,
                BindContext ctx, String pointer) {
            RepTarget repTarget = reps.orElseGet(() -> {
                // a bad value written for reps, hold or distance is reported once, where it is written
                if (!amountWritten && !test) {
                    ctx.reject(pointer, "the set has no reps",
                            "add reps: 8, a range such as reps: 8-12, reps: 5+, reps: amrap, hold: 30s or distance: 40m");
                }
                // A hold or a carry is one continuous effort.
                return RepTarget.exactly(1);
            });
            return new SetPrescription(number, repTarget, rir, rpe, load, rest, tempo, technique, hold, distance, test,
                    location, waivers, written);
        }
    }
}
