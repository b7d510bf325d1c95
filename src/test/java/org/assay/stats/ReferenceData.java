package org.assay.stats;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/** Loads a committed reference file /reference/NAME.json written by src/test/reference/ scripts. */
final class ReferenceData {
    private ReferenceData() {}

    static JsonNode load(String name) {
        String resource = "/reference/" + name + ".json";
        try (InputStream in = ReferenceData.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("missing test resource " + resource);
            JsonNode root = new ObjectMapper().readTree(in);
            if (!root.hasNonNull("generated_by")) throw new IllegalStateException(resource + " has no generated_by");
            return root;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static double[] doubles(JsonNode array) {
        double[] out = new double[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asDouble();
        return out;
    }

    static boolean[] booleans(JsonNode array) {
        boolean[] out = new boolean[array.size()];
        for (int i = 0; i < out.length; i++) out[i] = array.get(i).asBoolean();
        return out;
    }

    /** |expected - actual| within a relative tolerance, with an absolute floor for tiny values. */
    static boolean close(double expected, double actual, double relative, double absoluteFloor) {
        return Math.abs(expected - actual) <= Math.max(absoluteFloor, relative * Math.abs(expected));
    }
}
