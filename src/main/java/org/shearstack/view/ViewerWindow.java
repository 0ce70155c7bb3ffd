package org.shearstack.view;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.UnaryOperator;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.Group;
import javafx.scene.Scene;
import javafx.scene.SceneAntialiasing;
import javafx.scene.SubScene;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ColorPicker;
import javafx.scene.control.Label;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.control.Slider;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Pane;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import javafx.scene.paint.Color;
import javafx.stage.Stage;
import org.shearstack.check.Finding;

/**
 * The viewer window: headline figures and messages on top, the parts on the left, the model in the
 * middle, findings on the right, view controls below. It keeps the user's choices (hidden parts, colours,
 * spread, cut, camera) when a new model arrives from watch mode, and keeps the last good model when a
 * reload fails.
 */
final class ViewerWindow {

    private static final String PANEL = "-fx-background-color: #eceae4; -fx-padding: 8;";

    private final Stage stage;
    private final Pane viewport = new Pane();
    private final SubScene area = new SubScene(new Group(), 800, 600, true, SceneAntialiasing.BALANCED);
    private final Label title = new Label();
    private final Label banner = new Label();
    private final Label status = new Label();
    private final Label details = new Label();
    private final Label emptyNote = new Label();
    private final FlowPane headlines = new FlowPane(8, 6);
    private final VBox partRows = new VBox(4);
    private final ListView<Finding> findings = new ListView<>();
    private final Slider spread = new Slider(0, ModelView.MAX_SPREAD, 0);
    private final CheckBox cut = new CheckBox("Cut through axis");
    private final Map<String, Boolean> visibility = new HashMap<>();
    private final Map<String, Rgb> colours = new HashMap<>();
    private ModelView model;
    private boolean fitted;
    private Orbit previousOrbit = Orbit.initial();
    private boolean userMoved;

