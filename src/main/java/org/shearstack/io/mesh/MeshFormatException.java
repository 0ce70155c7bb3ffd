package org.shearstack.io.mesh;

/** A mesh file that cannot be read: the message says where (byte offset, line, entry), what was expected and found. */
public final class MeshFormatException extends Exception {

    private static final long serialVersionUID = 1L;

    public MeshFormatException(String message) {
        super(message);
    }

    public MeshFormatException(String message, Throwable cause) {
        super(message, cause);
    }
}
