package dev.mesolint.maven;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;

/** A programme repository in a temporary folder, and Mojos configured as Maven would with the defaults. */
final class MojoFixture {
    static final String PROGRAMME = """
            # Invented demo programme of the fictional Harbourside Strength Club.
            format: 1
            programme:
              id: harbour-test
              title: Harbourside test block
              level: intermediate
              goal: hypertrophy
              session-minutes: 60
            weeks:
              - week: 1
                sessions:
                  - day: 1
                    name: Upper A
                    work:
                      - exercise: barbell-bench-press
                        sets: 4
                        reps: 8
                        rir: 2
                        rest: 3min
            """;

    final Path root;
    final RecordingLog log = new RecordingLog();

    MojoFixture(Path root) {
        this.root = root;
    }

    MojoFixture programme(String name, String text) throws IOException {
        Path file = root.resolve("programmes").resolve(name);
        Files.createDirectories(file.getParent());
        Files.writeString(file, text);
        return this;
    }

    <T extends AbstractMesolintMojo> T configure(T mojo) {
        mojo.setLog(log);
        mojo.basedir = root.toFile();
        mojo.programmes = root.resolve("programmes").toFile();
        mojo.outputDirectory = root.resolve("target/mesolint").toFile();
        mojo.catalogues = new ArrayList<>();
        mojo.cache = true;
        return mojo;
    }

    CheckMojo check() {
        return configure(new CheckMojo());
    }

    ReportMojo report() {
        return configure(new ReportMojo());
    }

    /** The site report as {@code mvn site} runs it: the site plugin hands it the site folder. */
    SiteReportMojo siteReport() {
        SiteReportMojo mojo = configure(new SiteReportMojo());
        mojo.setReportOutputDirectory(root.resolve("target/site").toFile());
        return mojo;
    }
}
