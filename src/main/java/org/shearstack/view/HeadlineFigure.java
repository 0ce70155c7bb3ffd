package org.shearstack.view;

import java.util.Objects;
import org.shearstack.check.Severity;

/**
 * One headline figure shown above the model, already formatted (for example
 * "runaway vs allowable", "31 000 rpm of 52 000 rpm").
 */
public record HeadlineFigure(String label, String value, Severity severity) {

    public HeadlineFigure {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(severity, "severity");
    }
}
