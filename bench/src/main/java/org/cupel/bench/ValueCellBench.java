package org.cupel.bench;

import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.cupel.assay.SourceLocation;
import org.cupel.ingest.ValueConventions;
import org.cupel.ingest.ValueParser;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;

/** Parsing value cells as a lab file writes them: plain numbers, censoring codes and missing markers. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ValueCellBench {
    private static final int CELLS = 10_000;
    private final ValueParser parser = new ValueParser(ValueConventions.DEFAULTS);
    private final SourceLocation where = new SourceLocation("bench.csv", 2, 3);
    private String[] cells;

    @Setup
    public void cells() {
        SplittableRandom random = new SplittableRandom(20240601);
        cells = new String[CELLS];
        for (int i = 0; i < CELLS; i++) {
            int kind = random.nextInt(100);
            cells[i] = kind < 85 ? String.format("%.3f", random.nextDouble() * 12)
                    : kind < 95 ? "<0.005" : kind < 98 ? "-0.01" : "IS";
        }
    }

    /** One operation parses {@value #CELLS} cells; divide the score by it for cells per second. */
    @Benchmark
    public void parseCells(Blackhole sink) {
        for (String c : cells) {
            sink.consume(parser.parse(c, Double.NaN, where));
        }
    }
}
