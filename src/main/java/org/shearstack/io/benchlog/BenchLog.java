package org.shearstack.io.benchlog;

import java.util.List;
import org.shearstack.check.Finding;
import org.shearstack.physics.dyno.SpeedLog;

/**
 * A log as read: the samples in SI units, what the reader noticed (skipped lines, repeated times,
 * unused columns) and a one-line description of the columns and units it used.
 */
public record BenchLog(String source, SpeedLog log, List<Finding> findings, String columns) {
    public BenchLog {
        findings = List.copyOf(findings);
    }
}
