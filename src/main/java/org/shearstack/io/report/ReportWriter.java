package org.shearstack.io.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

/** Writes report.html, report.json and summary.md into a folder (the caller makes the folder atomic). */
public final class ReportWriter {

    public static final String HTML = "report.html";
    public static final String JSON = "report.json";
    public static final String SUMMARY = "summary.md";

    private ReportWriter() {
    }

    /** Writes the three files; returns their paths. */
    public static List<Path> write(ReportData r, Path folder) throws IOException {
        Path html = Files.writeString(folder.resolve(HTML), ReportHtml.page(r), StandardCharsets.UTF_8);
        Path json = Files.writeString(folder.resolve(JSON), ReportJson.text(r), StandardCharsets.UTF_8);
        Path md = Files.writeString(folder.resolve(SUMMARY), SummaryMarkdown.text(r), StandardCharsets.UTF_8);
        return List.of(html, json, md);
    }
}
