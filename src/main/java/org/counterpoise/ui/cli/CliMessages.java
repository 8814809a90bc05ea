package org.counterpoise.ui.cli;

import java.util.List;
import java.util.stream.Collectors;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.PlainText;
import picocli.CommandLine;
import picocli.CommandLine.MissingParameterException;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.OverwrittenOptionException;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.TypeConversionException;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * Turns picocli's complaints about the command line into the program's plain messages: which
 * option or argument, what is wrong, what is allowed. Decided on the exception's type; picocli's
 * own wording (which names Java types) is used only as a last resort, escaped.
 */
final class CliMessages {
    private CliMessages() {
    }

    /**
     * @param e the problem
     * @return one line, without "error: "
     */
    static String of(ParameterException e) {
        CommandLine cl = e.getCommandLine();
        if (e instanceof MissingParameterException m && !m.getMissing().isEmpty()) {
            return m.getMissing().stream().map(a -> InvalidInputException.missing(name(a), "give " + what(a))
                    .getMessage()).collect(Collectors.joining("; "));
        }
        if (e instanceof UnmatchedArgumentException u && !u.getUnmatched().isEmpty()) {
            String first = PlainText.quote(u.getUnmatched().get(0));
            List<String> hints = u.getSuggestions();
            String hint = hints.isEmpty() ? "" : " (did you mean " + PlainText.quote(hints.get(0)) + "?)";
            if (u.isUnknownOption()) {
                return InvalidInputException.unusable(first, "is not an option of " + commandName(cl) + hint,
                        "see " + commandName(cl) + " --help for the options").getMessage();
            }
            if (cl.getParent() == null && !cl.getSubcommands().isEmpty()) {
                return InvalidInputException.unusable(first, "is not a command" + hint,
                        "the commands are " + String.join(", ", cl.getSubcommands().keySet())).getMessage();
            }
            return InvalidInputException.unusable(first, "is one argument too many",
                    commandName(cl) + " takes the arguments shown by " + commandName(cl) + " --help").getMessage();
        }
        if (e instanceof OverwrittenOptionException o && o.getOverwritten() != null) {
            return InvalidInputException.unusable(name(o.getOverwritten()), "is given more than once",
                    "give it once").getMessage();
        }
        ArgSpec arg = e.getArgSpec();
        if (arg != null && e.getValue() != null) {
            String allowed = e.getCause() instanceof TypeConversionException t ? t.getMessage()
                    : "see " + commandName(cl) + " --help for what is allowed";
            return new InvalidInputException(name(arg), Converters.shown(e.getValue()), allowed).getMessage();
        }
        return "the command line was not understood: " + PlainText.escape(e.getMessage());
    }

    static String commandName(CommandLine cl) {
        return cl == null ? "counterpoise" : cl.getCommandSpec().qualifiedName();
    }

    private static String name(ArgSpec a) {
        return a instanceof OptionSpec o ? o.longestName() : a.paramLabel();
    }

    private static String what(ArgSpec a) {
        String d = String.join(" ", a.description()).strip();
        return d.isEmpty() ? a.paramLabel() : d.replaceAll("\\$\\{[^}]*}", "").replaceAll("\\s*\\(default\\s*\\)", "");
    }
}
