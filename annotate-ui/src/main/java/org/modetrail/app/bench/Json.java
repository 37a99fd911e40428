package org.modetrail.app.bench;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Just enough JSON writing for the bench's figures: maps, lists, strings, numbers, booleans and null. NaN and
 * infinities, which JSON cannot hold, are written as null.
 */
final class Json {
    private Json() {
    }

    static String write(Object value) {
        StringBuilder out = new StringBuilder();
        write(value, out, 0);
        return out.append('\n').toString();
    }

    private static void write(Object v, StringBuilder out, int depth) {
        if (v == null) {
            out.append("null");
        } else if (v instanceof String s) {
            string(s, out);
        } else if (v instanceof Boolean b) {
            out.append(b);
        } else if (v instanceof Double || v instanceof Float) {
            double d = ((Number) v).doubleValue();
            // Six significant digits: more than any timing here can claim.
            out.append(Double.isFinite(d)
                    ? new BigDecimal(d).round(new MathContext(6)).stripTrailingZeros().toPlainString() : "null");
        } else if (v instanceof Number n) {
            out.append(n.longValue());
        } else if (v instanceof double[] a) {
            Double[] boxed = new Double[a.length];
            for (int i = 0; i < a.length; i++) {
                boxed[i] = a[i];
            }
            write(List.of(boxed), out, depth);
        } else if (v instanceof int[] a) {
            out.append('[');
            for (int i = 0; i < a.length; i++) {
                out.append(i > 0 ? ", " : "").append(a[i]);
            }
            out.append(']');
        } else if (v instanceof Map<?, ?> m) {
            out.append('{');
            boolean first = true;
            for (Map.Entry<?, ?> e : m.entrySet()) {
                out.append(first ? "\n" : ",\n").append("  ".repeat(depth + 1));
                string(String.valueOf(e.getKey()), out);
                out.append(": ");
                write(e.getValue(), out, depth + 1);
                first = false;
            }
            out.append(first ? "}" : "\n" + "  ".repeat(depth) + "}");
        } else if (v instanceof List<?> l) {
            out.append('[');
            for (int i = 0; i < l.size(); i++) {
                out.append(i > 0 ? ", " : "");
                write(l.get(i), out, depth + 1);
            }
            out.append(']');
        } else {
            string(v.toString(), out);
        }
    }

    private static void string(String s, StringBuilder out) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                default -> {
                    if (c < 0x20) {
                        out.append(String.format(Locale.ROOT, "\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }
}
