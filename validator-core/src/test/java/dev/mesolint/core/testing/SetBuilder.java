package dev.mesolint.core.testing;

import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Technique;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.value.Durations;
import dev.mesolint.core.value.InvalidValueException;
import dev.mesolint.core.value.Load;
import dev.mesolint.core.value.RepTarget;
import dev.mesolint.core.value.RirRange;
import dev.mesolint.core.value.Rpe;
import dev.mesolint.core.value.Tempo;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/** Writes a set the way a programme file would, through the real value parsers: {@code reps("8").rir("2")}. */
public final class SetBuilder {
    private RepTarget reps;
    private Optional<RirRange> rir = Optional.empty();
    private Optional<Rpe> rpe = Optional.empty();
    private Optional<Load> load = Optional.empty();
    private Optional<Duration> rest = Optional.empty();
    private Optional<Tempo> tempo = Optional.empty();
    private Optional<Technique> technique = Optional.empty();
    private int line = 10;

    private SetBuilder(RepTarget reps) {
        this.reps = reps;
    }

    public static SetBuilder reps(String text) {
        return new SetBuilder(parse(() -> RepTarget.parse(text)));
    }

    public SetBuilder rir(String text) {
        rir = Optional.of(parse(() -> RirRange.parse(text)));
        return this;
    }

    public SetBuilder rpe(String text) {
        rpe = Optional.of(parse(() -> Rpe.parse(text)));
        return this;
    }

    public SetBuilder load(String text) {
        load = Optional.of(parse(() -> Load.parse(text)));
        return this;
    }

    public SetBuilder rest(String text) {
        rest = Optional.of(parse(() -> Durations.parse(text)));
        return this;
    }

    public SetBuilder tempo(String text) {
        tempo = Optional.of(parse(() -> Tempo.parse(text)));
        return this;
    }

    public SetBuilder technique(Technique t) {
        technique = Optional.of(t);
        return this;
    }

    public SetBuilder line(int l) {
        line = l;
        return this;
    }

    public SetPrescription build(int number) {
        return new SetPrescription(number, reps, rir, rpe, load, rest, tempo, technique,
                new Location(line, 7, "/weeks/0/sessions/0/work/0/sets/" + (number - 1)), List.of());
    }

    /** {@code count} copies of this set, numbered from 1. */
    public List<SetPrescription> times(int count) {
        List<SetPrescription> sets = new ArrayList<>();
        for (int i = 1; i <= count; i++) {
            sets.add(build(i));
        }
        return sets;
    }

    private interface Parser<T> {
        T parse() throws InvalidValueException;
    }

    private static <T> T parse(Parser<T> parser) {
        try {
            return parser.parse();
        } catch (InvalidValueException e) {
            throw new IllegalArgumentException(e.getMessage() + " (" + e.hint() + ")", e);
        }
    }
}
