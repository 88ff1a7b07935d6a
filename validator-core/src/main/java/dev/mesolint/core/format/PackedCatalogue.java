package dev.mesolint.core.format;

import dev.mesolint.core.catalogue.Catalogue;
import dev.mesolint.core.catalogue.Exercise;
import dev.mesolint.core.catalogue.ExerciseKind;
import dev.mesolint.core.catalogue.MovementPattern;
import dev.mesolint.core.catalogue.Muscle;
import dev.mesolint.core.catalogue.Region;
import dev.mesolint.core.catalogue.Role;
import dev.mesolint.core.catalogue.Skill;
import dev.mesolint.core.catalogue.Stability;
import dev.mesolint.core.source.Location;
import dev.mesolint.core.yaml.LocatedYamlReader;
import dev.mesolint.core.yaml.YamlLimits;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.DataInputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.zip.CRC32;

/**
 * The built-in catalogue's entries as the build read them, packed: reading the YAML text at start-up (parse, schema,
 * binding, all of it cold) was a sixth of a one-file check, unpacking it is a fiftieth of that. The build writes the
 * pack beside the YAML ({@link #main}, run by Maven after compiling) from the very entries {@link CatalogueReader}
 * reads, with the checksum of the text it read; a pack whose checksum does not match the YAML shipped beside it (an
 * edited catalogue not yet rebuilt, say) or that does not unpack cleanly is never used, and the YAML is read instead.
 */
public final class PackedCatalogue {
    /** Where the build puts the pack, beside {@link CatalogueReader#BUILT_IN}. */
    static final String RESOURCE = "/dev/mesolint/catalogue/exercises.packed";
    private static final int MAGIC = 0x4d4c4331; // "MLC1"

    private PackedCatalogue() {
    }

    /** Writes the pack of the built-in catalogue to {@code args[0]}; the build runs it once the classes are compiled. */
    public static void main(String[] args) throws IOException {
        if (args.length != 1) {
            throw new IllegalArgumentException("usage: PackedCatalogue OUTPUT-FILE");
        }
        byte[] yaml = CatalogueReader.builtInText();
        CatalogueReader reader = new CatalogueReader(new LocatedYamlReader(YamlLimits.DEFAULTS),
                FormatSchema.load(FormatSchema.CATALOGUE));
        List<Exercise> entries = reader.readBuiltIn(yaml);
        Path out = Path.of(args[0]);
        Files.createDirectories(out.toAbsolutePath().getParent());
        Files.write(out, pack(entries, checksum(yaml)));
    }

    /** The entries of the pack on the class path, if there is one made from exactly {@code yaml}. */
    static Optional<Catalogue> builtIn(byte[] yaml) {
        try (InputStream in = PackedCatalogue.class.getResourceAsStream(RESOURCE)) {
            return in == null ? Optional.empty() : unpack(in.readAllBytes(), checksum(yaml)).map(Catalogue::of);
        } catch (IOException e) {
            return Optional.empty();
        }
    }

    static long checksum(byte[] text) {
        CRC32 crc = new CRC32();
        crc.update(text);
        return crc.getValue() ^ ((long) text.length << 32);
    }

    static byte[] pack(List<Exercise> entries, long checksum) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (DataOutputStream out = new DataOutputStream(bytes)) {
            out.writeInt(MAGIC);
            out.writeLong(checksum);
            out.writeInt(entries.size());
            for (Exercise e : entries) {
                out.writeUTF(e.id());
                out.writeUTF(e.name());
                out.writeUTF(e.kind().name());
                out.writeUTF(e.pattern().name());
                out.writeUTF(e.stability().name());
                out.writeUTF(e.skill().name());
                out.writeInt(e.muscles().size());
                for (Map.Entry<Muscle, Double> m : e.muscles().entrySet()) {
                    out.writeUTF(m.getKey().name());
                    out.writeDouble(m.getValue());
                }
                out.writeInt(e.regions().size());
                for (Region r : e.regions()) {
                    out.writeUTF(r.name());
                }
                out.writeBoolean(e.ballistic());
                out.writeUTF(e.role().map(Role::name).orElse(""));
                out.writeUTF(e.origin());
                Location at = e.location();
                out.writeInt(at.line());
                out.writeInt(at.column());
                out.writeInt(at.endLine());
                out.writeInt(at.endColumn());
                out.writeUTF(at.pointer());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bytes.toByteArray();
    }

    /** The entries of {@code pack} when it was made from the text with {@code checksum}; empty when not, or damaged. */
    static Optional<List<Exercise>> unpack(byte[] pack, long checksum) {
        try (DataInputStream in = new DataInputStream(new ByteArrayInputStream(pack))) {
            if (in.readInt() != MAGIC || in.readLong() != checksum) {
                return Optional.empty();
            }
            int count = in.readInt();
            List<Exercise> entries = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                entries.add(entry(in));
            }
            return in.read() == -1 ? Optional.of(entries) : Optional.empty();
        } catch (IOException | IllegalArgumentException e) {
            return Optional.empty(); // truncated, or a name this build does not know
        }
    }

    private static Exercise entry(DataInputStream in) throws IOException {
        String id = in.readUTF();
        String name = in.readUTF();
        ExerciseKind kind = ExerciseKind.valueOf(in.readUTF());
        MovementPattern pattern = MovementPattern.valueOf(in.readUTF());
        Stability stability = Stability.valueOf(in.readUTF());
        Skill skill = Skill.valueOf(in.readUTF());
        Map<Muscle, Double> muscles = new LinkedHashMap<>();
        for (int m = in.readInt(); m > 0; m--) {
            muscles.put(Muscle.valueOf(in.readUTF()), in.readDouble());
        }
        Set<Region> regions = EnumSet.noneOf(Region.class);
        for (int r = in.readInt(); r > 0; r--) {
            regions.add(Region.valueOf(in.readUTF()));
        }
        boolean ballistic = in.readBoolean();
        String role = in.readUTF();
        String origin = in.readUTF();
        Location at = new Location(in.readInt(), in.readInt(), in.readInt(), in.readInt(), in.readUTF());
        return new Exercise(id, name, kind, pattern, stability, skill, muscles, regions, ballistic,
                role.isEmpty() ? Optional.empty() : Optional.of(Role.valueOf(role)), origin, at);
    }
}
