package org.counterpoise;

import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.counterpoise.ui.cli.Cli;

/** Entry point: with arguments, the command line; without, the help. */
public final class Main {
    private Main() {
    }

    /**
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        System.exit(Cli.run(args, out, err));
    }
}
