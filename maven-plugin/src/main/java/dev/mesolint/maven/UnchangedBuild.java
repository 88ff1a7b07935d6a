package dev.mesolint.maven;

import dev.mesolint.core.cache.RunStamp;
import dev.mesolint.core.source.ReadLog;
import java.io.File;
import java.io.IOException;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.net.URISyntaxException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import org.apache.maven.execution.MavenSession;
import org.apache.maven.plugin.MojoExecutionException;
import org.apache.maven.plugin.MojoFailureException;
import org.apache.maven.plugin.logging.Log;

/**
 * The check goal on a build where nothing changed: the last outcome, logged again line for line, failure and all,
 * without reading configuration or loading the checker. What "nothing changed" means is {@link RunStamp}'s proof:
 * the same plugin code and parameters, the same entries below the programmes folder and the same markers above it,
 * and every file the last run read (programmes, configuration, profiles, catalogues, baseline) byte for byte.
 */
final class UnchangedBuild {
    static final String FILE = "run-stamp.txt";

    private final RunStamp stamp;
    private final Path file;

    private UnchangedBuild(RunStamp stamp, Path file) {
        this.stamp = stamp;
        this.file = file;
    }

    /** A real run, as the goal makes it. */
    interface Run {
        void run() throws MojoExecutionException, MojoFailureException;
    }

    /** The stamp of this build; empty when the inputs cannot even be listed (the real run then says why). */
    static Optional<UnchangedBuild> stamp(AbstractMesolintMojo mojo, Path outputFolder) {
        try {
            RunStamp stamp = RunStamp.take(settings(mojo), List.of(mojo.programmes.toPath()),
                    Set.of(outputFolder));
            return Optional.of(new UnchangedBuild(stamp, outputFolder.resolve(FILE)));
        } catch (IOException | RuntimeException e) {
            mojo.getLog().debug("mesolint: no unchanged-build record: " + e.getMessage());
            return Optional.empty();
        }
    }

    /** Logs the last outcome again when nothing changed; throws its failure, if it failed. */
    boolean replayed(Log log) throws MojoFailureException {
        Optional<RunStamp.Replay> replay = stamp.replay(file);
        if (replay.isEmpty()) {
            return false;
        }
        int n = replay.get().programmes();
        log.info("mesolint: " + n + " programme" + (n == 1 ? "" : "s") + " unchanged, results reused from cache "
                + "(nothing changed since the last build)");
        for (RunStamp.Line line : replay.get().log()) {
            switch (line.level()) {
                case "error" -> log.error(line.text());
                case "warn" -> log.warn(line.text());
                case "debug" -> log.debug(line.text());
                default -> log.info(line.text());
            }
        }
        if (replay.get().failure().isPresent()) {
            throw new MojoFailureException(replay.get().failure().get());
        }
        return true;
    }

    /**
     * Makes the real run, recording what it reads and logs; saves the record when the run ended in a verdict (pass
     * or failure on findings), removes it when the run broke, so a broken build is never replayed.
     */
    void record(AbstractMesolintMojo mojo, Run run) throws MojoExecutionException, MojoFailureException {
        Log real = mojo.getLog();
        RecordingLog recording = new RecordingLog(real);
        mojo.setLog(recording);
        try (ReadLog reads = ReadLog.open()) {
            try {
                run.run();
            } catch (MojoFailureException e) {
                save(real, reads, mojo.lastRunProgrammes, recording.lines(), Optional.of(e.getMessage()));
                throw e;
            } catch (MojoExecutionException | RuntimeException e) {
                forget(real);
                throw e;
            }
            save(real, reads, mojo.lastRunProgrammes, recording.lines(), Optional.empty());
        } finally {
            mojo.setLog(real);
        }
    }

    private void save(Log log, ReadLog reads, int programmes, List<RunStamp.Line> lines, Optional<String> failure) {
        try {
            stamp.save(file, reads.files(), programmes, lines, failure);
        } catch (IOException e) {
            log.debug("mesolint: could not write " + file + ": " + e.getMessage() + "; the next build runs in full");
        }
    }

