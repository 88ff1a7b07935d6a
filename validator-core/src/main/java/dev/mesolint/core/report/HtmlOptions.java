package dev.mesolint.core.report;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.value.Load;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * How the coach's report and the athlete's sheet are written, beyond the run itself.
 *
 * @param plateIncrement the repository's loading step for programmes that set none; empty for the default
 * @param showReasons    whether the reasons of the athlete's constraints (health data) are shown; false for a report
 *                       that will be shared
 * @param catalogue      the run's catalogue, for exercise names and the regions a load cap applies to
 * @param sections       extra per-programme sections, written after the findings in this order
 */
public record HtmlOptions(Optional<Load.Absolute> plateIncrement, boolean showReasons, Catalogue catalogue,
        List<ProgrammeSection> sections) {

    /** Default step, reasons shown, no catalogue, no extra sections. */
    public static final HtmlOptions DEFAULTS = new HtmlOptions(Optional.empty(), true, Catalogue.of(List.of()),
            List.of());

    public HtmlOptions {
        Objects.requireNonNull(plateIncrement, "plateIncrement");
        Objects.requireNonNull(catalogue, "catalogue");
        sections = List.copyOf(sections);
    }

    public HtmlOptions withPlateIncrement(Optional<Load.Absolute> step) {
        return new HtmlOptions(step, showReasons, catalogue, sections);
    }

    public HtmlOptions withReasons(boolean show) {
        return new HtmlOptions(plateIncrement, show, catalogue, sections);
    }

    public HtmlOptions withCatalogue(Catalogue newCatalogue) {
        return new HtmlOptions(plateIncrement, showReasons, newCatalogue, sections);
    }

    /** These options with {@code section} added after the existing ones. */
    public HtmlOptions withSection(ProgrammeSection section) {
        List<ProgrammeSection> all = new java.util.ArrayList<>(sections);
        all.add(section);
        return new HtmlOptions(plateIncrement, showReasons, catalogue, all);
    }
}
