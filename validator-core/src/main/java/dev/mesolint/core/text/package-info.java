/** Text that leaves the tool: input strings made safe for reports and terminals. */
package dev.mesolint.core.text;
