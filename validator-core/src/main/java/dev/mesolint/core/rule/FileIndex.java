package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.ExerciseLookups;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.PerEntry;
import dev.mesolint.core.model.ModelParameters;
import dev.mesolint.core.model.RestGap;
import dev.mesolint.core.model.SessionMetrics;
import dev.mesolint.core.model.SessionRests;
import dev.mesolint.core.model.SetMetrics;
import dev.mesolint.core.model.WeekMetrics;
import dev.mesolint.core.programme.Session;
import dev.mesolint.core.programme.Week;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;

/**
 * What several rules look up in one file, worked out once and shared: the exercise entries the programme names, each
 * entry's prime movers, the written weeks by number, each session's rests and what kinds of set the programme has.
 * Filled on first use, so a rule that asks nothing costs nothing. Confined to the thread that checks the file.
 */
public final class FileIndex {
    /** Each entry's credit arrays, shared by every file of the run. */
    private static final PerEntry<ExerciseCredits> CREDITS = new PerEntry<>(ExerciseCredits::new,
            ExerciseCredits::exercise);

    private final ExerciseLookups<ExerciseCredits> exercises;
    private final List<Week> weeks;
    private final ModelParameters parameters;
    private final List<WeekMetrics> figures;
    private final Map<Session, List<RestGap>> rests = new IdentityHashMap<>();
    private Map<Integer, Week> weeksByNumber;
    private SetSummary sets;

    FileIndex(Catalogue catalogue, List<Week> weeks, ModelParameters parameters, List<WeekMetrics> figures) {
        this.exercises = new ExerciseLookups<>(id -> catalogue.find(id).map(CREDITS::of).orElse(null),
                c -> c.exercise().id());
        this.weeks = weeks;
        this.parameters = parameters;
        this.figures = figures;
    }

    /**
     * What any of the model's working sets has, found in one walk for the rules that judge a kind of set only:
     * a rule whose kind of set the programme never writes has nothing to look at.
     *
     * @param effortUnstated a set states no effort (no rir, rpe, load, AMRAP, hold, carry or test)
     * @param effortConflict a set's stated effort and load disagree ({@code EffortAgreement.isConflict})
     * @param technique      a set uses a technique (drop set, rest-pause)
     */
    public record SetSummary(boolean effortUnstated, boolean effortConflict, boolean technique) {
    }

    /** The summary of every working set in the model's figures, made on first use. */
    public SetSummary sets() {
        if (sets == null) {
            boolean unstated = false;
            boolean conflict = false;
            boolean technique = false;
            for (WeekMetrics week : figures) {
                for (SessionMetrics session : week.sessions()) {
                    for (SetMetrics set : session.sets()) {
                        unstated |= !set.prescription().statesEffort();
                        conflict |= set.agreement().isConflict();
                        technique |= set.prescription().technique().isPresent();
                    }
                }
            }
            sets = new SetSummary(unstated, conflict, technique);
        }
        return sets;
    }

    /** The entry of {@code id} in the file's catalogue (built-in, repository and programme entries); null if none. */
    public Exercise exercise(String id) {
        ExerciseCredits credits = exercises.get(id);
        return credits == null ? null : credits.exercise();
    }

    /** The credited muscles of the entry of {@code id}, as arrays; null when the file's catalogue has no such id. */
    public ExerciseCredits credits(String id) {
        return exercises.get(id);
    }

    /** The muscles {@code exercise} credits as prime mover (credit 1 or more), in the order the entry writes them. */
    public List<Muscle> primeMovers(Exercise exercise) {
        return CREDITS.of(exercise).primeMovers();
    }

    /** The first written week numbered {@code number}; null when the programme writes none. */
    public Week week(int number) {
        if (weeksByNumber == null) {
            weeksByNumber = new HashMap<>();
            for (Week w : weeks) {
                weeksByNumber.putIfAbsent(w.number(), w);
            }
        }
        return weeksByNumber.get(number);
    }

    /** The rests of {@code session} that more work follows ({@link SessionRests}), planned once for every rule. */
    public List<RestGap> rests(Session session) {
        return rests.computeIfAbsent(session, s -> SessionRests.of(s, parameters));
    }
}
