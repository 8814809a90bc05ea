package org.counterpoise.io.measurement;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.counterpoise.core.error.InvalidInputException;
import org.counterpoise.io.PlainText;
import org.counterpoise.io.TextFiles;

/**
 * A measurement file as a table of numbers: lines starting with '#' and blank lines are comments;
 * the first other line is the header; columns are separated by commas, or by semicolons or tabs
 * (then a decimal comma is accepted too); double quotes around a cell are dropped. Every refusal
 * names the file, the line and the column.
 *
 * @param file how the user named the file
 * @param header the column names as written
 * @param rows the numbers, one array per data line
 * @param lineNumbers the file's line number (1-based) of each data line
 */
record MeasurementTable(String file, List<String> header, List<double[]> rows, List<Integer> lineNumbers) {
    /** Largest measurement file: 8 MiB, some 200 000 lines. */
    static final long MAX_BYTES = 8L << 20;

    static MeasurementTable read(Path path, String what) {
        String file = PlainText.escape(path.toString());
        String text = TextFiles.readUtf8(path, file, MAX_BYTES, what);
        List<String> lines = text.lines().toList();
        List<String> header = null;
        String separator = ",";
        boolean decimalComma = false;
        List<double[]> rows = new ArrayList<>();
        List<Integer> numbers = new ArrayList<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i).strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            if (header == null) {
                separator = line.contains(";") ? ";" : line.contains("\t") ? "\t" : ",";
                decimalComma = !separator.equals(",");
                header = List.of(line.split(separator, -1)).stream().map(MeasurementTable::unquoted).toList();
                continue;
            }
            String[] cells = line.split(separator, -1);
            if (cells.length != header.size()) {
                throw new InvalidInputException(file + ", line " + (i + 1), cells.length + " columns",
                        header.size() + " columns as in the header line, separated by " + name(separator));
            }
            double[] row = new double[cells.length];
            for (int c = 0; c < cells.length; c++) {
                row[c] = number(unquoted(cells[c]), decimalComma, file + ", line " + (i + 1) + ", column " + (c + 1)
                        + " (" + PlainText.quote(header.get(c)) + ")");
            }
            rows.add(row);
            numbers.add(i + 1);
        }
        if (header == null || rows.isEmpty()) {
            throw InvalidInputException.unusable(file, header == null ? "holds no header line" : "holds no data lines",
                    "a header line naming the columns, then one line of numbers per sample");
        }
        return new MeasurementTable(file, header, rows, numbers);
    }

    /** A cell without its surrounding blanks and the double quotes spreadsheets put around text. */
    private static String unquoted(String cell) {
        String s = cell.strip();
        return s.length() >= 2 && s.startsWith("\"") && s.endsWith("\"") ? s.substring(1, s.length() - 1).strip() : s;
    }

    private static double number(String cell, boolean decimalComma, String where) {
        String s = decimalComma ? cell.replace(',', '.') : cell;
        try {
            double v = Double.parseDouble(s);
            if (Double.isFinite(v) && !s.toLowerCase(Locale.ROOT).matches(".*[a-df-z].*")) {
                return v;
            }
        } catch (NumberFormatException e) {
            // refused below with the cell named
        }
        throw new InvalidInputException(where, cell.isEmpty() ? "empty" : PlainText.quote(cell),
                "a finite number with a decimal point" + (decimalComma ? " or comma" : "")
                        + " (a decimal comma needs semicolons between columns)");
    }

    private static String name(String separator) {
        return switch (separator) {
            case ";" -> "semicolons";
            case "\t" -> "tabs";
            default -> "commas";
        };
    }

    /**
     * @param prefixes lower-case beginnings of the column's name
     * @return the first column whose name starts with one of them, or -1
     */
    int column(String... prefixes) {
        for (int c = 0; c < header.size(); c++) {
            String h = header.get(c).toLowerCase(Locale.ROOT);
            for (String p : prefixes) {
                if (h.startsWith(p)) {
                    return c;
                }
            }
        }
        return -1;
    }

    /**
     * @param row index of a data row
     * @param column column index
     * @return where that cell is, in the user's words
     */
    String where(int row, int column) {
        return file + ", line " + lineNumbers.get(row) + ", column " + (column + 1) + " ("
                + PlainText.quote(header.get(column)) + ")";
    }
}
