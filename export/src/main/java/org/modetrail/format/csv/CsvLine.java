package org.modetrail.format.csv;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Splits one line of comma-separated values (RFC 4180: fields may be quoted, "" is a quote inside quotes). */
final class CsvLine {
    private CsvLine() {
    }

    /** The fields of {@code line}; throws with the column where quoting is broken. */
    static List<String> split(String line) {
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (quoted) {
                if (c == '"') {
                    if (i + 1 < line.length() && line.charAt(i + 1) == '"') {
                        field.append('"');
                        i++;
                    } else {
                        quoted = false;
                    }
                } else {
                    field.append(c);
                }
            } else if (c == '"' && field.length() == 0) {
                quoted = true;
            } else if (c == ',') {
                fields.add(field.toString().strip());
                field.setLength(0);
            } else {
                field.append(c);
            }
        }
        if (quoted) {
            throw new IllegalArgumentException("a quoted field is not closed");
        }
        fields.add(field.toString().strip());
        return fields;
    }

    /** A field quoted when it holds a comma, a quote or a line break. */
    static String quote(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    /**
     * The header's columns by name (lower case) to their position: every one of {@code required} must be there,
     * {@code optional} ones may be, anything else or a name given twice is refused naming line 1.
     */
    static Map<String, Integer> columns(Path file, String header, List<String> required, List<String> optional)
            throws CsvFormatException {
        List<String> names;
        try {
            names = split(header);
        } catch (IllegalArgumentException e) {
            throw new CsvFormatException(file, 1, e.getMessage());
        }
        Map<String, Integer> columns = new HashMap<>();
        for (int i = 0; i < names.size(); i++) {
            String name = names.get(i).toLowerCase(Locale.ROOT);
            if (!required.contains(name) && !optional.contains(name)) {
                throw new CsvFormatException(file, 1, "unknown column '" + names.get(i) + "'; the columns are "
                        + String.join(",", required) + (optional.isEmpty() ? ""
                        : " and optionally " + String.join(",", optional)));
            }
            if (columns.put(name, i) != null) {
                throw new CsvFormatException(file, 1, "column '" + name + "' appears twice");
            }
        }
        for (String r : required) {
            if (!columns.containsKey(r)) {
                throw new CsvFormatException(file, 1, "the header lacks column '" + r + "'; it needs "
                        + String.join(",", required));
            }
        }
        return columns;
    }

    /** Takes one data row of a file read by {@link #read}. */
    interface RowReader {
        void row(int line, List<String> fields, Map<String, Integer> columns) throws CsvFormatException;
    }

    /**
     * Reads a CSV file: its header (by {@link #columns}), then every row that is not blank, split into as many
     * fields as the header has columns and handed to {@code reader} with its line number; more than
     * {@code maxRows} rows are refused as "more than N {@code what}". A file that is not UTF-8 is refused by name.
     *
     * @return the number of the file's last line
     */
    static int read(Path file, List<String> required, List<String> optional, int maxRows, String what,
                     RowReader reader) throws java.io.IOException {
        try (java.io.BufferedReader in = java.nio.file.Files.newBufferedReader(file,
                java.nio.charset.StandardCharsets.UTF_8)) {
            String header = in.readLine();
            if (header == null || header.isBlank()) {
                throw new CsvFormatException(file, 1, "the file is empty; it needs the header "
                        + String.join(",", required));
            }
            Map<String, Integer> columns = columns(file, header.replace("\uFEFF", ""), required, optional);
            String text;
            int line = 1;
            int rows = 0;
            while ((text = in.readLine()) != null) {
                line++;
                if (text.isBlank()) {
                    continue;
                }
                if (++rows > maxRows) {
                    throw new CsvFormatException(file, line, "more than " + maxRows + " " + what);
                }
                reader.row(line, fields(file, line, text, columns), columns);
            }
            return line;
        } catch (java.nio.charset.MalformedInputException e) {
            throw new CsvFormatException(file, 0, "is not UTF-8 text; save it as UTF-8 CSV");
        }
    }

    /** The fields of row {@code line}, as many as the header's columns, or an error naming the line. */
    static List<String> fields(Path file, int line, String text, Map<String, Integer> columns)
            throws CsvFormatException {
        List<String> f;
        try {
            f = split(text);
        } catch (IllegalArgumentException e) {
            throw new CsvFormatException(file, line, e.getMessage());
        }
        if (f.size() != columns.size()) {
            throw new CsvFormatException(file, line, "has " + f.size() + " fields, the header " + columns.size());
        }
        return f;
    }

    /** The number in column {@code name}: finite, with a dot for decimals whatever the locale. */
    static double number(Path file, int line, List<String> f, Map<String, Integer> c, String name)
            throws CsvFormatException {
        String s = f.get(c.get(name));
        try {
            double v = Double.parseDouble(s);
            if (!Double.isFinite(v) || s.contains(",")) {
                throw new NumberFormatException();
            }
            return v;
        } catch (NumberFormatException e) {
            throw new CsvFormatException(file, line, name + " must be a number with a dot for decimals, got '" + s
                    + "'");
        }
    }

    /** The whole number in column {@code name}. */
    static int whole(Path file, int line, List<String> f, Map<String, Integer> c, String name)
            throws CsvFormatException {
        String s = f.get(c.get(name));
        try {
            return Integer.parseInt(s);
        } catch (NumberFormatException e) {
            throw new CsvFormatException(file, line, name + " must be a whole number, got '" + s + "'");
        }
    }
}
