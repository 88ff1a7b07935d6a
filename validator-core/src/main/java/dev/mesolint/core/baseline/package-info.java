/** Baselines: today's findings recorded so that only new findings fail a build. */
package dev.mesolint.core.baseline;
