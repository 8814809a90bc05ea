package org.counterpoise.ui.gui.plot;

import com.formdev.flatlaf.FlatLaf;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.Toolkit;
import java.awt.datatransfer.StringSelection;
import java.awt.event.ActionEvent;
import java.awt.event.HierarchyEvent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import java.util.function.Function;
import javax.swing.AbstractAction;
import javax.swing.Action;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JPopupMenu;
import javax.swing.SwingConstants;
import org.counterpoise.io.chart.ChartFactory;
import org.counterpoise.io.chart.ChartNumbers;
import org.counterpoise.io.chart.ChartTheme;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.internal.chartpart.Chart;

/**
 * Holds one chart and swaps it when a new result arrives (on the event thread only). Shows a
 * short message instead while there is nothing to draw.
 *
 * <p>The chart is painted by a plain component of this package, not by the chart library's own
 * panel: that panel binds Ctrl+S, Ctrl+E and Ctrl+P in the whole window (its save, export and print
 * dialogs) and opens its own menu on a right click, so a shortcut of the application could reach
 * it. Here the only menu is the application's own ({@link #actions()}), and no key is bound.
 *
 * <p>A chart given as a recipe ({@link #show(Function)}) is rebuilt in the colours of the look
 * when the look changes between light and dark. Given while the host is not showing (a step or tab
 * not on screen), it is built when the host is first shown or its chart is asked for. Pointer
 * listeners hear the x value under the pointer, and NaN whenever the data shown changes, so a
 * readout never describes an old chart.
 */
public final class ChartHost extends JPanel {
    private Function<ChartTheme, ? extends Chart<?, ?>> recipe;
    private Chart<?, ?> shown;
    /**
     * True while a chart given as a recipe waits to be built: it was given while this host was not
     * showing (docs/performance.md, "Long events on the wizard's event thread").
     */
    private boolean pending;
    private final List<DoubleConsumer> pointer = new ArrayList<>();
    private final Action copyValues = new AbstractAction("Copy values") {
        @Override
        public void actionPerformed(ActionEvent e) {
            String text = values();
            if (!text.isEmpty()) {
                Toolkit.getDefaultToolkit().getSystemClipboard().setContents(new StringSelection(text), null);
            }
        }
    };

    /** @param name component name, for tests */
    public ChartHost(String name) {
        super(new BorderLayout());
        setName(name);
        setPreferredSize(new Dimension(560, 300));
        copyValues.putValue(Action.SHORT_DESCRIPTION, "Copy the plotted values as tab-separated text");
        message("computing\u2026");
        addHierarchyListener(e -> {
            if ((e.getChangeFlags() & HierarchyEvent.SHOWING_CHANGED) != 0 && isShowing()) {
                buildPending(); // before it is first painted
            }
        });
    }

    /** @return the chart colours that match the installed look (dark or light) */
    public static ChartTheme currentTheme() {
        return FlatLaf.isLafDark() ? ChartTheme.DARK : ChartTheme.LIGHT;
    }

    /**
     * Shows a chart built for the current look, and rebuilds it when the look changes.
     * @param chartRecipe builds the chart in the given colours (cheap: data already computed)
     */
    public void show(Function<ChartTheme, ? extends Chart<?, ?>> chartRecipe) {
        recipe = chartRecipe;
        if (isShowing()) {
            pending = false;
            display(chartRecipe.apply(currentTheme()));
        } else {
            // built when first shown or asked for: a hidden step's or tab's chart costs its event nothing
            pending = true;
            firePointer(Double.NaN);
        }
    }

    /** @param c the chart to show as it is (its colours do not follow the look) */
    public void show(XYChart c) {
        recipe = null;
        pending = false;
        display(c);
    }

    /** Builds a chart given while hidden, now. */
    private void buildPending() {
        if (pending) {
            pending = false;
            display(recipe.apply(currentTheme()));
        }
    }

    private void display(Chart<?, ?> c) {
        shown = c;
        removeAll();
        Canvas canvas = new Canvas(c);
        canvas.setName(getName() + ".panel");
        add(canvas, BorderLayout.CENTER);
        copyValues.setEnabled(c instanceof XYChart);
        revalidate();
        repaint();
        firePointer(Double.NaN);
    }

    /** @param text what to say instead of a chart */
    public void message(String text) {
        recipe = null;
        pending = false;
        shown = null;
        removeAll();
        JLabel l = new JLabel(text, SwingConstants.CENTER);
        l.setEnabled(false);
        add(l, BorderLayout.CENTER);
        copyValues.setEnabled(false);
        revalidate();
        repaint();
        firePointer(Double.NaN);
    }

    /** @return the XY chart shown, or null (nothing shown, or another kind of chart) */
    public XYChart chart() {
        buildPending();
        return shown instanceof XYChart xy ? xy : null;
    }

    /** @return the chart shown, of any kind, or null */
    public Chart<?, ?> shownChart() {
        buildPending();
        return shown;
    }

    /**
     * @param listener hears the x value (chart units) under the pointer, and NaN when the data
     *     shown changes
     */
    public void onPointer(DoubleConsumer listener) {
        pointer.add(listener);
    }

    /** @return the application's actions on this chart (also its right-click menu) */
    public List<Action> actions() {
        return List.of(copyValues);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        // Called by the superclass constructor too, before this class' fields exist.
        if (recipe != null && !pending) {
            display(recipe.apply(currentTheme()));
        }
    }

    private void firePointer(double x) {
        if (pointer == null) {
            return;
        }
        for (DoubleConsumer l : pointer) {
            l.accept(x);
        }
    }

    /** The XY chart's series as tab-separated text: series, x, y; a heading line first. */
    String values() {
        XYChart xy = chart();
        if (xy == null) {
            return "";
        }
        StringBuilder out = new StringBuilder("series\t" + xy.getXAxisTitle() + "\t" + xy.getYAxisTitle() + "\n");
        for (String note : ChartFactory.notes(xy)) {
            out.append("# ").append(note).append('\n');
        }
        for (XYSeries s : xy.getSeriesMap().values()) {
            if (!s.isShowInLegend() || s.getName().equals(ChartFactory.UNBOUNDED_SERIES)) {
                continue;
            }
            double[] x = s.getXData();
            double[] y = s.getYData();
            for (int i = 0; i < x.length; i++) {
                out.append(s.getName()).append('\t').append(ChartNumbers.label(x[i])).append('\t')
                        .append(ChartNumbers.label(y[i])).append('\n');
            }
        }
        return out.toString();
    }

    /** Paints the chart at the component's size; reports the pointer; the application's menu only. */
    private final class Canvas extends JComponent {
        private final transient Chart<?, ?> chart;
        private boolean painted;

        Canvas(Chart<?, ?> chart) {
            this.chart = chart;
            setOpaque(true);
            JPopupMenu menu = new JPopupMenu();
            for (Action a : actions()) {
                menu.add(a);
            }
            setComponentPopupMenu(menu);
            addMouseMotionListener(new MouseAdapter() {
                @Override
                public void mouseMoved(MouseEvent e) {
                    if (painted && chart == shown && chart instanceof XYChart xy) {
                        double x = xy.getChartXFromCoordinate(e.getX());
                        if (Double.isFinite(x)) {
                            firePointer(x);
                        }
                    }
                }
            });
        }

        @Override
        protected void paintComponent(Graphics g) {
            Graphics2D g2 = (Graphics2D) g.create();
            try {
                chart.paint(g2, getWidth(), getHeight());
                painted = true;
            } finally {
                g2.dispose();
            }
        }
    }
}
