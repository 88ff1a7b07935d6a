package dev.mesolint.core.architecture;

import static com.tngtech.archunit.base.DescribedPredicate.describe;
import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import dev.mesolint.core.rule.RuleDefinition;
import org.junit.jupiter.api.Test;

/**
 * The layers of the core, checked on its compiled classes: no package cycle, no front-end types, and no rule class
 * named by the code that runs or reports rules (it finds them through the rule list and the interfaces they
 * implement, so rule packs are served the same way).
 */
class ArchitectureTests {
    private static final JavaClasses CORE = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("dev.mesolint.core");

    @Test
    void noPackageDependsOnItselfThroughOthers() {
        slices().matching("dev.mesolint.core.(*)..").should().beFreeOfCycles().check(CORE);
    }

    @Test
    void theCoreKnowsNoCommandLineOrMavenTypes() {
        noClasses().should().dependOnClassesThat().resideInAnyPackage("picocli..", "org.apache.maven..",
                "org.codehaus.plexus..").check(CORE);
    }

    /**
     * The core names a front end's settings only through {@code SettingNames}, so a problem reads in the caller's
     * words: no command-line option ({@code "--config"}) is written in its sources, except in the text of a
     * {@code 'mesolint ...'} command a hint quotes.
     */
    @Test
    void theCoreWritesNoCommandLineOptionNames() throws java.io.IOException {
        java.util.regex.Pattern option = java.util.regex.Pattern.compile("\"[^\"]*(?<![\\w(-])--[a-z][a-z-]+");
        try (java.util.stream.Stream<java.nio.file.Path> files = java.nio.file.Files.walk(
                java.nio.file.Path.of("src/main/java"))) {
            java.util.List<String> found = files.filter(f -> f.toString().endsWith(".java")).flatMap(f -> {
                try {
                    return java.nio.file.Files.readAllLines(f).stream()
                            .filter(l -> option.matcher(l).find() && !l.contains("'mesolint "))
                            .map(l -> f.getFileName() + ": " + l.strip());
                } catch (java.io.IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            }).toList();
            org.junit.jupiter.api.Assertions.assertEquals(java.util.List.of(), found,
                    "name settings through SettingNames (RunOptions.names()), not as options");
        }
    }

    @Test
    void noRuleClassIsNamedByTheEngineReportsProfilesOrBaselines() {
        noClasses().that().resideInAnyPackage("dev.mesolint.core.engine..", "dev.mesolint.core.report..",
                        "dev.mesolint.core.profile..", "dev.mesolint.core.baseline..", "dev.mesolint.core.cache..",
                        "dev.mesolint.core.config..", "dev.mesolint.core.format..",
                        "dev.mesolint.core.run..")
                .should().dependOnClassesThat(describe("rule classes",
                        (JavaClass c) -> c.isAssignableTo(RuleDefinition.class) && !c.isInterface()))
                .check(CORE);
    }
}
