/**
 * Reading a programme repository's history with JGit (no {@code git} binary): revisions, the files changed between
 * two of them with renames followed, and a revision's programme files written out to be checked.
 */
package dev.mesolint.core.git;
