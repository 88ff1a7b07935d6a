/**
 * The one way a front end runs the checks: a {@link dev.mesolint.core.run.RunRequest} in, a
 * {@link dev.mesolint.core.run.RunResult} out, through {@link dev.mesolint.core.run.CheckRun}. The command line's
 * check, baseline and metrics commands and both Maven goals call it; what they print or log stays theirs.
 */
package dev.mesolint.core.run;
