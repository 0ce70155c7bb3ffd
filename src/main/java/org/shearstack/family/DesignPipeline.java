package org.shearstack.family;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.shearstack.io.AtomicFolder;
import org.shearstack.io.report.ReportJson;
import org.shearstack.io.report.ReportWriter;
import org.shearstack.job.DesignJob;
import org.shearstack.job.DesignOutput;
import org.shearstack.job.DesignResult;
import org.shearstack.job.JobOptions;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.Engine;
import org.shearstack.rules.RuleCatalog;
import org.shearstack.spec.Spec;

/**
 * The family's variant pipeline is the design command's own: {@link DesignJob} (spec → rules → model → checks →
 * kit → report content) and {@link DesignOutput} (every file, atomically). One rule engine serves every variant
 * (it holds no state). With check-only, a variant's folder holds only its report.json (no meshes, no HTML page).
 * The table row is read back from the report.json text written, so the two cannot disagree.
 */
public final class DesignPipeline implements VariantPipeline {

    private static final ObjectMapper JSON = new ObjectMapper();

    private final Profiles profiles;
    private final Engine engine;
    private final boolean checkOnly;

    private DesignPipeline(Profiles profiles, boolean checkOnly) {
        this.profiles = profiles;
        this.engine = RuleCatalog.engine(profiles);
        this.checkOnly = checkOnly;
    }

    /** The pipeline for a family: with meshes, or check-only. */
    public static DesignPipeline of(Profiles profiles, boolean checkOnly) {
        return new DesignPipeline(profiles, checkOnly);
    }

    @Override
    public JsonNode run(Spec spec, Path folder) throws IOException {
        JobOptions options = checkOnly ? JobOptions.checkOnly() : JobOptions.full().withPreview(false);
        DesignResult result = DesignJob.run(spec, profiles, engine, options);
        if (checkOnly) {
            String json = ReportJson.text(result.report());
            AtomicFolder.write(folder, dir -> Files.writeString(dir.resolve(ReportWriter.JSON), json,
                    StandardCharsets.UTF_8));
            return JSON.readTree(json);
        }
        DesignOutput.Written written = DesignOutput.write(result, folder);
        // the row is read from the very file the variant's folder holds
        return JSON.readTree(written.folder().resolve(ReportWriter.JSON).toFile());
    }
}
