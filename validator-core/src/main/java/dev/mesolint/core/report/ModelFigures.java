package dev.mesolint.core.report;

import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.rule.RuleSettings;
import dev.mesolint.core.rule.WeeklyVolumeLimit;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.BiFunction;

/**
 * Report figures read from the training model's {@link ProgrammeMetrics}, computed once per file by the checker.
 *
 * <p>A set's undiscounted stimulus is what its stimulating reps would give from a fresh state (reps / K); the
 * discounted one is the model's fatigue-adjusted stimulus, so the difference is what the sets before it cost.
 */
public final class ModelFigures implements ReportFigures {
    private final BiFunction<String, String, VolumeBounds> bounds;

    /** @param bounds the weekly floor and cap for (profile, muscle) */
    public ModelFigures(BiFunction<String, String, VolumeBounds> bounds) {
        this.bounds = bounds;
    }

    /**
     * Figures whose floor and cap are the {@code weekly-volume-min} and {@code weekly-volume-max} limits of each
     * file's profile, so the chart shows the lines the rules check against (none where a rule is off).
     */
    public static ModelFigures underProfiles(RuleConfiguration configuration,
            List<? extends RuleDefinition> rules) {
        List<? extends RuleDefinition> limits = rules.stream().filter(r -> r instanceof WeeklyVolumeLimit).toList();
        return new ModelFigures((profile, muscleName) -> {
            Muscle muscle = dev.mesolint.core.catalogue.Named.byYamlName(Muscle.class, muscleName).orElseThrow();
            double floor = 0;
            double cap = Double.MAX_VALUE;
            for (RuleDefinition rule : limits) {
                RuleSettings s = configuration.settingsFor(profile, rule);
                if (s.severity() != Severity.OFF) {
                    WeeklyVolumeLimit limit = (WeeklyVolumeLimit) rule;
                    floor = Math.max(floor, limit.weeklyFloor(s, muscle).orElse(0));
                    cap = Math.min(cap, limit.weeklyCap(s, muscle).orElse(Double.MAX_VALUE));
                }
            }
            return cap == Double.MAX_VALUE ? new VolumeBounds(floor, Math.max(floor, VolumeBounds.DEFAULTS.cap()))
                    : new VolumeBounds(floor, cap);
        });
    }

    @Override
    public boolean has(FileReport file) {
        return file.metrics().isPresent() && file.programme().isPresent();
    }

    @Override
    public Optional<ProgrammeFigures> of(FileReport file) {
        if (!has(file)) {
            return Optional.empty();
        }
        ProgrammeMetrics metrics = file.metrics().get();
        List<WeekFigures> weeks = metrics.weeks().stream().map(w -> week(w, metrics)).toList();
        OptionalDouble budget = file.programme().get().info().sessionMinutes().map(OptionalDouble::of)
                .orElse(OptionalDouble.empty());
        String profile = file.profile();
        // The floor applies only to muscles the programme trains directly, as the weekly-volume-min rule reads them;
        // muscles trained only as synergists are not expected to reach it.
        java.util.Set<String> direct = new java.util.HashSet<>();
        metrics.directlyTrained().keySet().forEach(m -> direct.add(m.yamlName()));
        return Optional.of(new ProgrammeFigures() {
            @Override
            public String file() {
                return file.displayPath();
            }

            @Override
            public String programmeId() {
                return metrics.programmeId();
            }

            @Override
            public List<WeekFigures> weeks() {
                return weeks;
            }

            @Override
            public VolumeBounds weeklySetBounds(String muscle) {
                VolumeBounds b = bounds.apply(profile, muscle);
                return direct.contains(muscle) ? b : new VolumeBounds(0, b.cap());
            }

            @Override
            public OptionalDouble sessionBudgetMinutes() {
                return budget;
            }
        });
    }

    private static WeekFigures week(WeekMetrics week, ProgrammeMetrics metrics) {
        Map<String, MuscleWeek> muscles = new LinkedHashMap<>();
        week.muscles().forEach((Muscle m, dev.mesolint.core.model.MuscleWeek mw) -> muscles.put(m.yamlName(),
                new MuscleWeek(mw.hardSets(), mw.stimulatingReps(), mw.stimulus())));
        double k = metrics.parameters().stimulatingRepsCeiling();
        return new WeekFigures(week.number(), week.deload(), muscles,
                week.sessions().stream().map(s -> session(s, k)).toList());
    }

    private static SessionFigures session(SessionMetrics session, double k) {
        List<SetFigures> sets = session.sets().stream().map(s -> set(s, k)).toList();
        return new SessionFigures(session.day(), session.name() == null ? "" : session.name(),
                session.location().line(), session.minutes(), sets);
    }

    private static SetFigures set(SetMetrics set, double k) {
        double fresh = set.stimulatingReps() / k;
        return new SetFigures(set.exerciseId(), set.location().line(), fresh, Math.min(fresh, set.stimulus()));
    }
}
