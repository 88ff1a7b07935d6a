package dev.mesolint.core.rule;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.finding.Anchor;
import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.model.ProgrammeMetrics;
import dev.mesolint.core.programme.Programme;
import dev.mesolint.core.programme.Waiver;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.LocatedDocument;
import java.util.ArrayList;
import java.util.Collections;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Set;

/**
 * Per-file state of one run: the loaded programme, the findings so far and which waivers were used.
 * Confined to the thread that checks the file.
 */
public final class FileScope {
    private final String displayPath;
    private final Programme programme;
    private final Catalogue catalogue;
    private final LocatedDocument document;
    private final String profileName;
    private final List<Finding> findings = new ArrayList<>();
    private final Set<Waiver> used = Collections.newSetFromMap(new IdentityHashMap<>());

    private final ProgrammeMetrics metrics;
    private FileIndex index;
    private Anchors.Paths paths;

    public FileScope(String displayPath, Programme programme, Catalogue catalogue, LocatedDocument document,
            String profileName, ProgrammeMetrics metrics) {
        this.metrics = metrics;
        this.displayPath = displayPath;
        this.programme = programme;
        this.catalogue = catalogue;
        this.document = document;
        this.profileName = profileName;
    }

    public String displayPath() {
        return displayPath;
    }

    public Programme programme() {
        return programme;
    }

    public Catalogue catalogue() {
        return catalogue;
    }

    public LocatedDocument document() {
        return document;
    }

    public ProgrammeMetrics metrics() {
        return metrics;
    }

    public String profileName() {
        return profileName;
    }

    /** The lookups rules share in this file, made on first use. */
    public FileIndex index() {
        if (index == null) {
            index = new FileIndex(catalogue, programme.weeks(), metrics.parameters(), metrics.weeks());
        }
        return index;
    }

    /** The anchor of a finding at {@code location}: this programme's id and the node's logical path. */
    public Anchor anchor(Location location) {
        if (paths == null && document != null) {
            paths = new Anchors.Paths(document.root());
        }
        return Anchors.of(paths, programme.info().id(), displayPath, location.pointer());
    }

    /** Records a finding, waived when a waiver at its place (or for the whole file) names its rule. */
    void add(Finding finding, List<Waiver> waivers) {
        Waiver match = covering(waivers, finding.ruleId());
        if (match == null) {
            match = covering(programme.fileWaivers(), finding.ruleId());
        }
        if (match != null) {
            used.add(match);
            findings.add(finding.waivedBy(match));
        } else {
            findings.add(finding);
        }
    }

    /** The first of {@code waivers} that names {@code ruleId}; null when none does. */
    private static Waiver covering(List<Waiver> waivers, String ruleId) {
        for (Waiver w : waivers) {
            if (w.covers(ruleId)) {
                return w;
            }
        }
        return null;
    }

    public List<Finding> findings() {
        return List.copyOf(findings);
    }

    public boolean used(Waiver waiver) {
        return used.contains(waiver);
    }
}
