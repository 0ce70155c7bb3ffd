package org.shearstack.io.report;

import java.util.List;

/**
 * One print plate: its file and the parts on it.
 *
 * @param file   file name inside the kit ("plates/plate-1.3mf")
 * @param parts  part names on the plate, one entry per copy
 */
public record PlateData(String file, List<String> parts) {
    public PlateData {
        parts = List.copyOf(parts);
    }
}
