package org.counterpoise.ui.gui.action;

import java.awt.Component;
import java.awt.event.KeyEvent;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import javax.swing.Action;
import javax.swing.JFileChooser;
import javax.swing.JMenu;
import javax.swing.JMenuItem;
import javax.swing.JOptionPane;
import javax.swing.JRootPane;
import javax.swing.filechooser.FileNameExtensionFilter;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.preset.Presets;
import org.counterpoise.io.project.LoadedProject;
import org.counterpoise.io.project.Project;
import org.counterpoise.io.project.ProjectReader;
import org.counterpoise.io.project.ProjectWriter;
import org.counterpoise.ui.gui.document.DesignDocument;
import org.counterpoise.ui.gui.document.ProjectCheck;
import org.counterpoise.ui.gui.document.ProjectEdits;
import org.counterpoise.ui.gui.session.RecentFiles;
import org.counterpoise.ui.gui.task.TaskRunner;

/**
 * New, Open, Save, Save as, the recent files and the unsaved-changes question. Saving runs on the
 * task bar (checked to reopen, then written atomically) and can be cancelled before the write.
 */
public final class FileActions {
    private final Component parent;
    private final DesignDocument document;
    private final TaskRunner tasks;
    private final BooleanSupplier inputsComplete;
    private final Consumer<String> status;
    private final RecentFiles recent = new RecentFiles();
    private final JMenu recentMenu = new JMenu("Recent files");
    private final Action newProject;
    private final Action open;
    private final Action save;
    private final Action saveAs;

    /**
     * @param parent the window, for dialogs
     * @param document the document
     * @param tasks where saving runs
     * @param inputsComplete true when every field on screen holds a value (so the document is what is shown)
     * @param status the status line
     */
    public FileActions(Component parent, DesignDocument document, TaskRunner tasks, BooleanSupplier inputsComplete,
            Consumer<String> status) {
        this.parent = parent;
        this.document = document;
        this.tasks = tasks;
        this.inputsComplete = inputsComplete;
        this.status = status;
        newProject = Actions.of("New project", KeyEvent.VK_N, Shortcuts.menuKey(KeyEvent.VK_N, false),
                e -> whenDiscarded(() -> document.load(untitled(), null)));
        open = Actions.of("Open\u2026", KeyEvent.VK_O, Shortcuts.menuKey(KeyEvent.VK_O, false), e -> open());
        save = Actions.of("Save", KeyEvent.VK_S, Shortcuts.menuKey(KeyEvent.VK_S, false), e -> save(false, null));
        saveAs = Actions.of("Save as\u2026", KeyEvent.VK_A, Shortcuts.menuKey(KeyEvent.VK_S, true),
                e -> save(true, null));
        recentMenu.setMnemonic('r');
        refreshRecent();
    }

    /** @return a new, untitled project (the numbers of the default scenario to start from) */
    public static Project untitled() {
        return ProjectEdits.untitled(Presets.defaultProject().project());
    }

    /** @param root the window's root pane: New, Open, Save and Save as work wherever the focus is */
    public void bind(JRootPane root) {
        for (Action a : new Action[] {newProject, open, save, saveAs}) {
            Shortcuts.bind(root, a);
        }
    }

    /** @param menu the File menu to fill (the caller adds presets and Quit) */
    public void fill(JMenu menu) {
        menu.add(new JMenuItem(newProject));
        menu.add(new JMenuItem(open));
        menu.add(new JMenuItem(save));
        menu.add(new JMenuItem(saveAs));
        menu.add(recentMenu);
    }

    /** @return the Save action */
    public Action save() {
        return save;
    }

    /**
     * Asks about unsaved changes, then runs what the user wanted.
     * @param then run when the changes were saved, or the user chose not to save, or there were none
     */
    public void whenDiscarded(Runnable then) {
        if (!document.dirty()) {
            then.run();
            return;
        }
        int answer = JOptionPane.showConfirmDialog(parent, "Save the changes to " + document.project().name() + "?",
                "Unsaved changes", JOptionPane.YES_NO_CANCEL_OPTION, JOptionPane.WARNING_MESSAGE);
        if (answer == JOptionPane.NO_OPTION) {
            then.run();
        } else if (answer == JOptionPane.YES_OPTION) {
            save(false, then);
        }
    }

