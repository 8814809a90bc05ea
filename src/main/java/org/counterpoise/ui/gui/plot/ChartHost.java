package org.counterpoise.ui.gui.plot;

import java.awt.BorderLayout;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.SwingConstants;
import org.knowm.xchart.XChartPanel;
import org.knowm.xchart.XYChart;

/**
 * Holds one chart and swaps it when a new result arrives (on the event thread only). Shows a
 * short message instead while there is nothing to draw.
 */
public final class ChartHost extends JPanel {
    private XYChart chart;

    /** @param name component name, for tests */
    public ChartHost(String name) {
        super(new BorderLayout());
        setName(name);
        setPreferredSize(new java.awt.Dimension(560, 300));
        message("computing\u2026");
    }

    /** @param c the chart to show */
    public void show(XYChart c) {
        chart = c;
        removeAll();
        XChartPanel<XYChart> panel = new XChartPanel<>(c);
        panel.setName(getName() + ".panel");
        add(panel, BorderLayout.CENTER);
        revalidate();
        repaint();
    }

    /** @param text what to say instead of a chart */
    public void message(String text) {
        chart = null;
        removeAll();
        JLabel l = new JLabel(text, SwingConstants.CENTER);
        l.setEnabled(false);
        add(l, BorderLayout.CENTER);
        revalidate();
        repaint();
    }

    /** @return the chart shown, or null */
    public XYChart chart() {
        return chart;
    }
}
