package org.assay.common;

import java.util.EnumMap;
import java.util.Map;
import java.util.StringJoiner;

/**
 * The values of every {@link Limit} for the running command: the defaults, changed by
 * {@code --limit NAME=VALUE}. The command line installs them for the length of one command
 * ({@link #runWith}); readers ask {@link Limit#value()}. A process runs one command at a time,
 * so one shared setting is enough and spares every reader a parameter.
 */
public final class Limits {
    private static final Limits DEFAULTS = new Limits(new EnumMap<>(Limit.class));
    private static volatile Limits current = DEFAULTS;

    private final EnumMap<Limit, Long> overrides;

    private Limits(EnumMap<Limit, Long> overrides) {
        this.overrides = overrides;
    }

    public static Limits defaults() { return DEFAULTS; }

    public static Limits current() { return current; }

    public long get(Limit limit) {
        Long v = overrides.get(limit);
        return v != null ? v : limit.defaultValue();
    }

    /**
     * The defaults with {@code NAME=VALUE} settings applied. A value may use the suffixes k, M, G
     * (powers of 1024) or be written with underscores; an unknown name or a value that is not a
     * positive whole number is a usage error that lists the names.
     */
    public static Limits parse(Map<String, String> settings) {
        EnumMap<Limit, Long> values = new EnumMap<>(Limit.class);
        for (Map.Entry<String, String> e : settings.entrySet()) {
            Limit limit = Limit.byKey(e.getKey().trim());
            if (limit == null) {
                throw UserInputException.usage("--limit " + e.getKey() + ": no such limit",
                        "the limits are " + names());
            }
            values.put(limit, parseValue(e.getKey(), e.getValue()));
        }
        return new Limits(values);
    }

    private static long parseValue(String key, String text) {
        String t = text == null ? "" : text.trim().replace("_", "");
        long unit = 1;
        if (!t.isEmpty()) {
            switch (t.charAt(t.length() - 1)) {
                case 'k', 'K' -> unit = 1L << 10;
                case 'M' -> unit = 1L << 20;
                case 'G' -> unit = 1L << 30;
                default -> { }
            }
            if (unit != 1) t = t.substring(0, t.length() - 1);
        }
        try {
            long v = Long.parseLong(t);
            if (v <= 0) throw new NumberFormatException();
            return Math.multiplyExact(v, unit);
        } catch (NumberFormatException | ArithmeticException e) {
            throw UserInputException.usage("--limit " + key + "=" + text + ": the value must be a positive whole number",
                    "write it like --limit " + key + "=2000000 or --limit " + key + "=4G");
        }
    }

    /** Runs {@code work} with these limits in force, then restores the previous ones. */
    public <T> T runWith(java.util.function.Supplier<T> work) {
        Limits before = current;
        current = this;
        try {
            return work.get();
        } finally {
            current = before;
        }
    }

    /** Every limit name, for help and error text. */
    public static String names() {
        StringJoiner j = new StringJoiner(", ");
        for (Limit l : Limit.values()) j.add(l.key());
        return j.toString();
    }
}
