package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import javax.swing.JButton;
import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JPanel;
import org.counterpoise.ui.gui.action.EditActions;
import org.counterpoise.ui.gui.action.FileActions;

/**
 * The window that holds the {@link ProjectDetails} beside the wizard (not modal, so the steps stay
 * usable), made on first use; the file and undo shortcuts work in it as in the wizard.
 */
final class ProjectDetailsDialog {
    private final JFrame owner;
    private final ProjectDetails details;
    private final FileActions files;
    private final EditActions edits;
    private JDialog dialog;

    ProjectDetailsDialog(JFrame owner, ProjectDetails details, FileActions files, EditActions edits) {
        this.owner = owner;
        this.details = details;
        this.files = files;
        this.edits = edits;
    }

    /** Shows the window, making it the first time. */
    void show() {
        if (dialog == null) {
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
