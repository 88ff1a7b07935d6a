package dev.mesolint.core.review;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What a change did to one programme file.
 *
 * @param before        the file's path at the base; empty when the programme was added
 * @param after         the file's path at the head; empty when it was removed
 * @param programmeId   the programme's id (the head's, else the base's); empty when the file loaded on neither side
 * @param profileBefore the profile the base was checked under
 * @param loadedBefore  whether the base file loaded (parsed, valid, bound): figures exist only for loaded files
 * @param units         the unit of the volume loads, {@code kg} or {@code lb}
 */
public record ProgrammeChange(Status status, Optional<String> before, Optional<String> after,
        Optional<String> programmeId, Optional<String> profileBefore, Optional<String> profileAfter,
        boolean loadedBefore, boolean loadedAfter, Optional<String> units, FigureChanges figures,
        List<LimitCrossing> limits, FindingChanges findings) {

    /** What happened to the file. */
    public enum Status {
        ADDED("added"), REMOVED("removed"), RENAMED("renamed"), EDITED("edited"), UNCHANGED("unchanged");

        private final String words;

        Status(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    public ProgrammeChange {
        Objects.requireNonNull(status, "status");
        limits = List.copyOf(limits);
        Objects.requireNonNull(figures, "figures");
        Objects.requireNonNull(findings, "findings");
    }

    /** The path reviewers know the file by: the head's, else the base's. */
    public String path() {
        return after.or(() -> before).orElseThrow();
    }

    public boolean profileChanged() {
        return profileBefore.isPresent() && profileAfter.isPresent() && !profileBefore.equals(profileAfter);
    }

    /** True when there is anything to show: the file, a figure, a limit, a finding or the profile changed. */
    public boolean changed() {
        return status != Status.UNCHANGED || figures.changed() || !limits.isEmpty() || findings.changed()
                || profileChanged();
    }
}
