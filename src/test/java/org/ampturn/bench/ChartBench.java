package org.ampturn.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.ampturn.chart.Figure;
import org.ampturn.chart.RlRun;
import org.openjdk.jmh.annotations.*;

/**
 * A 100,000-point transient (7 signals: current, three voltages, three energies) written as a
 * stacked figure at 1600×1000. Target (issue 6): PNG in at most 300 ms after warm-up. Sample mode
 * reports the spread as well: on a shared machine the low percentiles show the cost of the work
 * itself, the mean also the waiting for a core.
 */
@State(Scope.Benchmark)
@BenchmarkMode({Mode.AverageTime, Mode.SampleTime})
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 4, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = "-Djava.awt.headless=true")
public class ChartBench {
    private Figure figure;
    private Path dir;

    @Setup
    public void setUp() throws IOException {
        figure = Figure.of("transient", org.ampturn.chart.Plots.dataOf(new RlRun(100_001)));
        dir = Files.createTempDirectory("chart-bench");
    }

    @TearDown
    public void tearDown() throws IOException {
        try (var s = Files.list(dir)) {
            for (Path p : (Iterable<Path>) s::iterator) Files.deleteIfExists(p);
        }
        Files.deleteIfExists(dir);
    }

    @Benchmark
    public Figure png1600x1000() {
        return figure.save(dir.resolve("t.png"), 1600, 1000);
    }

    @Benchmark
    public Figure svg1600x1000() {
        return figure.save(dir.resolve("t.svg"), 1600, 1000);
    }
}
