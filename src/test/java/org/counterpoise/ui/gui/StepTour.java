package org.counterpoise.ui.gui;

import java.awt.GraphicsEnvironment;
import java.awt.Rectangle;
import java.awt.Robot;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;
import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.ui.gui.wizard.WizardFrame;

/**
 * Not a test: opens the wizard as a user would and photographs the whole screen on every step,
 * for a person to look at (run it under Xvfb at several screen sizes and scalings):
 * {@code java -Dsun.java2d.uiScale=2 -cp target/counterpoise.jar:target/test-classes
 * org.counterpoise.ui.gui.StepTour target/tour [preset or project file]}; with
 * {@code -Dtour.runup=true} also the result step's Run-up tab ({@code step5-runup.png}), with
 * {@code -Dtour.comparison=true} its comparison of methods ({@code step5-comparison.png}); with
 * {@code -Dtour.criterion=MACHINE} (a family of the goal step's criterion list) that criterion first;
 * with {@code -Dtour.hardware=true} the result step's Hardware tab ({@code step5-hardware.png}); with
 * {@code -Dtour.units=us} every value in US customary units; {@code -Dtour.details=true} also
 * photographs the project details window ({@code details.png}).
 */
public final class StepTour {
    private StepTour() {
    }

    /** @param args output folder, then optionally a preset name or a project file */
    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/tour");
        Files.createDirectories(out);
        System.setProperty("counterpoise.prefs", "memory");
        AtomicReference<WizardFrame> frame = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            Themes.apply(false);
            WizardFrame f = new WizardFrame();
            if (args.length > 1 && args[1].endsWith(".json") && Files.isRegularFile(Path.of(args[1]))) {
                f.openFile(Path.of(args[1])); // a project file of one's own
            } else if (args.length > 1) {
                f.load(Presets.load(args[1]), null);
            }
            f.setVisible(true);
            frame.set(f);
        });
        waitSettled(frame.get());
        String typed = System.getProperty("tour.mass");
        if (typed != null) {
            SwingUtilities.invokeAndWait(() -> ((javax.swing.JTextField) find(frame.get().getContentPane(), "structure.mass"))
                    .setText(typed));
            Thread.sleep(1500);
        }
        String criterion = System.getProperty("tour.criterion");
        if (criterion != null) {
            // a family of the goal step's criterion list by its name (MACHINE, HUMAN_COMFORT...)
            SwingUtilities.invokeAndWait(() -> {
                javax.swing.JComboBox<?> list = (javax.swing.JComboBox<?>) find(frame.get().getContentPane(),
                        "acceptance.criterion");
                for (int i = 0; i < list.getItemCount(); i++) {
                    if (String.valueOf(list.getItemAt(i)).equals(criterion)) {
                        list.setSelectedIndex(i);
                    }
                }
            });
            Thread.sleep(1500);
            waitSettled(frame.get());
        }
        if ("us".equals(System.getProperty("tour.units"))) {
            SwingUtilities.invokeAndWait(() -> ((javax.swing.JComboBox<?>) find(frame.get().getContentPane(),
                    "display.units")).setSelectedIndex(1));
            Thread.sleep(1500);
            waitSettled(frame.get());
        }
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice()
                .getDefaultConfiguration().getBounds();
        if (Boolean.getBoolean("tour.details")) {
            SwingUtilities.invokeAndWait(() -> frame.get().showProjectDetails());
            Thread.sleep(1500);
            ImageIO.write(new Robot().createScreenCapture(screen), "png", out.resolve("details.png").toFile());
            SwingUtilities.invokeAndWait(() -> java.util.Arrays.stream(java.awt.Window.getWindows())
                    .filter(w -> "project.dialog".equals(w.getName())).forEach(w -> w.setVisible(false)));
        }
        for (int step = 0; step < 7; step++) {
            int s = step;
            SwingUtilities.invokeAndWait(() -> frame.get().showStep(s));
            Thread.sleep(step >= 4 ? 5000 : 2500);
            if (Boolean.getBoolean("tour.dump")) {
                SwingUtilities.invokeAndWait(() -> dump(frame.get().getContentPane(), ""));
            }
            BufferedImage image = new Robot().createScreenCapture(screen);
            ImageIO.write(image, "png", out.resolve("step" + (step + 1) + ".png").toFile());
            if (step == 4 && Boolean.getBoolean("tour.runup")) {
                // the result step's Run-up tab (computed when shown)
                photographTab(frame.get(), 1, Long.getLong("tour.runup.wait", 8000), out.resolve("step5-runup.png"));
            }
            if (step == 4 && Boolean.getBoolean("tour.hardware")) {
                // the result step's realisation (computed after the design, in the background)
                photographTab(frame.get(), 3, Long.getLong("tour.hardware.wait", 5000), out.resolve("step5-hardware.png"));
            }
            if (step == 4 && Boolean.getBoolean("tour.comparison")) {
                // the result step's comparison of methods (computed with the design, in the background)
                photographTab(frame.get(), 2, Long.getLong("tour.comparison.wait", 6000),
                        out.resolve("step5-comparison.png"));
            }
        }
        SwingUtilities.invokeAndWait(() -> frame.get().dispose());
        System.exit(0);
    }

    /** Shows the result step's tab {@code index}, waits, photographs the screen, and goes back to the first tab. */
    private static void photographTab(WizardFrame frame, int index, long waitMs, Path file) throws Exception {
        Rectangle screen = GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice()
                .getDefaultConfiguration().getBounds();
        SwingUtilities.invokeAndWait(() -> ((javax.swing.JTabbedPane) find(frame.getContentPane(), "result.views"))
                .setSelectedIndex(index));
        Thread.sleep(waitMs);
        ImageIO.write(new Robot().createScreenCapture(screen), "png", file.toFile());
        SwingUtilities.invokeAndWait(() -> ((javax.swing.JTabbedPane) find(frame.getContentPane(), "result.views"))
                .setSelectedIndex(0));
    }

    private static java.awt.Component find(java.awt.Container root, String name) {
        for (java.awt.Component c : root.getComponents()) {
            if (name.equals(c.getName())) {
                return c;
            }
            if (c instanceof java.awt.Container sub) {
                java.awt.Component found = find(sub, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static void dump(java.awt.Component c, String indent) {
        if (!c.isShowing() || indent.length() > 24) {
            return;
        }
        System.out.println(indent + c.getClass().getSimpleName() + " " + c.getName() + " " + c.getBounds().width + "x"
                + c.getBounds().height + " min " + c.getMinimumSize().width + "x" + c.getMinimumSize().height + " pref "
                + c.getPreferredSize().width + "x" + c.getPreferredSize().height);
        if (c instanceof java.awt.Container k) {
            for (java.awt.Component child : k.getComponents()) {
                dump(child, indent + "  ");
            }
        }
    }

    private static void waitSettled(WizardFrame f) throws Exception {
        for (int i = 0; i < 600; i++) {
            AtomicReference<Boolean> done = new AtomicReference<>(false);
            SwingUtilities.invokeAndWait(() -> done.set(f.settled() && f.shownResult() != null));
            if (done.get()) {
                return;
            }
            Thread.sleep(100);
        }
    }
}
