package org.ladderkin.io;

import java.nio.file.Path;

/** Writes numbered output sets into a folder, forever, for {@link OutputSetTest}'s kill test (run in its own JVM). */
public final class OutputSetWriterMain {

    private OutputSetWriterMain() {
    }

    public static void main(String[] args) throws Exception {
        Path dir = Path.of(args[0]);
        for (long run = System.nanoTime(); ; run++) {
            try (OutputSet set = OutputSet.begin(dir)) {
                for (String name : OutputSetTest.NAMES) {
                    AtomicFiles.writeString(set.resolve(name), OutputSetTest.content(name, run));
                }
                set.commit();
            }
        }
    }
}
