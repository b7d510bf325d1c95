package org.assay.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.assay.data.EvaluationData;
import org.assay.data.ReadOptions;
import org.assay.audit.ClassificationReproduction;
import org.assay.audit.GenerationReproduction;

/**
 * Invented, seeded input files for the benchmarks, written to temporary files at setup and read
 * back through the same readers `assay measure` uses (never committed). The shapes follow
 * src/bench/generate.py; the numbers differ (another generator), which no benchmark depends on.
 */
final class BenchData {
    private BenchData() {}

    /** id,label,prediction,score: P(label 1) = 0.4, a logistic score of N(label - 0.5, 1), prediction = score &gt; 0.5. */
    static Path classificationCsv(int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        Path file = temp("assay-bench-classification", ".csv");
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("id,label,prediction,score\n");
            for (int i = 0; i < n; i++) {
                int label = rng.nextDouble() < 0.4 ? 1 : 0;
                double score = 1 / (1 + Math.exp(-(gaussian(rng) + label - 0.5)));
                w.write(i + "," + label + "," + (score > 0.5 ? 1 : 0) + "," + String.format(Locale.ROOT, "%.6f", score) + "\n");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    /** One JSON Lines item per sentence: a reference of 8-30 invented words, a hypothesis that keeps about 70% of them. */
    static Path generationJsonl(int n, long seed) {
        SplittableRandom rng = new SplittableRandom(seed);
        List<String> vocab = inventedWords(3000, rng);
        Path file = temp("assay-bench-generation", ".jsonl");
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            for (int i = 0; i < n; i++) {
                int length = 8 + rng.nextInt(23);
                StringBuilder ref = new StringBuilder();
                StringBuilder hyp = new StringBuilder();
                for (int j = 0; j < length; j++) {
                    String word = vocab.get(zipf(rng, vocab.size()));
                    ref.append(j == 0 ? "" : " ").append(word);
                    double u = rng.nextDouble();
                    if (u < 0.05) continue;
                    hyp.append(hyp.length() == 0 ? "" : " ").append(u < 0.75 ? word : vocab.get(zipf(rng, vocab.size())));
                }
                w.write("{\"id\": \"s" + i + "\", \"hypothesis\": \"" + hyp + "\", \"references\": [\"" + ref + "\"]}\n");
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    /**
     * A Q x 5Q float32 .npy matrix (C order, little-endian, format 1.0) of standard normal scores,
     * +3 on each query's five relevant candidates 5q..5q+4; written row by row.
     */
    static Path scoreMatrixNpy(int queries, long seed) {
        int candidates = 5 * queries;
        SplittableRandom rng = new SplittableRandom(seed);
        Path file = temp("assay-bench-scores", ".npy");
        String dict = "{'descr': '<f4', 'fortran_order': False, 'shape': (" + queries + ", " + candidates + "), }";
        int unpadded = 10 + dict.length() + 1;
        String header = dict + " ".repeat((64 - unpadded % 64) % 64) + "\n";
        try (FileChannel out = FileChannel.open(file, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
            ByteBuffer head = ByteBuffer.allocate(10 + header.length()).order(ByteOrder.LITTLE_ENDIAN);
            head.put((byte) 0x93).put("NUMPY".getBytes(StandardCharsets.US_ASCII)).put((byte) 1).put((byte) 0)
                    .putShort((short) header.length()).put(header.getBytes(StandardCharsets.US_ASCII)).flip();
            out.write(head);
            ByteBuffer row = ByteBuffer.allocate(4 * candidates).order(ByteOrder.LITTLE_ENDIAN);
            for (int q = 0; q < queries; q++) {
                row.clear();
                for (int c = 0; c < candidates; c++) row.putFloat((float) (gaussian(rng) + (c / 5 == q ? 3 : 0)));
                row.flip();
                while (row.hasRemaining()) out.write(row);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return file;
    }

    static EvaluationData readClassification(Path csv, ReadOptions options) {
        return new ClassificationReproduction(null, null, csv, options).read().parts().get(0).data();
    }

    static EvaluationData readGeneration(Path jsonl) {
        return new GenerationReproduction(null, null, jsonl, List.of(), null).read().parts().get(0).data();
    }

    static void delete(Path file) {
        try {
            if (file != null) Files.deleteIfExists(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Path temp(String prefix, String suffix) {
        try {
            Path file = Files.createTempFile(prefix, suffix);
            file.toFile().deleteOnExit();
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Box-Muller; one of the pair is enough here. */
    private static double gaussian(SplittableRandom rng) {
        double u = 1 - rng.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rng.nextDouble());
    }

    /** Rank r (0-based) with probability proportional to 1 / (r + 1), by inversion of the harmonic sum (approximate). */
    private static int zipf(SplittableRandom rng, int size) {
        double h = Math.log(size) + 0.5772156649;
        int r = (int) Math.floor(Math.exp(rng.nextDouble() * h - 0.5772156649)) - 1;
        return Math.max(0, Math.min(size - 1, r));
    }

    private static List<String> inventedWords(int count, SplittableRandom rng) {
        String consonants = "bdfgklmnprstvz";
        String vowels = "aeiou";
        java.util.Set<String> words = new java.util.TreeSet<>();
        while (words.size() < count) {
            StringBuilder w = new StringBuilder();
            int syllables = 2 + rng.nextInt(2);
            for (int s = 0; s < syllables; s++) {
                w.append(consonants.charAt(rng.nextInt(consonants.length()))).append(vowels.charAt(rng.nextInt(vowels.length())));
            }
            words.add(w.toString());
        }
        return new ArrayList<>(words);
    }
}
