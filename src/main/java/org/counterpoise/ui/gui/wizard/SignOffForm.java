package org.counterpoise.ui.gui.wizard;

import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextField;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.project.SignOff;
import org.counterpoise.io.project.Signature;
import org.counterpoise.ui.gui.Themes;

/**
 * Who prepared, checked and approved this issue of the sheet, each with a name and a date (both
 * optional: a blank line is printed for a hand signature). A date that is not a calendar date is
 * said under the rows and nothing is saved until it is one.
 */
final class SignOffForm extends JPanel {
    /** The three lines of a sign-off, in the order printed. */
    private enum Line {
        PREPARED("Prepared", 'p'), CHECKED("Checked", 'h'), APPROVED("Approved", 'v');

        private final String words;
        private final char mnemonic;

        Line(String words, char mnemonic) {
            this.words = words;
            this.mnemonic = mnemonic;
        }

        String key() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    private final JTextField[] names = new JTextField[Line.values().length];
    private final JTextField[] dates = new JTextField[Line.values().length];
    private final JLabel problem = new JLabel(" ");
    private boolean showing;

    /** @param changed told with the edit's key (the field's name) after every keystroke of the user */
    SignOffForm(Consumer<String> changed) {
        super(new GridBagLayout());
        setName("identity.sign_off");
        problem.setName("identity.sign_off.message");
        problem.setForeground(Themes.problemColour());
        GridBagConstraints head = at(1, 0);
        add(new JLabel("Name"), head);
        add(new JLabel("Date (YYYY-MM-DD)"), at(2, 0));
        for (Line line : Line.values()) {
            int i = line.ordinal();
            names[i] = field("identity.sign_off." + line.key() + ".name", 20, changed);
            dates[i] = field("identity.sign_off." + line.key() + ".date", 10, changed);
            JLabel label = new JLabel(line.words);
            label.setDisplayedMnemonic(line.mnemonic);
            label.setLabelFor(names[i]);
            GridBagConstraints lc = at(0, i + 1);
            lc.anchor = GridBagConstraints.LINE_END;
            lc.insets = new Insets(3, 0, 3, 10);
            add(label, lc);
            add(names[i], at(1, i + 1));
            add(dates[i], at(2, i + 1));
        }
        GridBagConstraints pc = at(0, Line.values().length + 1);
        pc.gridwidth = 3;
        add(problem, pc);
    }

    private JTextField field(String id, int columns, Consumer<String> changed) {
        JTextField f = new JTextField(columns);
        f.setName(id);
        f.setMinimumSize(f.getPreferredSize());
        f.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                told();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                told();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                told();
            }

            private void told() {
                if (!showing) {
                    changed.accept(id);
                }
            }
        });
        return f;
    }

    private static GridBagConstraints at(int x, int y) {
        GridBagConstraints c = new GridBagConstraints();
        c.gridx = x;
        c.gridy = y;
        c.anchor = GridBagConstraints.LINE_START;
        c.insets = new Insets(3, 0, 3, 6);
        return c;
    }

    /**
     * @return the sign-off as shown
     * @throws InvalidInputException for a date that is not a calendar date (said under the rows)
     */
    SignOff signOff() {
        Signature[] s = new Signature[Line.values().length];
        for (Line line : Line.values()) {
            int i = line.ordinal();
            try {
                s[i] = new Signature(names[i].getText(), dates[i].getText());
                dates[i].putClientProperty("JComponent.outline", null);
            } catch (InvalidInputException e) {
                dates[i].putClientProperty("JComponent.outline", "error");
                problem.setText(line.words + ": " + e.problem());
                throw e;
            }
        }
        problem.setText(" ");
        return new SignOff(s[0], s[1], s[2]);
    }

    /**
     * Shows a sign-off; a field whose text already means the value keeps it (and its caret).
     * @param signOff the sign-off
     * @param always true to replace a bad date too (a project just loaded)
     * @param editing the name of the field being typed in, or null
     */
    void show(SignOff signOff, boolean always, String editing) {
        List<Signature> lines = List.of(signOff.prepared(), signOff.checked(), signOff.approved());
        showing = true;
        try {
            for (Line line : Line.values()) {
                int i = line.ordinal();
                set(names[i], lines.get(i).name(), always, editing);
                if (always || " ".equals(problem.getText())) {
                    set(dates[i], lines.get(i).date(), always, editing);
                }
            }
            if (always) {
                problem.setText(" ");
                for (JTextField d : dates) {
                    d.putClientProperty("JComponent.outline", null);
                }
            }
        } finally {
            showing = false;
        }
    }

    private static void set(JTextComponent c, String text, boolean always, String editing) {
        if (!always && c.getName().equals(editing)) {
            return;
        }
        String shown = c.getText();
        if (!shown.equals(text) && !shown.strip().equals(text)) {
            c.setText(text);
        }
    }
}
