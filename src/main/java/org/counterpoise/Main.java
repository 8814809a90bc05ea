package org.counterpoise;

import java.awt.GraphicsEnvironment;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.counterpoise.core.design.DesignDossier;
import java.nio.file.Path;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.ui.cli.Cli;
import org.counterpoise.ui.gui.GuiMain;

/**
 * Entry point: with arguments, the command line; with one project file as the only argument, the
 * wizard on that file; without, the wizard. On a machine with no display, instead of the wizard,
 * the design report of that file or of the default scenario.
 */
public final class Main {
    private Main() {
    }

    /**
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        if (args.length == 0) {
            if (GraphicsEnvironment.isHeadless()) {
                out.println("No display: running the default example scenario through the design report instead"
                        + " of opening the wizard.");
                out.print(DesignReport.render(DesignDossier.of(Presets.defaultProject().project().toStudy()).design()));
                out.flush();
                System.exit(0);
            }
            GuiMain.launch();
            return;
        }
        if (Cli.isProjectFile(args)) {
            if (GraphicsEnvironment.isHeadless()) {
                out.println("No display: printing the design report of " + PlainText.escape(args[0])
                        + " instead of opening the wizard.");
                System.exit(Cli.run(new String[] {"design", args[0]}, out, err));
            }
            GuiMain.open(Path.of(args[0]));
            return;
        }
        System.exit(Cli.run(args, out, err));
    }
}
