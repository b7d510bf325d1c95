package org.assay.testing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/** Loads committed reference values (written by the scripts in src/test/reference/). */
public final class ReferenceData {
    private ReferenceData() {}

    public static JsonNode load(String name) {
        try (InputStream in = ReferenceData.class.getResourceAsStream("/reference/" + name)) {
            if (in == null) throw new IllegalStateException("missing reference file /reference/" + name);
            return new ObjectMapper().readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static int[] ints(JsonNode array) {
        int[] out = new int[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asInt();
        return out;
    }

    public static double[] doubles(JsonNode array) {
        if (array == null || array.isNull()) return null;
        double[] out = new double[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asDouble();
        return out;
    }
}
