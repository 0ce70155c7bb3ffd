package org.shearstack.view;

import java.util.Objects;
import java.util.Optional;
import org.shearstack.geom.Mesh;

/**
 * What the section cut leaves of one part.
 *
 * @param body  the kept half of the part's surface (assembly frame, mm); empty mesh when nothing is kept
 * @param cap   the cut face, closing the body (shares the body's vertex array); empty mesh when none
 * @param note  empty when the cut is clean, otherwise why the cut face is missing or partial
 */
public record SectionResult(Mesh body, Mesh cap, String note) {

    public SectionResult {
        Objects.requireNonNull(body, "body");
        Objects.requireNonNull(cap, "cap");
        Objects.requireNonNull(note, "note");
    }

    /** Body and cap as one mesh (closed when the input was closed and the note is empty). */
    public Mesh combined() {
        int[] bodyTri = body.triangleArray();
        int[] capTri = cap.triangleArray();
        if (capTri.length == 0) {
            return body;
        }
        int[] all = new int[bodyTri.length + capTri.length];
        System.arraycopy(bodyTri, 0, all, 0, bodyTri.length);
        System.arraycopy(capTri, 0, all, bodyTri.length, capTri.length);
        return Mesh.of(body.vertexArray(), all);
    }

    public Optional<String> problem() {
        return note.isEmpty() ? Optional.empty() : Optional.of(note);
    }
}
