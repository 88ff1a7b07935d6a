package dev.mesolint.cli;

/** A team catalogue file of the fictional Harbourside Strength Club, shared by the CLI tests that need one. */
final class ClubCatalogue {
    /** One club exercise the built-in catalogue lacks: a sled push, credited like a squat pattern. */
    static final String SLED_PUSH = """
            format: 1
            exercises:
              - id: harbour-sled-push
                name: Harbourside sled push
                kind: compound
                pattern: squat
                stability: stable
                skill: low
                muscles: {quadriceps: 1, glutes: 0.5}
                regions: [knee, hip, ankle]
            """;

    private ClubCatalogue() {
    }
}
