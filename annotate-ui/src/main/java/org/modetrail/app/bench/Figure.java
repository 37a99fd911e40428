package org.modetrail.app.bench;

/**
 * One line of the bench's table.
 *
 * @param key     stable name for the JSON output, e.g. {@code sequential.ratio_source_to_grabber}
 * @param label   what was measured, in words, for the table
 * @param median  the figure (median of the passes or samples)
 * @param p90     90th percentile, or NaN where it means nothing (ratios, single values)
 * @param unit    fps, ms, s/h, x (a ratio), or empty
 * @param values  every pass or sample, for the JSON output; may be empty
 * @param target  the target in words, or null when none is set
 * @param met     whether the target is met, or null when none is set
 */
public record Figure(String key, String label, double median, double p90, String unit, double[] values,
                     String target, Boolean met) {

    public Figure {
        if (key == null || key.isBlank() || label == null) {
            throw new IllegalArgumentException("a figure needs a key and a label");
        }
        unit = unit == null ? "" : unit;
        values = values == null ? new double[0] : values.clone();
        if ((target == null) != (met == null)) {
            throw new IllegalArgumentException("a target and whether it is met go together: " + key);
        }
    }

    /** A measured figure without a target: median and p90 of the values. */
    static Figure measured(String key, String label, String unit, double[] values) {
        Summary s = Summary.of(values);
        return new Figure(key, label, s.median(), values.length > 1 ? s.p90() : Double.NaN, unit, values, null,
                null);
    }

    /** A single derived value (a ratio, a rate per hour) without a target. */
    static Figure value(String key, String label, String unit, double value) {
        return new Figure(key, label, value, Double.NaN, unit, null, null, null);
    }

    Figure withTarget(String target, boolean met) {
        return new Figure(key, label, median, p90, unit, values, target, met);
    }
}
