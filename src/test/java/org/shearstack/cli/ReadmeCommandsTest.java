package org.shearstack.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every {@code ./shearstack ...} line in the README's code blocks runs in-process and ends with exit code 0
 * (ok) or 3 (a design with a failed check), never 1 (internal error) or 2 (bad input), so the documented
 * commands cannot rot. Cheap variants: {@code --check-only} / {@code --no-parts} where the command has them, outputs into a
 * temporary folder; {@code view} (needs a display) and lines naming the user's own files (which the README
 * shows as placeholders, e.g. {@code my-run.csv}) are skipped.
 */
class ReadmeCommandsTest {

    private static final Set<String> CHECK_ONLY = Set.of("design", "family");
    private static final Set<String> SKIPPED = Set.of("view");

    @TempDir
    static Path tmp;

    /** One command line of the README, split into arguments as a POSIX shell would (quotes, comments). */
    static List<String> words(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder w = new StringBuilder();
        boolean inWord = false;
        char quote = 0;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quote != 0) {
                if (c == quote) {
                    quote = 0;
                } else {
                    w.append(c);
                }
            } else if (c == '"' || c == '\'') {
                quote = c;
                inWord = true;
            } else if (c == '#' && !inWord) {
                break;
            } else if (Character.isWhitespace(c)) {
                if (inWord) {
                    out.add(w.toString());
                    w.setLength(0);
                    inWord = false;
                }
            } else {
                w.append(c);
                inWord = true;
            }
        }
        if (inWord) {
            out.add(w.toString());
        }
        return out;
    }

    /** The {@code ./shearstack} lines inside fenced code blocks of the README, in order. */
    static List<String> readmeCommands() throws IOException {
        List<String> lines = Files.readAllLines(Path.of("README.md"));
        List<String> cmds = new ArrayList<>();
        boolean inBlock = false;
        for (String l : lines) {
            String t = l.strip();
            if (t.startsWith("```")) {
                inBlock = !inBlock;
            } else if (inBlock && t.startsWith("./shearstack ")) {
                cmds.add(t);
            }
        }
        return cmds;
    }

    /** Null when the line is only a synopsis or names files the reader supplies; else the arguments to run. */
    static List<String> runnable(List<String> words, Path outDir) {
        List<String> args = new ArrayList<>(words.subList(1, words.size()));
        if (args.isEmpty() || SKIPPED.contains(args.get(0))) {
            return null;
        }
        for (String a : args) {
            if (a.startsWith("[") || a.equals("SPEC") || a.equals("DIR")) {
                return null; // a synopsis line
            }
            if ((a.endsWith(".yaml") || a.endsWith(".csv")) && !a.startsWith("-") && !a.contains("=")
                    && !Files.exists(Path.of(a)) && !isOutputValue(args, a)) {
                return null; // the reader's own file
            }
        }
        String cmd = args.get(0);
        if (CHECK_ONLY.contains(cmd) && !args.contains("--check-only")) {
            args.add(1, "--check-only");
        }
        if (cmd.equals("check") && !args.contains("--no-parts")) {
            args.add(1, "--no-parts"); // printability of the parts is tested in PartsPrintabilityTest
        }
        int o = args.indexOf("-o");
        if (o >= 0) {
            args.set(o + 1, outDir.resolve(Path.of(args.get(o + 1)).getFileName()).toString());
        } else if (Set.of("design", "family", "dyno").contains(cmd)) {
            args.add("-o");
            args.add(outDir.resolve("out").toString());
        }
        if (cmd.equals("family") && !args.contains("--progress")) {
            args.add("--progress");
            args.add("never");
        }
        return args;
    }

    private static boolean isOutputValue(List<String> args, String a) {
        int i = args.indexOf(a);
        return i > 0 && args.get(i - 1).equals("-o");
    }

    @Test
    void readmeShowsCommands() throws IOException {
        List<String> cmds = readmeCommands();
        assertTrue(cmds.stream().map(ReadmeCommandsTest::words)
                        .anyMatch(w -> w.equals(List.of("./shearstack", "design", "examples/classroom-demo.yaml"))),
                "the README's first command is the design of the demo spec");
        assertTrue(cmds.size() >= 10, "the README shows the commands: " + cmds);
    }

    @Test
    void shellWordsFollowQuotesAndComments() {
        assertEquals(List.of("./shearstack", "supply", "--tank", "100 L", "--from", "10 bar(g)"),
                words("./shearstack supply --tank \"100 L\" --from '10 bar(g)'   # blow-down"));
    }

    @TestFactory
    Stream<DynamicTest> everyReadmeCommandRuns() throws IOException {
        List<String> cmds = readmeCommands();
        assertFalse(cmds.isEmpty());
        List<DynamicTest> tests = new ArrayList<>();
        for (int i = 0; i < cmds.size(); i++) {
            String line = cmds.get(i);
            Path outDir = tmp.resolve("cmd" + i);
            List<String> args = runnable(words(line), outDir);
            if (args == null) {
                continue;
            }
            tests.add(DynamicTest.dynamicTest(line, () -> {
                Files.createDirectories(outDir);
                StringWriter out = new StringWriter();
                StringWriter err = new StringWriter();
                int code = Main.run(args.toArray(String[]::new), new PrintWriter(out), new PrintWriter(err));
                assertTrue(code == 0 || code == 3,
                        "exit " + code + " for " + args + "\n" + out + "\n" + err);
            }));
        }
        assertTrue(tests.size() >= 8, "most README commands are runnable in the test: " + tests.size());
        return tests.stream();
    }
}
