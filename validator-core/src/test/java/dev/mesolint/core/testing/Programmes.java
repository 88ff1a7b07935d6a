package dev.mesolint.core.testing;

/** Small programme texts for tests (invented Harbourside Strength Club demo data). */
public final class Programmes {
    private Programmes() {
    }

    /** A valid header; append {@code weeks:}. */
    public static final String HEADER = """
            format: 1
            programme:
              id: harbour-test
              title: Harbourside test block
              level: intermediate
              goal: hypertrophy
              session-minutes: 60
            """;

    /** A complete valid one-week programme. */
    public static String oneWeek() {
        return HEADER + """
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        name: Upper A
                        work:
                          - exercise: barbell-bench-press
                            sets: 3
                            reps: 8
                            rir: 2
                            rest: 3min
                """;
    }
}
