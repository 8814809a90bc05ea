package org.counterpoise.ui.gui.task;

import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;

/**
 * The strip at the bottom of the window that shows the running job (the most recent one when
 * several run), an indeterminate progress bar and a Cancel button. Hidden while nothing runs.
 * Event thread only.
 */
public final class TaskBar extends JPanel {
    private final JLabel label = new JLabel();
    private final JProgressBar bar = new JProgressBar();
    private final JButton cancel = new JButton("Cancel");
    private final List<Entry> running = new ArrayList<>();

    /** An idle bar. */
    public TaskBar() {
        super(new FlowLayout(FlowLayout.LEFT, 6, 0));
        setName("tasks");
        label.setName("tasks.label");
        cancel.setName("tasks.cancel");
        bar.setIndeterminate(true);
        bar.setPreferredSize(new Dimension(120, bar.getPreferredSize().height));
        cancel.addActionListener(e -> {
            if (!running.isEmpty()) {
                Entry top = running.get(running.size() - 1);
                top.onCancel.run();
                top.phase("cancelling\u2026");
                cancel.setEnabled(false);
            }
        });
        add(label);
        add(bar);
        add(cancel);
        setVisible(false);
    }

    /**
     * @param title what runs
     * @param onCancel what Cancel does
     * @return the entry, to update and remove
     */
    Entry add(String title, Runnable onCancel) {
        Entry e = new Entry(title, onCancel);
        running.add(e);
        refresh();
        return e;
    }

    /** @return the text shown, or empty while idle (for tests) */
    public String shown() {
        return running.isEmpty() ? "" : label.getText();
    }

    private void refresh() {
        if (running.isEmpty()) {
            setVisible(false);
            return;
        }
        Entry top = running.get(running.size() - 1);
        label.setText(top.title + (top.phase == null ? "\u2026" : ": " + top.phase));
        cancel.setEnabled(!"cancelling\u2026".equals(top.phase));
        setVisible(true);
        revalidate();
        repaint();
    }

    /** One running job. */
    final class Entry {
        private final String title;
        private final Runnable onCancel;
        private String phase;

        private Entry(String title, Runnable onCancel) {
            this.title = title;
            this.onCancel = onCancel;
        }

        void phase(String what) {
            if (!"cancelling\u2026".equals(phase)) {
                phase = what;
            }
            refresh();
        }

        void remove() {
            running.remove(this);
            refresh();
        }
    }
}
