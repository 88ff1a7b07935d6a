package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.value.LoadUnit;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything the training model computes for one programme: computed once, immutable, shared by every rule and
 * report (safe to read from several threads).
 *
 * @param programmeId the programme's id
 * @param units       the unit of every volume load
 * @param parameters  the parameters the figures were computed with
 * @param weeks       in week-number order
 * @param directlyTrained the muscles some set trains as a prime mover (credit 1), each with the first exercise
 *                    that does, in muscle order: the muscles weekly floors apply to
 */
public record ProgrammeMetrics(String programmeId, LoadUnit units, ModelParameters parameters,
        List<WeekMetrics> weeks, Map<Muscle, String> directlyTrained) {

    public ProgrammeMetrics {
        Objects.requireNonNull(parameters, "parameters");
        weeks = List.copyOf(weeks);
        directlyTrained = Collections.unmodifiableMap(new EnumMap<>(directlyTrained.isEmpty()
                ? new EnumMap<Muscle, String>(Muscle.class) : directlyTrained));
    }

    /**
     * Computes the figures. The programme's own catalogue entries are laid over {@code catalogue}; sets of
     * exercises found in neither are left out (another rule reports them).
     */
    public static ProgrammeMetrics compute(Programme programme, Catalogue catalogue, ModelParameters params) {
        ExerciseTable exercises = new ExerciseTable(catalogue.overlay(programme.localExercises()));
        LoadUnit units = programme.info().units();
        WeekCalculator calculator = new WeekCalculator(params);
        List<Week> inOrder = new ArrayList<>(programme.weeks());
        inOrder.sort(Comparator.comparingInt(Week::number));
        List<WeekMetrics> weeks = new ArrayList<>(inOrder.size());
        for (Week week : inOrder) {
            weeks.add(calculator.compute(week, exercises, programme.athlete(), units));
        }
        return new ProgrammeMetrics(programme.info().id(), units, params, new TrendCalculator(params).withTrends(weeks),
                directlyTrained(weeks, exercises));
    }

    private static Map<Muscle, String> directlyTrained(List<WeekMetrics> weeks, ExerciseTable exercises) {
        Map<Muscle, String> direct = new EnumMap<>(Muscle.class);
        // The sets in the order they are done, week by week: each muscle goes to the exercise of the first set that
        // has it as a prime mover (a later set of the same exercise changes nothing). Read from the sets, not the
        // per-lift figures, which are worked out only when a rule or report reads them.
        for (WeekMetrics week : weeks) {
            for (SessionMetrics session : week.sessions()) {
                for (SetMetrics set : session.sets()) {
                    ExerciseFigures exercise = exercises.find(set.exerciseId());
                    if (exercise == null) {
                        continue;
                    }
                    for (Muscle muscle : exercise.primeMovers) {
                        direct.putIfAbsent(muscle, exercise.exercise.id());
                    }
                }
            }
        }
        return direct;
    }

    /** Computes the figures with {@link ModelParameters#defaults()}. */
    public static ProgrammeMetrics compute(Programme programme, Catalogue catalogue) {
        return compute(programme, catalogue, ModelParameters.defaults());
    }

    public Optional<WeekMetrics> week(int number) {
        return weeks.stream().filter(w -> w.number() == number).findFirst();
    }

    /** The lift's strength figures in every week that does it, in week order. */
    public List<LiftWeek> liftWeeks(String exerciseId) {
        return weeks.stream().flatMap(w -> w.lift(exerciseId).stream()).toList();
    }

    /** Numbers of the weeks the programme marks as deloads. */
    public List<Integer> deloadWeeks() {
        return weeks.stream().filter(WeekMetrics::deload).map(WeekMetrics::number).toList();
    }
}
