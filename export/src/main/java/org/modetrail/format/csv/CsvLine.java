package org.modetrail.format.csv;

import java.util.ArrayList;
import java.util.List;

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
}
