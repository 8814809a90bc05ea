package org.counterpoise.ui.gui.session;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.prefs.Preferences;

/**
 * The last few project files opened or saved, kept in the user's preferences. When the
 * preferences cannot be used (a locked-down account, or tests with counterpoise.prefs=memory),
 * the list lives in memory for the session.
 */
public final class RecentFiles {
    private static final int SIZE = 6;
    private final List<Path> memory = new ArrayList<>();
    private final Preferences prefs;

    /** Uses the user preferences unless the system property counterpoise.prefs is "memory". */
    public RecentFiles() {
        Preferences p = null;
        if (!"memory".equals(System.getProperty("counterpoise.prefs"))) {
            try {
                p = Preferences.userRoot().node("org/counterpoise/recent");
                for (int i = 0; i < SIZE; i++) {
                    String v = p.get("file" + i, null);
                    if (v != null) {
                        memory.add(Path.of(v));
                    }
                }
            } catch (RuntimeException e) {
                p = null;
            }
        }
        prefs = p;
    }

    /** @return the recent files, newest first */
    public List<Path> list() {
        return List.copyOf(memory);
    }

    /** @param file a file just opened or saved */
    public void add(Path file) {
        Path f = file.toAbsolutePath().normalize();
        memory.remove(f);
        memory.add(0, f);
        while (memory.size() > SIZE) {
            memory.remove(memory.size() - 1);
        }
        if (prefs != null) {
            try {
                for (int i = 0; i < SIZE; i++) {
                    if (i < memory.size()) {
                        prefs.put("file" + i, memory.get(i).toString());
                    } else {
                        prefs.remove("file" + i);
                    }
                }
            } catch (RuntimeException e) {
                // Preferences are a convenience; the in-memory list still works.
            }
        }
    }
}
