/**
 * The mesolint Maven plugin: thin Mojos that gather their parameters into one request for mesolint-core, log what
 * it found and fail the build at the fail level. No checking logic lives here.
 */
package dev.mesolint.maven;
