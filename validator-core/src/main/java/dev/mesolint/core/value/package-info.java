/** Small, strict parsers for prescription values: durations, loads, reps, RIR, RPE and tempo. */
package dev.mesolint.core.value;
