package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.Yaml;
import org.yaml.snakeyaml.constructor.SafeConstructor;

/** The hook that the repository's .pre-commit-hooks.yaml offers runs and selects files as the framework would. */
class PreCommitHookTests {
    private static final Path HOOKS = Path.of("..", ".pre-commit-hooks.yaml");

    @SuppressWarnings("unchecked")
    private static Map<String, Object> hook() throws IOException {
        List<Object> hooks = new Yaml(new SafeConstructor(new LoaderOptions())).load(Files.readString(HOOKS));
        assertEquals(1, hooks.size());
        return (Map<String, Object>) hooks.get(0);
    }

    @Test
    void selectsProgrammesButNotTheConfigurationProfilesOrCatalogues() throws IOException {
        Map<String, Object> hook = hook();
        assertEquals("mesolint-check", hook.get("id"));
        // The framework matches 'files' and 'exclude' with Python's re.search on the path from the root.
        Pattern files = Pattern.compile((String) hook.get("files"));
        Pattern exclude = Pattern.compile((String) hook.get("exclude"));
        for (String picked : List.of("programmes/block.yml", "sample-programs/programmes/strength-block.yaml")) {
            assertTrue(files.matcher(picked).find() && !exclude.matcher(picked).find(), picked);
        }
        for (String left : List.of(".mesolint.yaml", ".mesolint/profiles/club.yaml", "sub/.mesolint/catalogue/x.yaml",
                "README.md")) {
            assertFalse(files.matcher(left).find() && !exclude.matcher(left).find(), left);
        }
    }

    @Test
    void theEntryChecksTheFilesItIsGiven() throws IOException {
        List<String> args = new ArrayList<>(List.of(((String) hook().get("entry")).split(" ")));
        assertEquals("mesolint", args.remove(0));
        args.add("../sample-programs/programmes/strength-block.yaml");
        StringWriter out = new StringWriter();
        int clean = MesolintCommand.execute(args.toArray(String[]::new), new PrintWriter(out),
                new PrintWriter(new StringWriter()));
        assertEquals(0, clean, out.toString());
        assertEquals("", out.toString(), "quiet: a clean commit prints nothing");

        args.set(args.size() - 1, "../sample-programs/broken/unknown-exercise.yaml");
        StringWriter failing = new StringWriter();
        assertEquals(1, MesolintCommand.execute(args.toArray(String[]::new), new PrintWriter(failing),
                new PrintWriter(new StringWriter())));
        assertTrue(failing.toString().contains("unknown-exercise"), failing.toString());
    }
}
