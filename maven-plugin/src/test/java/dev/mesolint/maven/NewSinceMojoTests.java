package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.apache.maven.plugin.MojoFailureException;
import org.eclipse.jgit.api.Git;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The plugin's {@code newSince}: findings the base revision already had do not fail the build; new ones do. */
class NewSinceMojoTests {
    @TempDir
    Path dir;

    @Test
    void anOldFindingIsHeldAndANewOneFailsTheBuild() throws Exception {
        MojoFixture repo = new MojoFixture(dir).programme("good.yaml", MojoFixture.PROGRAMME)
                .programme("rehab/misspelt.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench")
                        .replace("id: harbour-test", "id: harbour-rehab"));
        try (Git git = Git.init().setDirectory(dir.toFile()).setInitialBranch("main").call()) {
            git.add().addFilepattern(".").call();
            git.commit().setMessage("library with one known finding").setAuthor("coach", "coach@invalid")
                    .setCommitter("coach", "coach@invalid").call();
        }
        CheckMojo unchanged = repo.check();
        unchanged.newSince = "main";
        unchanged.execute(); // the misspelt id was already there at main: held, not a failure
        assertTrue(repo.log.text().contains("findings already present at main are held"), repo.log.text());

        repo.programme("new.yaml", MojoFixture.PROGRAMME.replace("barbell-bench", "barbel-bench")
                .replace("id: harbour-test", "id: harbour-new"));
        CheckMojo changed = repo.check();
        changed.newSince = "main";
        MojoFailureException failure = assertThrows(MojoFailureException.class, changed::execute);
        assertTrue(failure.getMessage().contains("1 error"), failure.getMessage());
    }
}
