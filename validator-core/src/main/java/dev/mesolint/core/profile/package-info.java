/** Rule profiles: the built-in ones, team profile files, and their resolution along {@code extends} chains. */
package dev.mesolint.core.profile;
