package org.counterpoise;

import java.awt.GraphicsEnvironment;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import org.counterpoise.core.design.Designer;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.text.DesignReport;
import org.counterpoise.ui.cli.Cli;
import org.counterpoise.ui.gui.GuiMain;

/**
 * Entry point: with arguments, the command line; without, the wizard, or on a machine with no
 * display the default scenario's design report.
 */
public final class Main {
    private Main() {
    }

    /**
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        if (args.length == 0) {
            if (GraphicsEnvironment.isHeadless()) {
                out.println("No display: running the default example scenario through the design report instead"
                        + " of opening the wizard.");
                out.print(DesignReport.render(Designer.design(Presets.defaultProject().project().toStudy())));
                out.flush();
                System.exit(0);
            }
            GuiMain.launch();
            return;
        }
        System.exit(Cli.run(args, out, err));
    }
}
