package org.shearstack.io.report;

import java.util.List;
import java.util.Objects;
import org.shearstack.geom.LayeredSolid;

/**
 * One distinct printed part as the report shows it.
 *
 * @param name              file name without extension ("rotor-disc")
 * @param count             copies in the kit
 * @param material          filament name
 * @param massG             mass of one copy, grams
 * @param volumeMm3         volume of one copy
 * @param printOrientation  how it lies on the bed, in words
 * @param solid             the part in its print frame (for the section drawing)
 * @param keyDimensions     dimensions to print beside the drawing
 */
public record PartData(String name, int count, String material, double massG, double volumeMm3,
        String printOrientation, LayeredSolid solid, List<KeyDimension> keyDimensions) {

    public PartData {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(solid, "solid");
        keyDimensions = List.copyOf(keyDimensions);
    }
}
