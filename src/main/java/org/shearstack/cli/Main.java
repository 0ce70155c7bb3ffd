package org.shearstack.cli;

import java.io.PrintWriter;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import picocli.CommandLine;

/** Entry point: runs the command tree and maps every outcome to an {@link ExitCode}; the only place that exits. */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        System.exit(run(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs a command line with the given writers and returns the exit code (tests call this). */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine();
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The configured command tree, with exit codes mapped here and nowhere else. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new ShearStackCommand());
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("shearstack: " + ex.getMessage());
            if (!CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr())) {
                c.getErr().println("Try '" + c.getCommandSpec().qualifiedName() + " --help'.");
            }
            c.getErr().flush();
            return ExitCode.BAD_INPUT.code();
        });
        cl.setExecutionExceptionHandler((ex, c, parsed) -> {
            PrintWriter err = c.getErr();
            if (ex instanceof BadInputException bad) {
                for (Problem p : bad.problems()) {
                    err.println(p.format());
                }
                err.println("shearstack: " + bad.problems().size() + " problem" + (bad.problems().size() == 1 ? "" : "s")
                        + "; nothing written");
                err.flush();
                return ExitCode.BAD_INPUT.code();
            }
            err.println("shearstack: internal error: " + ex);
            for (StackTraceElement e : ex.getStackTrace()) {
                err.println("    at " + e);
            }
            err.println("Please report this with the spec that caused it.");
            err.flush();
            return ExitCode.INTERNAL_ERROR.code();
        });
        return cl;
    }
}
