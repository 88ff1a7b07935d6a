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

    @Test
    void noRuleClassIsNamedByTheEngineReportsProfilesOrBaselines() {
        noClasses().that().resideInAnyPackage("dev.mesolint.core.engine..", "dev.mesolint.core.report..",
                        "dev.mesolint.core.profile..", "dev.mesolint.core.baseline..", "dev.mesolint.core.cache..",
                        "dev.mesolint.core.config..", "dev.mesolint.core.format..")
                .should().dependOnClassesThat(describe("rule classes",
                        (JavaClass c) -> c.isAssignableTo(RuleDefinition.class) && !c.isInterface()))
                .check(CORE);
    }
}
