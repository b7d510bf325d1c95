package org.assay.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.assay.common.UserInputException;

/**
 * Writes a set of files into a folder; every file assay writes goes through here. Nothing is
 * overwritten without {@code force}, and all checks run before the first write. Each file is first
 * written to a temporary file in the same folder (so the move stays on one file system), and only
 * when every file of the set is written are they moved into place, one rename each.
 *
 * <p>Interruption (SIGTERM, Ctrl-C): a shutdown hook ({@link Interruption}) deletes the temporary files
 * of a set that is still being written, so the folder keeps its previous files, byte for byte; a set
 * whose moves have begun is let finish first (the moves take milliseconds), so the folder never holds
 * half an old and half a new report. A SIGKILL or a power cut, which run no hook, can leave a hidden
 * temporary file ({@code .NAME.XXXX.assay-tmp}) beside the intact previous files; assay never reads
 * one, and a later run does not delete it either, since it could belong to another assay process
 * writing into the same folder at that moment.
 */
public final class OutputDirectory {
    /** Suffix of the temporary files. */
    static final String TEMP_SUFFIX = ".assay-tmp";

    private final Path dir;
    private final boolean force;

    public OutputDirectory(Path dir, boolean force) {
        this.dir = dir;
        this.force = force;
    }

    /** Writes {@code files} (name to text, UTF-8); returns the paths written. */
    public List<Path> write(Map<String, String> files) {
        Map<String, byte[]> bytes = new LinkedHashMap<>();
        files.forEach((name, text) -> bytes.put(name, text.getBytes(StandardCharsets.UTF_8)));
        return writeBytes(bytes);
    }

    /** Fails, before anything is written, when a file of {@code names} exists and {@code force} is off. */
    public void checkWritable(java.util.Collection<String> names) {
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new UserInputException(dir, null, "the output path exists and is not a folder", "choose another --out");
        }
        for (String name : names) {
            Path target = dir.resolve(name);
            if (Files.exists(target, java.nio.file.LinkOption.NOFOLLOW_LINKS) && !force) {
                throw new UserInputException(target, null, "refusing to overwrite an existing file",
                        "pass --force to replace it, or choose another --out");
            }
        }
    }

    /** Writes {@code files} (name to bytes); returns the paths written. */
    public List<Path> writeBytes(Map<String, byte[]> files) {
        checkWritable(files.keySet());
        boolean created = !Files.exists(dir);
        Interruption.Batch batch = null;
        try {
            Files.createDirectories(dir);
            batch = Interruption.begin(created ? dir : null);
            List<Path> written = new ArrayList<>();
            for (Map.Entry<String, byte[]> e : files.entrySet()) {
                Path tmp = batch.stage(dir, e.getKey());
                Files.write(tmp, e.getValue(), StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                TestPause.afterStep();
                written.add(dir.resolve(e.getKey()));
            }
            batch.commit(OutputDirectory::move);
            return written;
        } catch (IOException e) {
            if (batch != null) batch.abandon();
            if (created) deleteQuietly();
            throw new UserInputException(dir, null, "cannot write the report: " + e.getMessage(),
                    "check that the folder is writable");
        } finally {
            if (batch != null) batch.abandon();
        }
    }

    static void move(Path tmp, Path target) throws IOException {
        try {
            Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
        }
        TestPause.afterStep();
    }

    private void deleteQuietly() {
        try (var s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException ignored) {
            // best effort: the folder was ours and is being abandoned
        }
    }

    /**
     * The batches being written in this JVM and the shutdown hook that cleans them up. Staging a file
     * and committing a batch hold one lock; the hook takes the same lock, so it runs either before a
     * commit starts (it deletes the staged files and no commit follows) or after it ends.
     */
    static final class Interruption {
        private static final Object LOCK = new Object();
        private static final List<Batch> OPEN = new ArrayList<>();
        private static boolean hooked;
        private static boolean shuttingDown;

        private Interruption() {}

        /** A set of staged files; {@code createdDir} is the folder this write created, or null. */
        static Batch begin(Path createdDir) throws IOException {
            synchronized (LOCK) {
                if (shuttingDown) throw new IOException("assay is shutting down");
                if (!hooked) {
                    Runtime.getRuntime().addShutdownHook(new Thread(Interruption::onShutdown, "assay-output-cleanup"));
                    hooked = true;
                }
                Batch b = new Batch(createdDir);
                OPEN.add(b);
                return b;
            }
        }

        private static void onShutdown() {
            synchronized (LOCK) {
                shuttingDown = true;
                for (Batch b : List.copyOf(OPEN)) b.deleteStaged();
                OPEN.clear();
            }
        }

        /** One write's temporary files, in the order they are to be moved into place. */
        static final class Batch {
            private final Path createdDir;
            private final Map<Path, Path> staged = new LinkedHashMap<>();   // temporary file -> target
            private boolean done;

            private Batch(Path createdDir) { this.createdDir = createdDir; }

            /** Creates an empty temporary file for {@code name} in {@code dir} (umask permissions, not 0600). */
            Path stage(Path dir, String name) throws IOException {
                synchronized (LOCK) {
                    if (shuttingDown || done) throw new IOException("assay is shutting down");
                    while (true) {
                        String random = Long.toHexString(Double.doubleToLongBits(Math.random()) ^ System.nanoTime());
                        Path tmp = dir.resolve("." + name + "." + random + TEMP_SUFFIX);
                        try {
                            Files.createFile(tmp);
                        } catch (FileAlreadyExistsException e) {
                            continue;
                        }
                        staged.put(tmp, dir.resolve(name));
                        return tmp;
                    }
                }
            }

            /** Moves every staged file into place; a shutdown waits for this to end. */
            void commit(Mover mover) throws IOException {
                synchronized (LOCK) {
                    if (shuttingDown) throw new IOException("assay is shutting down");
                    for (Map.Entry<Path, Path> e : staged.entrySet()) mover.move(e.getKey(), e.getValue());
                    staged.clear();
                    close();
                }
            }

            /** Deletes what is still staged (after an error); does nothing after a commit. */
            void abandon() {
                synchronized (LOCK) {
                    if (done) return;
                    deleteStaged();
                    close();
                }
            }

            private void close() {
                done = true;
                OPEN.remove(this);
            }

            private void deleteStaged() {
                for (Path tmp : staged.keySet()) {
                    try {
                        Files.deleteIfExists(tmp);
                    } catch (IOException ignored) {
                        // best effort: the next write into the folder removes leftovers
                    }
                }
                staged.clear();
                if (createdDir != null) {
                    try {
                        Files.deleteIfExists(createdDir);   // only when empty: a folder this write created
                    } catch (IOException ignored) {
                        // not empty (or gone): leave it
                    }
                }
            }
        }

        interface Mover {
            void move(Path tmp, Path target) throws IOException;
        }
    }

    /**
     * A pause after each staged file and each move, read from the system property
     * {@code assay.test.writePauseMillis} (0, no pause, unless set). It exists only so that
     * {@code InterruptedWriteTest} can send SIGTERM at a known step of a write in a separate JVM;
     * nothing else sets it.
     */
    static final class TestPause {
        private static final long MILLIS = Long.getLong("assay.test.writePauseMillis", 0L);

        private TestPause() {}

        static void afterStep() {
            if (MILLIS <= 0) return;
            try {
                Thread.sleep(MILLIS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }
}
