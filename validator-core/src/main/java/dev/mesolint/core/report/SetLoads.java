package dev.mesolint.core.report;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.programme.AthleteConstraint;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.LoadUnit;
import java.util.List;
import java.util.Optional;

/**
 * Works out the weight of a set for the report: a share of 1RM times the athlete's 1RM, rounded to the plate
 * increment by {@link PlateRounding}'s rule (down under a cap or at near-maximal loads, to the nearest step
 * otherwise). Weights are in the programme's unit.
 */
final class SetLoads {
    private final Programme programme;
    private final PlateRounding plates;
    private final Catalogue catalogue;
    private final List<AthleteConstraint> caps;

    /** What the load cell shows: the weight to put on the bar (or the load as written) and how it was reached. */
    record Worked(String main, String detail, PlateRounding.Direction direction) {
        boolean roundedDown() {
            return direction != null && direction != PlateRounding.Direction.NEAREST;
        }
    }

    SetLoads(Programme programme, PlateRounding plates, Catalogue catalogue) {
        this.programme = programme;
        this.plates = plates;
        this.catalogue = catalogue.overlay(programme.localExercises());
        this.caps = programme.athlete().constraints().stream()
                .filter(c -> c.region().isPresent() && c.maxLoad().isPresent()).toList();
    }

    PlateRounding plates() {
        return plates;
    }

    /** The set's load in a session of week {@code week}, day {@code day}; empty when the set states none. */
    Optional<Worked> of(String exerciseId, SetPrescription set, int week, int day) {
        if (set.load().isEmpty()) {
            return Optional.empty();
        }
        LoadUnit units = programme.info().units();
        // The 1RM in force for this session: a later week may state a new one, and after a test it is unknown.
        Optional<Load.Absolute> max = programme.athlete().oneRepMax(exerciseId, week, day);
        if (set.load().get() instanceof Load.Absolute weight) {
            String share = max.map(m -> percent(weight.in(m.unit()) / m.amount()) + " of 1RM").orElse("as written");
            return Optional.of(new Worked(Html.weight(weight.amount()) + " " + weight.unit().symbol(), share, null));
        }
        double share = ((Load.Relative) set.load().get()).fraction();
        if (max.isEmpty()) {
            return Optional.of(new Worked(percent(share) + " 1RM", programme.athlete().steps(exerciseId).isEmpty()
                    ? "no 1RM given for this exercise" : "1RM not known here: set by the test before", null));
        }
        double oneRm = max.get().in(units);
        Optional<AthleteConstraint> cap = capFor(exerciseId);
        PlateRounding.Rounded rounded = plates.round(share * oneRm, share, cap.isPresent());
        String detail = percent(share) + " of " + Html.weight(oneRm) + " " + units.symbol();
        detail += switch (rounded.direction()) {
            case DOWN_UNDER_CAP -> ", rounded down under the " + percent(cap.get().maxLoad().get()) + " "
                    + cap.get().region().get().yamlName() + " cap";
            case DOWN_NEAR_MAXIMAL -> ", rounded down (near-maximal)";
            case NEAREST -> "";
        };
        return Optional.of(new Worked(Html.weight(rounded.weight()) + " " + units.symbol(), detail,
                rounded.direction()));
    }

    /**
     * The first load cap whose region the exercise loads; an exercise the catalogue does not know is treated as
     * capped when any cap exists, so that its load is never rounded up past one.
     */
    Optional<AthleteConstraint> capFor(String exerciseId) {
        Optional<Exercise> exercise = catalogue.find(exerciseId);
        return caps.stream().filter(c -> exercise.map(e -> e.regions().contains(c.region().get())).orElse(true))
                .findFirst();
    }

    /** The exercise's name in the catalogue, else its id with spaces. */
    String name(String exerciseId) {
        return catalogue.find(exerciseId).map(Exercise::name).filter(n -> !n.isBlank())
                .orElse(exerciseId.replace('-', ' '));
    }

    static String percent(double share) {
        return Html.weight(share * 100) + "%";
    }
}
