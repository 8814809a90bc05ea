package org.counterpoise.ui.gui.task;

import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;

/**
 * The strip at the bottom of the window that shows the running job (the most recent one when
 * several run), its progress (indeterminate until the job reports a share done) and a Cancel
 * button. Hidden while nothing runs. Event thread only.
 */
public final class TaskBar extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JLabel label = new JLabel();
    private final JProgressBar bar = new JProgressBar(0, 100);
    private final JButton cancel = new JButton("Cancel");
    private final List<Entry> running = new ArrayList<>();

    /** Where a job stands, as the bar shows it. */
    enum State {
        /** Working. */
        RUNNING,
        /** Cancel was pressed; the job stops at its next check. */
        CANCELLING
    }

    /** An idle bar. */
    public TaskBar() {
        super(new FlowLayout(FlowLayout.LEFT, 6, 0));
        setName("tasks");
        label.setName("tasks.label");
        cancel.setName("tasks.cancel");
        bar.setName("tasks.progress");
        bar.setPreferredSize(new Dimension(120, bar.getPreferredSize().height));
        cancel.addActionListener(e -> {
            if (!running.isEmpty()) {
                running.get(running.size() - 1).cancel();
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

    /** @return the state of the job shown, or empty while idle (for tests) */
    Optional<State> shownState() {
        return running.isEmpty() ? Optional.empty() : Optional.of(running.get(running.size() - 1).state);
    }

    private void refresh() {
        if (running.isEmpty()) {
            setVisible(false);
            return;
        }
        Entry top = running.get(running.size() - 1);
        String detail = switch (top.state) {
            case CANCELLING -> ": cancelling\u2026";
            case RUNNING -> top.phase == null ? "\u2026" : ": " + top.phase;
        };
        label.setText(top.title + detail);
        cancel.setEnabled(top.state == State.RUNNING);
        bar.setIndeterminate(top.percent < 0);
        bar.setValue(Math.max(0, top.percent));
        setVisible(true);
        revalidate();
        repaint();
    }

    /** One running job. */
    final class Entry {
        private final String title;
        private final Runnable onCancel;
        private String phase;
        private State state = State.RUNNING;
        private int percent = -1;

        private Entry(String title, Runnable onCancel) {
            this.title = title;
            this.onCancel = onCancel;
        }

        /** @return where the job stands */
        State state() {
            return state;
        }

        void phase(String what) {
            phase = what;
            refresh();
        }

        /** @param done the share done, in percent (0 to 100) */
        void percent(int done) {
            percent = done;
            refresh();
        }

        void cancel() {
            if (state == State.RUNNING) {
                state = State.CANCELLING;
                onCancel.run();
                refresh();
            }
        }

        void remove() {
            running.remove(this);
            refresh();
        }
    }
}
