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
import org.stellabar.eos.Electrons;
import org.stellabar.structure.IsentropicRequest;
import org.stellabar.structure.ScaleAnchor;
import org.stellabar.structure.StarBuilder;
import org.stellabar.structure.StarModel;
import org.stellabar.survey.EosGrid;
import org.stellabar.table.Table;

import static org.stellabar.physics.Constants.SOLAR_MASS;

/**
 * Speed of the Fermi–Dirac equation of state in bulk: a 100 × 100 grid on either equation of state (the same points, one thread,
 * for the fermi/classical ratio); one isentropic 80 M☉ oxygen core.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class FermiEosBenchmark {

    private static final Composition OXYGEN = Composition.fromAnyTwo(0.0, 0.0, 1.0, 16.0);

    private EosGrid grid;
    private EosGrid.Spec classicalGrid;
    private EosGrid.Spec fermiGrid;

    @Setup
    public void setUp() {
        grid = new EosGrid(1);
        classicalGrid = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-4, 1e8, 100, 1e6, 1e10, 100, OXYGEN,
                Electrons.classical);
        fermiGrid = new EosGrid.Spec(EosGrid.Plane.RHO_T, 1e-4, 1e8, 100, 1e6, 1e10, 100, OXYGEN, Electrons.fermi);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Table classicalGrid10k() {
        return grid.evaluate(classicalGrid);
    }

    @Benchmark
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public Table fermiGrid10k() {
        return grid.evaluate(fermiGrid);
    }

    /** An isentropic 80 Msun pure-oxygen core with T_c = 2e9 K on the fermi EOS (warm JVM). */
    @Benchmark
    @Warmup(iterations = 1, time = 1)
    @Measurement(iterations = 3, time = 1)
    @OutputTimeUnit(TimeUnit.MILLISECONDS)
    public StarModel oxygenCore80() {
        return new StarBuilder().build(new IsentropicRequest("core", 80.0 * SOLAR_MASS,
                new ScaleAnchor.CentralTemperature(2e9), OXYGEN, 400, Electrons.fermi));
    }
}
