package dev.mesolint.core.review;

/**
 * Invented test programmes of the fictional Harbourside Strength Club, with the values a review test changes as
 * parameters. One week: Upper on day 1 (bench press, cable row, lateral raise), Lower on day 3 (squat, leg curl).
 */
final class ReviewProgrammes {
    private ReviewProgrammes() {
    }

    static String block(int benchSets, String rowRest, String squatLoad) {
        return """
                format: 1
                programme:
                  id: harbour-review-block
                  title: Harbourside review test block
                  author: Harbourside Strength Club coaching team
                  level: intermediate
                  goal: hypertrophy
                  session-minutes: 60
                  units: kg
                athlete:
                  one-rep-max:
                    barbell-bench-press: 100kg
                    barbell-back-squat: 120kg
                weeks:
                  - week: 1
                    sessions:
                      - day: 1
                        name: Upper
                        work:
                          - exercise: barbell-bench-press
                            sets: %d
                            reps: 8
                            load: 70%%
                            rir: 2
                            rest: 3min
                          - exercise: seated-cable-row
                            sets: 3
                            reps: 10
                            rir: 2
                            rest: %s
                          - exercise: dumbbell-lateral-raise
                            sets: 3
                            reps: 12
                            rir: 2
                            rest: 60s
                      - day: 3
                        name: Lower
                        work:
                          - exercise: barbell-back-squat
                            sets: 3
                            reps: 8
                            load: %s
                            rir: 2
                            rest: 3min
                          - exercise: machine-seated-leg-curl
                            sets: 3
                            reps: 10
                            rir: 2
                            rest: 90s
                """.formatted(benchSets, rowRest, squatLoad);
    }

    static String block() {
        return block(3, "2min", "70%");
    }
}
