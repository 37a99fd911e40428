package org.modetrail.app.bench;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** Everything one bench run measured, printable as a plain-text table and as JSON. */
public record BenchReport(Map<String, String> facts, List<Section> sections) {
    private static final int LABEL_WIDTH = 62;

    public BenchReport {
        facts = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(facts));
        sections = List.copyOf(sections);
    }

    /** Figures that have a target and miss it. */
    public List<Figure> missedTargets() {
        List<Figure> missed = new ArrayList<>();
        for (Section s : sections) {
            for (Figure f : s.figures()) {
                if (Boolean.FALSE.equals(f.met())) {
                    missed.add(f);
                }
            }
        }
        return missed;
    }

    public void print(PrintWriter out) {
        out.println("modetrail bench");
        int keyWidth = facts.keySet().stream().mapToInt(String::length).max().orElse(0);
        facts.forEach((k, v) -> out.printf(Locale.ROOT, "  %-" + keyWidth + "s  %s%n", k, v));
        for (Section s : sections) {
            out.println();
            out.printf(Locale.ROOT, "%-" + LABEL_WIDTH + "s %10s %10s  %-4s  %-13s %s%n", s.title(), "median", "p90",
                    "unit", "target", "met");
            for (Figure f : s.figures()) {
                out.printf(Locale.ROOT, "  %-" + (LABEL_WIDTH - 2) + "s %10s %10s  %-4s  %-13s %s%n", f.label(),
                        number(f.median()), number(f.p90()), f.unit(), f.target() == null ? "-" : f.target(),
                        f.met() == null ? "-" : f.met() ? "yes" : "NO");
            }
            for (String note : s.notes()) {
                out.println("  * " + note);
            }
        }
        List<Figure> missed = missedTargets();
        out.println();
        out.println(missed.isEmpty() ? "All targets met."
                : "Targets missed: " + String.join(", ", missed.stream().map(Figure::key).toList()));
        out.flush();
    }

    /** Three significant figures, enough for timings on a shared machine, without scientific notation. */
    static String number(double v) {
        if (Double.isNaN(v)) {
            return "-";
        }
        double a = Math.abs(v);
        if (a >= 100) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        if (a >= 10) {
            return String.format(Locale.ROOT, "%.1f", v);
        }
        if (a >= 1) {
            return String.format(Locale.ROOT, "%.2f", v);
        }
        return String.format(Locale.ROOT, "%.3f", v);
    }

    public String toJson() {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("facts", facts);
        Map<String, Object> figures = new LinkedHashMap<>();
        for (Section s : sections) {
            for (Figure f : s.figures()) {
                Map<String, Object> m = new LinkedHashMap<>();
                m.put("label", f.label());
                m.put("median", f.median());
                m.put("p90", f.p90());
                m.put("unit", f.unit());
                m.put("target", f.target());
                m.put("met", f.met());
                m.put("values", f.values());
                figures.put(f.key(), m);
            }
        }
        root.put("figures", figures);
        Map<String, Object> notes = new LinkedHashMap<>();
        for (Section s : sections) {
            notes.put(s.key(), s.notes());
        }
        root.put("notes", notes);
        root.put("targets_missed", missedTargets().stream().map(Figure::key).toList());
        return Json.write(root);
    }
}
