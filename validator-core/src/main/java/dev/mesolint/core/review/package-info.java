/**
 * Reviewing a change to a programme repository: both revisions checked, programmes paired across renames, the
 * change in training figures, findings new, resolved and unchanged, limits crossed; the outputs for a pull request;
 * and the gate that counts only what a change introduced.
 */
package dev.mesolint.core.review;
