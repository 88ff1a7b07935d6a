/** Positions in programme files, shared by every layer that reports on them. */
package dev.mesolint.core.source;
