package org.counterpoise.ui.cli;

import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** The top command: lists the sub-commands. */
@Command(name = "counterpoise", mixinStandardHelpOptions = true, versionProvider = Version.class,
        description = {"Design assistant for dynamic vibration absorbers (tuned mass dampers).",
            "A preliminary design aid: verify by measurement; local codes and licensed practice govern."})
public final class CounterpoiseCommand implements Runnable {
    /** The sub-commands, in the order {@code --help} lists them: the one list. */
    static final List<Class<?>> COMMANDS = List.of(DesignCommand.class, OptimumCommand.class,
            RobustnessCommand.class, SheetCommand.class, RunUpCommand.class, IdentifyCommand.class,
            SiteCheckCommand.class);

    @Spec
    private CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /**
     * The command line for these arguments. Picocli reads every option of a command when the
     * command is added, which takes a tenth of a second or more for all of them in a fresh JVM; so
     * when the first argument names a sub-command only that one is added, otherwise (help, version,
     * a mistyped name, which gets picocli's suggestions) all of them.
     *
     * @param args the arguments
     * @return the top command with the sub-commands the arguments need
     */
    static CommandLine commandLine(String[] args) {
        CommandLine cl = new CommandLine(new CounterpoiseCommand());
        boolean named = args.length > 0 && names().contains(args[0]);
        for (Class<?> command : COMMANDS) {
            if (!named || name(command).equals(args[0])) {
                cl.addSubcommand(command);
            }
        }
        return cl;
    }

    /** @return the sub-commands' names */
    static List<String> names() {
        return COMMANDS.stream().map(CounterpoiseCommand::name).toList();
    }

    private static String name(Class<?> command) {
        return command.getAnnotation(Command.class).name();
    }
}
