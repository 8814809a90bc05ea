package org.counterpoise.ui.gui.wizard;

import java.awt.BorderLayout;
import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectIdentity;
import org.counterpoise.io.project.Revision;
import org.counterpoise.io.project.SignOff;
import org.counterpoise.ui.gui.Themes;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.field.Html;

/**
 * Who and what the project is: name, revision, date of issue, engineer, client or site, notes. A
 * view of the document like the steps; printed on the report and the sheet.
 */
final class ProjectDetails extends JPanel {
    private final DesignDocument document;
    private final JTextField name = text("project.name", 28);
    private final JTextField documentNumber = text("project.document_number", 16);
    private final JTextField revision = text("project.revision", 6);
    private final JTextField date = text("project.date", 10);
    private final JTextField engineer = text("project.engineer", 28);
    private final JTextField client = text("project.client", 28);
    private final JTextArea notes = new JTextArea(6, 40);
    private final JLabel dateProblem = new JLabel(" ");
    private final RevisionHistoryTable history = new RevisionHistoryTable(this::listEdited);
    private final SignOffForm signOff = new SignOffForm(this::edited);
    private boolean syncing;
    /** The component whose typing makes the edit being applied (never re-set while it notifies). */
    private String editing;

    ProjectDetails(DesignDocument document) {
        super(new BorderLayout());
        this.document = document;
        setName("project.details");
        notes.setName("project.notes");
        notes.setLineWrap(true);
        notes.setWrapStyleWord(true);
        dateProblem.setName("project.date.message");
        JPanel form = new JPanel(new GridBagLayout());
        form.setBorder(BorderFactory.createEmptyBorder(10, 12, 10, 12));
        int row = 0;
        row = row(form, row, "Project name", 'n', name, "Printed as the title of the report and the sheet");
        row = row(form, row, "Document number", 'u', documentNumber, "The sheet's document or drawing number");
        row = row(form, row, "Revision", 'r', revision, "Revision mark of this issue, e.g. B");
        row = row(form, row, "Date of issue", 'd', date, "YYYY-MM-DD; empty to print the day the sheet is made");
        GridBagConstraints mc = at(1, row++);
        form.add(dateProblem, mc);
        row = row(form, row, "Engineer", 'e', engineer, "Who designed the absorber");
        row = row(form, row, "Client or site", 'c', client, "Whom or where the absorber is for");
        row = row(form, row, "Notes", 'o', new JScrollPane(notes), "Anything the reader of the sheet should know");
        GridBagConstraints filler = at(0, row);
        filler.weighty = 1;
        form.add(new JLabel(), filler);
        // the sheet's title block beside the project: its earlier issues and who signs this one
        JPanel sheet = new JPanel(new BorderLayout(0, 6));
        sheet.setBorder(BorderFactory.createEmptyBorder(10, 6, 10, 12));
        JPanel historyPanel = new JPanel(new BorderLayout(0, 2));
        historyPanel.add(heading("Revision history (oldest first)"), BorderLayout.NORTH);
        historyPanel.add(history, BorderLayout.CENTER);
        JPanel signOffPanel = new JPanel(new BorderLayout(0, 2));
        signOffPanel.add(heading("Sign-off of this issue"), BorderLayout.NORTH);
        signOffPanel.add(signOff, BorderLayout.CENTER);
        sheet.add(historyPanel, BorderLayout.CENTER);
        sheet.add(signOffPanel, BorderLayout.SOUTH);
        add(form, BorderLayout.CENTER);
        add(sheet, BorderLayout.EAST);
        for (JTextComponent c : List.of(name, documentNumber, revision, date, engineer, client, notes)) {
            c.getDocument().addDocumentListener(new DocumentListener() {
                @Override
                public void insertUpdate(DocumentEvent e) {
                    edited(c.getName());
                }

                @Override
                public void removeUpdate(DocumentEvent e) {
                    edited(c.getName());
                }

                @Override
                public void changedUpdate(DocumentEvent e) {
                    edited(c.getName());
                }
            });
        }
    }

    private static JLabel heading(String text) {
        JLabel l = new JLabel(text);
        l.setFont(l.getFont().deriveFont(Font.BOLD));
        return l;
    }

