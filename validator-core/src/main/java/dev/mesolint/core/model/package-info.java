/**
 * The training model: resolves every working set to reps and reps in reserve, then computes stimulating reps,
 * fatigue between sets, session dose-response, weekly and block figures. docs/model.md explains every formula.
 *
 * <p>Entry point: {@link dev.mesolint.core.model.ProgrammeMetrics#compute}. Population-level guidance, not a medical
 * assessment.
 */
package dev.mesolint.core.model;
