package org.shearstack.view;

import java.util.function.DoubleSupplier;
import javafx.scene.SubScene;
import javafx.scene.input.MouseButton;
import javafx.scene.input.MouseEvent;
import javafx.scene.input.ScrollEvent;

/**
 * Mouse handling for the 3D area: drag with the primary button to turn the model around, drag with the
 * secondary or middle button (or shift + primary) to move it, wheel to come closer or go back, double
 * click to fit everything in view.
 */
final class Navigation {

    private static final double DEGREES_PER_PIXEL = 0.4;
    private static final double ZOOM_PER_WHEEL_UNIT = 1.0015;

    private final ViewerWindow window;
    private double lastX;
    private double lastY;

    private Navigation(ViewerWindow window) {
        this.window = window;
    }

    static void attach(SubScene area, ViewerWindow window, DoubleSupplier heightPx) {
        Navigation n = new Navigation(window);
        area.addEventHandler(MouseEvent.MOUSE_PRESSED, e -> {
            n.lastX = e.getSceneX();
            n.lastY = e.getSceneY();
            area.requestFocus();
        });
        area.addEventHandler(MouseEvent.MOUSE_DRAGGED, e -> {
            double dx = e.getSceneX() - n.lastX;
            double dy = e.getSceneY() - n.lastY;
            n.lastX = e.getSceneX();
            n.lastY = e.getSceneY();
            boolean pan = e.getButton() == MouseButton.SECONDARY || e.getButton() == MouseButton.MIDDLE
                    || (e.getButton() == MouseButton.PRIMARY && e.isShiftDown());
            window.changeOrbit(o -> pan ? o.panByPixels(dx, dy, heightPx.getAsDouble())
                    : o.orbitBy(dx * DEGREES_PER_PIXEL, -dy * DEGREES_PER_PIXEL));
        });
        area.addEventHandler(MouseEvent.MOUSE_CLICKED, e -> {
            if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2) {
                window.fitToView();
            }
        });
        area.addEventHandler(ScrollEvent.SCROLL, e ->
                window.changeOrbit(o -> o.zoomBy(Math.pow(ZOOM_PER_WHEEL_UNIT, -e.getDeltaY()))));
    }
}
