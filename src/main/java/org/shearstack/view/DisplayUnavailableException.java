package org.shearstack.view;

/** Raised when a window or a snapshot needs a display (or 3D support) that this machine does not offer. */
public class DisplayUnavailableException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public DisplayUnavailableException(String message) {
        super(message);
    }
}
