/** The rule reference pages, generated from rule metadata, the built-in profiles and the fixture examples. */
package dev.mesolint.core.reference;
