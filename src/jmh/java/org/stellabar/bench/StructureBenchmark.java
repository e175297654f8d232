package org.stellabar.bench;

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
import org.stellabar.physics.Constants;
import org.stellabar.structure.EddingtonStandardModel;
import org.stellabar.structure.LaneEmdenSolution;
import org.stellabar.structure.LaneEmdenSolver;
import org.stellabar.survey.MassSequence;
import org.stellabar.table.Table;

/**
 * Speed of one Lane-Emden solve at the default tolerance (n = 3, and n = 4.9 where ξ₁ ≈ 171), of
 * the relativistic constant K_n, and of a 10⁴-mass standard-model sequence (parallel).
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class StructureBenchmark {

    private LaneEmdenSolver solver;
    private MassSequence sequence;
    private LaneEmdenSolution three;

    @Setup
    public void setUp() {
        solver = new LaneEmdenSolver();
        three = solver.solve(3.0);
        sequence = new MassSequence(EddingtonStandardModel.create(), Composition.of(0.7, 0.28, 0.02),
                0.1 * Constants.SOLAR_MASS, 1e8 * Constants.SOLAR_MASS, 10_000);
    }

    @Benchmark
    public LaneEmdenSolution laneEmdenThree() {
        return solver.solve(3.0);
    }

    @Benchmark
    public LaneEmdenSolution laneEmdenFourPointNine() {
        return solver.solve(4.9);
    }

    @Benchmark
    public double relativisticCoefficientThree() {
        return solver.solve(3.0).relativisticCoefficient();
    }

    @Benchmark
    public double profileSample1000() {
        return three.sample(1000).theta()[500];
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Table sequenceTenThousandMasses() {
        return sequence.table();
    }
}
