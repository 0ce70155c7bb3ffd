package org.shearstack.family;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Path;
import org.shearstack.spec.Spec;

/**
 * What a family does with one variant: resolve, check and generate it, write its folder (all or nothing), and hand
 * back its report.json tree, from which the family's table row is read. Must be safe to call from several threads.
 */
@FunctionalInterface
public interface VariantPipeline {

    /**
     * Runs one variant.
     *
     * @param spec    the variant's spec
     * @param folder  its folder (replaced as a whole when written)
     * @return the variant's report.json tree
     * @throws org.shearstack.spec.BadInputException when the variant's values do not make a design
     * @throws IOException when its folder cannot be written
     */
    JsonNode run(Spec spec, Path folder) throws IOException;
}
