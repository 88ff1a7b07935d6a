/** The programme model that rules and metrics read: immutable records with source locations. */
package dev.mesolint.core.programme;
