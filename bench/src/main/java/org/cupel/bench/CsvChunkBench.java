package org.cupel.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.cupel.ingest.RawTable;
import org.cupel.ingest.TableReader;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Tokenizing one CSV chunk of the size of a demo lab file (400 rows, ten analytes) into a raw table.
 * Bytes per second = file size (printed at setup) times the score.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CsvChunkBench {
    private Path file;

    @Setup(Level.Trial)
    public void write() throws IOException {
        SplittableRandom random = new SplittableRandom(20240601);
        StringBuilder csv = new StringBuilder("Sample ID,Au_ppm,Ag_ppm,Cu_pct,Pb_pct,Zn_pct,As_ppm,S_pct,Fe_pct,Mo_ppm,Bi_ppm\n");
        for (int r = 0; r < 400; r++) {
            csv.append("S").append(100000 + r);
            for (int c = 0; c < 10; c++) {
                csv.append(',').append(random.nextInt(20) == 0 ? "<0.01" : String.format("%.3f", random.nextDouble() * 5));
            }
            csv.append('\n');
        }
        file = Files.createTempFile("cupel-bench", ".csv");
        Files.writeString(file, csv);
        System.out.println("CSV chunk: " + Files.size(file) + " bytes");
    }

    @TearDown(Level.Trial)
    public void delete() throws IOException {
        Files.deleteIfExists(file);
    }

    @Benchmark
    public RawTable readChunk() {
        return TableReader.read(file);
    }
}
