package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import javax.swing.ImageIcon;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.SwingConstants;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.counterpoise.core.criteria.AmplitudeConvention;
import org.counterpoise.core.design.DesignDossier;
import org.counterpoise.core.realisation.HardwareChoice;
import org.counterpoise.io.project.MeasuredSource;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.SeveralModes;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.sheet.RunUpPanel;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.sheet.SheetPanel;
import org.counterpoise.io.text.UnitSystem;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * Step 6: preview of the parameter sheet, and the buttons that save it and the exports. The
 * preview, the PDF and the exports are made off the event thread; the PDF and the exports show on
 * the task bar and can be cancelled.
 */
final class SheetStep extends Step {
    /** The step's title in the step list. */
    static final String TITLE = "Parameter sheet";
    private final JLabel preview = new JLabel("The sheet preview appears here.", SwingConstants.CENTER);
    private final JComponent page;
    private final TaskRunner tasks;
    private final Messages messages;
    private DesignDossier dossier;
    private Project project;

    /** Where the outcome of a save is said (the status line). */
    @FunctionalInterface
    interface Messages {
        /** @param text a short sentence */
        void say(String text);
    }

    SheetStep(TaskRunner tasks, Messages messages) {
        this.tasks = tasks;
        this.messages = messages;
        preview.setName("sheet.preview");
        JButton savePdf = new JButton("Save sheet as PDF\u2026");
        savePdf.setName("sheet.save");
        savePdf.setMnemonic('s');
        savePdf.addActionListener(e -> savePdf());
        JButton saveExports = new JButton("Save curves, result and charts\u2026");
        saveExports.setName("sheet.exports");
        saveExports.setMnemonic('e');
        saveExports.addActionListener(e -> saveExports());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT));
        buttons.add(savePdf);
        buttons.add(saveExports);
        JPanel p = new JPanel(new BorderLayout());
        p.add(buttons, BorderLayout.NORTH);
        p.add(new JScrollPane(preview), BorderLayout.CENTER);
        page = p;
    }

    @Override
    String title() {
        return TITLE;
    }

    @Override
    JComponent component() {
        return page;
    }

    @Override
    void showProject(Project p, boolean loaded) {
        // The sheet shows results; its project details arrive with them (see show).
    }

    @Override
    boolean fieldsValid() {
        return true;
    }

    /**
     * @param d the analyses of the design now shown, or null
     * @param p the project it was computed from
     */
    void show(DesignDossier d, Project p) {
        dossier = d;
        project = p;
        preview.setIcon(null);
        preview.setText(d == null ? "Fix the inputs to see the sheet." : "Open this step to render the preview.");
    }

    private String issued() {
        return project.identity().date().isEmpty() ? LocalDate.now().toString() : project.identity().date();
    }

    private String revision(String fallback) {
        return project.identity().revision().isEmpty() ? fallback : project.identity().revision();
    }

    /** Renders the first page of the sheet in the background when the step is shown. */
    @Override
    void shown() {
        DesignDossier d = dossier;
        if (d == null || previewShown()) {
            return;
        }
        String notes = project.notes();
        String date = issued();
        String revision = revision("draft");
        ProjectIdentity identity = project.identity();
        HardwareChoice hardware = project.hardware();
        UnitSystem units = project.displayUnits();
        MeasuredSource measured = project.structure().measured();
        Project p = project;
        preview.setText("drawing the preview\u2026");
        tasks.current(null, progress -> {
            d.monteCarlo(progress); // the dossier's run, shared with the robustness step: made once
            ByteArrayOutputStream pdf = new ByteArrayOutputStream();
            SheetFiles.writeSheet(d, notes, date, revision, identity, List.of(), AmplitudeConvention.PEAK,
                    hardware, units, measured, SeveralModes.layout(p), pdf);
            try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
                return new PDFRenderer(doc).renderImageWithDPI(0, 80);
            }
        }, (BufferedImage image) -> {
            if (d == dossier) {
                preview.setIcon(new ImageIcon(image));
                preview.setText(null);
            }
        }, e -> preview.setText("The preview could not be drawn: " + e.getMessage()));
    }

    private void savePdf() {
        if (dossier == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("PDF sheet", "pdf"));
        if (chooser.showSaveDialog(page) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        if (!file.toString().toLowerCase(Locale.ROOT).endsWith(".pdf")) {
            file = file.resolveSibling(file.getFileName() + ".pdf");
        }
        boolean replace = !Files.exists(file) || JOptionPane.showConfirmDialog(page,
                file.getFileName() + " exists. Replace it?", "Save sheet", JOptionPane.YES_NO_OPTION)
                == JOptionPane.YES_OPTION;
        if (replace) {
            writeSheet(file);
        }
    }

    /**
     * Writes the sheet in the background (replacing an existing file), with progress and Cancel.
     * @param file the PDF
     */
    void writeSheet(Path file) {
        DesignDossier d = dossier;
        String notes = project.notes();
        String date = issued();
        String revision = revision("A");
        ProjectIdentity identity = project.identity();
        Project p = project;
        tasks.requested("Saving the sheet " + file.getFileName(), progress -> {
            progress.phase("Monte Carlo");
            d.monteCarlo(progress); // already made for this state unless the robustness step is still at it
            progress.checkCancelled();
            progress.phase("run-up");
            SheetPanel runUp = RunUpPanel.of(p, d.design(), progress); // as `sheet` prints it (the preview is page 1)
            progress.phase("drawing");
            new SheetFiles.Outputs(d).panel(runUp).hardware(p.hardware(), p.displayUnits())
                    .measured(p.structure().measured()).absorbers(SeveralModes.layout(p))
                    .sheet(file, notes, date, revision, "sheet file", identity)
                    .write(true);
            return file;
        }, f -> messages.say("Saved the sheet to " + f + "."),
                e -> JOptionPane.showMessageDialog(page, e.getMessage(), "Save sheet", JOptionPane.WARNING_MESSAGE),
                () -> messages.say("Saving the sheet was cancelled."));
    }

    private void saveExports() {
        if (dossier == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        if (chooser.showSaveDialog(page) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path dir = chooser.getSelectedFile().toPath();
        DesignDossier d = dossier;
        tasks.requested("Saving curves, result and charts", progress -> {
            progress.phase("writing six files");
            return SheetFiles.writeExports(d, dir, true, "folder");
        }, (List<Path> written) -> messages.say("Wrote " + written.size() + " files to " + dir + "."),
                e -> JOptionPane.showMessageDialog(page, e.getMessage(), "Exports", JOptionPane.WARNING_MESSAGE),
                () -> messages.say("Saving the exports was cancelled."));
    }

    boolean previewShown() {
        return preview.getIcon() != null;
    }
}