    ViewerWindow(Stage stage) {
        this.stage = stage;
        area.setFill(PartNode.fx(Snapshots.BACKGROUND));
        area.widthProperty().bind(viewport.widthProperty());
        area.heightProperty().bind(viewport.heightProperty());
        emptyNote.setWrapText(true);
        emptyNote.setStyle("-fx-text-fill: #5a564d; -fx-font-size: 14px; -fx-padding: 24;");
        emptyNote.maxWidthProperty().bind(viewport.widthProperty());
        emptyNote.setMouseTransparent(true);
        viewport.getChildren().addAll(area, emptyNote);
        viewport.setMinSize(200, 150);
        Navigation.attach(area, this, () -> Math.max(1, area.getHeight()));
        viewport.widthProperty().addListener((o, a, b) -> refitIfUntouched());
        viewport.heightProperty().addListener((o, a, b) -> refitIfUntouched());

        BorderPane layout = new BorderPane();
        layout.setTop(top());
        layout.setLeft(left());
        layout.setCenter(viewport);
        layout.setRight(right());
        layout.setBottom(bottom());
        Scene scene = new Scene(layout, 1280, 820);
        scene.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.F) {
                fitToView();
            }
        });
        stage.setScene(scene);
        stage.setTitle("ShearStack view");
    }

    private VBox top() {
        title.setStyle("-fx-font-size: 16px; -fx-font-weight: bold;");
        banner.setWrapText(true);
        banner.setMaxWidth(Double.MAX_VALUE);
        banner.setStyle("-fx-background-color: #b3261e; -fx-text-fill: white; -fx-padding: 6;");
        banner.setVisible(false);
        banner.setManaged(false);
        VBox box = new VBox(6, title, headlines, banner);
        box.setStyle(PANEL);
        return box;
    }

    private VBox left() {
        Label heading = new Label("Parts");
        heading.setStyle("-fx-font-weight: bold;");
        ScrollPane scroll = new ScrollPane(partRows);
        scroll.setFitToWidth(true);
        VBox.setVgrow(scroll, Priority.ALWAYS);
        VBox box = new VBox(6, heading, scroll);
        box.setPrefWidth(230);
        box.setStyle(PANEL);
        return box;
    }

    private VBox right() {
        Label heading = new Label("Findings");
        heading.setStyle("-fx-font-weight: bold;");
        findings.setCellFactory(v -> new FindingCell());
        findings.getSelectionModel().selectedItemProperty().addListener((o, before, now) -> select(now));
        VBox.setVgrow(findings, Priority.ALWAYS);
        details.setWrapText(true);
        details.setMaxWidth(290);
        details.setMinHeight(90);
        details.setAlignment(Pos.TOP_LEFT);
        Button clear = new Button("Clear highlight");
        clear.setOnAction(e -> findings.getSelectionModel().clearSelection());
        VBox box = new VBox(6, heading, findings, details, clear);
        box.setPrefWidth(310);
        box.setStyle(PANEL);
        return box;
    }

    private HBox bottom() {
        spread.setPrefWidth(220);
        spread.valueProperty().addListener((o, a, b) -> {
            if (model != null) {
                model.setExplode(b.doubleValue());
            }
        });
        cut.selectedProperty().addListener((o, a, on) -> applySection(on));
        Button fit = new Button("Fit to view");
        fit.setOnAction(e -> fitToView());
        HBox.setHgrow(status, Priority.ALWAYS);
        status.setMaxWidth(Double.MAX_VALUE);
        HBox box = new HBox(10, new Label("Spread parts"), spread, cut, fit, status);
        box.setAlignment(Pos.CENTER_LEFT);
        box.setPadding(new Insets(6, 8, 6, 8));
        box.setStyle("-fx-background-color: #e2dfd7;");
        return box;
    }

    Stage stage() {
        return stage;
    }

    Optional<ModelView> model() {
        return Optional.ofNullable(model);
    }

    /** Selects a finding in the list as a click would (null clears the selection). */
    void selectFinding(Finding f) {
        if (f == null) {
            findings.getSelectionModel().clearSelection();
        } else {
            findings.getSelectionModel().select(f);
        }
    }

    String detailsText() {
        return details.getText();
    }

    boolean bannerShown() {
        return banner.isVisible();
    }

    String bannerText() {
        return banner.getText();
    }

    /** Shows a reload's outcome: a new model, or the error beside the last good model. */
    void apply(Reload reload, Optional<ModelView> built) {
        if (reload instanceof Reload.Failed failed) {
            showError(failed.message());
        } else if (reload instanceof Reload.Loaded loaded && built.isPresent()) {
            show(built.get(), loaded.loadNanos());
        }
    }

    void showError(String message) {
        banner.setText("Could not update: " + message + (model == null ? "" : "\nShowing the last good model."));
        banner.setVisible(true);
        banner.setManaged(true);
    }

    /** Replaces the model, keeping the user's view choices. */
    void show(ModelView next, long loadNanos) {
        banner.setVisible(false);
        banner.setManaged(false);
        model = next;
        ViewScene s = next.scene();
        stage.setTitle("ShearStack view · " + s.title());
        title.setText(s.title());
        fillHeadlines(s);
        fillParts(next);
        findings.getItems().setAll(s.findings());
        details.setText(s.findings().isEmpty() ? "No findings." : "Select a finding to see it on the model.");
        next.setExplode(spread.getValue());
        List<String> sectionNotes = next.setSection(cut.isSelected());
        area.setRoot(next.root());
        area.setCamera(next.camera());
        if (fitted) {
            next.setOrbit(previousOrbit);
        } else {
            fitToView();
            fitted = true;
        }
        emptyNote.setVisible(s.parts().isEmpty());
        emptyNote.setText(s.parts().isEmpty() ? "Nothing to draw. " + String.join(" ", s.notes()) : "");
        List<String> all = new java.util.ArrayList<>(s.notes());
        all.addAll(next.notes());
        all.addAll(sectionNotes);
        if (loadNanos > 0) {
            all.add(String.format(Locale.ROOT, "updated in %.0f ms", loadNanos / 1e6));
        }
        status.setText(String.join("  ·  ", all));
    }

    void changeOrbit(UnaryOperator<Orbit> change) {
        if (model != null) {
            model.setOrbit(change.apply(model.orbit()));
            previousOrbit = model.orbit();
            userMoved = true;
        }
    }

    void fitToView() {
        if (model != null) {
            model.fit(Math.max(1, area.getWidth()) / Math.max(1, area.getHeight()));
            previousOrbit = model.orbit();
            userMoved = false;
        }
    }

    private void refitIfUntouched() {
        if (!userMoved) {
            fitToView();
        }
    }

    private void applySection(boolean on) {
        if (model != null) {
            List<String> notes = model.setSection(on);
            if (!notes.isEmpty()) {
                status.setText(String.join("  ·  ", notes));
            }
        }
    }

    private void select(Finding f) {
        if (model == null) {
            return;
        }
        model.highlight(Optional.ofNullable(f));
        details.setText(f == null ? "Select a finding to see it on the model." : FindingCell.details(f));
    }

    private void fillHeadlines(ViewScene s) {
        headlines.getChildren().clear();
        for (HeadlineFigure h : s.headlines()) {
            Label chip = new Label(h.label() + ": " + h.value());
            chip.setStyle("-fx-background-color: white; -fx-padding: 3 8 3 8; -fx-border-width: 0 0 0 5;"
                    + "-fx-border-color: " + FindingCell.severityColour(h.severity()).hex() + ";");
            headlines.getChildren().add(chip);
        }
    }

    private void fillParts(ModelView view) {
        partRows.getChildren().clear();
        for (PartNode node : view.partNodes()) {
            String name = node.part().name();
            boolean shown = visibility.getOrDefault(name, true);
            Rgb colour = colours.getOrDefault(name, node.part().colour());
            view.setVisible(name, shown);
            view.setColour(name, colour);
            CheckBox box = new CheckBox(name);
            box.setSelected(shown);
            box.selectedProperty().addListener((o, a, on) -> {
                visibility.put(name, on);
                view.setVisible(name, on);
            });
            ColorPicker picker = new ColorPicker(PartNode.fx(colour));
            picker.setStyle("-fx-color-label-visible: false;");
            picker.setPrefWidth(48);
            picker.setOnAction(e -> {
                Color c = picker.getValue();
                Rgb rgb = new Rgb((int) Math.round(c.getRed() * 255), (int) Math.round(c.getGreen() * 255),
                        (int) Math.round(c.getBlue() * 255));
                colours.put(name, rgb);
                view.setColour(name, rgb);
            });
            HBox row = new HBox(6, picker, box);
            row.setAlignment(Pos.CENTER_LEFT);
            partRows.getChildren().add(row);
        }
    }
}
