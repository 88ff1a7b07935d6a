package dev.mesolint.core.yaml;

import java.util.HashSet;
import java.util.Set;
import org.yaml.snakeyaml.LoaderOptions;
import org.yaml.snakeyaml.error.Mark;
import org.yaml.snakeyaml.events.CollectionStartEvent;
import org.yaml.snakeyaml.events.Event;
import org.yaml.snakeyaml.events.ScalarEvent;
import org.yaml.snakeyaml.nodes.NodeId;
import org.yaml.snakeyaml.nodes.Tag;
import org.yaml.snakeyaml.parser.Parser;
import org.yaml.snakeyaml.parser.ParserImpl;
import org.yaml.snakeyaml.resolver.Resolver;
import tools.jackson.databind.JsonNode;

/**
 * The one-pass road from YAML text to a located tree: builds, straight from the parser's events, the very
 * {@link LocatedDocument} that SnakeYAML's composer and {@link NodeConverter} build in two passes, for the documents
 * nearly every programme is: one document, a mapping at the root, no anchor, alias, tag, merge key or repeated key,
 * well within the limits. For anything else, a syntax error included, it answers "not here" ({@code null}) and the
 * reader takes the general road, which reads the text again and says what is wrong exactly as it always has.
 *
 * <p>So it never decides what a document means on its own: it only skips building the composer's node graph (a node
 * and a tuple per value, an identity set per collection) where that graph could only have been converted one way.
 */
final class DirectTreeBuilder {
    /** Thrown to leave a document for the general road; one instance, no stack trace, never seen outside. */
    private static final class NotHere extends RuntimeException {
        private static final long serialVersionUID = 1L;
        static final NotHere INSTANCE = new NotHere();

        private NotHere() {
            super("left for the composer", null, false, false);
        }
    }

    private final Parser parser;
    private final Resolver resolver;
    /** Below the limits the general road enforces, so that a tree built here is one that road would build too. */
    private final int maxDepth;
    private final int maxNodes;
    private int nodes;
    /** The marks of the node built last: where its first event starts and its last event ends. */
    private Mark start;
    private Mark end;

    private DirectTreeBuilder(String text, LoaderOptions options, Resolver resolver, YamlLimits limits) {
        this.parser = new ParserImpl(WholeTextReader.of(text), options);
        this.resolver = resolver;
        this.maxDepth = Math.min(limits.maxDepth(), options.getNestingDepthLimit()) - 1;
        this.maxNodes = limits.maxNodes() - 1;
    }

    /** The document {@code text} holds, or null when the general road must read it (see the class comment). */
    static LocatedDocument build(String text, LoaderOptions options, Resolver resolver, YamlLimits limits) {
        try {
            return new DirectTreeBuilder(text, options, resolver, limits).document();
        } catch (RuntimeException | StackOverflowError e) {
            // NotHere, a syntax error or a limit the parser enforces: the general road meets it again and reports it.
            return null;
        }
    }

    private LocatedDocument document() {
        expect(Event.ID.StreamStart);
        expect(Event.ID.DocumentStart);
        if (!parser.checkEvent(Event.ID.MappingStart)) {
            throw NotHere.INSTANCE; // a list, a scalar or nothing at the root: rare, and a problem the binder words
        }
        JsonNode root = node(0);
        Mark rootStart = start;
        Mark rootEnd = end;
        expect(Event.ID.DocumentEnd);
        expect(Event.ID.StreamEnd); // a second document is the general road's to report
        return new LocatedDocument(root, Spans.of(rootStart, rootEnd, ""));
    }

    private void expect(Event.ID id) {
        if (!parser.checkEvent(id)) {
            throw NotHere.INSTANCE;
        }
        parser.getEvent();
    }

    /** The node whose first event is next, at {@code depth}; leaves its marks in {@link #start} and {@link #end}. */
    private JsonNode node(int depth) {
        if (++nodes > maxNodes || depth > maxDepth) {
            throw NotHere.INSTANCE;
        }
        Event event = parser.getEvent();
        switch (event.getEventId()) {
            case Scalar:
                return scalar((ScalarEvent) event);
            case SequenceStart:
                return sequence((CollectionStartEvent) event, depth);
            case MappingStart:
                return mapping((CollectionStartEvent) event, depth);
            default:
                throw NotHere.INSTANCE; // an alias
        }
    }

    private JsonNode scalar(ScalarEvent event) {
        Tag tag = plainTag(event);
        start = event.getStartMark();
        end = event.getEndMark();
        return NodeConverter.scalar(event.getValue(), event.getScalarStyle(), tag);
    }

    /** The tag the composer would give an untagged, unanchored scalar; only a plain or string one is built here. */
    private Tag plainTag(ScalarEvent event) {
        if (event.getAnchor() != null || event.getTag() != null) {
            throw NotHere.INSTANCE;
        }
        Tag tag = resolver.resolve(NodeId.scalar, event.getValue(), event.getImplicit().canOmitTagInPlainScalar());
        if (tag != PlainScalarResolver.PLAIN && tag != Tag.STR) {
            throw NotHere.INSTANCE; // the merge key '<<' and '=' keep SnakeYAML's own tags
        }
        return tag;
    }

    private void plainCollection(CollectionStartEvent event, NodeId kind, Tag expected) {
        if (event.getAnchor() != null || event.getTag() != null
                || resolver.resolve(kind, null, event.getImplicit()) != expected) {
            throw NotHere.INSTANCE;
        }
    }

    private JsonNode sequence(CollectionStartEvent event, int depth) {
        plainCollection(event, NodeId.sequence, Tag.SEQ);
        Mark first = event.getStartMark();
        LocatedArray array = new LocatedArray(4);
        while (!parser.checkEvent(Event.ID.SequenceEnd)) {
            JsonNode item = node(depth + 1);
            array.add(item, start, end);
        }
        start = first;
        end = parser.getEvent().getEndMark();
        return array;
    }

    private JsonNode mapping(CollectionStartEvent event, int depth) {
        plainCollection(event, NodeId.mapping, Tag.MAP);
        Mark first = event.getStartMark();
        LocatedObject object = new LocatedObject(8);
        Set<String> seen = null;
        int count = 0;
        while (!parser.checkEvent(Event.ID.MappingEnd)) {
            Event keyEvent = parser.getEvent();
            if (!(keyEvent instanceof ScalarEvent key)) {
                throw NotHere.INSTANCE; // a list or mapping as a key, or an alias
            }
            plainTag(key);
            String name = KeyNames.canonical(key.getValue());
            if (++count > NodeConverter.SCANNED_KEYS) { // then by hashing, as the converter does
                if (seen == null) {
                    seen = new HashSet<>();
                    for (int i = 0; i < NodeConverter.SCANNED_KEYS; i++) {
                        seen.add(object.name(i));
                    }
                }
                if (!seen.add(name)) {
                    throw NotHere.INSTANCE;
                }
            } else if (object.indexOf(name) >= 0) {
                throw NotHere.INSTANCE; // a repeated key: the general road words it with both places
            }
            JsonNode value = node(depth + 1);
            object.add(name, value, key.getStartMark(), key.getEndMark(), start, end);
        }
        start = first;
        end = parser.getEvent().getEndMark();
        return object;
    }
}
