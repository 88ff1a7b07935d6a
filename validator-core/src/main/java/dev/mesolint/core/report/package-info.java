/**
 * Reports of the training model's figures: JSON (shape published in docs/schema/metrics.schema.json), CSV and
 * plain-text tables. Each writer takes a list of {@link dev.mesolint.core.report.FileMetrics} and a Writer.
 */
package dev.mesolint.core.report;
