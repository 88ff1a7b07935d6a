package dev.mesolint.cli;

/** A one-session programme of the fictional Harbourside Strength Club: 4x8 back squats, the rest between sets given. */
final class SquatDay {
    private SquatDay() {
    }

    /**
     * The programme with id {@code id} and {@code rest} after each set. Under hypertrophy, 60 s gives one
     * short-rest-compound warning (the default asks 2 min after heavy compound work; rules.md); 3 min gives none.
     */
    static String resting(String id, String rest) {
        return """
                # Invented demo programme of the fictional Harbourside Strength Club.
                format: 1
                programme:
                  id: %s
                  level: intermediate
                  goal: hypertrophy
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        work:
                          - exercise: barbell-back-squat
                            sets: 4
                            reps: 8
                            rir: 2
                            rest: %s
                """.formatted(id, rest);
    }
}
