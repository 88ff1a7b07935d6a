package dev.mesolint.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Element;
import org.w3c.dom.Node;
import org.w3c.dom.NodeList;

/**
 * Every user property is {@code mesolint.} and the parameter's own name, as docs/maven-plugin.md promises. Read from
 * the plugin descriptor the build generates, as Maven reads it ({@code @Parameter} is not kept at run time).
 */
class ParameterNamesTests {
    private static final Pattern PROPERTY = Pattern.compile("\\$\\{(mesolint\\.[^}]*)}");

    @Test
    void eachParameterIsNamedAsItsProperty() throws Exception {
        List<String> mismatched = new ArrayList<>();
        List<String> seen = new ArrayList<>();
        try (InputStream in = getClass().getResourceAsStream("/META-INF/maven/plugin.xml")) {
            assertNotNull(in, "the plugin descriptor is generated before the tests run");
            NodeList configurations = DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(in)
                    .getElementsByTagName("configuration");
            for (int c = 0; c < configurations.getLength(); c++) {
                NodeList values = configurations.item(c).getChildNodes();
                for (int v = 0; v < values.getLength(); v++) {
                    Node value = values.item(v);
                    Matcher m = PROPERTY.matcher(value.getTextContent().trim());
                    if (value instanceof Element && m.matches()) {
                        seen.add(value.getNodeName());
                        if (!m.group(1).equals("mesolint." + value.getNodeName())) {
                            mismatched.add(value.getNodeName() + " <- " + m.group(1));
                        }
                    }
                }
            }
        }
        assertEquals(List.of(), mismatched);
        assertTrue(seen.contains("allowEmpty") && seen.contains("failOn"), "parameters read: " + seen);
    }
}
