package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JPanel;
import org.counterpoise.io.project.Project;
import org.counterpoise.ui.gui.action.EditActions;
import org.counterpoise.ui.gui.action.FileActions;
import org.counterpoise.ui.gui.document.DesignDocument;

/**
 * The window that holds the {@link ProjectDetails} beside the wizard (not modal, so the steps stay
 * usable), made on first use, its fields with it (not for the first window: docs/performance.md);
 * the file and undo shortcuts work in it as in the wizard.
 */
final class ProjectDetailsDialog {
    private final JFrame owner;
    private final DesignDocument document;
    private final FileActions files;
    private final EditActions edits;
    private ProjectDetails details;
    private JDialog dialog;

    ProjectDetailsDialog(JFrame owner, DesignDocument document, FileActions files, EditActions edits) {
        this.owner = owner;
        this.document = document;
        this.files = files;
        this.edits = edits;
    }

    /** @param p a project just opened, undone or redone: the fields, once made, show all of it */
    void load(Project p) {
        if (details != null) {
            details.load(p);
        }
    }

    /** @param p the project after an edit: the fields, once made, show what differs */
    void sync(Project p) {
        if (details != null) {
            details.sync(p);
        }
    }

    /** Shows the window, making it the first time. */
    void show() {
        if (dialog == null) {
            details = new ProjectDetails(document);
            details.load(document.project());
            dialog = new JDialog(owner, "Project details", false);
            dialog.setName("project.dialog");
            JPanel content = new JPanel(new BorderLayout());
            content.add(details, BorderLayout.CENTER);
            JButton close = new JButton("Close");
            close.setName("project.close");
            close.addActionListener(e -> dialog.setVisible(false));
            JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 6));
            buttons.add(close);
            content.add(buttons, BorderLayout.SOUTH);
            dialog.setContentPane(content);
            files.bind(dialog.getRootPane());
            edits.bind(dialog.getRootPane());
            dialog.pack();
            dialog.setLocationRelativeTo(owner);
        }
        dialog.setVisible(true);
    }
}
