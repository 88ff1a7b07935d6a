package dev.mesolint.core.engine;

import dev.mesolint.core.catalogue.CatalogueFile;
import dev.mesolint.core.config.ConfigDocument;
import dev.mesolint.core.config.ConfigProblem;
import dev.mesolint.core.config.RepositoryConfigReader;
import dev.mesolint.core.finding.FrameworkRules;
import dev.mesolint.core.format.CatalogueReader;
import dev.mesolint.core.profile.ProfileReader;
import dev.mesolint.core.rule.RuleDefinition;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.source.Violation;
import dev.mesolint.core.yaml.LocatedDocument;
import java.nio.file.Path;
import java.util.List;

/**
 * Checks one of mesolint's own files found among the programmes as what it is (catalogue, team profile, repository
 * configuration), with the reader that file would get if it were in effect: its problems become its findings.
 */
final class OwnFileCheck {
    /** What a check found, and the rule that reports it. */
    record Problems(String ruleId, List<Violation> violations) {
        static final Problems NONE = new Problems(FrameworkRules.SCHEMA, List.of());
    }

    /** The file as a configuration document (profile files are read as such). */
    @FunctionalInterface
    interface ConfigSource {
        ConfigDocument read() throws ConfigProblem;
    }

    private final CatalogueReader catalogues;
    private final ProfileReader profiles;
    private final Path root;

    OwnFileCheck(CatalogueReader catalogues, List<RuleDefinition> rules, Path root) {
        this.catalogues = catalogues;
        this.profiles = new ProfileReader(rules);
        this.root = root;
    }

    Problems check(OwnFileKind kind, Path file, LocatedDocument document, String shown, ConfigSource source) {
        try {
            switch (kind) {
                case CATALOGUE -> {
                    CatalogueFile read = catalogues.read(document, shown);
                    return read.ok() ? Problems.NONE : new Problems(read.ruleId(), read.violations());
                }
                case PROFILE -> profiles.read(source.read(), file.toAbsolutePath().normalize().getParent());
                case CONFIGURATION -> RepositoryConfigReader.read(file, shown, root, false);
                default -> throw new IllegalStateException("unknown kind " + kind);
            }
            return Problems.NONE;
        } catch (ConfigProblem e) {
            // A configuration reader stops at its first problem: one located finding, as a run in effect would say.
            return new Problems(FrameworkRules.SCHEMA, List.of(new Violation(e.location().orElse(Location.START),
                    e.getMessage(), e.hint())));
        }
    }
}
