package org.shearstack.view;

import java.util.Locale;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;
import org.shearstack.check.Finding;
import org.shearstack.check.Severity;

/** One finding in the list: a severity tag, the code and part, and the message. */
final class FindingCell extends ListCell<Finding> {

    @Override
    protected void updateItem(Finding f, boolean empty) {
        super.updateItem(f, empty);
        if (empty || f == null) {
            setGraphic(null);
            setText(null);
            return;
        }
        Label tag = new Label(tagText(f.severity()));
        tag.setStyle("-fx-text-fill: white; -fx-font-weight: bold; -fx-padding: 1 5 1 5; -fx-background-radius: 3;"
                + "-fx-background-color: " + severityColour(f.severity()).hex() + ";");
        Label code = new Label(f.code() + (f.part().isEmpty() ? "" : "  ·  " + f.part()));
        code.setStyle("-fx-font-weight: bold;");
        Label message = new Label(f.message());
        message.setWrapText(true);
        message.setMaxWidth(250);
        code.setMaxWidth(200);
        setGraphic(new VBox(2, new HBox(6, tag, code), message));
        setPrefWidth(0); // follow the list's width instead of widening it
        setText(null);
    }

    static String tagText(Severity s) {
        return switch (s) {
            case OK -> "ok";
            case CAUTION -> "caution";
            case FAIL -> "fail";
        };
    }

    static Rgb severityColour(Severity s) {
        return switch (s) {
            case OK -> Rgb.parse("#3a8a55");
            case CAUTION -> Rgb.parse("#b8860b");
            case FAIL -> Rgb.parse("#b3261e");
        };
    }

    /** A plain-text account of a finding for the details box. */
    static String details(Finding f) {
        StringBuilder b = new StringBuilder(f.message());
        if (f.measuredValue().isPresent()) {
            b.append(String.format(Locale.ROOT, "%nmeasured %.4g %s", f.measured(), f.unit()));
            if (!Double.isNaN(f.limit())) {
                b.append(String.format(Locale.ROOT, ", limit %.4g %s", f.limit(), f.unit()));
            }
        }
        if (!f.feature().isEmpty()) {
            b.append(System.lineSeparator()).append("feature: ").append(f.feature());
        }
        if (!f.remedy().isEmpty()) {
            b.append(System.lineSeparator()).append("remedy: ").append(f.remedy());
        }
        if (!f.where().isKnown() && !f.part().isEmpty()) {
            b.append(System.lineSeparator()).append("(no location: the whole part is highlighted)");
        }
        return b.toString();
    }
}
