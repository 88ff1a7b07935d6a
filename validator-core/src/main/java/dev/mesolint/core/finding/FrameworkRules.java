package dev.mesolint.core.finding;

import java.util.Set;

/**
 * The ids of the rules the framework itself reports (a file that does not load, a stale waiver or baseline entry,
 * a shared programme id), for code that must treat them apart without naming a rule class.
 */
public final class FrameworkRules {
    public static final String YAML_SYNTAX = "yaml-syntax";
    public static final String SCHEMA = "schema";
    public static final String INTERNAL_ERROR = "internal-error";
    public static final String UNUSED_WAIVER = "unused-waiver";
    public static final String UNUSED_BASELINE_ENTRY = "unused-baseline-entry";
    public static final String DUPLICATE_PROGRAMME_ID = "duplicate-programme-id";

    /** The rules that report a file that did not load: its findings are about the text, so no baseline holds them. */
    public static final Set<String> LOAD_FAILURES = Set.of(YAML_SYNTAX, SCHEMA, INTERNAL_ERROR);

    /** Rules whose severity no profile may change: a broken file or a shared id could pass otherwise. */
    public static final Set<String> FIXED_SEVERITY = Set.of(YAML_SYNTAX, SCHEMA, INTERNAL_ERROR,
            DUPLICATE_PROGRAMME_ID);

    private FrameworkRules() {
    }
}
