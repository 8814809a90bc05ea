package org.counterpoise.ui.gui.wizard;

import java.awt.datatransfer.Clipboard;
import java.awt.datatransfer.DataFlavor;
import java.awt.datatransfer.UnsupportedFlavorException;
import java.awt.event.InputEvent;
import java.io.File;
import java.io.IOException;
import java.util.List;
import javax.swing.JComponent;
import javax.swing.JTextField;
import javax.swing.TransferHandler;

/**
 * A measurement file dropped from the desktop's file manager onto a file field (or the window
 * around it) names that file in the field; text typed or pasted into the field is untouched.
 */
final class FileDrop extends TransferHandler {
    private final JTextField field;
    private final TransferHandler text;
    private final Runnable dropped;

    private FileDrop(JTextField field, Runnable dropped) {
        this.field = field;
        this.text = field.getTransferHandler();
        this.dropped = dropped;
    }

    /**
     * @param field the file field
     * @param dropped told, on the event thread, after a file was dropped
     * @param targets further components a file may be dropped on (the field's window, say)
     */
    static void install(JTextField field, Runnable dropped, JComponent... targets) {
        FileDrop handler = new FileDrop(field, dropped);
        field.setTransferHandler(handler);
        for (JComponent c : targets) {
            c.setTransferHandler(handler);
        }
    }

    @Override
    public boolean canImport(TransferSupport support) {
        if (support.isDataFlavorSupported(DataFlavor.javaFileListFlavor)) {
            return true;
        }
        return support.getComponent() == field && text != null && text.canImport(support);
    }

    @Override
    public boolean importData(TransferSupport support) {
        if (support.isDataFlavorSupported(DataFlavor.javaFileListFlavor)) {
            try {
                List<?> files = (List<?>) support.getTransferable().getTransferData(DataFlavor.javaFileListFlavor);
                if (files.isEmpty() || !(files.get(0) instanceof File f)) {
                    return false;
                }
                field.setText(f.getPath());
                dropped.run();
                return true;
            } catch (UnsupportedFlavorException | IOException e) {
                return false; // the drag source withdrew its data: nothing is dropped
            }
        }
        return support.getComponent() == field && text != null && text.importData(support);
    }

    @Override
    public int getSourceActions(JComponent c) {
        return text == null ? NONE : text.getSourceActions(c);
    }

    @Override
    public void exportToClipboard(JComponent c, Clipboard clipboard, int action) {
        if (text != null) {
            text.exportToClipboard(c, clipboard, action); // copy and cut of the typed text stay the field's own
        }
    }

    @Override
    public void exportAsDrag(JComponent c, InputEvent e, int action) {
        if (text != null) {
            text.exportAsDrag(c, e, action);
        }
    }
}
