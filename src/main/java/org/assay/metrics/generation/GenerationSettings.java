package org.assay.metrics.generation;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.assay.common.UserInputException;
import org.assay.data.generation.GenerationData;

/**
 * Reading a generation metric's parameters (with clear errors) and stating the settings a value
 * was computed with in one line. The line uses the parameter names a claim's {@code params} take,
 * so what a report prints can be copied into a claims file:
 * {@code tokenize=13a lowercase=false smoothing=none order=4 refs=2}. {@code refs} is the number
 * of references per item ("1-3" when it varies).
 */
final class GenerationSettings {
    private GenerationSettings() {}

    /** Fails on a parameter the metric does not take. */
    static void checkKnown(GenerationMetrics.Info info, Map<String, String> params) {
        for (String p : params.keySet()) {
            if (!info.params().contains(p)) {
                throw UserInputException.usage("metric " + info.id() + " takes no parameter '" + p + "'",
                        info.params().isEmpty() ? "remove it" : "allowed: " + String.join(", ", info.params().stream().sorted().toList()));
            }
        }
    }

    /** A parameter that must be one of {@code allowed}; {@code fallback} when absent. */
    static String choice(String metric, Map<String, String> params, String key, String fallback, List<String> allowed) {
        String v = params.getOrDefault(key, fallback).strip().toLowerCase(Locale.ROOT);
        if (!allowed.contains(v)) {
            throw UserInputException.usage(metric + " parameter " + key + " is '" + params.get(key) + "'",
                    "use one of: " + String.join(", ", allowed));
        }
        return v;
    }

    /** A true/false parameter; {@code fallback} when absent. */
    static boolean flag(String metric, Map<String, String> params, String key, boolean fallback) {
        String v = params.get(key);
        if (v == null) return fallback;
        return switch (v.strip().toLowerCase(Locale.ROOT)) {
            case "true", "yes", "1" -> true;
            case "false", "no", "0" -> false;
            default -> throw UserInputException.usage(metric + " parameter " + key + " is '" + v + "'", "use true or false");
        };
    }

    /** A whole-number parameter within [min, max]; {@code fallback} when absent. */
    static int integer(String metric, Map<String, String> params, String key, int fallback, int min, int max) {
        String v = params.get(key);
        if (v == null) return fallback;
        try {
            int n = Integer.parseInt(v.strip());
            if (n >= min && n <= max) return n;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw UserInputException.usage(metric + " parameter " + key + " is '" + v + "'",
                "use a whole number from " + min + " to " + max);
    }

    /** A real-number parameter within [min, max]; {@code fallback} when absent. */
    static double real(String metric, Map<String, String> params, String key, double fallback, double min, double max) {
        String v = params.get(key);
        if (v == null) return fallback;
        try {
            double x = Double.parseDouble(v.strip());
            if (x >= min && x <= max) return x;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw UserInputException.usage(metric + " parameter " + key + " is '" + v + "'",
                "use a number from " + min + " to " + max);
    }

    /**
     * The settings line: the effective settings in the order given, then {@code refs=}.
     * Numbers print without a trailing ".0".
     */
    static String line(Map<String, Object> effective, GenerationData data) {
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<String, Object> e : effective.entrySet()) {
            Object v = e.getValue();
            String text = v instanceof Double d && d == Math.rint(d) && !Double.isInfinite(d)
                    ? Long.toString(d.longValue()) : String.valueOf(v);
            sb.append(e.getKey()).append('=').append(text).append(' ');
        }
        int min = Integer.MAX_VALUE, max = 0;
        for (List<String> refs : data.references()) {
            min = Math.min(min, refs.size());
            max = Math.max(max, refs.size());
        }
        sb.append("refs=").append(min == max ? Integer.toString(min) : min + "-" + max);
        return sb.toString();
    }

    /** An ordered map for {@link #line}, from alternating keys and values. */
    static Map<String, Object> settings(Object... keysAndValues) {
        Map<String, Object> m = new LinkedHashMap<>();
        for (int i = 0; i < keysAndValues.length; i += 2) m.put((String) keysAndValues[i], keysAndValues[i + 1]);
        return m;
    }
}
