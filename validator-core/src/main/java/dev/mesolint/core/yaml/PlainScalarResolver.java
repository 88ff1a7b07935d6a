package dev.mesolint.core.yaml;

import org.yaml.snakeyaml.nodes.NodeId;
import org.yaml.snakeyaml.nodes.Tag;
import org.yaml.snakeyaml.resolver.Resolver;

/**
 * Gives every untagged plain scalar the tag {@link #PLAIN} instead of matching it against SnakeYAML's YAML 1.1
 * regular expressions (a tenth of the parse): {@link NodeConverter} types plain scalars by the YAML 1.2 core schema
 * itself, and every text it reads as null, a boolean or a number is one YAML 1.1 also reads as other than a string
 * (tested), so the result is the same as resolving first. The merge key {@code <<} and {@code =} still get
 * SnakeYAML's tags; quoted and explicitly tagged scalars, sequences and mappings are tagged as before.
 *
 * <p>Thread-safe: it holds no state once built.
 */
final class PlainScalarResolver extends Resolver {
    /** The tag of a plain scalar left for {@link NodeConverter} to type. */
    static final Tag PLAIN = new Tag("tag:mesolint.dev,2026:plain");
    private static final Resolver YAML_11 = new Resolver();

    @Override
    protected void addImplicitResolvers() {
        // none: plain scalars are resolved below, without a regular expression
    }

    @Override
    public Tag resolve(NodeId kind, String value, boolean implicit) {
        if (kind == NodeId.scalar && implicit) {
            boolean merge = value.length() == 2 ? value.charAt(0) == '<' && value.charAt(1) == '<'
                    : value.length() == 1 && value.charAt(0) == '=';
            return merge ? YAML_11.resolve(kind, value, true) : PLAIN;
        }
        return super.resolve(kind, value, implicit);
    }
}
