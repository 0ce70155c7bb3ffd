package org.shearstack.io.kit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;

import javax.xml.validation.Schema;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.assembly.Kit;
import org.shearstack.assembly.KitPart;
import org.shearstack.geom.GeometryContext;
import org.shearstack.io.mesh.ThreeMfSchema;
import org.shearstack.rules.geometry.TestDesigns;

/**
 * The kit's 3MF packages (assembly, exploded assembly, every print plate) carry model XML that validates against
 * the published 3MF core schema (3MF Consortium, 3MF Core Specification 1.4.0, ../shared/standards/3mf).
 */
class KitWriterSchemaTest {

    @Test
    void everyKitPackageValidatesAgainstTheCoreSchema(@TempDir Path tmp) throws Exception {
        Path folder = ThreeMfSchema.folder();
        assumeTrue(folder != null, "3MF schemas not found at ../shared/standards/3mf; schema validation skipped");
        Schema schema = ThreeMfSchema.core(folder);
        Kit kit = Kit.build("demo", TestDesigns.demo(), GeometryContext.withChordTolerance(0.2));
        Path out = tmp.resolve("kit");
        KitWriter.write(kit, out);
        int copies = kit.parts().stream().mapToInt(KitPart::count).sum();
        for (String f : KitWriter.files(kit)) {
            if (!f.endsWith(".3mf")) {
                continue;
            }
            String xml = model(out.resolve(f));
            ThreeMfSchema.validate(schema, xml);
            if (f.startsWith("assembly")) {
                // one mesh object per distinct part, one component per copy (3MF core §4.1.2)
                assertEquals(kit.parts().size(), count(xml, "<mesh>"), f);
                assertEquals(copies, count(xml, "<component "), f);
            } else {
                assertTrue(count(xml, "<item ") > 0, f);
            }
        }
    }

    static String model(Path file) throws Exception {
        try (ZipFile z = new ZipFile(file.toFile())) {
            ZipEntry e = z.getEntry("3D/3dmodel.model");
            try (InputStream in = z.getInputStream(e)) {
                return new String(in.readAllBytes(), StandardCharsets.UTF_8);
            }
        }
    }

    static int count(String s, String what) {
        int n = 0;
        for (int i = s.indexOf(what); i >= 0; i = s.indexOf(what, i + 1)) {
            n++;
        }
        return n;
    }
}
