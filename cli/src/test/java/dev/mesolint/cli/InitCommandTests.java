package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InitCommandTests {
    @TempDir
    Path dir;

    private record Run(int exit, String out, String err) {
    }

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(args, new PrintWriter(out), new PrintWriter(err));
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void theScaffoldIsARepositoryWhoseSampleIsCleanAndWhoseChecksBite() throws IOException {
        Path club = dir.resolve("club");
        Run init = run("init", club.toString());
        assertEquals(0, init.exit(), init.err());
        for (String file : InitCommand.FILES.values()) {
            assertTrue(Files.isRegularFile(club.resolve(file)), file);
        }
        assertTrue(Files.isRegularFile(club.resolve(".mesolint/schema/programme.schema.json")));
        assertTrue(Files.readString(club.resolve("pom.xml")).contains("<mesolint.version>" + Mesolint.version()
                + "</mesolint.version>"));
        assertTrue(init.out().contains(Mesolint.CAUTION));
        assertTrue(Files.readString(club.resolve(".mesolint.yaml")).contains("\nrules-version: "
                + Mesolint.RULE_SET_VERSION + "\n"), "the scaffold records the rule set it starts with");

        // The sample passes under the scaffold's own configuration (fail-on: warning, the club's profile and
        // catalogue), checked from inside the repository ...
        Path programmes = club.resolve("programmes");
        Run clean = run("check", programmes.toString());
        assertEquals(0, clean.exit(), clean.out() + clean.err());
        assertTrue(clean.out().startsWith("1 file checked: 0 errors, 0 warnings"), clean.out());

        // ... and a misspelt exercise fails it.
        Path sample = programmes.resolve("harbourside-starter.yaml");
        Files.writeString(sample, Files.readString(sample).replace("exercise: push-up", "exercise: push-upp"));
        Run broken = run("check", programmes.toString());
        assertEquals(1, broken.exit());
        assertTrue(broken.out().contains("programmes/harbourside-starter.yaml:"), broken.out());
        assertTrue(broken.out().contains("unknown-exercise: unknown exercise 'push-upp'"), broken.out());
    }

    @Test
    void existingFilesAreNeverOverwrittenWithoutForce() throws IOException {
        Files.writeString(dir.resolve("pom.xml"), "<project/>\n");

        Run r = run("init", dir.toString());

        assertEquals(2, r.exit());
        assertTrue(r.err().contains("init would overwrite pom.xml"), r.err());
        assertEquals("<project/>\n", Files.readString(dir.resolve("pom.xml")));
        assertEquals(0, run("init", "--force", dir.toString()).exit());
        assertTrue(Files.readString(dir.resolve("pom.xml")).contains("mesolint-maven-plugin"));
    }
}
