package dev.mesolint.core.model;

import dev.mesolint.core.programme.SetPrescription;

/** Whether two sets of one entry state the same effort, so that the later can reuse the earlier's resolution. */
final class SamePrescription {
    private SamePrescription() {
    }

    /** Same reps, RIR, RPE, load, 1RM test and technique: everything {@link SetWork} is computed from. */
    static boolean effortAndTechnique(SetPrescription a, SetPrescription b) {
        return a.test() == b.test() && same(a.reps(), b.reps()) && same(a.rir(), b.rir()) && same(a.rpe(), b.rpe())
                && same(a.load(), b.load()) && same(a.technique(), b.technique());
    }

    private static boolean same(Object a, Object b) {
        return a == b || a.equals(b);
    }
}
