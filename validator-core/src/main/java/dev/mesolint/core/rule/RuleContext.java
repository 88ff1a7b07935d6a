package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.finding.Facts;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.finding.Severity;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Located;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.SetPrescription;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.Pointers;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * What one rule sees of one file, and where it reports. Created per rule and file; not shared between threads.
 */
public final class RuleContext {
    private final FileScope file;
    private final RuleMetadata rule;
    private final RuleSettings settings;
    private Map<String, String> shown;

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
        return Optional.ofNullable(file.index().exercise(id));
    }

    /** The catalogue entry of {@code id}, or null when there is none: for per-set loops. */
    public Exercise exerciseOrNull(String id) {
        return file.index().exercise(id);
    }

    /** The lookups every rule of this file shares (exercises, prime movers, weeks, rests), made once. */
    public FileIndex index() {
        return file.index();
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
        if (shown == null) {
            shown = new HashMap<>();
        }
        // Asked for by every finding's message: formatted once per rule and file.
        String text = shown.get(name);
        if (text == null) {
            text = rule.parameter(name).map(p -> p.format(param(name))).orElseThrow();
            shown.put(name, text);
        }
        return text;
    }

    /** Reports a finding about {@code subject}; the waivers in force there are applied. */
    public void report(Located subject, String message, String fix) {
        report(subject.location(), subject.waivers(), message, fix);
    }

    /** Reports a finding about {@code subject} with what it is about, measured and how to change it. */
    public void report(Located subject, String message, String fix, Facts facts) {
        report(subject.location(), subject.waivers(), settings.severity(), message, fix, facts);
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
        report(location, waivers, severity, message, fix, Facts.NONE);
    }

    /**
     * The one place findings are made: the framework adds the file, the rule id and the {@link
     * dev.mesolint.core.finding.Anchor} (programme id and logical path) the fingerprint is made of, then applies the
     * waivers in force.
     */
    public void report(Location location, List<Waiver> waivers, Severity severity, String message, String fix,
            Facts facts) {
        if (severity == Severity.OFF) {
            return;
        }
        Finding finding = new Finding(rule.id(), severity, file.displayPath(), location, message, fix,
                Optional.empty(), false, facts, file.anchor(location));
        file.add(finding, waivers);
    }

    /**
     * Where a key of {@code subject} was written ({@code rest} of a set): for a set, as the binder recorded it (on
     * the set, else on the entry the value was inherited from); for another node, the key on the node itself; else
     * the subject's own location.
     */
    public Location fieldLocation(Located subject, String key) {
        if (subject instanceof SetPrescription set) {
            return set.placeOf(key);
        }
        String candidate = Pointers.child(subject.location().pointer(), key);
        Location l = file.document().writtenAt(candidate);
        return l == null ? subject.location() : l.withPointer(candidate);
    }
}
