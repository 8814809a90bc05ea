package org.counterpoise.ui.gui.field;

import java.awt.Component;
import java.util.function.Function;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JComboBox;
import javax.swing.JList;

/**
 * Shows a list's items (enum values the code decides on) in words: the list holds the value, the
 * renderer says it, so no code reads the words or the position back.
 */
public final class ItemWords {
    private ItemWords() {
    }

    /**
     * @param <T> the item type
     * @param combo the list
     * @param type the item type
     * @param words the words for each item
     */
    public static <T> void show(JComboBox<T> combo, Class<T> type, Function<T, String> words) {
        combo.setRenderer(new DefaultListCellRenderer() {
            @Override
            public Component getListCellRendererComponent(JList<?> list, Object value, int index, boolean selected,
                    boolean focus) {
                String text = type.isInstance(value) ? words.apply(type.cast(value)) : "";
                return super.getListCellRendererComponent(list, text, index, selected, focus);
            }
        });
    }
}
