package dev.mesolint.core.finding;

import java.util.Objects;
import java.util.Optional;

/**
 * What a rule knows about a finding besides its words: the subject, the measured value and limit, and a fix a tool
 * can apply. Rules supply these; the framework adds the identity ({@link Anchor}).
 */
public record Facts(Subject subject, Optional<Measure> measure, Optional<Edit> edit) {

    public static final Facts NONE = new Facts(Subject.NONE, Optional.empty(), Optional.empty());

    public Facts {
        Objects.requireNonNull(subject, "subject");
        Objects.requireNonNull(measure, "measure");
        Objects.requireNonNull(edit, "edit");
    }

    public static Facts about(Subject subject) {
        return NONE.withSubject(subject);
    }

    public Facts withSubject(Subject s) {
        return new Facts(s, measure, edit);
    }

    public Facts measured(double value, double limit, String unit) {
        return new Facts(subject, Optional.of(new Measure(value, limit, unit)), edit);
    }

    public Facts withEdit(Edit e) {
        return new Facts(subject, measure, Optional.ofNullable(e));
    }

    // equals and hashCode as the record's generated ones give them, without their method handles (see Location):
    // facts take part in the keys that merge a rule's findings.
    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof Facts f && Objects.equals(subject, f.subject)
                && Objects.equals(measure, f.measure) && Objects.equals(edit, f.edit);
    }

    @Override
    public int hashCode() {
        return (Objects.hashCode(subject) * 31 + Objects.hashCode(measure)) * 31 + Objects.hashCode(edit);
    }
}