    private void open() {
        whenDiscarded(() -> {
            Path file = document.file();
            JFileChooser chooser = new JFileChooser(file == null ? null : file.toAbsolutePath().getParent().toFile());
            chooser.setFileFilter(new FileNameExtensionFilter("Counterpoise project (JSON)", "json"));
            if (chooser.showOpenDialog(parent) == JFileChooser.APPROVE_OPTION) {
                openFile(chooser.getSelectedFile().toPath());
            }
        });
    }

    /**
     * Opens a project file (a small JSON file: read on the event thread; the design runs in the
     * background afterwards).
     * @param path the file
     * @return true when opened; a bad file is reported and the open project stays
     */
    public boolean openFile(Path path) {
        try {
            LoadedProject p = ProjectReader.read(path);
            p.project().toStudy();
            document.load(p.project(), path);
            recent.add(path);
            refreshRecent();
            if (!p.unknownFields().isEmpty()) {
                status.accept("Note: fields not used from the file: " + String.join(", ", p.unknownFields()));
            }
            return true;
        } catch (InvalidInputException e) {
            JOptionPane.showMessageDialog(parent, "This project cannot be opened:\n" + e.getMessage(), "Open",
                    JOptionPane.WARNING_MESSAGE);
            return false;
        }
    }

    /**
     * Saves the project: to its file, or to one the user chooses.
     * @param choose true to ask for a file even when the project has one
     * @param then run after a successful save, or null
     */
    public void save(boolean choose, Runnable then) {
        if (!inputsComplete.getAsBoolean()) {
            JOptionPane.showMessageDialog(parent, "Fix the inputs marked in red before saving.", "Save",
                    JOptionPane.WARNING_MESSAGE);
            return;
        }
        Path target = document.file();
        if (choose || target == null) {
            JFileChooser chooser = new JFileChooser(target == null ? null : target.toAbsolutePath().getParent().toFile());
            chooser.setFileFilter(new FileNameExtensionFilter("Counterpoise project (JSON)", "json"));
            if (chooser.showSaveDialog(parent) != JFileChooser.APPROVE_OPTION) {
                return;
            }
            target = chooser.getSelectedFile().toPath();
            if (!target.getFileName().toString().endsWith(".json")) {
                target = target.resolveSibling(target.getFileName() + ".json");
            }
        }
        saveTo(target, then);
    }

    /**
     * Saves in the background: the project is checked to reopen and to design, then written
     * atomically (the old file stays whole until the new one is complete).
     * @param target the file
     * @param then run after a successful save, or null
     */
    public void saveTo(Path target, Runnable then) {
        Project p = document.project();
        tasks.requested("Saving " + target.getFileName(), progress -> {
            progress.phase("checking that it reopens");
            String json = ProjectCheck.reopenable(p);
            progress.checkCancelled();
            progress.phase("writing");
            ProjectWriter.writeAtomically(target, json);
            return target;
        }, written -> {
            document.saved(p, written);
            recent.add(written);
            refreshRecent();
            status.accept("Saved " + written.getFileName() + ".");
            if (then != null) {
                then.run();
            }
        }, e -> JOptionPane.showMessageDialog(parent, e instanceof InvalidInputException
                ? "The project was not saved, because it would not reopen:\n" + e.getMessage()
                : "The project could not be saved to " + target + ":\n" + e.getMessage(), "Save",
                JOptionPane.WARNING_MESSAGE),
                () -> status.accept("Saving was cancelled; " + target.getFileName() + " is unchanged."));
    }

    private void refreshRecent() {
        recentMenu.removeAll();
        for (Path p : recent.list()) {
            JMenuItem it = new JMenuItem(p.getFileName().toString());
            it.setToolTipText(p.toString());
            it.addActionListener(e -> whenDiscarded(() -> openFile(p)));
            recentMenu.add(it);
        }
        recentMenu.setEnabled(!recent.list().isEmpty());
    }
}
