package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;

/**
 * A section the HTML report adds to each programme after its findings, such as the changes since an earlier
 * revision. A section escapes every piece of text it writes and writes nothing when it has nothing to say.
 */
@FunctionalInterface
public interface ProgrammeSection {
    /**
     * Appends this section for {@code file} to {@code page}.
     *
     * @param id the programme's element id in the page ({@code p2}); a section's own ids start with it
     */
    void render(ReportInput input, FileReport file, String id, StringBuilder page);
}
