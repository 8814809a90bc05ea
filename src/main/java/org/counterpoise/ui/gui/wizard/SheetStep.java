package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import javax.swing.ImageIcon;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JFileChooser;
import javax.swing.JLabel;
import javax.swing.JOptionPane;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.SwingConstants;
import javax.swing.SwingWorker;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.counterpoise.core.design.DesignCurves;
import org.counterpoise.core.design.DesignResult;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.sheet.SheetContent;
import org.counterpoise.io.sheet.SheetFiles;
import org.counterpoise.io.sheet.SheetWriter;

/** Step 6: preview of the parameter sheet, and the buttons that save it and the exports. */
final class SheetStep extends Step {
    private final JLabel preview = new JLabel("The sheet preview appears here.", SwingConstants.CENTER);
    private final JComponent page;
    private DesignResult result;
    private String notes = "";

    SheetStep() {
        preview.setName("sheet.preview");
        JButton savePdf = new JButton("Save sheet as PDF\u2026");
        savePdf.setName("sheet.save");
        savePdf.setMnemonic('s');
        savePdf.addActionListener(e -> savePdf());
        JButton saveExports = new JButton("Save curves, result and charts\u2026");
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
        return "Parameter sheet";
    }

    @Override
    JComponent component() {
        return page;
    }

    void show(DesignResult r, String projectNotes) {
        result = r;
        notes = projectNotes == null ? "" : projectNotes;
        preview.setIcon(null);
        preview.setText(r == null ? "Fix the inputs to see the sheet." : "Open this step to render the preview.");
    }

    /** Renders the first page of the sheet in the background when the step is shown. */
    @Override
    void shown() {
        DesignResult r = result;
        if (r == null || previewShown()) {
            return;
        }
        String projectNotes = notes;
        preview.setText("drawing the preview\u2026");
        new SwingWorker<BufferedImage, Void>() {
            @Override
            protected BufferedImage doInBackground() throws IOException {
                ByteArrayOutputStream pdf = new ByteArrayOutputStream();
                SheetWriter.write(SheetContent.of(r, projectNotes, LocalDate.now().toString(), "draft",
                        SheetFiles.monteCarlo(r)), SheetFiles.charts(r, DesignCurves.of(r)), pdf);
                try (PDDocument doc = Loader.loadPDF(pdf.toByteArray())) {
                    return new PDFRenderer(doc).renderImageWithDPI(0, 80);
                }
            }

            @Override
            protected void done() {
                if (r != result) {
                    return; // a newer design arrived meanwhile
                }
                try {
                    preview.setIcon(new ImageIcon(get()));
                    preview.setText(null);
                } catch (java.util.concurrent.ExecutionException e) {
                    preview.setText("The preview could not be drawn: " + e.getCause().getMessage());
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
            }
        }.execute();
    }

    private void savePdf() {
        if (result == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileFilter(new FileNameExtensionFilter("PDF sheet", "pdf"));
        if (chooser.showSaveDialog(page) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        Path file = chooser.getSelectedFile().toPath();
        if (!file.toString().toLowerCase(java.util.Locale.ROOT).endsWith(".pdf")) {
            file = file.resolveSibling(file.getFileName() + ".pdf");
        }
        boolean replace = !java.nio.file.Files.exists(file) || JOptionPane.showConfirmDialog(page,
                file.getFileName() + " exists. Replace it?", "Save sheet", JOptionPane.YES_NO_OPTION)
                == JOptionPane.YES_OPTION;
        if (!replace) {
            return;
        }
        try {
            SheetFiles.writeSheet(result, notes, file, LocalDate.now().toString(), "A", true, "sheet file");
        } catch (InvalidInputException e) {
            JOptionPane.showMessageDialog(page, e.getMessage(), "Save sheet", JOptionPane.WARNING_MESSAGE);
        }
    }

    private void saveExports() {
        if (result == null) {
            return;
        }
        JFileChooser chooser = new JFileChooser();
        chooser.setFileSelectionMode(JFileChooser.DIRECTORIES_ONLY);
        if (chooser.showSaveDialog(page) != JFileChooser.APPROVE_OPTION) {
            return;
        }
        try {
            List<Path> written = SheetFiles.writeExports(result, chooser.getSelectedFile().toPath(), true, "folder");
            JOptionPane.showMessageDialog(page, "Wrote " + written.size() + " files.", "Exports",
                    JOptionPane.INFORMATION_MESSAGE);
        } catch (InvalidInputException e) {
            JOptionPane.showMessageDialog(page, e.getMessage(), "Exports", JOptionPane.WARNING_MESSAGE);
        }
    }

    boolean previewShown() {
        return preview.getIcon() != null;
    }
}
