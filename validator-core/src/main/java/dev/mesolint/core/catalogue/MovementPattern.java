package dev.mesolint.core.catalogue;

/** The movement pattern of an exercise. */
public enum MovementPattern implements Named {
    SQUAT, HINGE, LUNGE, HORIZONTAL_PUSH, VERTICAL_PUSH, HORIZONTAL_PULL, VERTICAL_PULL, ELBOW_FLEXION,
    ELBOW_EXTENSION, KNEE_EXTENSION, KNEE_FLEXION, HIP_EXTENSION, CALF_RAISE, LATERAL_RAISE, CORE, CARRY
}
