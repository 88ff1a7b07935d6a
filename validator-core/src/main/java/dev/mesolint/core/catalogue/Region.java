package dev.mesolint.core.catalogue;

/** Joints and spine regions an exercise loads, matched against athlete constraints. */
public enum Region implements Named {
    NECK, SHOULDER, ELBOW, WRIST, UPPER_BACK, LOWER_BACK, HIP, KNEE, ANKLE
}
