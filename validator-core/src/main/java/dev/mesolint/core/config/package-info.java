/** The repository configuration file, references to profiles, and located configuration errors. */
package dev.mesolint.core.config;
