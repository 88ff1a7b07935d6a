package dev.mesolint.core.review;

import dev.mesolint.core.finding.Finding;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.ReportOptions;
import dev.mesolint.core.report.SarifReport;
import java.io.IOException;
import java.io.Writer;
import java.util.List;

/**
 * The review as SARIF 2.1.0, the check's own SARIF with {@code baselineState} relative to the base revision: the
 * head's findings are {@code new} or {@code unchanged}, and the findings the change resolved follow as
 * {@code absent}, located where they were at the base.
 */
public final class ReviewSarif implements ReviewWriter {

    @Override
    public void write(ReviewInput input, Writer out) throws IOException {
        Review review = input.review();
        List<Finding> resolved = review.programmes().stream().flatMap(p -> p.findings().resolved().stream()).toList();
        new SarifReport(resolved).write(ReportInput.of(NewSinceGate.markUnchanged(review), input.rules(),
                input.root()).withOptions(ReportOptions.DEFAULTS.withBaselineInForce(true)), out);
    }
}
