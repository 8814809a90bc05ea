package org.counterpoise.ui.gui.wizard;

import java.awt.Component;
import java.util.function.IntConsumer;
import java.util.function.IntSupplier;
import java.util.stream.IntStream;
import javax.swing.BorderFactory;
import javax.swing.DefaultListCellRenderer;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.ListSelectionModel;
import org.counterpoise.ui.gui.Themes;

/**
 * The wizard's list of steps at the left of its window: each step numbered with its title, a mark
 * and the problem colour on a step with a problem; picking one asks the wizard to go there.
 */
final class StepList extends JList<Integer> {
    private static final long serialVersionUID = 1L;

    /**
     * @param pages the wizard's steps, in order (their titles and problems are read, the steps not made)
     * @param go goes to the step of an index
     * @param current the index of the step shown
     */
    StepList(StepPages pages, IntConsumer go, IntSupplier current) {
        super(IntStream.range(0, pages.size()).boxed().toArray(Integer[]::new));
        setName("steps");
        setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        setFixedCellWidth(190);
        setBorder(BorderFactory.createEmptyBorder(10, 6, 10, 6));
        setCellRenderer(new DefaultListCellRenderer() {
            private static final long serialVersionUID = 1L;

            @Override
            public Component getListCellRendererComponent(JList<?> l, Object value, int index, boolean selected,
                    boolean focus) {
                Page<? extends Step> s = pages.page((Integer) value);
                String mark = s.problem() != null ? "  \u25cf" : "";
                JLabel label = (JLabel) super.getListCellRendererComponent(l, (index + 1) + "   " + s.title() + mark,
                        index, selected, focus);
                label.setBorder(BorderFactory.createEmptyBorder(7, 8, 7, 8));
                if (s.problem() != null && !selected) {
                    label.setForeground(Themes.problemColour());
                }
                return label;
            }
        });
        addListSelectionListener(e -> {
            if (!e.getValueIsAdjusting() && getSelectedIndex() >= 0 && getSelectedIndex() != current.getAsInt()) {
                go.accept(getSelectedIndex());
            }
        });
    }
}
