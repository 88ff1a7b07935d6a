package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Located;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.LocatedDocument;
import dev.mesolint.core.yaml.Pointers;
import java.util.List;
import java.util.Optional;

/**
 * What one rule sees of one file, and where it reports. Created per rule and file; not shared between threads.
 */
public final class RuleContext {
    private final FileScope file;
    private final RuleMetadata rule;
    private final RuleSettings settings;

    public RuleContext(FileScope file, RuleMetadata rule, RuleSettings settings) {
        this.file = file;
        this.rule = rule;
        this.settings = settings;
    }

    public Programme programme() {
        return file.programme();
    }

    /** The training-model figures of this programme, computed once for all rules. */
    public ProgrammeMetrics metrics() {
        return file.metrics();
    }

    public Catalogue catalogue() {
        return file.catalogue();
    }

    public Optional<Exercise> exercise(String id) {
        return file.catalogue().find(id);
    }

    public String profileName() {
        return file.profileName();
    }

    /** A parameter's configured value, in its base unit (seconds, fraction, count). */
    public double param(String name) {
        return settings.value(name);
    }

    /** A parameter as a profile would write it, for messages: {@code 2min}, {@code 30%}. */
    public String shown(String name) {
        return rule.parameter(name).map(p -> p.format(param(name))).orElseThrow();
    }

    /** Reports a finding about {@code subject}; the waivers in force there are applied. */
    public void report(Located subject, String message, String fix) {
        report(subject.location(), subject.waivers(), message, fix);
    }

    public void report(Location location, List<Waiver> waivers, String message, String fix) {
        report(location, waivers, settings.severity(), message, fix);
    }

    /** The severity the profile gives this rule (never {@code OFF}: a rule that is off does not run). */
    public Severity severity() {
        return settings.severity();
    }

    /**
     * Reports at a severity other than the configured one, for a rule whose metadata documents a second severity
     * for one kind of finding (an infeasible load is always an error; a long isolation set is at most info). Use
     * {@link #severity()} to derive it, so that a profile's choice still counts.
     */
    public void report(Location location, List<Waiver> waivers, Severity severity, String message, String fix) {
        if (severity == Severity.OFF) {
            return;
        }
        Finding finding = new Finding(rule.id(), severity, file.displayPath(), location, message, fix,
                Optional.empty());
        file.add(finding, waivers);
    }

    /**
     * Where a key of {@code subject} was written ({@code rest} of a set): on the node itself, else on the entry the
     * value was inherited from, else the subject's own location.
     */
    public Location fieldLocation(Located subject, String key) {
        LocatedDocument doc = file.document();
        String pointer = subject.location().pointer();
        while (true) {
            String candidate = Pointers.child(pointer, key);
            if (doc.values().containsKey(candidate)) {
                Location l = doc.values().get(candidate);
                return new Location(l.line(), l.column(), candidate);
            }
            // climb from a set in a list (/…/sets/2) to its entry (/…); stop at the work item
            if (pointer.matches(".*/sets/\\d+")) {
                pointer = pointer.substring(0, pointer.lastIndexOf("/sets/"));
            } else {
                return subject.location();
            }
        }
    }
}
