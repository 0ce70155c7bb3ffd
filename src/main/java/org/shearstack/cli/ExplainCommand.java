package org.shearstack.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.shearstack.design.ResolvedDesign;
import org.shearstack.profile.Profiles;
import org.shearstack.rules.DesignResolver;
import org.shearstack.rules.Key;
import org.shearstack.spec.BadInputException;
import org.shearstack.spec.Problem;
import org.shearstack.spec.Spec;
import org.shearstack.spec.SpecReader;
import org.shearstack.spec.Suggest;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Parameters;

/** {@code explain SPEC [KEY]}: why each value of a design has the value it has. */
@Command(name = "explain", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Resolve a spec and print the derivation tree of one key, or every value with its origin.")
public final class ExplainCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Parameters(index = "0", paramLabel = "SPEC", description = "The design spec (YAML).")
    Path specFile;

    @Parameters(index = "1", paramLabel = "KEY", arity = "0..1",
            description = "A key such as print.min-wall; without it every value is listed.")
    String key;

    @Mixin
    ProfileOptions profileOptions;

    @Override
    public Integer call() {
        Spec spec = SpecReader.read(specFile).orThrow();
        Profiles profiles = profileOptions.load();
        ResolvedDesign design = DesignResolver.resolve(spec, profiles);
        PrintWriter out = command.commandLine().getOut();
        if (key == null) {
            out.println("design " + design.name() + " (" + design.keys().size() + " values; "
                    + "explain SPEC KEY shows one derivation tree)");
            for (Key k : design.keys()) {
                var d = design.derivation(k);
                out.println("  " + k.name() + " = " + design.display(k) + "   [" + d.origin().name().toLowerCase(
                        java.util.Locale.ROOT) + " " + d.ruleId() + "]");
            }
        } else {
            Key k = design.key(key).orElseThrow(() -> new BadInputException(java.util.List.of(new Problem(
                    "command line", 0, 0, "KEY", "a key of the design", "\"" + key + "\"",
                    Suggest.nearest(key, design.keys().stream().map(Key::name).toList())
                            .map(s -> "did you mean " + s + "?").orElse("run explain SPEC to list the keys")))));
            out.print(design.explain(k));
        }
        out.flush();
        return ExitCode.OK.code();
    }

}
