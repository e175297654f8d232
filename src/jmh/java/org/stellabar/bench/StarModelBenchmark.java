package org.stellabar.bench;

import static org.stellabar.physics.Constants.SOLAR_MASS;
import static org.stellabar.physics.Constants.SOLAR_RADIUS;

import java.util.concurrent.TimeUnit;
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
import org.stellabar.eos.Composition;
import org.stellabar.structure.StandardModelRequest;
import org.stellabar.structure.IsentropicRequest;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.structure.StarRequest;

/**
 * One standard-model star of 40 M☉ and 12 R☉ with a 1000-row profile: with the builder's n = 3
 * Lane-Emden solution already cached (the case of many stars), and from a fresh builder (one
 * star per run, including the Lane-Emden solve). An isentropic star of the same M and R, whose
 * shooting integrates the structure some ten times, for comparison.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class StarModelBenchmark {

    private StarBuilder builder;
    private StarRequest standard;
    private StarRequest isentropic;

    @Setup
    public void setUp() {
        builder = new StarBuilder();
        Composition composition = Composition.of(0.7, 0.28, 0.02);
        standard = StandardModelRequest.of(40.0 * SOLAR_MASS, 12.0 * SOLAR_RADIUS, composition).withPoints(1000);
        isentropic = IsentropicRequest.withRadius(40.0 * SOLAR_MASS, 12.0 * SOLAR_RADIUS, composition)
                .withPoints(1000);
    }

    @Benchmark
    public StarModel standardModel1000Rows() {
        return builder.build(standard);
    }

    @Benchmark
    public StarModel standardModel1000RowsFreshBuilder() {
        return new StarBuilder().build(standard);
    }

    @Benchmark
    public StarModel isentropicStar1000Rows() {
        return builder.build(isentropic);
    }
}
