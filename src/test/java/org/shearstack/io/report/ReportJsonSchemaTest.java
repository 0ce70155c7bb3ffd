package org.shearstack.io.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.InputStream;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.shearstack.job.DesignJob;
import org.shearstack.job.DesignResult;
import org.shearstack.job.JobOptions;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.SpecReader;

class ReportJsonSchemaTest {

    static JsonSchema schema;
    static JsonNode pinned;

    @BeforeAll
    static void load() throws Exception {
        try (InputStream in = ReportJson.class.getResourceAsStream(ReportJson.SCHEMA_RESOURCE)) {
            schema = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012).getSchema(in);
        }
        pinned = new ObjectMapper().readTree(ReportJson.text(PinnedDemo.run(11).report()));
    }

    @Test
    void pinnedDemoValidatesAndCarriesTheDocumentedKeys() {
        Set<ValidationMessage> errors = schema.validate(pinned);
        assertTrue(errors.isEmpty(), errors.toString());
        // keys named in the flow and safety issues
        for (String path : List.of("performance.map", "performance.band", "performance.runawaySpeedRpm",
                "performance.stallTorqueNm", "performance.operatingPoint", "supply.conductanceDm3PerSBar",
                "supply.criticalPressureRatio", "safety.maxSafeSupplyPressureBarG", "safety.runawaySpeedRpm",
                "safety.allowableSpeedRpm", "parts", "derivations", "findings", "bom")) {
            JsonNode n = ReportJson.at(pinned, path);
            assertFalse(n.isMissingNode() || n.isNull(), path);
        }
        assertEquals(11, pinned.at("/performance/map").size());
        assertEquals(0.5, pinned.at("/supply/conductanceDm3PerSBar").asDouble(), 1e-12, "as pinned in the spec");
        assertEquals(0.3, pinned.at("/supply/criticalPressureRatio").asDouble(), 1e-12, "as pinned in the spec");
        assertEquals(4.0, pinned.at("/supply/pressureBarG").asDouble(), 1e-9, "4 bar(g) in the spec");
    }

    @Test
    void aDesignWithoutSizesValidatesWithNullSectionsAndSaysWhy() throws Exception {
        DesignResult demo = DesignJob.run(SpecReader.read(java.nio.file.Path.of("examples/classroom-demo.yaml"))
                .orThrow(), Profiles.load(Optional.empty()), JobOptions.checkOnly());
        JsonNode json = new ObjectMapper().readTree(ReportJson.text(demo.report()));
        Set<ValidationMessage> errors = schema.validate(json);
        assertTrue(errors.isEmpty(), errors.toString());
        if (json.get("performance").isNull()) {
            assertTrue(json.get("omissions").toString().contains("performance"));
        }
        if (json.get("safety").isNull()) {
            assertEquals("caution", json.get("verdict").asText(), "an unchecked rotor is never a pass");
        }
    }

    @Test
    void theSchemaRejectsAReportWithoutItsSafetyKeys() {
        ObjectNode broken = pinned.deepCopy();
        ((ObjectNode) broken.get("safety")).remove("maxSafeSupplyPressureBarG");
        assertFalse(schema.validate(broken).isEmpty());
        ObjectNode wrongVerdict = pinned.deepCopy();
        wrongVerdict.put("verdict", "fine");
        assertFalse(schema.validate(wrongVerdict).isEmpty());
    }
}
