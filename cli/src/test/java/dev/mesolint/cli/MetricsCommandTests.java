package dev.mesolint.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.mesolint.core.Mesolint;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class MetricsCommandTests {
    @TempDir
    Path dir;

    @Test
    void printsTheWeeklyTableAndWritesJsonAndCsv() throws Exception {
        StringWriter out = new StringWriter();
        // Folders that do not exist yet are created, as for every output.
        Path json = dir.resolve("reports/figures/metrics.json");
        Path csv = dir.resolve("reports/sheets/metrics.csv");
        int exit = MesolintCommand.execute(new String[] {"metrics", "--root", "..", "--json", json.toString(), "--csv",
            csv.toString(), "../sample-programs/programmes/novice-full-body.yaml"}, new PrintWriter(out, true),
                new PrintWriter(new StringWriter(), true));
        assertEquals(0, exit, out.toString());
        assertTrue(out.toString().contains("Credited hard sets per week"), out.toString());
        assertTrue(out.toString().contains("quadriceps"), out.toString());
        String text = Files.readString(json);
        assertTrue(text.contains("\"file\" : \"sample-programs/programmes/novice-full-body.yaml\"")
                || text.contains("\"file\":\"sample-programs/programmes/novice-full-body.yaml\""), text.substring(0, 300));
        assertTrue(text.contains(Mesolint.CAUTION), "the caution is in the JSON");
        List<String> rows = Files.readAllLines(csv);
        assertTrue(rows.size() > 10, "one row per set plus a header");
        String last = rows.get(rows.size() - 1);
        assertTrue(last.startsWith("\"Caution: " + Mesolint.CAUTION.substring(0, 30)), last);
        assertEquals(rows.get(0).split(",", -1).length, last.replaceAll("\"[^\"]*\"", "x").split(",", -1).length,
                "the caution row keeps the table's width");
    }

    @Test
    void aFileThatDoesNotLoadIsReportedAndExitsOne() {
        StringWriter err = new StringWriter();
        int exit = MesolintCommand.execute(new String[] {"metrics", "../sample-programs/broken/schema.yaml"},
                new PrintWriter(new StringWriter(), true), new PrintWriter(err, true));
        assertEquals(1, exit);
        assertTrue(err.toString().contains("error schema:"), err.toString());
    }
}
