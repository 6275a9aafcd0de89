package org.ladderkin.bench;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.ladderkin.fit.Dataset;
import org.ladderkin.io.TableOptions;
import org.ladderkin.io.TraceTableReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Reading speed of the streaming trace table reader on a generated CSV (one delay column, four traces, cells with six
 * significant digits).
 * Run: {@code mvn -B -q test-compile && java -cp target/test-classes:target/classes:$(cat cp.txt) org.openjdk.jmh.Main TraceTableRead}
 * (with {@code cp.txt} from {@code mvn dependency:build-classpath -Dmdep.outputFile=cp.txt}).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(1)
public class TraceTableReadBenchmark {

    @Param({"1000000"})
    int rows;

    Path file;

    @Setup(Level.Trial)
    public void writeFile() throws IOException {
        file = Files.createTempFile("ladderkin-bench", ".csv");
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("delay (ps),a,b,c,d\n");
            for (int i = 0; i < rows; i++) {
                double t = i * 0.01;
                // six significant digits, as instruments write them
                w.write(String.format(Locale.ROOT, "%.6g", t));
                for (int k = 1; k <= 4; k++) {
                    w.write(',');
                    w.write(String.format(Locale.ROOT, "%.6g", k * Math.exp(-t / (100.0 * k))));
                }
                w.write('\n');
            }
        }
    }

    @TearDown(Level.Trial)
    public void deleteFile() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public Dataset read() {
        return TraceTableReader.read(file, "bench.csv", TableOptions.defaults());
    }
}
