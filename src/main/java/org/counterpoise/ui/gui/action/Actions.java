package org.counterpoise.ui.gui.action;

import java.awt.event.ActionEvent;
import java.util.function.Consumer;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.KeyStroke;

/** Small factory for named actions with a mnemonic and an accelerator. */
public final class Actions {
    private Actions() {
    }

    /**
     * @param name menu text
     * @param mnemonic mnemonic key code, or 0
     * @param key accelerator, or null
     * @param body what it does
     * @return the action
     */
    public static Action of(String name, int mnemonic, KeyStroke key, Consumer<ActionEvent> body) {
        Action a = new AbstractAction(name) {
            private static final long serialVersionUID = 1L;

            @Override
            public void actionPerformed(ActionEvent e) {
                body.accept(e);
            }
        };
        if (mnemonic != 0) {
            a.putValue(Action.MNEMONIC_KEY, mnemonic);
        }
        if (key != null) {
            a.putValue(Action.ACCELERATOR_KEY, key);
        }
        return a;
    }
}
