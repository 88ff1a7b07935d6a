package dev.mesolint.core.config;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

class FolderRuleTests {
    private static FolderRule rule(String pattern) {
        return new FolderRule(pattern, ProfileRef.of("strength", Path.of(""), "test", null));
    }

    @Test
    void aFolderMatchesEverythingBelowIt() {
        FolderRule rehab = rule("./rehab/");
        assertTrue(rehab.matches("rehab/knee.yaml"));
        assertTrue(rehab.matches("rehab/2026/knee.yaml"));
        assertFalse(rehab.matches("rehabilitation/knee.yaml"));
        assertFalse(rehab.matches("squad/rehab/knee.yaml"));
        assertTrue(rule("squad/strength-block.yaml").matches("squad/strength-block.yaml"));
    }

    @Test
    void aGlobMatchesThePathRelativeToTheRoot() {
        FolderRule deep = rule("squad/**/strength-*.yaml");
        assertTrue(deep.matches("squad/2026/strength-block.yaml"));
        assertFalse(deep.matches("squad/strength-block.yaml"), "** needs a folder between");
        FolderRule any = rule("**/strength-*.yaml");
        assertTrue(any.matches("a/strength-x.yaml"));
        assertFalse(rule("*.yaml").matches("squad/x.yaml"));
        assertTrue(rule("*.yaml").matches("x.yaml"));
    }
}
