package dev.mesolint.maven;

import java.util.ArrayList;
import java.util.List;
import org.apache.maven.plugin.logging.Log;

/** A Maven log that keeps every line as {@code [LEVEL] text}, for assertions. */
final class RecordingLog implements Log {
    final List<String> lines = new ArrayList<>();

    private void add(String level, CharSequence text) {
        lines.add("[" + level + "] " + text);
    }

    String text() {
        return String.join("\n", lines);
    }

    @Override
    public boolean isDebugEnabled() {
        return true;
    }

    @Override
    public void debug(CharSequence content) {
        add("DEBUG", content);
    }

    @Override
    public void debug(CharSequence content, Throwable error) {
        add("DEBUG", content);
    }

    @Override
    public void debug(Throwable error) {
        add("DEBUG", error.toString());
    }

    @Override
    public boolean isInfoEnabled() {
        return true;
    }

    @Override
    public void info(CharSequence content) {
        add("INFO", content);
    }

    @Override
    public void info(CharSequence content, Throwable error) {
        add("INFO", content);
    }

    @Override
    public void info(Throwable error) {
        add("INFO", error.toString());
    }

    @Override
    public boolean isWarnEnabled() {
        return true;
    }

    @Override
    public void warn(CharSequence content) {
        add("WARNING", content);
    }

    @Override
    public void warn(CharSequence content, Throwable error) {
        add("WARNING", content);
    }

    @Override
    public void warn(Throwable error) {
        add("WARNING", error.toString());
    }

    @Override
    public boolean isErrorEnabled() {
        return true;
    }

    @Override
    public void error(CharSequence content) {
        add("ERROR", content);
    }

    @Override
    public void error(CharSequence content, Throwable error) {
        add("ERROR", content);
    }

    @Override
    public void error(Throwable error) {
        add("ERROR", error.toString());
    }
}
