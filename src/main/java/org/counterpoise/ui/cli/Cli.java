package org.counterpoise.ui.cli;

import java.io.PrintWriter;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import picocli.CommandLine;

/**
 * Runs the command line: exit 0 on success, 2 on bad input (one paragraph on standard error),
 * 1 on an internal failure (reported as a bug, never as a stack trace).
 */
public final class Cli {
    /** Exit code for bad input. */
    public static final int BAD_INPUT = 2;

    private Cli() {
    }

    /**
     * @param args arguments
     * @param out standard output
     * @param err standard error
     * @return the exit code
     */
    public static int run(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new CounterpoiseCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExitCodeExceptionMapper(e -> e instanceof InvalidInputException ? BAD_INPUT : 1);
        cl.setParameterExceptionHandler((e, a) -> {
            err.println("error: " + e.getMessage());
            err.println("Run with --help for the options.");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            if (e instanceof InvalidInputException) {
                err.println("error: " + e.getMessage());
                return BAD_INPUT;
            }
            if (e instanceof CoreException) {
                err.println("error: " + e.getMessage());
                return 1;
            }
            err.println("error: bug in Counterpoise (please report it): " + e);
            return 1;
        });
        int code = cl.execute(args);
        out.flush();
        err.flush();
        return code;
    }
}
