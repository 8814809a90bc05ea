package org.counterpoise.ui.cli;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The top command: lists the sub-commands. */
@Command(name = "counterpoise", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = {"Design assistant for dynamic vibration absorbers (tuned mass dampers).",
            "A preliminary design aid: verify by measurement; local codes and licensed practice govern."},
        subcommands = {DesignCommand.class, OptimumCommand.class, RobustnessCommand.class, SheetCommand.class,
            RunUpCommand.class, IdentifyCommand.class, SiteCheckCommand.class})
public final class CounterpoiseCommand implements Runnable {
    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
