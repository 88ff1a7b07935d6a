package dev.mesolint.core.report;

import dev.mesolint.core.Mesolint;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.model.EffortAgreement;
import dev.mesolint.core.model.IntensityZone;
import dev.mesolint.core.model.LiftSession;
import dev.mesolint.core.model.LiftWeek;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.MuscleSession;
import dev.mesolint.core.model.MuscleWeek;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.io.IOException;
import java.io.Writer;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.RecordComponent;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Writes the model's figures as JSON, in the shape published as docs/schema/metrics.schema.json.
 *
 * <p>Fields may be added in later versions, never renamed. Numbers are rounded to three decimals; a figure the model
 * cannot know is {@code null}. Thread-safe.
 */
public final class MetricsJsonWriter {
    /** Version of the JSON shape, written as {@code format}. */
    public static final int FORMAT = 1;

    private static final JsonMapper MAPPER = JsonMapper.builder().build();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** Writes {@code files} as one pretty-printed JSON document followed by a newline. */
    public void write(List<FileMetrics> files, Writer out) throws IOException {
        out.write(MAPPER.writerWithDefaultPrettyPrinter().writeValueAsString(toJson(files)));
        out.write(System.lineSeparator());
        out.flush();
    }

    public ObjectNode toJson(List<FileMetrics> files) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("caution", Mesolint.CAUTION);
        ArrayNode programmes = root.putArray("programmes");
        for (FileMetrics file : files) {
            ObjectNode p = programmes.addObject();
            p.put("file", file.file());
            p.put("id", file.metrics().programmeId());
            p.put("units", file.metrics().units().symbol());
            ArrayNode deloads = p.putArray("deloadWeeks");
            file.metrics().deloadWeeks().forEach(deloads::add);
            p.set("parameters", parameters(file.metrics().parameters()));
            ArrayNode weeks = p.putArray("weeks");
            file.metrics().weeks().forEach(w -> week(weeks.addObject(), w));
        }
        return root;
    }

    private static void week(ObjectNode node, WeekMetrics week) {
        node.put("week", week.number());
        node.put("deload", week.deload());
        node.put("line", week.location().line());
        number(node, "volumeLoad", week.volumeLoad());
        ObjectNode muscles = node.putObject("muscles");
        week.muscles().forEach((muscle, m) -> muscleWeek(muscles.putObject(muscle.yamlName()), m));
        muscleNumbers(node.putObject("acuteChronic"), week.acuteChronic());
        muscleNumbers(node.putObject("change"), week.change());
        ArrayNode sessions = node.putArray("sessions");
        week.sessions().forEach(s -> session(sessions.addObject(), s));
        ArrayNode lifts = node.putArray("lifts");
        week.lifts().forEach(l -> liftWeek(lifts.addObject(), l));
    }

    private static void liftWeek(ObjectNode node, LiftWeek lift) {
        node.put("exercise", lift.exerciseId());
        node.put("sets", lift.sets());
        number(node, "reps", lift.reps());
        optional(node, "topSetFraction", lift.topSetFraction());
        optional(node, "topSetLoad", lift.topSetLoad());
        optional(node, "meanIntensity", lift.meanIntensity());
        optional(node, "volumeLoad", lift.volumeLoad());
        number(node, "heavyReps", lift.heavyReps());
        node.put("unknownIntensitySets", lift.unknownIntensitySets());
    }

    private static void liftSession(ObjectNode node, LiftSession lift) {
        node.put("exercise", lift.exerciseId());
        ArrayNode zones = node.putArray("zones");
        for (IntensityZone zone : lift.zones()) {
            ObjectNode z = zones.addObject();
            number(z, "from", zone.from());
            optional(z, "below", zone.below());
            z.put("sets", zone.sets());
            number(z, "reps", zone.reps());
        }
        number(node, "unknownIntensityReps", lift.unknownIntensityReps());
    }

    private static void muscleWeek(ObjectNode node, MuscleWeek m) {
        number(node, "hardSets", m.hardSets());
        number(node, "stimulatingReps", m.stimulatingReps());
        number(node, "stimulus", m.stimulus());
        node.put("hardSessions", m.hardSessions());
        ArrayNode gaps = node.putArray("gapsHours");
        m.gapsHours().forEach(g -> gaps.add(number(g)));
        number(node, "unknownEffortSets", m.unknownEffortSets());
    }

    private static void session(ObjectNode node, SessionMetrics session) {
        node.put("day", session.day());
        node.put("name", session.name());
        node.put("line", session.location().line());
        number(node, "minutes", session.minutes());
        number(node, "volumeLoad", session.volumeLoad());
        ObjectNode muscles = node.putObject("muscles");
        session.muscles().forEach((muscle, m) -> muscleSession(muscles.putObject(muscle.yamlName()), m));
        ArrayNode sets = node.putArray("sets");
        session.sets().forEach(s -> set(sets.addObject(), s));
        ArrayNode lifts = node.putArray("lifts");
        session.lifts().forEach(l -> liftSession(lifts.addObject(), l));
    }

    private static void muscleSession(ObjectNode node, MuscleSession m) {
        number(node, "hardSets", m.hardSets());
        number(node, "stimulatingReps", m.stimulatingReps());
        number(node, "rawStimulus", m.rawStimulus());
        number(node, "stimulus", m.stimulus());
        number(node, "unknownEffortSets", m.unknownEffortSets());
    }

    private static void set(ObjectNode node, SetMetrics set) {
        node.put("exercise", set.exerciseId());
        node.put("set", set.setNumber());
        node.put("round", set.round());
        node.put("line", set.location().line());
        node.put("column", set.location().column());
        node.put("pointer", set.location().pointer());
        number(node, "reps", set.reps());
        number(node, "repsUpper", set.effort().repsUpper());
        optional(node, "rir", set.rir());
        node.put("effortSource", EnumNames.of(set.effortSource()));
        node.put("hard", set.hard());
        number(node, "stimulatingReps", set.stimulatingReps());
        number(node, "extraReps", set.extraReps());
        if (set.primeMover().isPresent()) {
            node.put("primeMover", set.primeMover().get().yamlName());
        } else {
            node.putNull("primeMover");
        }
        number(node, "recruitment", set.recruitment());
        number(node, "stimulus", set.stimulus());
        number(node, "restAfterSeconds", set.restAfterSeconds());
        optional(node, "loadFraction", set.effort().loadFraction());
        optional(node, "volumeLoad", set.volumeLoad());
        agreement(node.putObject("agreement"), set.agreement());
        muscleNumbers(node.putObject("fatigueBefore"), set.fatigueBefore());
    }

    private static void agreement(ObjectNode node, EffortAgreement a) {
        node.put("status", EnumNames.of(a.status()));
        optional(node, "repsToFailure", a.repsToFailure());
        optional(node, "impliedRir", a.impliedRir());
        optional(node, "statedRir", a.statedRir());
        number(node, "tolerance", a.tolerance());
    }

    private static void muscleNumbers(ObjectNode node, Map<Muscle, Double> values) {
        values.forEach((muscle, v) -> number(node, muscle.yamlName(), v));
    }

    /** Every parameter by its record component name, so a report says which figures it was computed with. */
    private static ObjectNode parameters(ModelParameters params) {
        ObjectNode node = MAPPER.createObjectNode();
        for (RecordComponent c : ModelParameters.class.getRecordComponents()) {
            Object value = read(c, params);
            if (value instanceof Number n) {
                number(node, c.getName(), n.doubleValue());
            } else {
                node.put(c.getName(), value instanceof Enum<?> e ? EnumNames.of(e) : String.valueOf(value));
            }
        }
        return node;
    }

    private static Object read(RecordComponent component, ModelParameters params) {
        try {
            return component.getAccessor().invoke(params);
        } catch (IllegalAccessException | InvocationTargetException e) {
            throw new IllegalStateException("cannot read parameter " + component.getName(), e);
        }
    }

    private static void optional(ObjectNode node, String name, OptionalDouble value) {
        if (value.isPresent()) {
            number(node, name, value.getAsDouble());
        } else {
            node.putNull(name);
        }
    }

    private static void number(ObjectNode node, String name, double value) {
        node.set(name, number(value));
    }

    /** Whole values as integers ({@code 6}, not {@code 6.0}); others rounded to three decimals. */
    private static JsonNode number(double value) {
        double rounded = Numbers.round(value);
        if (rounded == Math.rint(rounded) && Math.abs(rounded) < 1e15) {
            return NODES.numberNode((long) rounded);
        }
        return NODES.numberNode(rounded);
    }
}
