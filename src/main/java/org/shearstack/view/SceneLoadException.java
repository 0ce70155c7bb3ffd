package org.shearstack.view;

/** A scene could not be made; the message says where (file, line, column or key), what was expected and found. */
public class SceneLoadException extends Exception {

    private static final long serialVersionUID = 1L;

    public SceneLoadException(String message) {
        super(message);
    }

    public SceneLoadException(String message, Throwable cause) {
        super(message, cause);
    }
}