    private void forget(Log log) {
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            log.debug("mesolint: could not remove " + file + ": " + e.getMessage());
        }
    }

    /**
     * Every parameter of the goal (read from the Mojo's own fields, so a parameter added later is covered without a
     * word here), and the code the plugin runs: each jar of its class path by size and time, rule packs included.
     */
    static String settings(AbstractMesolintMojo mojo) {
        TreeMap<String, String> values = new TreeMap<>();
        for (Class<?> type = mojo.getClass(); type != null && AbstractMesolintMojo.class.isAssignableFrom(type);
                type = type.getSuperclass()) {
            for (Field field : type.getDeclaredFields()) {
                if (Modifier.isStatic(field.getModifiers()) || field.getType() == MavenSession.class) {
                    continue;
                }
                try {
                    field.setAccessible(true);
                    values.put(type.getSimpleName() + "." + field.getName(), String.valueOf(field.get(mojo)));
                } catch (IllegalAccessException | RuntimeException e) {
                    values.put(type.getSimpleName() + "." + field.getName(), "unreadable");
                }
            }
        }
        values.remove("AbstractMesolintMojo.lastRunProgrammes");
        values.put("goal", mojo.getClass().getName());
        values.put("code", code(mojo.getClass().getClassLoader()));
        return values.toString();
    }

    private static String code(ClassLoader loader) {
        List<String> jars = new ArrayList<>();
        URL[] urls = loader instanceof URLClassLoader u ? u.getURLs() : new URL[0];
        if (urls.length == 0) {
            urls = new URL[] {UnchangedBuild.class.getProtectionDomain().getCodeSource().getLocation()};
        }
        for (URL url : urls) {
            try {
                File jar = new File(url.toURI());
                jars.add(jar + "@" + jar.length() + "@" + jar.lastModified());
            } catch (URISyntaxException | RuntimeException e) {
                jars.add(url.toString());
            }
        }
        return String.join(",", jars);
    }

    /** Passes every line on, and keeps the ones a replay must show again. */
    private static final class RecordingLog implements Log {
        private final Log out;
        private final List<RunStamp.Line> lines = new ArrayList<>();

        RecordingLog(Log out) {
            this.out = out;
        }

        synchronized List<RunStamp.Line> lines() {
            return List.copyOf(lines);
        }

        private synchronized void keep(String level, CharSequence text) {
            String line = String.valueOf(text);
            // The cache line describes this run, not the outcome: a replay says its own.
            if (!line.contains(" unchanged, results reused from cache")) {
                lines.add(new RunStamp.Line(level, line));
            }
        }

        @Override public boolean isDebugEnabled() { return out.isDebugEnabled(); }
        @Override public void debug(CharSequence c) { keep("debug", c); out.debug(c); }
        @Override public void debug(CharSequence c, Throwable e) { keep("debug", c); out.debug(c, e); }
        @Override public void debug(Throwable e) { out.debug(e); }
        @Override public boolean isInfoEnabled() { return out.isInfoEnabled(); }
        @Override public void info(CharSequence c) { keep("info", c); out.info(c); }
        @Override public void info(CharSequence c, Throwable e) { keep("info", c); out.info(c, e); }
        @Override public void info(Throwable e) { out.info(e); }
        @Override public boolean isWarnEnabled() { return out.isWarnEnabled(); }
        @Override public void warn(CharSequence c) { keep("warn", c); out.warn(c); }
        @Override public void warn(CharSequence c, Throwable e) { keep("warn", c); out.warn(c, e); }
        @Override public void warn(Throwable e) { out.warn(e); }
        @Override public boolean isErrorEnabled() { return out.isErrorEnabled(); }
        @Override public void error(CharSequence c) { keep("error", c); out.error(c); }
        @Override public void error(CharSequence c, Throwable e) { keep("error", c); out.error(c, e); }
        @Override public void error(Throwable e) { out.error(e); }
    }
}
