/**
 * Rule-set versions: what the built-in rules decide, as a version a repository records ({@code rules-version:}),
 * the changes between versions, and the notice a run gives when the two differ.
 */
package dev.mesolint.core.ruleset;
