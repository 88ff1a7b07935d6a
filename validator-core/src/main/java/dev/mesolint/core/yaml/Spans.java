package dev.mesolint.core.yaml;

import dev.mesolint.core.source.Location;
import java.util.Arrays;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.nodes.Node;

/**
 * Where nodes were written, packed four ints a node (line, column, end line, end column; 1-based as in
 * {@link Location}), so a tree keeps every node's place without an object per node; a {@link Location} is made only
 * when one is asked for.
 */
final class Spans {
    private int[] ints;
    private int count;

    Spans(int capacity) {
        ints = new int[Math.max(1, capacity) * 4];
    }

    /** Appends the span of {@code node}. */
    void add(Node node) {
        add(node.getStartMark(), node.getEndMark());
    }

    /** Appends the span from {@code start} to {@code end}, the marks of a node's first and last events. */
    void add(Mark start, Mark end) {
        if ((count + 1) * 4 > ints.length) {
            ints = Arrays.copyOf(ints, ints.length * 2);
        }
        int at = count * 4;
        ints[at] = line(start);
        ints[at + 1] = column(start);
        ints[at + 2] = line(end);
        ints[at + 3] = column(end);
        count++;
    }

    int size() {
        return count;
    }

    Location location(int index, String pointer) {
        int at = index * 4;
        return new Location(ints[at], ints[at + 1], ints[at + 2], ints[at + 3], pointer);
    }

    /** The place of a node not kept in any container (the root, or a node named in a problem). */
    static Location of(Node node, String pointer) {
        return of(node.getStartMark(), node.getEndMark(), pointer);
    }

    static Location of(Mark start, Mark end, String pointer) {
        return new Location(line(start), column(start), line(end), column(end), pointer);
    }

    // A node without a mark (none that SnakeYAML composes) is placed at the start of the file.
    private static int line(Mark mark) {
        return mark == null ? 1 : mark.getLine() + 1;
    }

    private static int column(Mark mark) {
        return mark == null ? 1 : mark.getColumn() + 1;
    }
}
