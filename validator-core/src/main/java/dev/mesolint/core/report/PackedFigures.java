package dev.mesolint.core.report;

import dev.mesolint.core.engine.FileReport;
import dev.mesolint.core.engine.RuleConfiguration;
import dev.mesolint.core.rule.RuleDefinition;
import java.io.ByteArrayOutputStream;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.zip.DataFormatException;
import java.util.zip.Deflater;
import java.util.zip.Inflater;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The JSON report's figures, packed as each file is checked: its {@code programme} and {@code metrics} objects as
 * compact, deflated JSON (a few KB a programme, where the model it is made from holds tens), so that the model can be
 * dropped at once and a JSON report of 10,000 programmes fits a 256 MB heap. Reports other than JSON see no figures.
 *
 * <p>Thread-safe: files are packed in parallel.
 */
public final class PackedFigures implements ReportFigures, JsonFigures {
    private final ModelFigures model;
    private final Map<String, Packed> packed = new ConcurrentHashMap<>();

    PackedFigures(ModelFigures model) {
        this.model = model;
    }

    /** Figures whose bounds are each file's profile's weekly volume limits, as {@link ModelFigures#underProfiles}. */
    public static PackedFigures underProfiles(RuleConfiguration configuration, List<? extends RuleDefinition> rules) {
        return new PackedFigures(ModelFigures.underProfiles(configuration, rules));
    }

    /**
     * Packs what the JSON report shows of {@code checked}'s programme and returns the report without the model; a
     * report without a programme is returned as it is.
     */
    public FileReport pack(FileReport checked) {
        if (checked.programme().isEmpty() && checked.metrics().isEmpty()) {
            return checked;
        }
        ObjectNode shown = JsonText.object();
        checked.programme().ifPresent(p -> shown.set("programme", JsonReport.programme(p)));
        Optional<ProgrammeFigures> figures = model.of(checked);
        figures.ifPresent(f -> shown.set("metrics", JsonReport.metrics(f)));
        packed.put(checked.displayPath(), new Packed(deflate(JsonText.compact(shown)), figures.isPresent()));
        return new FileReport(checked.displayPath(), Optional.empty(), checked.profile(), checked.findings(),
                Optional.empty(), checked.timing(), checked.identity(), checked.checkedAs());
    }

    /** Packed figures are for the JSON report only. */
    @Override
    public Optional<ProgrammeFigures> of(FileReport file) {
        return Optional.empty();
    }

    @Override
    public Optional<ObjectNode> programme(FileReport file) {
        return part(file, "programme");
    }

    @Override
    public Optional<ObjectNode> metrics(FileReport file) {
        return part(file, "metrics");
    }

    @Override
    public boolean hasMetrics(FileReport file) {
        Packed p = packed.get(file.displayPath());
        return p != null && p.hasMetrics();
    }

    /** One file's packed objects, and whether they include its figures (without unpacking them to know). */
    private record Packed(byte[] json, boolean hasMetrics) {
    }

    private Optional<ObjectNode> part(FileReport file, String name) {
        Packed p = packed.get(file.displayPath());
        if (p == null) {
            return Optional.empty();
        }
        JsonNode part = JsonText.parse(inflate(p.json())).get(name);
        return part instanceof ObjectNode o ? Optional.of(o) : Optional.empty();
    }

    private static byte[] deflate(byte[] data) {
        Deflater deflater = new Deflater(Deflater.BEST_SPEED);
        try {
            deflater.setInput(data);
            deflater.finish();
            ByteArrayOutputStream out = new ByteArrayOutputStream(data.length / 4 + 64);
            byte[] buffer = new byte[8192];
            while (!deflater.finished()) {
                out.write(buffer, 0, deflater.deflate(buffer));
            }
            return out.toByteArray();
        } finally {
            deflater.end();
        }
    }

    private static byte[] inflate(byte[] data) {
        Inflater inflater = new Inflater();
        try {
            inflater.setInput(data);
            ByteArrayOutputStream out = new ByteArrayOutputStream(data.length * 6);
            byte[] buffer = new byte[8192];
            while (!inflater.finished()) {
                int n = inflater.inflate(buffer);
                if (n == 0 && inflater.needsInput()) {
                    throw new IllegalStateException("packed figures are truncated");
                }
                out.write(buffer, 0, n);
            }
            return out.toByteArray();
        } catch (DataFormatException e) {
            throw new IllegalStateException("packed figures are damaged", e);
        } finally {
            inflater.end();
        }
    }
}
