/**
 * The result cache: findings of unchanged programme files reused across runs, keyed on each file's content, the
 * effective configuration and the tool version. No front-end types; the Maven plugin uses it and the CLI can.
 */
package dev.mesolint.core.cache;
