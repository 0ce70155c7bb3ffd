package org.shearstack.job;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.shearstack.io.AtomicFolder;

class AtomicFolderTest {

    @TempDir
    Path tmp;

    @Test
    void aNewWriteReplacesTheWholeFolder() throws IOException {
        Path out = tmp.resolve("kit");
        AtomicFolder.write(out, d -> {
            Files.writeString(d.resolve("a.txt"), "one");
            Files.writeString(d.resolve("old.txt"), "stale");
        });
        AtomicFolder.write(out, d -> Files.writeString(d.resolve("a.txt"), "two"));
        assertEquals("two", Files.readString(out.resolve("a.txt")));
        assertFalse(Files.exists(out.resolve("old.txt")), "files of the previous run do not linger");
        assertEquals(List.of(out), siblings(), "no temporary folders left beside the target");
    }

    @Test
    void aFailedWriteLeavesThePreviousFolderAsItWas() throws IOException {
        Path out = tmp.resolve("kit");
        AtomicFolder.write(out, d -> Files.writeString(d.resolve("a.txt"), "good"));
        assertThrows(IllegalStateException.class, () -> AtomicFolder.write(out, d -> {
            Files.writeString(d.resolve("a.txt"), "half");
            throw new IllegalStateException("boom");
        }));
        assertEquals("good", Files.readString(out.resolve("a.txt")));
        assertEquals(List.of(out), siblings());
    }

    @Test
    void aFailedFirstWriteLeavesNothing() throws IOException {
        Path out = tmp.resolve("fresh");
        assertThrows(IOException.class, () -> AtomicFolder.write(out, d -> {
            throw new IOException("disk full");
        }));
        assertFalse(Files.exists(out));
        assertTrue(siblings().isEmpty());
    }

    private List<Path> siblings() throws IOException {
        try (Stream<Path> s = Files.list(tmp)) {
            return s.sorted().toList();
        }
    }
}
