package dev.mesolint.core.review;

import dev.mesolint.core.report.HtmlReport;
import dev.mesolint.core.report.ReportInput;
import dev.mesolint.core.report.RunReports;
import java.io.IOException;
import java.io.Writer;
import java.time.Duration;

/**
 * The HTML report of the head with a "changes since REV" section in each changed programme; findings the base
 * already had are marked as held. The page's own footer carries the caution.
 */
public final class ReviewHtmlPage implements ReviewWriter {

    @Override
    public void write(ReviewInput input, Writer out) throws IOException {
        Review review = input.review();
        ReportInput report = RunReports.input(NewSinceGate.markUnchanged(review), input.rules(), review.afterRequest(),
                Duration.ZERO);
        report = report.withHtml(report.html().withReasons(input.showReasons())
                .withSection(new ReviewHtmlSection(input)));
        new HtmlReport(null).write(report, out);
    }
}
