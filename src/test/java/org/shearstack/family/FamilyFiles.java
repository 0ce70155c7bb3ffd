package org.shearstack.family;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/** Test helpers: an RFC 4180 reader for family.csv and a byte snapshot of a folder. */
public final class FamilyFiles {

    private FamilyFiles() {
    }

    /** The records of a CSV text (RFC 4180: quoted fields, doubled quotes, CRLF records). */
    public static List<List<String>> csv(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (quoted) {
                if (c == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    cell.append('"');
                    i++;
                } else if (c == '"') {
                    quoted = false;
                } else {
                    cell.append(c);
                }
            } else if (c == '"') {
                quoted = true;
            } else if (c == ',') {
                row.add(cell.toString());
                cell.setLength(0);
            } else if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                row.add(cell.toString());
                cell.setLength(0);
                rows.add(row);
                row = new ArrayList<>();
                i++;
            } else {
                cell.append(c);
            }
        }
        if (cell.length() > 0 || !row.isEmpty()) {
            row.add(cell.toString());
            rows.add(row);
        }
        return rows;
    }

    public static List<List<String>> csv(Path file) throws IOException {
        return csv(Files.readString(file, StandardCharsets.UTF_8));
    }

    /** Every regular file under a folder by relative path, with its bytes. */
    public static Map<String, byte[]> snapshot(Path root) throws IOException {
        Map<String, byte[]> m = new TreeMap<>();
        try (var walk = Files.walk(root)) {
            for (Path p : walk.filter(Files::isRegularFile).toList()) {
                m.put(root.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return m;
    }
}
