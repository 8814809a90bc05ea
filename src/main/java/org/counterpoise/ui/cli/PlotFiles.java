package org.counterpoise.ui.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.AtomicFiles;
import org.counterpoise.io.FileWriteException;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.chart.ChartFiles;
import org.knowm.xchart.XYChart;

/** Charts a command writes beside its text: PNG or SVG by the name's ending, all or none, never over an input. */
final class PlotFiles {
    private PlotFiles() {
    }

    /**
     * @param option the option that named the file
     * @param plot the file named
     * @return whether it is an SVG file (else PNG)
     * @throws InvalidInputException when the name ends in neither
     */
    static boolean svg(String option, Path plot) {
        String lower = plot.getFileName() == null ? "" : plot.getFileName().toString().toLowerCase(Locale.ROOT);
        if (!lower.endsWith(".svg") && !lower.endsWith(".png")) {
            throw new InvalidInputException(option, PlainText.escape(plot.toString()), "a file name ending in .png or .svg");
        }
        return lower.endsWith(".svg");
    }

    /**
     * @param plot a file named FILE.png or FILE.svg
     * @param suffix what to add to its stem
     * @return FILE{suffix}.png or .svg
     */
    static Path sibling(Path plot, String suffix) {
        String name = plot.getFileName().toString();
        return plot.resolveSibling(name.substring(0, name.length() - 4) + suffix + name.substring(name.length() - 4));
    }

    /**
     * @param option the option that named the files
     * @param targets the files, each ending in .png or .svg
     * @param charts one chart per file
     * @param force whether existing files may be replaced
     * @param inputs the files the command reads, never to be written over
     * @return a "wrote ..." line per file
     */
    static List<String> write(String option, List<Path> targets, List<XYChart> charts, boolean force,
            List<Path> inputs) {
        List<AtomicFiles.Entry> entries = new ArrayList<>();
        for (int i = 0; i < targets.size(); i++) {
            Path target = targets.get(i);
            XYChart chart = charts.get(i);
            boolean svg = svg(option, target);
            if (Files.exists(target) && inputs.stream().anyMatch(in -> in != null && sameFile(target, in))) {
                throw new InvalidInputException(option, PlainText.escape(target.toString()),
                        "a file other than the measurement being read");
            }
            if (!force && Files.exists(target)) {
                throw new InvalidInputException(option, PlainText.escape(target.toString()),
                        "a file that does not exist yet, or --force to replace it");
            }
            entries.add(new AtomicFiles.Entry(target, out -> {
                if (svg) {
                    ChartFiles.svg(chart, out);
                } else {
                    ChartFiles.png(chart, out);
                }
            }));
        }
        try {
            AtomicFiles.writeAll(entries);
        } catch (FileWriteException e) {
            throw new InvalidInputException(option, PlainText.escape(e.path().toString()), e.problem());
        }
        return targets.stream().map(p -> "wrote " + PlainText.escape(p.toString())).toList();
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.isSameFile(a, b);
        } catch (IOException e) {
            return false;
        }
    }
}
