package org.counterpoise.ui.gui.field;

import java.awt.BorderLayout;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Rectangle;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JViewport;
import javax.swing.Scrollable;
import javax.swing.SwingConstants;

/**
 * A wizard page that fills the window while the window is large enough for it, and scrolls once
 * the window is smaller than the page's minimum size: nothing is clipped on a small screen or at
 * a large display scaling, and nothing is stretched off screen either.
 */
public final class ScrollingPage extends JPanel implements Scrollable {
    private ScrollingPage(JComponent content) {
        super(new BorderLayout());
        setOpaque(false);
        add(content, BorderLayout.CENTER);
    }

    /**
     * @param content a step's page
     * @return the page in a scroll pane that scrolls only below the page's minimum size
     */
    public static JScrollPane of(JComponent content) {
        JScrollPane scroll = new JScrollPane(new ScrollingPage(content));
        scroll.setBorder(null);
        scroll.setName(content.getName() == null ? null : content.getName() + ".scroll");
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        scroll.getHorizontalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() {
        return super.getPreferredSize();
    }

    /** In the scroll pane: the visible area, but never less than the page's minimum. */
    @Override
    public Dimension getPreferredSize() {
        Dimension min = getMinimumSize();
        if (getParent() instanceof JViewport v && v.getWidth() > 0) {
            return new Dimension(Math.max(min.width, v.getWidth()), Math.max(min.height, v.getHeight()));
        }
        return super.getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(Rectangle visible, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(Rectangle visible, int orientation, int direction) {
        return Math.max(16, (orientation == SwingConstants.VERTICAL ? visible.height : visible.width) - 32);
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        Container p = getParent();
        return p instanceof JViewport v && v.getWidth() >= getMinimumSize().width;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        Container p = getParent();
        return p instanceof JViewport v && v.getHeight() >= getMinimumSize().height;
    }
}
