package org.counterpoise.ui.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.time.LocalDateTime;
import java.time.format.DateTimeFormatter;
import java.util.Arrays;
import java.util.Locale;
import org.counterpoise.core.error.CoreException;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.PlainText;
import picocli.CommandLine;

/**
 * Runs the command line. Exit codes (docs/cli.md): {@link #DONE} on success, {@link #BAD_INPUT}
 * on bad input or usage (one plain line on standard error naming the file, field or option, what
 * is wrong and what is allowed), {@link #FAILED} on anything else (an internal failure, reported
 * in a plain sentence; the details go to a file in the temporary folder, never to the terminal).
 */
public final class Cli {
    /** Exit code when the command did its job. */
    public static final int DONE = 0;
    /** Exit code for anything else: an internal failure, or the machine ran out of memory. */
    public static final int FAILED = 1;
    /** Exit code for bad input or usage. */
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
        int code;
        try {
            code = execute(args, out, err);
        } catch (Throwable e) { // NOPMD: the last line of defence; every failure becomes a plain sentence
            code = failed(e, args, err);
        }
        out.flush();
        err.flush();
        return code;
    }

    /**
     * True when the arguments are one project file and nothing else: not an option, not a
     * command's name, and either ending in .json or naming an existing file.
     * @param args the arguments
     * @return whether to open that file
     */
    public static boolean isProjectFile(String[] args) {
        if (args.length != 1 || args[0].startsWith("-") || args[0].isBlank()) {
            return false;
        }
        if (CounterpoiseCommand.names().contains(args[0])) {
            return false;
        }
        if (args[0].toLowerCase(Locale.ROOT).endsWith(".json")) {
            return true;
        }
        try {
            return Files.isRegularFile(Path.of(args[0]));
        } catch (InvalidPathException e) {
            return false;
        }
    }

    private static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = CounterpoiseCommand.commandLine(args);
        Converters.register(cl);
        cl.setOut(out);
        cl.setErr(err);
        cl.setExitCodeExceptionMapper(e -> e instanceof InvalidInputException ? BAD_INPUT : FAILED);
        cl.setParameterExceptionHandler((e, a) -> {
            err.println("error: " + PlainText.escape(CliMessages.of(e)));
            err.println("Run " + CliMessages.commandName(e.getCommandLine()) + " --help for the options.");
            return BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((e, commandLine, parseResult) -> {
            if (e instanceof InvalidInputException) {
                err.println("error: " + PlainText.escape(e.getMessage()));
                return BAD_INPUT;
            }
            if (e instanceof CoreException) {
                err.println("error: " + PlainText.escape(e.getMessage()));
                return FAILED;
            }
            return failed(e, args, err);
        });
        return cl.execute(args);
    }

    /**
     * An internal failure: one plain sentence, the details into a file for the bug report.
     * @param e the failure
     * @param args the arguments run
     * @param err standard error
     * @return {@link #FAILED}
     */
    static int failed(Throwable e, String[] args, PrintWriter err) {
        if (e instanceof OutOfMemoryError) {
            err.println("error: the computer ran out of memory for this task; ask for fewer cases or samples,"
                    + " or give Java more memory (java -Xmx4g -jar counterpoise.jar ...)");
            return FAILED;
        }
        Path details = writeDetails(e, args);
        err.println("error: Counterpoise stopped on an internal problem; this is a bug, not a mistake in your input."
                + (details == null ? " Please report what you ran."
                        : " Please report it with the details saved in " + details));
        return FAILED;
    }

    private static Path writeDetails(Throwable e, String[] args) {
        try {
            StringWriter trace = new StringWriter();
            e.printStackTrace(new PrintWriter(trace));
            String stamp = LocalDateTime.now().format(DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss", Locale.ROOT));
            Path file = Files.createTempFile("counterpoise-failure-" + stamp + "-", ".txt");
            Files.writeString(file, "Counterpoise " + Version.number() + "\njava " + System.getProperty("java.version")
                    + "\narguments: " + PlainText.escape(Arrays.toString(args)) + "\n\n" + trace, StandardCharsets.UTF_8);
            return file;
        } catch (IOException | RuntimeException ignored) {
            return null;
        }
    }
}
