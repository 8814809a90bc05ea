package org.counterpoise.ui.gui.session;

import java.awt.Dimension;
import java.awt.Frame;
import java.awt.GraphicsConfiguration;
import java.awt.GraphicsDevice;
import java.awt.GraphicsEnvironment;
import java.awt.Insets;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.util.HashMap;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.prefs.Preferences;
import javax.swing.JFrame;

/**
 * The window's size and position, remembered in the user's preferences between sessions and
 * always brought back onto a screen that is there now: a window saved on a large monitor opens
 * within a laptop's screen, and a first window never exceeds the screen (1366 x 768, or a
 * 1920 x 1080 screen at 200 % scaling, which Java sees as 960 x 540). When the preferences cannot
 * be used (or with counterpoise.prefs=memory, for tests), the placement lives in memory for the
 * session.
 */
public final class WindowPlacement {
    /** The smallest window that still shows a step, the step list and the buttons. */
    static final Dimension SMALLEST = new Dimension(640, 440);
    private static final Map<String, Integer> MEMORY = new ConcurrentHashMap<>();
    private static final String[] KEYS = {"x", "y", "width", "height", "maximized"};

    private WindowPlacement() {
    }

    /**
     * Sizes and places the frame (the remembered placement, clamped to a screen, or the preferred
     * size centred), and remembers every later move and resize.
     * @param frame the window, not yet shown
     * @param preferred its size on a screen with room for it
     */
    public static void restore(JFrame frame, Dimension preferred) {
        Map<String, Integer> saved = read();
        Rectangle wanted = saved.containsKey("width") ? new Rectangle(saved.get("x"), saved.get("y"),
                saved.get("width"), saved.get("height")) : null;
        Rectangle screen = usableScreen(wanted);
        Dimension min = new Dimension(Math.min(SMALLEST.width, screen.width), Math.min(SMALLEST.height, screen.height));
        frame.setMinimumSize(min);
        frame.setBounds(place(wanted, preferred, screen, min));
        if (saved.getOrDefault("maximized", 0) == 1) {
            frame.setExtendedState(frame.getExtendedState() | Frame.MAXIMIZED_BOTH);
        }
        ComponentAdapter moves = new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                remember(frame);
            }

            @Override
            public void componentMoved(ComponentEvent e) {
                remember(frame);
            }
        };
        frame.addComponentListener(moves);
        frame.addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosing(WindowEvent e) {
                remember(frame);
            }

            @Override
            public void windowClosed(WindowEvent e) {
                remember(frame);
            }
        });
        frame.addWindowStateListener(e -> remember(frame));
    }

    /**
     * Where a window goes: the wanted bounds moved and shrunk to lie within the screen, or the
     * preferred size (no larger than the screen) centred on it.
     * @param wanted remembered bounds, or null
     * @param preferred the size wanted when nothing is remembered
     * @param screen the usable area of the screen (without task bars)
     * @param min the smallest size allowed
     * @return the bounds to use
     */
    static Rectangle place(Rectangle wanted, Dimension preferred, Rectangle screen, Dimension min) {
        int w = Math.max(min.width, Math.min(wanted == null ? preferred.width : wanted.width, screen.width));
        int h = Math.max(min.height, Math.min(wanted == null ? preferred.height : wanted.height, screen.height));
        int x = wanted == null ? screen.x + (screen.width - w) / 2 : wanted.x;
        int y = wanted == null ? screen.y + (screen.height - h) / 2 : wanted.y;
        x = Math.max(screen.x, Math.min(x, screen.x + screen.width - w));
        y = Math.max(screen.y, Math.min(y, screen.y + screen.height - h));
        return new Rectangle(x, y, w, h);
    }

    /** Remembers the frame's normal (not maximised) bounds and whether it is maximised. */
    static void remember(JFrame frame) {
        boolean maximized = (frame.getExtendedState() & Frame.MAXIMIZED_BOTH) == Frame.MAXIMIZED_BOTH;
        Map<String, Integer> values = new HashMap<>();
        values.put("maximized", maximized ? 1 : 0);
        if (!maximized && (frame.getExtendedState() & Frame.ICONIFIED) == 0) {
            Rectangle b = frame.getBounds();
            values.put("x", b.x);
            values.put("y", b.y);
            values.put("width", b.width);
            values.put("height", b.height);
        }
        write(values);
    }

    /** @param wanted remembered bounds, or null @return the usable area of the screen they mostly lie on */
    private static Rectangle usableScreen(Rectangle wanted) {
        GraphicsConfiguration best = GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice()
                .getDefaultConfiguration();
        long bestArea = -1;
        if (wanted != null) {
            for (GraphicsDevice d : GraphicsEnvironment.getLocalGraphicsEnvironment().getScreenDevices()) {
                GraphicsConfiguration c = d.getDefaultConfiguration();
                Rectangle overlap = c.getBounds().intersection(wanted);
                long area = overlap.isEmpty() ? 0 : (long) overlap.width * overlap.height;
                if (area > bestArea) {
                    best = c;
                    bestArea = area;
                }
            }
        }
        Rectangle r = best.getBounds();
        Insets in = Toolkit.getDefaultToolkit().getScreenInsets(best);
        return new Rectangle(r.x + in.left, r.y + in.top, r.width - in.left - in.right, r.height - in.top - in.bottom);
    }

    private static boolean inMemory() {
        return "memory".equals(System.getProperty("counterpoise.prefs"));
    }

    private static Map<String, Integer> read() {
        Map<String, Integer> out = new HashMap<>();
        if (inMemory()) {
            out.putAll(MEMORY);
            return out;
        }
        try {
            Preferences p = node();
            for (String k : KEYS) {
                int v = p.getInt(k, Integer.MIN_VALUE);
                if (v != Integer.MIN_VALUE) {
                    out.put(k, v);
                }
            }
        } catch (RuntimeException e) {
            out.clear(); // preferences are a convenience: without them the window opens at its default place
        }
        if (out.containsKey("width") && !(out.containsKey("x") && out.containsKey("y") && out.containsKey("height"))) {
            out.remove("width");
        }
        return out;
    }

    private static void write(Map<String, Integer> values) {
        if (inMemory()) {
            MEMORY.putAll(values);
            return;
        }
        try {
            Preferences p = node();
            values.forEach(p::putInt);
        } catch (RuntimeException e) {
            // Preferences are a convenience; the window still works without them.
        }
    }

    private static Preferences node() {
        return Preferences.userRoot().node("org/counterpoise/window");
    }
}
