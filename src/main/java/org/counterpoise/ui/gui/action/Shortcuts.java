package org.counterpoise.ui.gui.action;

import java.awt.Toolkit;
import java.awt.event.InputEvent;
import java.awt.event.KeyEvent;
import javax.swing.Action;
import javax.swing.JComponent;
import javax.swing.JRootPane;
import javax.swing.KeyStroke;

/**
 * The application's shortcuts, bound window-wide. A binding on the root pane for "ancestor of the
 * focused component" is looked up before any component's window-wide binding, so a chart panel
 * (XChart binds Ctrl+S and Ctrl+P to its own dialogs) or any other widget cannot take them.
 */
public final class Shortcuts {
    private Shortcuts() {
    }

    /**
     * @param key a key code from {@link KeyEvent}
     * @param shift true for the shifted variant
     * @return the key with the platform's menu modifier (Ctrl, or Command on a Mac)
     */
    public static KeyStroke menuKey(int key, boolean shift) {
        int mask = Toolkit.getDefaultToolkit().getMenuShortcutKeyMaskEx();
        return KeyStroke.getKeyStroke(key, mask | (shift ? InputEvent.SHIFT_DOWN_MASK : 0));
    }

    /**
     * Binds an action to its accelerator (and to extra keys) on a window's root pane.
     * @param root the window's root pane
     * @param action the action; its ACCELERATOR_KEY is bound when set
     * @param extra further keys for the same action (e.g. Ctrl+Shift+Z for Redo)
     */
    public static void bind(JRootPane root, Action action, KeyStroke... extra) {
        String id = String.valueOf(action.getValue(Action.NAME)) + "@" + System.identityHashCode(action);
        KeyStroke main = (KeyStroke) action.getValue(Action.ACCELERATOR_KEY);
        if (main != null) {
            root.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).put(main, id);
        }
        for (KeyStroke k : extra) {
            root.getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).put(k, id);
        }
        root.getActionMap().put(id, action);
    }
}
