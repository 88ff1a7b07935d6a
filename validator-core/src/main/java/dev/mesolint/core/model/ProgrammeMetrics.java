package dev.mesolint.core.model;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Week;
import dev.mesolint.core.value.LoadUnit;
import java.util.Comparator;
import java.util.List;
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
 */
public record ProgrammeMetrics(String programmeId, LoadUnit units, ModelParameters parameters,
        List<WeekMetrics> weeks) {

    public ProgrammeMetrics {
        Objects.requireNonNull(parameters, "parameters");
        weeks = List.copyOf(weeks);
    }

    /**
     * Computes the figures. The programme's own catalogue entries are laid over {@code catalogue}; sets of
     * exercises found in neither are left out (another rule reports them).
     */
    public static ProgrammeMetrics compute(Programme programme, Catalogue catalogue, ModelParameters params) {
        Catalogue effective = catalogue.overlay(programme.localExercises());
        LoadUnit units = programme.info().units();
        WeekCalculator calculator = new WeekCalculator(params);
        List<WeekMetrics> weeks = programme.weeks().stream()
                .sorted(Comparator.comparingInt(Week::number))
                .map(w -> calculator.compute(w, effective, programme.athlete(), units))
                .toList();
        return new ProgrammeMetrics(programme.info().id(), units, params, new TrendCalculator(params).withTrends(weeks));
    }

    /** Computes the figures with {@link ModelParameters#defaults()}. */
    public static ProgrammeMetrics compute(Programme programme, Catalogue catalogue) {
        return compute(programme, catalogue, ModelParameters.defaults());
    }

    public Optional<WeekMetrics> week(int number) {
        return weeks.stream().filter(w -> w.number() == number).findFirst();
    }

    /** Numbers of the weeks the programme marks as deloads. */
    public List<Integer> deloadWeeks() {
        return weeks.stream().filter(WeekMetrics::deload).map(WeekMetrics::number).toList();
    }
}
