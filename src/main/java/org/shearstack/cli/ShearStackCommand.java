package org.shearstack.cli;

import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;

/**
 * The root command. To add a command, write one class with {@code @Command(name = ...,
 * mixinStandardHelpOptions = true, versionProvider = VersionProvider.class)} implementing
 * {@code Callable<Integer>} and add it to {@code subcommands} below.
 */
@Command(name = "shearstack", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Design, check and generate printable multiple-disc (boundary-layer) air turbines.",
        footer = {"", "Exit codes: 0 ok, 1 internal error, 2 bad input (nothing written), 3 design produced but a check FAILED."},
        subcommands = {
            DesignCommand.class,
            ExplainCommand.class,
            ProfilesCommand.class,
            DynoCommand.class,
            CalibrateCommand.class,
            ViewCommand.class,
            SupplyCommand.class,
            CheckCommand.class,
            FamilyCommand.class,
            // design, check, supply, family, dyno, view, calibrate, bench: add their classes here
            AutoComplete.GenerateCompletion.class,
        })
public final class ShearStackCommand implements Callable<Integer> {

    @picocli.CommandLine.Spec
    CommandSpec command;

    @Override
    public Integer call() {
        command.commandLine().usage(command.commandLine().getOut());
        return ExitCode.OK.code();
    }
}
