package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.programme.Athlete;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.programme.Goal;
import dev.mesolint.core.programme.Level;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.ProgrammeInfo;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import tools.jackson.databind.JsonNode;

/**
 * Binds a schema-valid document to a {@link Programme}, parsing every value and expanding repeated weeks.
 *
 * <p>The schema has already checked shapes and patterns; what remains are value errors the schema cannot express
 * (a rep range written backwards, 2:75) and repeats of weeks that do not exist.
 */
public final class ProgrammeBinder {
    private static final Pattern LOAD_CHANGE = Pattern.compile("([+-]\\d+(?:\\.\\d+)?)\\s*(%|kg|lb)");

    /** The outcome: a programme when the document has no value errors, and the errors otherwise. */
    public record Result(Optional<Programme> programme, List<Violation> violations) {
    }

    public Result bind(LocatedDocument document) {
        BindContext ctx = new BindContext(document);
        JsonNode root = document.root();
        JsonNode header = root.get("programme");
        LoadUnit units = Optional.ofNullable(BindContext.text(header, "units")).map(LoadUnit::fromSymbol)
                .orElse(LoadUnit.KG);
        JsonNode minutes = header.get("session-minutes");
        ProgrammeInfo info = new ProgrammeInfo(header.get("id").asString(), BindContext.text(header, "title"),
                BindContext.text(header, "author"),
                CatalogueEntryBinder.named(Level.class, header.get("level").asString()),
                CatalogueEntryBinder.named(Goal.class, header.get("goal").asString()),
                minutes == null ? Optional.empty() : Optional.of(minutes.doubleValue()), units,
                ctx.value(header, "/programme", "plate-increment", Load::parse).map(l -> (Load.Absolute) l),
                ctx.at("/programme"));
        Athlete athlete = athlete(ctx, root.get("athlete"));
        List<Exercise> local = CatalogueEntryBinder.readAll(ctx, root.get("exercises"), "/exercises", "programme");
        List<Waiver> fileWaivers = WaiverBinder.read(ctx, root, "", List.of(), true);
        List<WeekDraft> drafts = weeks(ctx, root.get("weeks"));
        var weeks = new WeekExpander(ctx).expand(drafts);
        athlete = OneRepMaxSchedule.withTests(ctx, athlete, root.path("athlete").get("one-rep-max"), weeks);
        List<Violation> violations = ctx.violations();
        Optional<Programme> programme = violations.isEmpty()
                ? Optional.of(new Programme(info, athlete, local, weeks, fileWaivers))
                : Optional.empty();
        return new Result(programme, violations);
    }

    private static Athlete athlete(BindContext ctx, JsonNode node) {
        if (node == null) {
            return Athlete.NONE;
        }
        Map<String, Load.Absolute> maxes = OneRepMaxSchedule.firstStated(ctx, node.get("one-rep-max"));
        List<AthleteConstraint> constraints = new ArrayList<>();
        JsonNode list = node.get("constraints");
        for (int i = 0; list != null && i < list.size(); i++) {
            JsonNode c = list.get(i);
            String pointer = "/athlete/constraints/" + i;
            Optional<Region> region = Optional.ofNullable(BindContext.text(c, "region"))
                    .map(r -> CatalogueEntryBinder.named(Region.class, r));
            Optional<Double> maxLoad = ctx.value(c, pointer, "max-load", Load::parse)
                    .map(l -> ((Load.Relative) l).fraction());
            List<String> avoid = new ArrayList<>();
            if (c.has("avoid")) {
                c.get("avoid").forEach(a -> avoid.add(a.asString()));
            }
            if (c.has("region") != c.has("max-load")) {
                ctx.reject(pointer, "a region constraint needs both region and max-load",
                        "write region: shoulder and max-load: 70%");
            }
            constraints.add(new AthleteConstraint(region, maxLoad, avoid, c.get("reason").asString(), ctx.at(pointer)));
        }
        return new Athlete(maxes, constraints);
    }

    private static List<WeekDraft> weeks(BindContext ctx, JsonNode list) {
        List<WeekDraft> drafts = new ArrayList<>();
        SessionBinder sessions = new SessionBinder(ctx);
        for (int i = 0; i < list.size(); i++) {
            JsonNode w = list.get(i);
            String pointer = Pointers.child("/weeks", i);
            List<Waiver> waivers = WaiverBinder.read(ctx, w, pointer, List.of(), false);
            Optional<Integer> repeat = w.has("repeat") ? Optional.of(w.get("repeat").asInt()) : Optional.empty();
            Adjustment adjust = adjustment(ctx, w.get("adjust"), Pointers.child(pointer, "adjust"));
            if (repeat.isEmpty() && w.has("adjust")) {
                ctx.reject(Pointers.child(pointer, "adjust"), "adjust only works with repeat",
                        "add repeat: N to start from week N, or write the changes into the sessions");
            }
            JsonNode deload = w.get("deload");
            drafts.add(new WeekDraft(w.get("week").asInt(), deload != null && deload.asBoolean(), repeat, adjust,
                    sessions.sessions(w.get("sessions"), Pointers.child(pointer, "sessions"), waivers),
                    ctx.at(list, i, pointer), ctx.at(w, "week", Pointers.child(pointer, "week")),
                    ctx.at(w, "repeat", Pointers.child(pointer, "repeat")), waivers));
        }
        return drafts;
    }

    private static Adjustment adjustment(BindContext ctx, JsonNode a, String pointer) {
        if (a == null) {
            return Adjustment.NONE;
        }
        double rir = a.path("rir").asDouble(0) - a.path("rpe").asDouble(0);
        double points = 0;
        double weight = 0;
        LoadUnit unit = LoadUnit.KG;
        if (a.has("load")) {
            Matcher m = LOAD_CHANGE.matcher(a.get("load").asString().trim());
            if (m.matches()) {
                double amount = Double.parseDouble(m.group(1));
                if (m.group(2).equals("%")) {
                    points = amount;
                } else {
                    weight = amount;
                    unit = LoadUnit.fromSymbol(m.group(2));
                }
            } else {
                ctx.reject(Pointers.child(pointer, "load"), new InvalidValueException("'" + a.get("load").asString()
                        + "' is not a load change", "write +2.5% or -5kg"));
            }
        }
        var only = new HashSet<String>();
        if (a.has("only")) {
            a.get("only").forEach(id -> only.add(id.asString()));
        }
        return new Adjustment(rir, a.path("sets").asInt(0), a.path("reps").asInt(0), points, weight, unit,
                java.util.Set.copyOf(only));
    }
}
