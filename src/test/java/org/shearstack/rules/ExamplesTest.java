package org.shearstack.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;
import org.shearstack.spec.SpecReader;

/** Every spec in examples/ reads and resolves, so documentation cannot rot. */
class ExamplesTest {

    @TestFactory
    Stream<DynamicTest> everyExampleResolves() throws IOException {
        List<Path> files;
        try (Stream<Path> s = Files.list(Path.of("examples"))) {
            files = s.filter(p -> p.toString().endsWith(".yaml")).sorted().toList();
        }
        assertFalse(files.isEmpty());
        Profiles profiles = Profiles.shipped();
        return files.stream().map(f -> DynamicTest.dynamicTest(f.toString(), () -> {
            ResolvedDesign d = DesignResolver.resolve(SpecReader.read(f).orThrow(), profiles);
            assertEquals(f.getFileName().toString().replace(".yaml", ""), d.name(), "name matches the file");
        }));
    }
}
