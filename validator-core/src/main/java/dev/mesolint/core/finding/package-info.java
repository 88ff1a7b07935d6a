/** Findings: what a rule reports, and how severe it is. */
package dev.mesolint.core.finding;
