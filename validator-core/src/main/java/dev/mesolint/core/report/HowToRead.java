package dev.mesolint.core.report;

/** The short "how to read this" box at the top of the coach's report: every figure's meaning and unit. */
final class HowToRead {
    private HowToRead() {
    }

    static void render(StringBuilder page) {
        page.append("""
                <aside class="how-to-read" aria-labelledby="how-to-read">
                <h2 id="how-to-read">How to read this report</h2>
                <dl>
                <div><dt>Result</dt><dd>✔ passes: no finding at or above the fail level; ✖ fails: at least one.
                Severities carry a shape as well as a colour: ✖ error, ▲ warning, ● info, ○ waived.</dd></div>
                <div><dt>Prescription</dt><dd>The programme as written, week by session. Loads in kg or lb are worked
                out from the athlete's 1RM and rounded to the plate increment; ↓ marks a load rounded down. Δ marks an
                entry that differs from the week before. Each row lists its findings and links to its line.</dd></div>
                <div><dt>Hard set</dt><dd>A working set taken within the profile's reps-in-reserve limit of failure,
                credited 1 to each prime mover and ½ to each synergist.</dd></div>
                <div><dt>Stimulus</dt><dd>In fresh-set equivalents: 1 is what one hard set gives a muscle when done
                without fatigue. <em>Lost to fatigue</em> is what fatigue from the session's earlier sets takes from
                the later ones.</dd></div>
                <div><dt>Session minutes</dt><dd>An estimate from reps, tempo, rests, warm-up sets and changeovers,
                against the programme's budget.</dd></div>
                </dl>
                </aside>
                """);
    }
}