    private static JTextField text(String id, int columns) {
        JTextField f = new JTextField(columns);
        f.setName(id);
        // GridBagLayout shrinks a field to its minimum (a sliver) once a row is too wide: never below its columns.
        f.setMinimumSize(f.getPreferredSize());
        return f;
    }

    private static int row(JPanel form, int row, String label, char mnemonic, JComponent field, String tip) {
        JLabel l = new JLabel(label);
        l.setDisplayedMnemonic(mnemonic);
        l.setLabelFor(field instanceof JScrollPane s ? s.getViewport().getView() : field);
        l.setToolTipText(tip);
        field.setToolTipText(tip);
        GridBagConstraints lc = at(0, row);
        lc.anchor = GridBagConstraints.FIRST_LINE_END;
        lc.insets = new Insets(4, 0, 4, 10);
        form.add(l, lc);
        GridBagConstraints fc = at(1, row);
        fc.fill = field instanceof JScrollPane ? GridBagConstraints.BOTH : GridBagConstraints.NONE;
        fc.weightx = 1;
        form.add(field, fc);
        return row + 1;
    }

    private static GridBagConstraints at(int x, int y) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(3, 0, 3, 0);
        return c;
    }

    private void edited(String key) {
        if (syncing) {
            return;
        }
        boolean dateOk = true;
        try {
            ProjectIdentity.checkDate("date", date.getText().strip());
            dateProblem.setText(" ");
            date.putClientProperty("JComponent.outline", null);
        } catch (InvalidInputException e) {
            // Wrapped to the form's width, so a long message neither runs off nor squeezes the fields.
            dateProblem.setForeground(Themes.problemColour());
            dateProblem.setText("<html><div style='width:240pt'>" + Html.escape(e.problem()) + "</div></html>");
            date.putClientProperty("JComponent.outline", "error");
            dateOk = false;
        }
        ProjectIdentity identity;
        try {
            // each part says its own bad date where it is shown
            List<Revision> revisions = history.revisions();
            SignOff signatures = signOff.signOff();
            if (!dateOk) {
                return; // a half-typed date is kept on screen, not saved
            }
            identity = new ProjectIdentity(revision.getText(), engineer.getText(), client.getText(), date.getText(),
                    documentNumber.getText(), revisions, signatures);
        } catch (InvalidInputException e) {
            return;
        }
        editing = key;
        try {
            document.apply(ProjectEdits.identity(key, name.getText().strip(), notes.getText(), identity));
        } finally {
            editing = null;
        }
    }

    /** A row added or removed, or a cell of the history edited: one undo step of its own. */
    private void listEdited(String key) {
        document.seal();
        edited(key);
        document.seal();
    }

    /** @param p the project to show (only what differs is touched) */
    void sync(Project p) {
        show(p, false);
    }

    private void show(Project p, boolean all) {
        syncing = true;
        try {
            for (JTextComponent c : List.of(name, notes, documentNumber, revision, engineer, client, date)) {
                if (all || !c.getName().equals(editing)) {
                    set(c, switch (c.getName()) {
                        case "project.name" -> p.name();
                        case "project.notes" -> p.notes();
                        case "project.revision" -> p.identity().revision();
                        case "project.document_number" -> p.identity().documentNumber();
                        case "project.engineer" -> p.identity().engineer();
                        case "project.client" -> p.identity().client();
                        default -> all || " ".equals(dateProblem.getText()) ? p.identity().date() : c.getText();
                    });
                }
            }
            history.show(p.identity().history(), all);
            signOff.show(p.identity().signOff(), all, editing);
        } finally {
            syncing = false;
        }
    }

    /** @param p a project just opened, undone or redone: every field shows it, a bad date too */
    void load(Project p) {
        dateProblem.setText(" ");
        date.putClientProperty("JComponent.outline", null);
        show(p, true);
    }

    /**
     * @param c a text component
     * @param text what the project holds
     */
    private static void set(JTextComponent c, String text) {
        String shown = c.getText();
        if (!shown.equals(text) && !shown.strip().equals(text)) {
            c.setText(text);
        }
    }
}
